#include "isoquant/sheet/tables/frontier_table.hpp"

#include "isoquant/sheet/tables/table_labels.hpp"
#include "isoquant/math/fits/ces_fit.hpp" // convergedText
#include "isoquant/math/fits/translog_fit.hpp"
#include "tables/table_writer.hpp"

#include <cmath>

namespace isoquant {

namespace {

void estimateRow(TableWriter& writer, const std::string& label, const ParameterEstimate& estimate)
{
    writer.put(label, {estimate.estimate, estimate.standardError, estimate.tStatistic, estimate.pValue,
                       estimate.lowerBound, estimate.upperBound});
}

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

std::string formNote(const ProductionFrontier& frontier)
{
    if (frontier.fit.wrongSkew) return wrongSkewNote;
    if (frontier.fit.status.is(FitStatusKind::boundary))
        return "note: no maximum with noise: the likelihood keeps rising toward noise SD = 0; the estimates "
               "are where the solver stopped (try the other inefficiency distribution or more rows)";
    if (!frontier.fit.status.is(FitStatusKind::ok))
        return "note: the likelihood was not maximised; the estimates are where the solver stopped";
    return "";
}

} // namespace

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
    for (std::size_t j = 0; j < labels.size(); ++j) estimateRow(writer, labels[j], frontier.coefficients[j]);
    writer.skipRow();

    estimateRow(writer, noiseSdLabel, frontier.noiseSd);
    estimateRow(writer, inefficiencySdLabel, frontier.inefficiencySd);
    estimateRow(writer, lambdaLabel, frontier.lambda);
    const auto n = static_cast<double>(fit.residuals.size());
    const auto parameters = static_cast<double>(fit.coefficients.size() + 2);
    writer.valueRow(observationsLabel, n);
    writer.valueRow(logLikelihoodLabel, fit.logLikelihood);
    writer.valueRow(aicLabel, -2 * fit.logLikelihood + 2 * parameters);
    writer.valueRow(bicLabel, -2 * fit.logLikelihood + parameters * std::log(n));
    const double statistic = inefficiencyTestStatistic(fit);
    writer.put(inefficiencyTestLabel, {Cell{}, Cell{}, statistic, inefficiencyTestPValue(statistic)});
    writer.valueRow(meanEfficiencyLabel, meanEfficiency(fit));
    const ParameterEstimate& returns = frontier.returns;
    writer.put(returnsLabel, {returns.estimate, returns.standardError, returns.tStatistic, returns.pValue});
    writer.textRow(verdictLabel, {frontier.verdict});
    writer.textRow(convergenceLabel, {frontierStatusWord(fit.status.kind),
                                      std::to_string(fit.evaluations) + " evaluations; " + fit.status.reason});
    writer.textRow(formLabel, {formWord(frontier.form), formNote(frontier)});
    return writer.finish();
}

} // namespace isoquant
