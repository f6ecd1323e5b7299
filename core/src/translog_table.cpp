#include "isoquant/form_tables.hpp"
#include "isoquant/translog_fit.hpp"

#include "table_writer.hpp"

namespace isoquant {

std::size_t translogFitTableRows(std::size_t inputs, std::size_t controls)
{
    return 2 * inputs + inputs * (inputs + 1) / 2 + controls + 15 + (controls > 0 ? 1 : 0);
}

CellTable translogFitTable(const ProductionFit& fit)
{
    const TranslogDetails& translog = *fit.translog;
    const std::size_t k = fit.inputLabels.size();
    const std::size_t m = fit.controlLabels.size();
    TableWriter writer(translogFitTableRows(k, m), fit.status == FitStatus::perfectFit);
    writer.textRow(headerLabels[0], {headerLabels[1], headerLabels[2], headerLabels[3], headerLabels[4],
                                     headerLabels[5], headerLabels[6]});
    Eigen::Index parameter = 0;
    writer.parameterRow(logScaleLabel, fit, parameter++);
    for (const auto& label : fit.inputLabels) writer.parameterRow(label, fit, parameter++);
    for (const auto& [i, j] : translogPairs(static_cast<Eigen::Index>(k)))
        writer.parameterRow(translogPairLabel(fit.inputLabels, i, j), fit, parameter++);
    for (const auto& label : fit.controlLabels) writer.parameterRow(label + controlSuffix, fit, parameter++);
    writer.skipRow();

    const LeastSquaresResult& regression = fit.regression;
    writer.valueRow(observationsLabel, static_cast<double>(regression.observations));
    writer.valueRow(rSquaredLabel, fit.rSquared);
    writer.valueRow(adjustedRSquaredLabel, fit.adjustedRSquared);
    writer.valueRow(residualSdLabel, regression.residualStandardDeviation);
    writer.put(overallTestLabel, {Cell{}, Cell{}, writer.undefinedIfExact(regression.fStatistic),
                                  writer.undefinedIfExact(regression.fPValue)});
    writer.valueRow(logLikelihoodLabel, writer.undefinedIfExact(regression.logLikelihood));
    writer.valueRow(aicLabel, writer.undefinedIfExact(regression.aic));
    writer.valueRow(bicLabel, writer.undefinedIfExact(regression.bic));
    for (std::size_t i = 0; i < k; ++i) {
        const auto index = static_cast<Eigen::Index>(i);
        writer.put(elasticityPrefix + fit.inputLabels[i],
                   {translog.elasticities(index), writer.undefinedIfExact(translog.elasticityStandardErrors(index)),
                    writer.undefinedIfExact(translog.elasticityTStatistics(index)),
                    writer.undefinedIfExact(translog.elasticityPValues(index)),
                    writer.undefinedIfExact(translog.elasticityLowerBounds(index)),
                    writer.undefinedIfExact(translog.elasticityUpperBounds(index))});
    }
    const ReturnsToScale& returns = fit.returns;
    writer.put(returnsLabel, {returns.estimate, writer.undefinedIfExact(returns.standardError),
                              writer.undefinedIfExact(returns.fStatistic), writer.undefinedIfExact(returns.pValue)});
    writer.textRow(verdictLabel, {returns.verdict});
    writer.put(cobbDouglasTestLabel, {Cell{}, Cell{}, writer.undefinedIfExact(translog.cobbDouglasTest.fStatistic),
                                      writer.undefinedIfExact(translog.cobbDouglasTest.pValue)});
    writer.textRow(formLabel, {formWord(fit.form), statusNote(fit)});
    if (m > 0) writer.valueRow(controlMeansLabel, fit.logScaleAtControlMeans);
    return writer.finish();
}

} // namespace isoquant
