#include "isoquant/math/forms/substitution_elasticity.hpp"

#include <cmath>

namespace isoquant {

namespace {

// A bordered Hessian whose reciprocal condition number is below this is treated as singular: its
// inverse would carry no correct digit (ε·cond ≥ 1e-16·1e12 = 1e-4 relative error at best).
constexpr double singularReciprocalCondition = 1e-12;

std::optional<double> finiteOrNothing(double value)
{
    if (!std::isfinite(value)) return std::nullopt;
    return value;
}

std::optional<double> directElasticity(const LocalShape& shape, Eigen::Index i, Eigen::Index j)
{
    const double ei = shape.elasticities(i), ej = shape.elasticities(j);
    if (ei == 0 || ej == 0) return std::nullopt;
    const Eigen::MatrixXd& s = shape.scaledHessian;
    const double denominator = -s(i, i) / (ei * ei) + 2 * s(i, j) / (ei * ej) - s(j, j) / (ej * ej);
    const double numerator = 1 / ei + 1 / ej;
    // A denominator at rounding level beside the numerator: a straight isoquant.
    if (std::fabs(denominator) <= 1e-13 * std::fabs(numerator)) return std::nullopt;
    return finiteOrNothing(numerator / denominator);
}

} // namespace

Eigen::MatrixXd scaledBorderedHessian(const LocalShape& shape)
{
    const Eigen::Index k = shape.elasticities.size();
    Eigen::MatrixXd bordered(k + 1, k + 1);
    bordered(0, 0) = 0;
    bordered.block(0, 1, 1, k) = shape.elasticities.transpose();
    bordered.block(1, 0, k, 1) = shape.elasticities;
    bordered.block(1, 1, k, k) = shape.scaledHessian;
    return bordered;
}

std::optional<double> substitutionElasticity(const LocalShape& shape, Eigen::Index first, Eigen::Index second,
                                             SubstitutionKind kind)
{
    if (kind == SubstitutionKind::direct) return directElasticity(shape, first, second);
    const Eigen::FullPivLU<Eigen::MatrixXd> lu(scaledBorderedHessian(shape));
    if (!lu.isInvertible() || lu.rcond() < singularReciprocalCondition) return std::nullopt;
    const Eigen::MatrixXd inverse = lu.inverse();
    const Eigen::Index i = first + 1, j = second + 1;
    if (kind == SubstitutionKind::allen) return finiteOrNothing(shape.scale() * inverse(i, j));
    return finiteOrNothing(shape.elasticities(second) * (inverse(i, j) - inverse(j, j)));
}

} // namespace isoquant
