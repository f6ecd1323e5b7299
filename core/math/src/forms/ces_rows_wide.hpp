// The four-doubles copy of the CES composite's rows (ces_rows_packet.hpp), compiled apart with
// -mavx2 (ces_rows_avx2.cpp); called only where the processor has AVX2. Internal to the math library.
#pragma once

#include "forms/ces_rows_packet.hpp"

#include <cstddef>

namespace isoquant::ces_rows::avx2 {

// Only whole packets: `count` a multiple of 4; the caller takes the rest in two-doubles packets.
void composite(const double* logRatio, std::size_t count, const Shape& shape, const Outputs& out);

// Adds rows [0, count) to `sums` (cesNormalSums' thirteen, each in sumLanes lanes), one packet of
// four a step: lane j of each sum takes rows j, j + 4, … in order, as the two-doubles code does.
// `count` a multiple of 4.
void addNormalSums(const NormalRows& rows, std::size_t count, double (&sums)[normalSumCount][sumLanes]);

} // namespace isoquant::ces_rows::avx2
