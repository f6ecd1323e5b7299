#include "models/form_models.hpp"

#include "isoquant/sheet/arguments/argument_names.hpp"
#include "isoquant/math/forms/ces.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/sheet/tables/table_labels.hpp"
#include "isoquant/math/messages/text.hpp"
#include "isoquant/math/forms/translog.hpp"

#include <cmath>

namespace isoquant {

namespace {

std::string rowPlace(const ParameterRow& parameter)
{
    return "model: row " + std::to_string(parameter.row + 1) + " (" + quoted(parameter.label) + ")";
}

double numberOf(const ParameterRow& parameter)
{
    if (!std::isfinite(parameter.value)) throw InputError(rowPlace(parameter) + " has no number in its second column");
    return parameter.value;
}

const ParameterRow* findParameter(const std::vector<ParameterRow>& parameters, const char* label)
{
    for (const auto& parameter : parameters)
        if (equalsIgnoringCase(parameter.label, label)) return &parameter;
    return nullptr;
}

// ρ from a rho row, or from a sigma row (ρ = 1/σ − 1); both must agree when both are given.
double readCurvature(const std::vector<ParameterRow>& parameters)
{
    const ParameterRow* rho = findParameter(parameters, curvatureLabel);
    const ParameterRow* sigma = findParameter(parameters, substitutionLabel);
    if (!rho && !sigma) throw argumentError(argument::model, "a ces model needs a \"rho\" row (or \"sigma\")");
    if (rho) {
        const double curvature = numberOf(*rho);
        if (curvature < -1) throw InputError(rowPlace(*rho) + " must be at least -1");
        // A PRODFIT table shows "n/a" for σ at ρ = −1: only a number is checked.
        if (sigma && std::isfinite(sigma->value) &&
            std::fabs(sigma->value * (1 + curvature) - 1) > 1e-9)
            throw InputError(rowPlace(*sigma) + " is not 1/(1 + rho)");
        return curvature;
    }
    const double substitution = numberOf(*sigma);
    if (!(substitution > 0)) throw InputError(rowPlace(*sigma) + " must be positive");
    return 1 / substitution - 1;
}

} // namespace

FormModel readCesModel(double logScale, const std::vector<ParameterRow>& parameters,
                       const std::optional<std::vector<std::string>>& inputLabels)
{
    for (const auto& parameter : parameters) {
        bool known = false;
        for (const char* label : {weightLabel, curvatureLabel, returnsParameterLabel, substitutionLabel})
            known = known || equalsIgnoringCase(parameter.label, label);
        if (!known)
            throw InputError(rowPlace(parameter) +
                             " is not a parameter of the ces form; its rows are delta, rho (or sigma) and nu");
    }
    const ParameterRow* delta = findParameter(parameters, weightLabel);
    const ParameterRow* nu = findParameter(parameters, returnsParameterLabel);
    if (!delta)
        throw argumentError(argument::model, "a ces model needs a \"delta\" row (the weight of the first input)");
    if (!nu) throw argumentError(argument::model, "a ces model needs a \"nu\" row (the returns to scale)");
    const double weight = numberOf(*delta);
    if (weight < 0 || weight > 1) throw InputError(rowPlace(*delta) + " must lie between 0 and 1");

    FormModel model;
    model.inputLabels = inputLabels.value_or(std::vector<std::string>{"input 1", "input 2"});
    if (model.inputLabels.size() != 2)
        throw argumentError(argument::model, "the inputs row of a ces model must name two inputs");
    model.technology = std::make_shared<Ces>(logScale, weight, readCurvature(parameters), numberOf(*nu));
    return model;
}

FormModel readTranslogModel(double logScale, const std::vector<ParameterRow>& parameters)
{
    FormModel model;
    std::vector<double> firstOrder;
    for (const auto& parameter : parameters) {
        if (parameter.label.find('*') != std::string::npos) continue;
        model.inputLabels.push_back(parameter.label);
        firstOrder.push_back(numberOf(parameter));
    }
    const auto k = static_cast<Eigen::Index>(firstOrder.size());
    if (k == 0) throw argumentError(argument::model, "a translog model needs one row per input after \"ln A\"");
    const auto positionOf = [&](const std::string& label, const ParameterRow& parameter) {
        for (Eigen::Index i = 0; i < k; ++i)
            if (equalsIgnoringCase(label, model.inputLabels[static_cast<std::size_t>(i)])) return i;
        throw InputError(rowPlace(parameter) + ": " + quoted(label) + " is not one of the model's inputs");
    };

    Eigen::MatrixXd interactions = Eigen::MatrixXd::Constant(k, k, std::nan(""));
    for (const auto& parameter : parameters) {
        const std::size_t star = parameter.label.find('*');
        if (star == std::string::npos) continue;
        const Eigen::Index i = positionOf(parameter.label.substr(0, star), parameter);
        const Eigen::Index j = positionOf(parameter.label.substr(star + 1), parameter);
        if (!std::isnan(interactions(i, j))) throw InputError(rowPlace(parameter) + " repeats an earlier pair");
        interactions(i, j) = interactions(j, i) = numberOf(parameter);
    }
    for (Eigen::Index i = 0; i < k; ++i)
        for (Eigen::Index j = i; j < k; ++j)
            if (std::isnan(interactions(i, j)))
                throw argumentError(argument::model,
                                    "a translog model needs a row \"" + model.inputLabels[static_cast<std::size_t>(i)] +
                                        "*" + model.inputLabels[static_cast<std::size_t>(j)] + "\" (0 when absent)");
    model.technology = std::make_shared<Translog>(
        logScale, Eigen::Map<const Eigen::VectorXd>(firstOrder.data(), k), interactions);
    return model;
}

} // namespace isoquant
