// The Cobb-Douglas technology inside a model read back from cells (the tests know its form).
#pragma once

#include "isoquant/math/forms/cobb_douglas.hpp"
#include "isoquant/sheet/models/production_model.hpp"

namespace isoquant::testing {

inline const CobbDouglas& cobbDouglasOf(const ProductionModel& model)
{
    return dynamic_cast<const CobbDouglas&>(*model.technology);
}

} // namespace isoquant::testing
