// Logs and exponentials of whole columns that stay exact outside the normal doubles.
// Eigen 3.4's vectorised kernels are exact only there: its log takes any subnormal x (below
// 2.2e-308) for 2.2e-308, and its exp returns 5.6e-309 for every argument below about −709.4,
// where the true value is subnormal or 0. Each function looks once at the smallest coefficient:
// when every value is in the kernel's range (the common case) the vectorised kernel runs, else
// std::log / std::exp coefficient by coefficient.
#pragma once

#include <Eigen/Dense>

#include <cmath>
#include <limits>

namespace isoquant {

// ln of the smallest normal double, ln 2.2250738585072014e-308
inline constexpr double logOfSmallestNormal = -708.39641853226410622;

template <typename Derived>
typename Derived::PlainObject exactLog(const Eigen::ArrayBase<Derived>& values)
{
    const typename Derived::PlainObject plain = values;
    if (plain.size() == 0 || plain.minCoeff() >= std::numeric_limits<double>::min()) return plain.log();
    return plain.unaryExpr([](double value) { return std::log(value); });
}

template <typename Derived>
typename Derived::PlainObject exactExp(const Eigen::ArrayBase<Derived>& values)
{
    const typename Derived::PlainObject plain = values;
    if (plain.size() == 0 || plain.minCoeff() >= logOfSmallestNormal) return plain.exp();
    return plain.unaryExpr([](double value) { return std::exp(value); });
}

} // namespace isoquant
