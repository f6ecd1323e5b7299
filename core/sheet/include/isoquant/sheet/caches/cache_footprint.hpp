// Bytes a cache entry holds on the heap and in place: what the fit cache counts against its
// byte budget. Estimates from the sizes of the containers (capacities where known), not an
// allocator's figure: the allocator's own bookkeeping is left out.
#pragma once

#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/math/fits/production_fit.hpp"

#include <cstddef>

namespace isoquant {

std::size_t footprintBytes(const CellTable& table);
std::size_t footprintBytes(const FitArguments& arguments);
std::size_t footprintBytes(const ProductionFit& fit);

} // namespace isoquant
