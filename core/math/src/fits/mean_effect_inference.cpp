#include "fits/mean_effect_inference.hpp"

#include <Eigen/QR>

namespace isoquant {

namespace {

// The sandwich (or classical) covariance of linear estimators θ̂ⱼ = Σᵢ Hᵢⱼ·yᵢ of the regression
// with one dummy per group, from the rows Hᵢ of their influence matrix, with the factors of
// least_squares.cpp: classical σ²·Σ HᵢHᵢᵀ; HC1 n/(n−p)·Σ eᵢ²HᵢHᵢᵀ; HC3 Σ eᵢ²/(1−hᵢᵢ)²·HᵢHᵢᵀ with
// hᵢᵢ = x̃ᵢᵀ(X̃ᵀX̃)⁻¹x̃ᵢ + 1/n_g; CR1 G/(G−1)·(n−1)/(n−p+nested)·Σ_g s_g s_gᵀ, s_g = Σ_{i∈g} eᵢHᵢ.
// Accumulated row by row, so that no n × q matrix is held.
class LinearEstimatorCovariance {
public:
    LinearEstimatorCovariance(Eigen::Index estimators, const LeastSquaresResult& run, const LeastSquaresOptions& options)
        : run_(run), options_(options), sum_(Eigen::MatrixXd::Zero(estimators, estimators)),
          scores_(Eigen::MatrixXd::Zero(estimators, options.covariance == CovarianceKind::cluster
                                                          ? run.summary.clusterCount
                                                          : 0))
    {
    }

    void add(Eigen::Index row, const Eigen::VectorXd& influence, double leverage)
    {
        const double residual = run_.residuals(row);
        switch (options_.covariance) {
        case CovarianceKind::classical: sum_.noalias() += influence * influence.transpose(); return;
        case CovarianceKind::hc1: sum_.noalias() += (residual * residual) * influence * influence.transpose(); return;
        case CovarianceKind::hc3: {
            const double scaled = residual / (1.0 - leverage);
            sum_.noalias() += (scaled * scaled) * influence * influence.transpose();
            return;
        }
        case CovarianceKind::cluster:
            scores_.col(options_.clusters[static_cast<std::size_t>(row)]) += residual * influence;
            return;
        }
    }

    Eigen::MatrixXd covariance() const
    {
        const double n = static_cast<double>(run_.residuals.size());
        const double df = run_.summary.residualDegreesOfFreedom;
        switch (options_.covariance) {
        case CovarianceKind::classical: return (run_.residuals.squaredNorm() / df) * sum_;
        case CovarianceKind::hc1: return (n / df) * sum_;
        case CovarianceKind::hc3: return sum_;
        case CovarianceKind::cluster: break;
        }
        const double g = static_cast<double>(run_.summary.clusterCount);
        const double clusterDf = df + static_cast<double>(options_.absorbedNestedInClusters);
        return (g / (g - 1.0)) * ((n - 1.0) / clusterDf) * (scores_ * scores_.transpose());
    }

private:
    const LeastSquaresResult& run_;
    const LeastSquaresOptions& options_;
    Eigen::MatrixXd sum_;
    Eigen::MatrixXd scores_;
};

} // namespace

MeanEffectInference meanEffectInference(const Eigen::MatrixXd& withinDesign, const Eigen::VectorXd& columnMeans,
                                        double responseMean, const LeastSquaresResult& run,
                                        const LeastSquaresOptions& options)
{
    const Eigen::Index n = withinDesign.rows(), k = withinDesign.cols();
    // (X̃ᵀX̃)⁻¹ = H·Hᵀ with H = P·R⁻¹ from X̃·P = Q·R. With aᵢ = Hᵀx̃ᵢ, b = (X̃ᵀX̃)⁻¹X̃ᵀy has influence
    // row H·aᵢ and leverage ‖aᵢ‖², and m = ȳ − x̄ᵀb (the dummy-variable regression's Σ_g (n_g/n)·α_g)
    // has 1/n − aᵢ·(Hᵀx̄).
    const Eigen::ColPivHouseholderQR<Eigen::MatrixXd> factor(withinDesign);
    const Eigen::MatrixXd upper = factor.matrixR().topLeftCorner(k, k).triangularView<Eigen::Upper>();
    const Eigen::MatrixXd upperInverse = upper.triangularView<Eigen::Upper>().solve(Eigen::MatrixXd::Identity(k, k));
    const Eigen::MatrixXd bread = factor.colsPermutation() * upperInverse;
    const Eigen::VectorXd breadMeans = bread.transpose() * columnMeans;
    LinearEstimatorCovariance accumulated(k + 1, run, options);
    Eigen::VectorXd influence(k + 1);
    for (Eigen::Index i = 0; i < n; ++i) {
        const Eigen::VectorXd orthonormal = bread.transpose() * withinDesign.row(i).transpose();
        influence.head(k) = bread * orthonormal;
        influence(k) = 1.0 / static_cast<double>(n) - orthonormal.dot(breadMeans);
        const double absorbed = options.absorbedLeverage.size() == n ? options.absorbedLeverage(i) : 0.0;
        accumulated.add(i, influence, orthonormal.squaredNorm() + absorbed);
    }
    const Eigen::MatrixXd covariance = accumulated.covariance();

    MeanEffectInference mean;
    mean.estimate = responseMean - columnMeans.dot(run.inference.estimates);
    mean.withColumns = Eigen::VectorXd::Zero(k + 1); // column 0, the plain mean effect, has none
    mean.withColumns.tail(k) = covariance.col(k).head(k);
    mean.variance = covariance(k, k);
    return mean;
}

} // namespace isoquant
