#include "numerics/least_squares_factor.hpp"

#include <Eigen/QR>
#include <Eigen/SVD>

#include <cmath>
#include <limits>
#include <stdexcept>

namespace isoquant {

void addSingularValues(LeastSquaresFactor& factor)
{
    const Eigen::JacobiSVD<Eigen::MatrixXd> svd(factor.upper, Eigen::ComputeFullV);
    factor.singularValues = svd.singularValues();
    factor.nullDirection = factor.permutation * svd.matrixV().col(factor.upper.cols() - 1);
}

double unitScale(double value) { return std::ldexp(1.0, -std::ilogb(value)); }

bool negligible(double magnitude) { return magnitude < std::numeric_limits<double>::min(); }

// Chan, Golub and LeVeque's pairwise update: M2 = M2ₐ + M2_b + δ²·nₐ·n_b/(nₐ + n_b), δ the
// difference of the means.
void addToMoments(ResponseMoments& moments, double& counted, const Eigen::Ref<const Eigen::VectorXd>& response)
{
    const double count = static_cast<double>(response.size());
    const double blockMean = response.mean();
    const double blockSquares = (response.array() - blockMean).square().sum();
    const double delta = blockMean - moments.mean;
    const double total = counted + count;
    moments.mean += delta * count / total;
    moments.centredSumOfSquares += blockSquares + delta * delta * counted * count / total;
    moments.sumOfSquares += response.squaredNorm();
    counted = total;
}

DoubleRouteFactor factorByBlocksInDouble(const RegressionRows& rows, Eigen::Index rowsPerBlock)
{
    const Eigen::Index p = rows.columns();
    const Eigen::Index width = p + 1; // the design and the response
    const Eigen::Index blockRows = std::max<Eigen::Index>(1, std::min(rowsPerBlock, rows.rows()));

    // Rows 0 … width−1 hold the triangular factor so far, the rest the next block.
    Eigen::MatrixXd stacked = Eigen::MatrixXd::Zero(width + blockRows, width);
    Eigen::VectorXd scales = Eigen::VectorXd::Ones(width);
    std::vector<bool> scaled(static_cast<std::size_t>(width), false);
    Eigen::HouseholderQR<Eigen::MatrixXd> qr(width + blockRows, width);
    DoubleRouteFactor result;
    double counted = 0;
    forEachBlock(rows, rowsPerBlock, [&](Eigen::Index, const auto& design, const auto& response) {
        if (!design.allFinite()) throw std::invalid_argument("design: holds a value that is not finite");
        if (!response.allFinite()) throw std::invalid_argument("response: holds a value that is not finite");
        addToMoments(result.response, counted, response);
        // Keep every scaled value below 2 in magnitude, so no squared norm can overflow.
        for (Eigen::Index j = 0; j < width; ++j) {
            const double largest = j < p ? design.col(j).cwiseAbs().maxCoeff() : response.cwiseAbs().maxCoeff();
            if (negligible(largest)) continue;
            const double wanted = unitScale(largest);
            const auto column = static_cast<std::size_t>(j);
            if (scaled[column] && wanted >= scales(j)) continue;
            if (scaled[column]) stacked.col(j).head(width) *= wanted / scales(j);
            scales(j) = wanted;
            scaled[column] = true;
        }
        const Eigen::Index count = design.rows();
        stacked.block(width, 0, count, p) = design * scales.head(p).asDiagonal();
        stacked.block(width, p, count, 1) = response * scales(p);
        qr.compute(stacked.topRows(width + count));
        stacked.topRows(width) = qr.matrixQR().topRows(width).template triangularView<Eigen::Upper>();
    });

    const Eigen::MatrixXd augmented = stacked.topRows(width);
    LeastSquaresFactor& factor = result.factor;
    factor.upper = augmented.topLeftCorner(p, p);
    factor.columnScales.resize(p);
    // ‖design·e_j‖ = ‖R·e_j‖ (Q is orthogonal): a power of two more gives every column unit order.
    for (Eigen::Index j = 0; j < p; ++j) {
        const double norm = factor.upper.col(j).norm();
        if (negligible(norm)) throw CollinearColumns({j});
        const double extra = unitScale(norm);
        factor.upper.col(j) *= extra;
        factor.columnScales(j) = scales(j) * extra;
    }
    factor.permutation.setIdentity(p);
    addSingularValues(factor);
    const double largest = factor.singularValues(0);
    const double smallest = factor.singularValues(p - 1);
    result.errorEstimate = std::numeric_limits<double>::infinity();
    if (!(smallest > 0)) return result;

    // In the scaled units c = (R·D)⁻¹·(Qᵀy·s)[0:p] and ‖r·s‖ = |R_aug(p, p)|; b = D·c/s.
    const Eigen::VectorXd scaledCoefficients =
        factor.upper.triangularView<Eigen::Upper>().solve(augmented.col(p).head(p));
    factor.coefficients = factor.columnScales.cwiseProduct(scaledCoefficients) / scales(p);
    factor.upperInverse = factor.upper.triangularView<Eigen::Upper>().solve(Eigen::MatrixXd::Identity(p, p));
    result.errorEstimate =
        householderErrorEstimate(largest / smallest, largest, std::fabs(augmented(p, p)), scaledCoefficients.norm());
    return result;
}

// u·(κ + κ²·‖r‖/(‖X‖₂·‖b‖)) with u = 2⁻⁵³ (Golub and Van Loan, Matrix Computations, §5.3.8).
double householderErrorEstimate(double condition, double largestSingularValue, double residualNorm,
                                double coefficientNorm)
{
    return unitRoundoff * (condition + condition * condition * residualNorm / (largestSingularValue * coefficientNorm));
}

LeastSquaresFactor factorInExtendedPrecision(const RegressionRows& rows, const Eigen::VectorXd& columnScales)
{
    using ExtendedMatrix = Eigen::Matrix<long double, Eigen::Dynamic, Eigen::Dynamic>;
    using ExtendedVector = Eigen::Matrix<long double, Eigen::Dynamic, 1>;
    const Eigen::Index p = rows.columns();
    ExtendedMatrix extendedDesign;
    ExtendedVector extendedResponse;
    {
        Eigen::MatrixXd design(rows.rows(), p);
        Eigen::VectorXd response(rows.rows());
        rows.fill(0, design, response);
        extendedDesign = (design * columnScales.asDiagonal()).cast<long double>();
        extendedResponse = response.cast<long double>();
    }
    const Eigen::ColPivHouseholderQR<ExtendedMatrix> qr(extendedDesign);
    const ExtendedMatrix extendedUpper = qr.matrixR().topLeftCorner(p, p).triangularView<Eigen::Upper>();
    LeastSquaresFactor factor;
    factor.columnScales = columnScales;
    factor.permutation = qr.colsPermutation();
    factor.upper = extendedUpper.cast<double>();
    addSingularValues(factor);
    // The solve and R⁻¹ are only meaningful at full rank; the caller checks the singular values first.
    if (factor.singularValues(p - 1) > 0) {
        const ExtendedVector coefficients = qr.solve(extendedResponse);
        factor.coefficients = columnScales.cwiseProduct(coefficients.cast<double>());
        factor.residuals = (extendedResponse - extendedDesign * coefficients).cast<double>();
        factor.upperInverse = extendedUpper.triangularView<Eigen::Upper>()
                                  .solve(ExtendedMatrix::Identity(p, p))
                                  .cast<double>();
    }
    return factor;
}

} // namespace isoquant
