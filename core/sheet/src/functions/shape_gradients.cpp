#include "functions/shape_gradients.hpp"

#include "functions/form_gradients.hpp"
#include "isoquant/math/fits/translog_fit.hpp"
#include "isoquant/math/forms/ces.hpp"
#include "isoquant/math/forms/local_shape.hpp"

#include <algorithm>
#include <cmath>

namespace isoquant::delta_method {

namespace {

// The local shape with its gradients: row i of `elasticities` is g of eᵢ, row i·k + j of
// `hessian` g of Sᵢⱼ.
struct LinearisedShape {
    LocalShape shape;
    Eigen::MatrixXd elasticities;
    Eigen::MatrixXd hessian;
};

// g of ∂eⱼ/∂ln xᵢ (shape_gradients.hpp).
Eigen::VectorXd elasticitySlopeGradient(const BoundsModel& read, const Eigen::VectorXd& bundle, Eigen::Index i,
                                        Eigen::Index j)
{
    Eigen::VectorXd gradient = zeroGradient(read);
    if (read.model.form == ProductionForm::translog) {
        const auto pairs = translogPairs(bundle.size());
        const auto at = std::find(pairs.begin(), pairs.end(), std::make_pair(std::min(i, j), std::max(i, j)));
        gradient(1 + bundle.size() + (at - pairs.begin())) = 1;
        return gradient;
    }
    const auto& ces = static_cast<const Ces&>(*read.technology);
    const double logRatio = std::log(bundle(0)) - std::log(bundle(1));
    const CesComposite h = cesComposite(logRatio, ces.weight, ces.curvature);
    const double spread = h.firstShare * h.secondShare, nu = ces.returnsToScale, rho = ces.curvature;
    const double bySpread = nu * rho * (h.secondShare - h.firstShare); // ∂q/∂s·(1 − 2π)
    const double sign = i == j ? -1 : 1;
    gradient(1) = sign * bySpread * spread / (ces.weight * (1 - ces.weight));
    gradient(2) = sign * (nu * spread - bySpread * logRatio * spread);
    gradient(3) = sign * rho * spread;
    return finiteCesGradient(gradient);
}

LinearisedShape linearisedShape(const BoundsModel& read, const Eigen::VectorXd& bundle)
{
    const Eigen::Index k = bundle.size();
    LinearisedShape linearised{localShape(*read.technology, bundle), Eigen::MatrixXd(k, zeroGradient(read).size()),
                               Eigen::MatrixXd(k * k, zeroGradient(read).size())};
    for (Eigen::Index i = 0; i < k; ++i)
        linearised.elasticities.row(i) = elasticityGradientOf(read, bundle, i).transpose();
    const Eigen::VectorXd& e = linearised.shape.elasticities;
    for (Eigen::Index i = 0; i < k; ++i)
        for (Eigen::Index j = 0; j < k; ++j) {
            Eigen::RowVectorXd row = e(i) * linearised.elasticities.row(j) + e(j) * linearised.elasticities.row(i) +
                                     elasticitySlopeGradient(read, bundle, i, j).transpose();
            if (i == j) row -= linearised.elasticities.row(j);
            linearised.hessian.row(i * k + j) = row;
        }
    return linearised;
}

// The shape's change along parameter p: (de, dS).
LocalShape directionOf(const LinearisedShape& linearised, Eigen::Index p)
{
    const Eigen::Index k = linearised.elasticities.rows();
    LocalShape change{linearised.elasticities.col(p), Eigen::MatrixXd(k, k)};
    for (Eigen::Index i = 0; i < k; ++i)
        for (Eigen::Index j = 0; j < k; ++j) change.scaledHessian(i, j) = linearised.hessian(i * k + j, p);
    return change;
}

// dσ of the direct elasticity σ = N/D along (de, dS) (shape_gradients.hpp).
double directChange(const LocalShape& shape, const LocalShape& change, Eigen::Index i, Eigen::Index j, double sigma)
{
    const double ei = shape.elasticities(i), ej = shape.elasticities(j);
    const double dei = change.elasticities(i), dej = change.elasticities(j);
    const Eigen::MatrixXd &s = shape.scaledHessian, &ds = change.scaledHessian;
    const double denominator = -s(i, i) / (ei * ei) + 2 * s(i, j) / (ei * ej) - s(j, j) / (ej * ej);
    const double numeratorChange = -dei / (ei * ei) - dej / (ej * ej);
    const double denominatorChange = -ds(i, i) / (ei * ei) + 2 * s(i, i) * dei / (ei * ei * ei) +
                                     2 * ds(i, j) / (ei * ej) - 2 * s(i, j) * (dei / ei + dej / ej) / (ei * ej) -
                                     ds(j, j) / (ej * ej) + 2 * s(j, j) * dej / (ej * ej * ej);
    return (numeratorChange - sigma * denominatorChange) / denominator;
}

} // namespace

Linearised secondPartialLinearised(const BoundsModel& read, const Eigen::VectorXd& bundle, Eigen::Index first,
                                   Eigen::Index second, double partial)
{
    const LinearisedShape linearised = linearisedShape(read, bundle);
    const double scaled =
        std::exp(read.technology->logOutput(bundle) - std::log(bundle(first)) - std::log(bundle(second)));
    const Eigen::VectorXd gradient = partial * logOutputGradientOf(read, bundle) +
                                     scaled * linearised.hessian.row(first * bundle.size() + second).transpose();
    return {partial, gradient, false};
}

Linearised technicalRateLinearised(const BoundsModel& read, const Eigen::VectorXd& bundle, Eigen::Index first,
                                   Eigen::Index second, double rate)
{
    const double ei = read.technology->elasticity(bundle, first), ej = read.technology->elasticity(bundle, second);
    const Eigen::VectorXd gi = elasticityGradientOf(read, bundle, first), gj = elasticityGradientOf(read, bundle, second);
    if (ei > 0 && ej > 0) return {rate, gi / ei - gj / ej, true};
    return {rate, (bundle(second) / bundle(first)) * (gi / ej - ei * gj / (ej * ej)), false};
}

Linearised substitutionLinearised(const BoundsModel& read, const Eigen::VectorXd& bundle, Eigen::Index first,
                                  Eigen::Index second, SubstitutionKind kind, double elasticity)
{
    const LinearisedShape linearised = linearisedShape(read, bundle);
    const LocalShape& shape = linearised.shape;
    Eigen::VectorXd gradient = zeroGradient(read);
    Eigen::MatrixXd inverse;
    if (kind != SubstitutionKind::direct) inverse = scaledBorderedHessian(shape).fullPivLu().inverse();
    const Eigen::Index i = first + 1, j = second + 1; // rows of the bordered Hessian
    for (Eigen::Index p = 0; p < gradient.size(); ++p) {
        const LocalShape change = directionOf(linearised, p);
        if (kind == SubstitutionKind::direct) {
            gradient(p) = directChange(shape, change, first, second, elasticity);
            continue;
        }
        const Eigen::MatrixXd moved = inverse * scaledBorderedHessian(change) * inverse; // −dC
        if (kind == SubstitutionKind::allen)
            gradient(p) = change.scale() * inverse(i, j) - shape.scale() * moved(i, j);
        else
            gradient(p) = change.elasticities(second) * (inverse(i, j) - inverse(j, j)) -
                          shape.elasticities(second) * (moved(i, j) - moved(j, j));
    }
    return {elasticity, gradient, false};
}

} // namespace isoquant::delta_method
