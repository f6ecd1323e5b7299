#include "isoquant/sheet/tables/form_tables.hpp"
#include "isoquant/math/fits/translog_fit.hpp"

#include "tables/table_writer.hpp"

namespace isoquant {

std::size_t translogFitTableRows(std::size_t inputs, std::size_t controls)
{
    return 2 * inputs + inputs * (inputs + 1) / 2 + controls + 16 + (controls > 0 ? 1 : 0);
}

CellTable translogFitTable(const ProductionFit& fit)
{
    const TranslogDetails& translog = *fit.translog;
    const ParameterInference& elasticities = translog.elasticities;
    const std::size_t k = fit.inputLabels.size();
    const std::size_t m = fit.controlLabels.size();
    TableWriter writer(translogFitTableRows(k, m), fit.status.is(FitStatusKind::exactFit));
    writer.headerRow(translogTitle);
    Eigen::Index parameter = 0;
    writer.parameterRow(logScaleLabel, fit, parameter++);
    for (const auto& label : fit.inputLabels) writer.parameterRow(label, fit, parameter++);
    for (const auto& [i, j] : translogPairs(static_cast<Eigen::Index>(k)))
        writer.parameterRow(translogPairLabel(fit.inputLabels, i, j), fit, parameter++);
    for (const auto& label : fit.controlLabels) writer.parameterRow(label + controlSuffix, fit, parameter++);
    writer.skipRow();

    writer.fitStatisticRows(fit, true);
    for (std::size_t i = 0; i < k; ++i) {
        const auto index = static_cast<Eigen::Index>(i);
        writer.put(elasticityPrefix + fit.inputLabels[i],
                   {elasticities.estimates(index), writer.undefinedIfExact(elasticities.standardErrors(index)),
                    writer.undefinedIfExact(elasticities.tStatistics(index)),
                    writer.undefinedIfExact(elasticities.pValues(index)),
                    writer.undefinedIfExact(elasticities.lowerBounds(index)),
                    writer.undefinedIfExact(elasticities.upperBounds(index))});
    }
    writer.returnsRows(fit.returns);
    writer.put(cobbDouglasTestLabel, {Cell{}, Cell{}, writer.undefinedIfExact(translog.cobbDouglasTest.fStatistic),
                                      writer.undefinedIfExact(translog.cobbDouglasTest.pValue)});
    writer.textRow(formLabel, {formWord(fit.form), statusNote(fit)});
    if (m > 0) writer.valueRow(controlMeansLabel, fit.logScaleAtControlMeans);
    writer.valueRow(smearingLabel, fit.smearingFactor);
    return writer.finish();
}

} // namespace isoquant
