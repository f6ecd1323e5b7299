#include "isoquant/math/forms/local_shape.hpp"

#include "isoquant/math/messages/input_error.hpp"

#include <algorithm>
#include <cmath>
#include <limits>

namespace isoquant {

namespace {

// xᵢ·xⱼ·fᵢⱼ / Y formed in logs: ln|fᵢⱼ| + ln xᵢ + ln xⱼ − ln Y, so that it is finite whenever fᵢⱼ is.
double scaledSecondPartial(const Technology& technology, const Eigen::VectorXd& bundle, double logOutput,
                           Eigen::Index first, Eigen::Index second)
{
    const double partial = technology.secondPartial(bundle, first, second);
    if (partial == 0) return 0;
    const double logMagnitude =
        std::log(std::fabs(partial)) + std::log(bundle(first)) + std::log(bundle(second)) - logOutput;
    return std::copysign(std::exp(logMagnitude), partial);
}

} // namespace

LocalShape localShape(const Technology& technology, const Eigen::VectorXd& bundle)
{
    const Eigen::Index k = technology.inputCount();
    const double logOutput = technology.logOutput(bundle);
    LocalShape shape;
    shape.elasticities.resize(k);
    shape.scaledHessian.resize(k, k);
    for (Eigen::Index i = 0; i < k; ++i) {
        shape.elasticities(i) = technology.elasticity(bundle, i);
        for (Eigen::Index j = i; j < k; ++j)
            shape.scaledHessian(i, j) = shape.scaledHessian(j, i) =
                scaledSecondPartial(technology, bundle, logOutput, i, j);
    }
    if (!std::isfinite(logOutput)) shape.elasticities.setConstant(std::numeric_limits<double>::quiet_NaN());
    return shape;
}

bool isFinite(const LocalShape& shape) { return shape.elasticities.allFinite() && shape.scaledHessian.allFinite(); }

LocalShape checkedLocalShape(const Technology& technology, const Eigen::VectorXd& bundle, const std::string& place)
{
    LocalShape shape = localShape(technology, bundle);
    if (!isFinite(shape)) throw InputError(place + " gives derivatives too large to represent");
    return shape;
}

CurvatureSign curvatureSign(double scaledSecond, double elasticity)
{
    if (std::fabs(scaledSecond) <= curvatureTolerance * std::fabs(elasticity)) return CurvatureSign::zero;
    return scaledSecond < 0 ? CurvatureSign::negative : CurvatureSign::positive;
}

std::string inputReturnsWord(const LocalShape& shape, Eigen::Index input)
{
    const double elasticity = shape.elasticities(input);
    if (!(elasticity > 0))
        return "uneconomic: the marginal product is not positive here, more of this input does not raise output";
    switch (curvatureSign(shape.scaledHessian(input, input), elasticity)) {
    case CurvatureSign::negative: return "diminishing";
    case CurvatureSign::zero: return "constant";
    case CurvatureSign::positive: return "increasing";
    }
    return {};
}

std::string inputPairWord(const LocalShape& shape, Eigen::Index first, Eigen::Index second)
{
    // Sᵢⱼ/eᵢ and Sᵢⱼ/eⱼ have the same sign when both marginal products are positive; judge against
    // the larger elasticity so the verdict does not depend on the order of the two inputs.
    const double reference = std::max(std::fabs(shape.elasticities(first)), std::fabs(shape.elasticities(second)));
    switch (curvatureSign(shape.scaledHessian(first, second), reference)) {
    case CurvatureSign::negative: return "substitutes";
    case CurvatureSign::zero: return "independent";
    case CurvatureSign::positive: return "complements";
    }
    return {};
}

} // namespace isoquant
