#include "isoquant/sheet/tables/frontier_table.hpp"

#include "isoquant/sheet/arguments/argument_names.hpp"
#include "isoquant/sheet/arguments/option_arguments.hpp"
#include "isoquant/sheet/tables/covariance_block.hpp"
#include "isoquant/sheet/tables/table_labels.hpp"
#include "isoquant/math/fits/ces_fit.hpp" // convergedText
#include "isoquant/math/fits/translog_fit.hpp"
#include "tables/frontier_rows.hpp"

#include <cmath>
#include <limits>

namespace isoquant {

namespace {

std::vector<std::string> parameterLabels(const ProductionFrontier& frontier)
{
    std::vector<std::string> labels{logScaleLabel};
    for (const auto& label : frontier.inputLabels) labels.push_back(label);
    if (frontier.form == ProductionForm::translog)
        for (const auto& [i, j] : translogPairs(static_cast<Eigen::Index>(frontier.inputLabels.size())))
            labels.push_back(translogPairLabel(frontier.inputLabels, i, j));
    for (const auto& label : frontier.controlLabels) labels.push_back(label + controlSuffix);
    return labels;
}

} // namespace

void frontierScaleRows(TableWriter& writer, const FrontierScaleEstimates& scales)
{
    writer.estimateRow(noiseSdLabel, scales.noiseSd);
    writer.estimateRow(inefficiencySdLabel, scales.inefficiencySd);
    writer.estimateRow(lambdaLabel, scales.lambda);
}

void frontierLikelihoodRows(TableWriter& writer, const StochasticFrontierFit& fit)
{
    const auto n = static_cast<double>(fit.residuals.size());
    const auto parameters = static_cast<double>(fit.coefficients.size() + 2);
    writer.valueRow(logLikelihoodLabel, fit.logLikelihood);
    writer.valueRow(aicLabel, -2 * fit.logLikelihood + 2 * parameters);
    writer.valueRow(bicLabel, -2 * fit.logLikelihood + parameters * std::log(n));
}

void frontierInefficiencyRows(TableWriter& writer, const StochasticFrontierFit& fit)
{
    const double statistic = inefficiencyTestStatistic(fit);
    writer.put(inefficiencyTestLabel, {Cell{}, Cell{}, statistic, inefficiencyTestPValue(statistic)});
    writer.valueRow(meanEfficiencyLabel, meanEfficiency(fit));
}

void frontierConvergenceRow(TableWriter& writer, const StochasticFrontierFit& fit)
{
    writer.textRow(convergenceLabel, {frontierStatusWord(fit.status.kind),
                                      std::to_string(fit.evaluations) + " evaluations; " + fit.status.reason});
}

std::string frontierNote(const StochasticFrontierFit& fit)
{
    if (fit.wrongSkew) return wrongSkewNote;
    if (fit.status.is(FitStatusKind::boundary))
        return "note: no maximum with noise: the likelihood keeps rising toward noise SD = 0; the estimates "
               "are where the solver stopped (try the other inefficiency distribution or more rows)";
    if (!fit.status.is(FitStatusKind::ok))
        return "note: the likelihood was not maximised; the estimates are where the solver stopped";
    return "";
}

std::string inefficiencyWord(InefficiencyDistribution distribution)
{
    return distribution == InefficiencyDistribution::halfNormal ? "half-normal" : "exponential";
}

std::string frontierStatusWord(FitStatusKind kind)
{
    if (kind == FitStatusKind::boundary) return boundaryText;
    return convergenceWord(kind); // the frontier's kinds: ok, notConverged, stopped
}

std::size_t frontierTableRows(ProductionForm form, std::size_t inputs, std::size_t controls)
{
    const std::size_t secondOrder = form == ProductionForm::translog ? inputs * (inputs + 1) / 2 : 0;
    return inputs + secondOrder + controls + 16;
}

CellTable frontierTable(const ProductionFrontier& frontier)
{
    const StochasticFrontierFit& fit = frontier.fit;
    TableWriter writer(frontierTableRows(frontier.form, frontier.inputLabels.size(), frontier.controlLabels.size()),
                       false);
    writer.headerRow(fit.distribution == InefficiencyDistribution::halfNormal ? halfNormalFrontierTitle
                                                                              : exponentialFrontierTitle);
    const std::vector<std::string> labels = parameterLabels(frontier);
    for (std::size_t j = 0; j < labels.size(); ++j) writer.estimateRow(labels[j], frontier.coefficients[j]);
    writer.skipRow();

    frontierScaleRows(writer, {frontier.noiseSd, frontier.inefficiencySd, frontier.lambda});
    writer.valueRow(observationsLabel, static_cast<double>(fit.residuals.size()));
    frontierLikelihoodRows(writer, fit);
    frontierInefficiencyRows(writer, fit);
    const ParameterEstimate& returns = frontier.returns;
    writer.put(returnsLabel, {returns.estimate, returns.standardError, returns.tStatistic, returns.pValue});
    writer.textRow(verdictLabel, {frontier.verdict});
    frontierConvergenceRow(writer, fit);
    writer.textRow(formLabel, {formWord(frontier.form), frontierNote(frontier.fit)});
    return writer.finish();
}

CellTable frontierTableWithCovariance(const ProductionFrontier& frontier, const Cell& covariance)
{
    const CellTable table = frontierTable(frontier);
    if (!readSwitchArgument(covariance, argument::covariance)) return table;
    CovarianceBlock block;
    block.labels = parameterLabels(frontier);
    const auto p = static_cast<Eigen::Index>(block.labels.size());
    block.matrix = frontier.fit.covariance.topLeftCorner(p, p);
    block.likelihood = true;
    block.degreesOfFreedom = std::numeric_limits<double>::infinity();
    block.level = frontier.confidenceLevel;
    return withCovarianceBlock(table, block);
}

} // namespace isoquant
