#include "least_squares_factor.hpp"

#include <Eigen/QR>
#include <Eigen/SVD>

#include <cmath>

namespace isoquant {

namespace {

void addSingularValues(LeastSquaresFactor& factor)
{
    const Eigen::JacobiSVD<Eigen::MatrixXd> svd(factor.upper, Eigen::ComputeFullV);
    factor.singularValues = svd.singularValues();
    factor.nullDirection = factor.permutation * svd.matrixV().col(factor.upper.cols() - 1);
}

} // namespace

std::optional<LeastSquaresFactor> factorInDouble(const Eigen::MatrixXd& scaledDesign,
                                                 const Eigen::VectorXd& response, double errorLimit)
{
    const Eigen::Index p = scaledDesign.cols();
    const Eigen::HouseholderQR<Eigen::MatrixXd> qr(scaledDesign);
    LeastSquaresFactor factor;
    factor.permutation.setIdentity(p);
    factor.upper = qr.matrixQR().topLeftCorner(p, p).triangularView<Eigen::Upper>();
    addSingularValues(factor);
    const double largest = factor.singularValues(0);
    const double smallest = factor.singularValues(p - 1);
    if (!(smallest > 0) || !(errorLimit > 0)) return std::nullopt;

    // b = R⁻¹·(Qᵀy)[0:p]; Qᵀ is applied by the stored reflectors.
    Eigen::VectorXd rotated = response;
    rotated.applyOnTheLeft(qr.householderQ().adjoint());
    factor.coefficients = factor.upper.triangularView<Eigen::Upper>().solve(rotated.head(p));
    factor.residuals = response - scaledDesign * factor.coefficients;
    const double condition = largest / smallest;
    const double unitRoundoff = std::ldexp(1.0, -53);
    const double estimate =
        unitRoundoff * (condition + condition * condition * factor.residuals.norm() /
                                        (largest * factor.coefficients.norm()));
    if (!(estimate <= errorLimit)) return std::nullopt;
    factor.upperInverse = factor.upper.triangularView<Eigen::Upper>().solve(Eigen::MatrixXd::Identity(p, p));
    return factor;
}

LeastSquaresFactor factorInExtendedPrecision(const Eigen::MatrixXd& scaledDesign, const Eigen::VectorXd& response)
{
    using ExtendedMatrix = Eigen::Matrix<long double, Eigen::Dynamic, Eigen::Dynamic>;
    using ExtendedVector = Eigen::Matrix<long double, Eigen::Dynamic, 1>;
    const Eigen::Index p = scaledDesign.cols();
    const ExtendedMatrix extendedDesign = scaledDesign.cast<long double>();
    const ExtendedVector extendedResponse = response.cast<long double>();
    const Eigen::ColPivHouseholderQR<ExtendedMatrix> qr(extendedDesign);
    const ExtendedMatrix extendedUpper = qr.matrixR().topLeftCorner(p, p).triangularView<Eigen::Upper>();
    LeastSquaresFactor factor;
    factor.permutation = qr.colsPermutation();
    factor.upper = extendedUpper.cast<double>();
    addSingularValues(factor);
    // The solve and R⁻¹ are only meaningful at full rank; the caller checks the singular values first.
    if (factor.singularValues(p - 1) > 0) {
        const ExtendedVector coefficients = qr.solve(extendedResponse);
        factor.coefficients = coefficients.cast<double>();
        factor.residuals = (extendedResponse - extendedDesign * coefficients).cast<double>();
        factor.upperInverse = extendedUpper.triangularView<Eigen::Upper>()
                                  .solve(ExtendedMatrix::Identity(p, p))
                                  .cast<double>();
    }
    return factor;
}

} // namespace isoquant
