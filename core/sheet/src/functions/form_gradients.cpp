#include "functions/form_gradients.hpp"

#include "isoquant/math/fits/translog_fit.hpp"
#include "isoquant/math/forms/ces.hpp"
#include "isoquant/math/forms/translog.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/math/numerics/exact_elementwise.hpp"
#include "isoquant/sheet/arguments/argument_names.hpp"

#include <cmath>

namespace isoquant::delta_method {

namespace {

// l = ln x as a row, as translogDesign takes it.
Eigen::MatrixXd logRow(const Eigen::VectorXd& bundle) { return exactLog(bundle.array()).matrix().transpose(); }

// g of ln Y for the translog: its regressors at the bundle (translogDesign), 0 at the controls.
Eigen::VectorXd translogLogOutputGradient(const BoundsModel& read, const Eigen::VectorXd& bundle)
{
    const Eigen::RowVectorXd terms = translogDesign(logRow(bundle), Eigen::MatrixXd(1, 0)).row(0);
    Eigen::VectorXd gradient = zeroGradient(read);
    gradient.head(terms.size()) = terms.transpose();
    return gradient;
}

// Row i of translogElasticityGradients: g of εᵢ, or of ν for i = k.
Eigen::VectorXd translogElasticityGradient(const BoundsModel& read, const Eigen::VectorXd& bundle, Eigen::Index row)
{
    const Eigen::VectorXd logs = logRow(bundle).transpose();
    return translogElasticityGradients(bundle.size(), zeroGradient(read).size(), logs).row(row).transpose();
}

// The ces at a bundle: d = ln x₁ − ln x₂, b = ln x₂ and H(d; δ, ρ) with its partials (ces.hpp).
struct CesAtBundle {
    const Ces& ces;
    double logRatio;
    double logSecond;
    CesComposite composite;
};

CesAtBundle cesAt(const BoundsModel& read, const Eigen::VectorXd& bundle)
{
    const auto& ces = static_cast<const Ces&>(*read.technology);
    const double logRatio = std::log(bundle(0)) - std::log(bundle(1));
    return {ces, logRatio, std::log(bundle(1)), cesComposite(logRatio, ces.weight, ces.curvature)};
}

// ln Y = ln A + ν·(b + H): g = (1, ν·∂H/∂δ, ν·∂H/∂ρ, b + H).
Eigen::VectorXd cesLogOutputGradient(const CesAtBundle& at)
{
    const CesComposite& h = at.composite;
    Eigen::VectorXd gradient(4);
    gradient << 1, at.ces.returnsToScale * h.byWeight, at.ces.returnsToScale * h.byCurvature, at.logSecond + h.value;
    return finiteCesGradient(gradient);
}

// ε₁ = ν·π, π = logistic(logit δ − ρ·d): ∂π/∂δ = π(1−π)/(δ(1−δ)), ∂π/∂ρ = −d·π(1−π), so
// g of ε₁ = (0, ν·∂π/∂δ, ν·∂π/∂ρ, π); ε₂ = ν − ε₁: g = (0, −ν·∂π/∂δ, −ν·∂π/∂ρ, 1 − π).
Eigen::VectorXd cesElasticityGradient(const CesAtBundle& at, Eigen::Index input)
{
    const CesComposite& h = at.composite;
    const double spread = h.firstShare * h.secondShare, nu = at.ces.returnsToScale, delta = at.ces.weight;
    const double sign = input == 0 ? 1 : -1;
    Eigen::VectorXd gradient(4);
    gradient << 0, sign * nu * spread / (delta * (1 - delta)), -sign * nu * at.logRatio * spread,
        input == 0 ? h.firstShare : h.secondShare;
    return finiteCesGradient(gradient);
}

} // namespace

// A δ of 0 or 1 leaves ∂/∂δ undefined (0/0): the fit's table has no standard errors there either.
Eigen::VectorXd finiteCesGradient(Eigen::VectorXd gradient)
{
    if (!gradient.allFinite())
        throw argumentError(argument::what, "the ces parameters lie on the edge of their range (delta 0 or 1), where "
                                            "this quantity has no derivative in them; bounds need an interior fit");
    return gradient;
}

Eigen::VectorXd logOutputGradientOf(const BoundsModel& read, const Eigen::VectorXd& bundle)
{
    switch (read.model.form) {
    case ProductionForm::translog: return translogLogOutputGradient(read, bundle);
    case ProductionForm::ces: return cesLogOutputGradient(cesAt(read, bundle));
    case ProductionForm::cobbDouglas: break;
    }
    return logOutputGradient(read, bundle); // (1, ln x, 0 …)
}

Eigen::VectorXd elasticityGradientOf(const BoundsModel& read, const Eigen::VectorXd& bundle, Eigen::Index input)
{
    switch (read.model.form) {
    case ProductionForm::translog: return translogElasticityGradient(read, bundle, input);
    case ProductionForm::ces: return cesElasticityGradient(cesAt(read, bundle), input);
    case ProductionForm::cobbDouglas: break;
    }
    Eigen::VectorXd gradient = zeroGradient(read);
    gradient(1 + input) = 1;
    return gradient;
}

Linearised outputLinearised(const BoundsModel& read, const Eigen::VectorXd& bundle, double factor)
{
    return {factor * read.technology->output(bundle), logOutputGradientOf(read, bundle), true};
}

Linearised marginalProductLinearised(const BoundsModel& read, const Eigen::VectorXd& bundle, Eigen::Index input)
{
    // MPᵢ = εᵢ·Y/xᵢ. Where εᵢ > 0, ln MPᵢ = ln εᵢ + ln Y − ln xᵢ: g = gεᵢ/εᵢ + g(ln Y), log scale
    // (cobb-douglas: 1/bᵢ added at bᵢ). Else MPᵢ itself: g = (Y/xᵢ)·(gεᵢ + εᵢ·g(ln Y)).
    const double marginal = read.technology->marginalProduct(bundle, input);
    const double elasticity = read.technology->elasticity(bundle, input);
    const Eigen::VectorXd ofElasticity = elasticityGradientOf(read, bundle, input);
    const Eigen::VectorXd ofLogOutput = logOutputGradientOf(read, bundle);
    if (elasticity > 0) return {marginal, ofElasticity / elasticity + ofLogOutput, true};
    const double scaled = read.technology->output(bundle) / bundle(input);
    return {marginal, scaled * (ofElasticity + elasticity * ofLogOutput), false};
}

Linearised elasticityLinearised(const BoundsModel& read, const Eigen::VectorXd& bundle, Eigen::Index input)
{
    return {read.technology->elasticity(bundle, input), elasticityGradientOf(read, bundle, input), false};
}

Linearised scaleLinearised(const BoundsModel& read, const Eigen::VectorXd& bundle)
{
    Eigen::VectorXd gradient = zeroGradient(read);
    switch (read.model.form) {
    case ProductionForm::translog:
        return {read.technology->scaleElasticity(bundle), translogElasticityGradient(read, bundle, bundle.size()),
                false};
    case ProductionForm::ces: gradient(3) = 1; break; // ν is a parameter
    case ProductionForm::cobbDouglas: gradient.segment(1, read.technology->inputCount()).setOnes(); break;
    }
    return {*read.technology->constantScaleElasticity(), gradient, false};
}

} // namespace isoquant::delta_method
