#include "isoquant/sheet/tables/cost_table.hpp"

#include "isoquant/sheet/arguments/argument_names.hpp"
#include "isoquant/sheet/arguments/option_arguments.hpp"
#include "isoquant/sheet/tables/covariance_block.hpp"
#include "isoquant/sheet/tables/frontier_table.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "tables/frontier_rows.hpp"
#include "tables/panel_rows.hpp"
#include "tables/table_writer.hpp"

namespace isoquant {

namespace {

constexpr PanelRowLabels costPanelLabels{costTrendLabel, costPredictionLabel, false};

} // namespace

std::size_t costFitTableRows(CostForm form, std::size_t prices, bool dropsIncompleteRows, bool frontier)
{
    const std::size_t secondOrder = form == CostForm::translog ? 1 + prices * (prices + 1) / 2 + prices : 0;
    return prices + 19 + secondOrder + (dropsIncompleteRows ? 1 : 0) + (frontier ? 6 : 0);
}

std::size_t costFitTableRows(const CostFit& fit)
{
    const std::size_t controls = fit.summary.controlLabels.size();
    return costFitTableRows(fit.form, fit.priceLabels.size(), fit.dropsIncompleteRows, fit.frontier.has_value()) +
           controls + (controls > 0 ? 1 : 0) + panelRowCount(fit.summary.panel, costPanelLabels);
}

namespace {

// Why there is no efficient scale, when there is none; and the fit's own note.
std::string costFormNote(const CostFit& fit)
{
    std::string note = fit.frontier ? frontierNote(fit.frontier->mirrored) : statusNote(fit.summary);
    auto add = [&note](const std::string& more) { note += (note.empty() ? "" : "; ") + more; };
    if (fit.form == CostForm::cobbDouglas)
        add("note: a Cobb-Douglas cost function has the same cost elasticity at every output, so no efficient scale");
    else if (!fit.efficientScale)
        add("note: the cost elasticity does not rise with output (output*output is not positive), so average cost "
            "has no lowest point and there is no efficient scale");
    return note;
}

// "regular at every row", or the first irregular row and what fails there.
std::string regularityNote(const CostFit& fit)
{
    if (!fit.regularity.firstRow) return "regular at every row";
    return "first: row " + std::to_string(static_cast<std::size_t>(*fit.regularity.firstRow) + fit.firstDataRow) + " (" +
           fit.regularity.firstPhrase + ")";
}

const char* costTitle(const CostFit& fit)
{
    if (!fit.frontier) return fit.form == CostForm::translog ? translogCostTitle : cobbDouglasCostTitle;
    return fit.frontier->mirrored.distribution == InefficiencyDistribution::halfNormal ? halfNormalCostFrontierTitle
                                                                                       : exponentialCostFrontierTitle;
}

// observations to BIC (and `incomplete rows dropped`): least squares', or a frontier's with its
// inefficiency rows.
void statisticRows(TableWriter& writer, const CostFit& fit)
{
    if (!fit.frontier) {
        writer.fitStatisticRows(fit.summary, true);
        if (fit.dropsIncompleteRows) writer.valueRow(droppedRowsLabel, static_cast<double>(fit.incompleteRowsDropped));
        return;
    }
    const StochasticFrontierFit& frontier = fit.frontier->mirrored;
    writer.valueRow(observationsLabel, static_cast<double>(frontier.residuals.size()));
    for (const char* leastSquaresOnly : {rSquaredLabel, adjustedRSquaredLabel, residualSdLabel})
        writer.valueRow(leastSquaresOnly, notANumber);
    writer.put(overallTestLabel, {Cell{}, Cell{}, notANumber, notANumber});
    frontierLikelihoodRows(writer, frontier);
    if (fit.dropsIncompleteRows) writer.valueRow(droppedRowsLabel, static_cast<double>(fit.incompleteRowsDropped));
    frontierInefficiencyRows(writer, frontier);
}

} // namespace

CellTable costFitTable(const CostFit& fit)
{
    const ProductionFit& summary = fit.summary;
    const bool translog = fit.form == CostForm::translog;
    TableWriter writer(costFitTableRows(fit), summary.status.is(FitStatusKind::exactFit));
    writer.headerRow(costTitle(fit));
    Eigen::Index parameter = 0;
    writer.parameterRow(costConstantLabel, summary, parameter++);
    writer.parameterRow(costOutputLabel, summary, parameter++);
    for (const auto& label : fit.priceLabels) writer.parameterRow(label, summary, parameter++);
    if (translog)
        for (const auto& label : costSecondOrderLabels(fit.priceLabels)) writer.parameterRow(label, summary, parameter++);
    for (const auto& label : summary.controlLabels) writer.parameterRow(label + controlSuffix, summary, parameter++);
    writer.skipRow();

    if (fit.frontier) frontierScaleRows(writer, fit.frontier->scales);
    statisticRows(writer, fit);
    const ParameterEstimate& elasticity = fit.costElasticity;
    writer.put(costElasticityLabel, {elasticity.estimate, writer.undefinedIfExact(elasticity.standardError),
                                     writer.undefinedIfExact(elasticity.tStatistic),
                                     writer.undefinedIfExact(elasticity.pValue),
                                     writer.undefinedIfExact(elasticity.lowerBound),
                                     writer.undefinedIfExact(elasticity.upperBound)});
    writer.returnsRows(summary.returns);
    if (fit.efficientScale) {
        const ParameterEstimate& scale = *fit.efficientScale;
        writer.put(efficientScaleLabel, {scale.estimate, writer.undefinedIfExact(scale.standardError), Cell{}, Cell{},
                                         writer.undefinedIfExact(scale.lowerBound),
                                         writer.undefinedIfExact(scale.upperBound)});
    } else {
        writer.textRow(efficientScaleLabel, {notAvailableText});
    }
    writer.put(costRegularityLabel, {static_cast<double>(fit.regularity.irregularRows), regularityNote(fit)});
    if (fit.frontier) frontierConvergenceRow(writer, fit.frontier->mirrored);
    writer.textRow(formLabel, {translog ? translogCostWord : cobbDouglasCostWord, costFormNote(fit)});
    if (!summary.controlLabels.empty()) writer.valueRow(costControlMeansLabel, summary.logScaleAtControlMeans);
    writer.valueRow(smearingLabel, summary.smearingFactor);
    writePanelRows(writer, summary.panel, costPanelLabels);
    return writer.finish();
}

std::vector<std::string> costParameterLabels(const CostFit& fit)
{
    std::vector<std::string> labels{costConstantLabel, costOutputLabel};
    labels.insert(labels.end(), fit.priceLabels.begin(), fit.priceLabels.end());
    if (fit.form == CostForm::translog)
        for (const auto& label : costSecondOrderLabels(fit.priceLabels)) labels.push_back(label);
    for (const auto& label : fit.summary.controlLabels) labels.push_back(label + controlSuffix);
    return labels;
}

std::string costShiftedConstantLabel(bool forPredictions)
{
    return forPredictions ? costPredictionLabel : costControlMeansLabel;
}

CellTable costFitTableWithCovariance(const CostFit& fit, const Cell& covariance)
{
    if (!readSwitchArgument(covariance, argument::covariance)) return costFitTable(fit);
    CovarianceBlock block;
    block.likelihood = fit.frontier.has_value(); // the frontier's inverse observed information, the normal
    block.labels = costParameterLabels(fit);
    block.matrix = fit.summary.inference.covariance;
    if (const auto& shifted = fit.summary.shiftedScale)
        appendShiftedParameter(block, *shifted, costShiftedConstantLabel(shifted->forPredictions));
    // As the table's standard errors: an exact fit has none, only the rounding left in V.
    if (fit.summary.status.is(FitStatusKind::exactFit)) block.matrix.setConstant(notANumber);
    block.kind = fit.summary.summary.covarianceKind;
    block.degreesOfFreedom = fit.summary.inference.degreesOfFreedom;
    block.level = fit.summary.inference.confidenceLevel;
    return withCovarianceBlock(costFitTable(fit), block);
}

} // namespace isoquant
