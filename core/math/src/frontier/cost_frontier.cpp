#include "isoquant/math/frontier/cost_frontier.hpp"

namespace isoquant {

StochasticFrontierFit fitMirroredCostFrontier(const Eigen::MatrixXd& design, const Eigen::VectorXd& logCost,
                                              const Eigen::VectorXd& leastSquaresCoefficients,
                                              InefficiencyDistribution distribution)
{
    const Eigen::VectorXd mirrored = -logCost;
    return fitStochasticFrontier(design, mirrored, -leastSquaresCoefficients, distribution);
}

double costFrontierLogLikelihood(InefficiencyDistribution distribution, const Eigen::MatrixXd& design,
                                 const Eigen::VectorXd& logCost, const Eigen::VectorXd& theta)
{
    const Eigen::Index p = design.cols();
    Eigen::VectorXd mirroredTheta = theta;
    mirroredTheta.head(p) = -theta.head(p);
    const Eigen::VectorXd mirrored = -logCost;
    return frontierLogLikelihood(distribution, FrontierData{design, mirrored}, mirroredTheta);
}

TruncatedNormal costInefficiencyGivenResidual(InefficiencyDistribution distribution, double costResidual,
                                              double noiseSd, double inefficiencySd)
{
    return inefficiencyGivenResidual(distribution, -costResidual, noiseSd, inefficiencySd);
}

} // namespace isoquant
