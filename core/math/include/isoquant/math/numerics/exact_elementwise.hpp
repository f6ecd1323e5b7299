// Logs and exponentials of whole columns that stay exact outside the normal doubles.
// Eigen 3.4's vectorised kernels (column_kernels.hpp) are exact only there: its log takes any
// subnormal x (below 2.2e-308) for 2.2e-308, and its exp returns 5.6e-309 for every argument below
// about −709.4, where the true value is subnormal or 0. Each function looks once at the smallest
// coefficient: when every value is in the kernel's range (the common case) the vectorised kernel
// runs, else std::log / std::exp coefficient by coefficient.
#pragma once

#include "isoquant/math/numerics/column_kernels.hpp"

#include <Eigen/Dense>

#include <algorithm>
#include <array>
#include <cmath>
#include <cstddef>
#include <limits>
#include <type_traits>

namespace isoquant {

// ln of the smallest normal double, ln 2.2250738585072014e-308
inline constexpr double logOfSmallestNormal = -708.39641853226410622;

// out[i] = ln values[i] for a column held contiguously (out is values or does not overlap it), by
// the rule above. Apart, the kernel checks the range as it goes and the rare column outside it is
// taken again; in place, the range is checked first.
inline void exactLogs(const double* values, double* out, Eigen::Index count)
{
    if (count == 0) return;
    const auto size = static_cast<std::size_t>(count);
    if (out != values) {
        if (column_kernels::logsOfNormals(values, out, size)) return;
    } else if (Eigen::Map<const Eigen::ArrayXd>(values, count).minCoeff() >= std::numeric_limits<double>::min()) {
        column_kernels::logs(values, out, size);
        return;
    }
    for (Eigen::Index i = 0; i < count; ++i) out[i] = std::log(values[i]);
}

// values[i] = e^values[i] for a column held contiguously, by the rule above.
inline void exactExpsInPlace(double* values, Eigen::Index count)
{
    Eigen::Map<Eigen::ArrayXd> column(values, count);
    if (count == 0 || column.minCoeff() >= logOfSmallestNormal) {
        column_kernels::exps(values, values, static_cast<std::size_t>(count));
        return;
    }
    column = column.unaryExpr([](double value) { return std::exp(value); });
}

template <typename Derived>
typename Derived::PlainObject exactLog(const Eigen::ArrayBase<Derived>& values)
{
    static_assert(std::is_same_v<typename Derived::Scalar, double>, "columns of doubles only");
    typename Derived::PlainObject plain = values;
    exactLogs(plain.data(), plain.data(), plain.size());
    return plain;
}

template <typename Derived>
typename Derived::PlainObject exactExp(const Eigen::ArrayBase<Derived>& values)
{
    static_assert(std::is_same_v<typename Derived::Scalar, double>, "columns of doubles only");
    typename Derived::PlainObject plain = values;
    exactExpsInPlace(plain.data(), plain.size());
    return plain;
}

// A running sum with Neumaier's compensation: the rounding of each addition is kept apart and
// added back at the end, so a sum of many partial sums does not drift with their number.
class CompensatedSum {
public:
    void add(double term)
    {
        const double total = sum_ + term;
        compensation_ += std::fabs(sum_) >= std::fabs(term) ? (sum_ - total) + term : (term - total) + sum_;
        sum_ = total;
    }
    double value() const { return sum_ + compensation_; }

private:
    double sum_ = 0;
    double compensation_ = 0;
};

// Σ e^v over a column, by the rule above, a chunk at a time: no column of exponentials is
// allocated (a million residuals would take 8 MB and its page faults).
inline double sumOfExactExps(const Eigen::Ref<const Eigen::VectorXd>& values)
{
    constexpr Eigen::Index chunk = 1024;
    std::array<double, chunk> exps{};
    CompensatedSum sum;
    for (Eigen::Index first = 0; first < values.size(); first += chunk) {
        const Eigen::Index count = std::min(chunk, values.size() - first);
        Eigen::Map<Eigen::ArrayXd> out(exps.data(), count);
        out = values.segment(first, count).array();
        exactExpsInPlace(out.data(), count);
        sum.add(out.sum());
    }
    return sum.value();
}

// The mean of e^v: Duan's smearing factor from residuals of ln Y.
inline double meanOfExactExps(const Eigen::Ref<const Eigen::VectorXd>& values)
{
    return sumOfExactExps(values) / static_cast<double>(values.size());
}

} // namespace isoquant
