#include "fits/mean_effect_inference.hpp"

#include <Eigen/QR>

namespace isoquant {

namespace {

// The sandwich (or classical) covariance of linear estimators θ̂ⱼ = Σᵢ Hᵢⱼ·yᵢ of the regression
// with one dummy per group, from their influence matrix H (n × q), with the factors of
// least_squares.cpp: classical σ²·HᵀH; HC1 n/(n−p)·Hᵀdiag(eᵢ²)H; HC3 Hᵀdiag(eᵢ²/(1−hᵢᵢ)²)H with
// hᵢᵢ = x̃ᵢᵀ(X̃ᵀX̃)⁻¹x̃ᵢ + 1/n_g; CR1 G/(G−1)·(n−1)/(n−p+nested)·Σ_g s_g s_gᵀ, s_g = Σ_{i∈g} eᵢHᵢ.
Eigen::MatrixXd linearEstimatorCovariance(const Eigen::MatrixXd& influence, const Eigen::VectorXd& leverage,
                                          const LeastSquaresResult& run, const LeastSquaresOptions& options)
{
    const Eigen::VectorXd& residuals = run.residuals;
    const double n = static_cast<double>(residuals.size());
    const double df = run.summary.residualDegreesOfFreedom;
    switch (options.covariance) {
    case CovarianceKind::classical:
        return (residuals.squaredNorm() / df) * (influence.transpose() * influence);
    case CovarianceKind::hc1:
        return (n / df) * (influence.transpose() * residuals.array().square().matrix().asDiagonal() * influence);
    case CovarianceKind::hc3: {
        const Eigen::VectorXd weights = residuals.array().square() / (1.0 - leverage.array()).square();
        return influence.transpose() * weights.asDiagonal() * influence;
    }
    case CovarianceKind::cluster: break;
    }
    const Eigen::Index groups = run.summary.clusterCount;
    Eigen::MatrixXd scores = Eigen::MatrixXd::Zero(influence.cols(), groups);
    for (Eigen::Index i = 0; i < influence.rows(); ++i)
        scores.col(options.clusters[static_cast<std::size_t>(i)]) += residuals(i) * influence.row(i).transpose();
    const double g = static_cast<double>(groups);
    const double clusterDf = df + static_cast<double>(options.absorbedNestedInClusters);
    return (g / (g - 1.0)) * ((n - 1.0) / clusterDf) * (scores * scores.transpose());
}

} // namespace

MeanEffectInference meanEffectInference(const Eigen::MatrixXd& withinDesign, const Eigen::VectorXd& columnMeans,
                                        double responseMean, const LeastSquaresResult& run,
                                        const LeastSquaresOptions& options)
{
    const Eigen::Index n = withinDesign.rows(), k = withinDesign.cols();
    // (X̃ᵀX̃)⁻¹ = P·R⁻¹·R⁻ᵀ·Pᵀ from X̃·P = Q·R, so that b = (X̃ᵀX̃)⁻¹X̃ᵀy has influence X̃(X̃ᵀX̃)⁻¹.
    const Eigen::ColPivHouseholderQR<Eigen::MatrixXd> factor(withinDesign);
    const Eigen::MatrixXd upper = factor.matrixR().topLeftCorner(k, k).triangularView<Eigen::Upper>();
    const Eigen::MatrixXd upperInverse =
        upper.triangularView<Eigen::Upper>().solve(Eigen::MatrixXd::Identity(k, k));
    const Eigen::MatrixXd bread = factor.colsPermutation() * upperInverse; // (X̃ᵀX̃)⁻¹ = bread·breadᵀ
    const Eigen::MatrixXd orthonormal = withinDesign * bread;
    // m = ȳ − x̄ᵀb = Σᵢ (1/n − x̃ᵢᵀ(X̃ᵀX̃)⁻¹x̄)·yᵢ: the dummy-variable regression's Σ_g (n_g/n)·α_g.
    Eigen::MatrixXd influence(n, k + 1);
    influence.leftCols(k) = orthonormal * bread.transpose();
    influence.col(k) = Eigen::VectorXd::Constant(n, 1.0 / static_cast<double>(n)) -
                       orthonormal * (bread.transpose() * columnMeans);
    Eigen::VectorXd leverage = orthonormal.rowwise().squaredNorm();
    if (options.absorbedLeverage.size() == n) leverage += options.absorbedLeverage;
    const Eigen::MatrixXd covariance = linearEstimatorCovariance(influence, leverage, run, options);

    MeanEffectInference mean;
    mean.estimate = responseMean - columnMeans.dot(run.inference.estimates);
    mean.withColumns = Eigen::VectorXd::Zero(k + 1); // column 0, the plain mean effect, has none
    mean.withColumns.tail(k) = covariance.col(k).head(k);
    mean.variance = covariance(k, k);
    return mean;
}

} // namespace isoquant
