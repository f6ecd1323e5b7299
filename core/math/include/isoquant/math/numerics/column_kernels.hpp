// ln, exp, ln(1 + x) and eˣ − 1 of a whole column of doubles in Eigen 3.4's packet kernels, four doubles a step (AVX2)
// where the processor has AVX2, else two (SSE2).
//
// Why two widths give the same numbers: both run Eigen's one polynomial (plog_impl_double /
// pexp_double) with separate multiplies and adds (the AVX2 copy is built with -mavx2 and without
// -mfma, so nothing is fused), and the last few values of a column go through the same packet
// kernel, padded, never through std::log. So every value's ln or exp is the same bits on every
// x86-64 processor and at every position in a column (tests/unit/test_column_kernels.cpp).
// Within 2 ulp of the true value for normal doubles (ln) and results (exp), not beyond:
// exact_elementwise.hpp checks the range.
#pragma once

#include <cstddef>

namespace isoquant::column_kernels {

enum class Width { automatic, twoDoubles, fourDoubles };

// Whether this processor runs the four-doubles kernels (checked once).
bool fourDoublesAvailable();

// out[i] = ln values[i] (exp values[i]) for i < count; `out` may be `values`. `width` is for the
// tests: `fourDoubles` where the processor lacks AVX2 falls back to two.
void logs(const double* values, double* out, std::size_t count, Width width = Width::automatic);
void exps(const double* values, double* out, std::size_t count, Width width = Width::automatic);
// As logs (the same bits), into `out` apart from `values`, and true where every value is at least
// the smallest normal double, 2.2250738585072014e-308 (false for a NaN). Where one is not, the
// kernel's log of it is not exact (exact_elementwise.hpp). The check rides on the kernel's own
// loads: a separate pass to find the least value cost a fit of a million rows 9 % of its time.
bool logsOfNormals(const double* values, double* out, std::size_t count, Width width = Width::automatic);
// exps[i] = e^values[i] and expm1s[i] = e^values[i] − 1 from one exp: Kahan's correction on the
// kernels' exp (numerics/column_kernels_packet.hpp), within 4 ulp; the same bits at both widths
// and positions, like ln and exp.
void expsAndExpm1s(const double* values, double* exps, double* expm1s, std::size_t count,
                   Width width = Width::automatic);

} // namespace isoquant::column_kernels
