#include "isoquant/sheet/functions/envelope_functions.hpp"

#include "isoquant/sheet/arguments/argument_names.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/sheet/arguments/model_inputs.hpp"
#include "isoquant/math/messages/text.hpp"
#include "isoquant/math/numerics/work_limits.hpp"
#include "isoquant/sheet/arguments/envelope_arguments.hpp"

#include <cmath>
#include <cstdio>
#include <memory>
#include <stdexcept>

namespace isoquant {

namespace {

std::string rowText(const EnvelopeData& data, Eigen::Index plant)
{
    return "row " + std::to_string(static_cast<std::size_t>(plant) + data.outputs.firstDataRow());
}

// A solved plant. With every plant using a positive amount of some input, both LPs have an
// optimum: λⱼ > 0 only where plant j uses no input that plant o lacks, and then λⱼ ≤ xᵢₒ/xᵢⱼ;
// anything else is the solver's failure, not the user's.
PlantEnvelope solved(EnvelopeSolver& solver, const EnvelopeData& data, Eigen::Index plant, bool secondStage)
{
    PlantEnvelope result = solver.solve(plant, secondStage);
    if (result.status != EnvelopeStatus::solved)
        throw std::runtime_error("the LP solver found no optimum for " + rowText(data, plant));
    return result;
}

// λ to 4 significant digits: "0.25", "0.3333", "1".
std::string weightText(double weight)
{
    char buffer[32];
    std::snprintf(buffer, sizeof buffer, "%.4g", weight);
    return formatNumber(std::strtod(buffer, nullptr));
}

std::string peersText(const PlantEnvelope& plant, const EnvelopeData& data, const std::vector<std::string>& names)
{
    std::string text;
    for (const auto& [peer, weight] : plant.peers) {
        const std::string name = names.empty() ? rowText(data, peer) : names[static_cast<std::size_t>(peer)];
        text += (text.empty() ? "" : ", ") + name + " (" + weightText(weight) + ")";
    }
    return text;
}

void requireFiniteScore(double score, const EnvelopeData& data, Eigen::Index plant)
{
    if (!std::isfinite(score))
        throw std::runtime_error("the LP solver gave no finite score for " + rowText(data, plant));
}

} // namespace

CellTable envelopeColumn(const CellTable& outputs, const CellTable& inputs, const Cell& returns,
                         const Cell& orientation, const Cell& what, const CellTable& names)
{
    const EnvelopeData data = readEnvelopeData(outputs, inputs);
    const EnvelopeReturns chosenReturns = readEnvelopeReturns(returns);
    const EnvelopeOrientation chosenOrientation = readEnvelopeOrientation(orientation);
    const EnvelopeRequest request = readEnvelopeRequest(what, data);
    const std::vector<std::string> plantNames = readPlantNames(names, data.outputs);
    const Eigen::Index plants = data.outputs.values.rows();
    if (static_cast<std::size_t>(plants) > maximumEnvelopePlants)
        throw argumentError(
            argument::outputs,
            "has " + groupedCount(static_cast<std::size_t>(plants)) +
                " rows of data; an envelope solves a linear program over all rows for every row, so one "
                "call compares at most " +
                groupedCount(maximumEnvelopePlants) + " rows");

    const bool scale = request.measure == EnvelopeMeasure::scaleEfficiency;
    const bool secondStage = request.measure != EnvelopeMeasure::score && !scale;
    EnvelopeSolver solver(data.outputs.values, data.inputs.values, scale ? EnvelopeReturns::constant : chosenReturns,
                          chosenOrientation);
    std::unique_ptr<EnvelopeSolver> variableSolver;
    if (scale)
        variableSolver = std::make_unique<EnvelopeSolver>(data.outputs.values, data.inputs.values,
                                                          EnvelopeReturns::variable, chosenOrientation);
    CellTable column(static_cast<std::size_t>(plants), 1);
    for (Eigen::Index plant = 0; plant < plants; ++plant) {
        const auto row = static_cast<std::size_t>(plant);
        const PlantEnvelope result = solved(solver, data, plant, secondStage);
        requireFiniteScore(result.score, data, plant);
        switch (request.measure) {
        case EnvelopeMeasure::score: column.set(row, 0, result.score); break;
        case EnvelopeMeasure::scaleEfficiency: {
            const double variableScore = solved(*variableSolver, data, plant, false).score;
            requireFiniteScore(variableScore, data, plant);
            column.set(row, 0, result.score / variableScore);
            break;
        }
        case EnvelopeMeasure::peers: column.set(row, 0, peersText(result, data, plantNames)); break;
        case EnvelopeMeasure::inputTarget: column.set(row, 0, result.inputTargets(request.column)); break;
        case EnvelopeMeasure::outputTarget: column.set(row, 0, result.outputTargets(request.column)); break;
        }
    }
    return underHeader(std::move(column), data.outputs, request.title);
}

} // namespace isoquant
