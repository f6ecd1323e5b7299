#include "isoquant/sheet/caches/cache_footprint.hpp"

#include "isoquant/math/fits/ces_fit.hpp"
#include "isoquant/math/fits/translog_fit.hpp"

#include <string>
#include <vector>

namespace isoquant {

namespace {

std::size_t heapBytes(const std::string& text)
{
    // Short texts live inside the string object itself (the small-string buffer).
    const char* self = reinterpret_cast<const char*>(&text);
    const bool inside = text.data() >= self && text.data() < self + sizeof text;
    return inside ? 0 : text.capacity() + 1;
}

std::size_t heapBytes(const std::vector<std::string>& texts)
{
    std::size_t bytes = texts.capacity() * sizeof(std::string);
    for (const std::string& text : texts) bytes += heapBytes(text);
    return bytes;
}

std::size_t heapBytes(const Eigen::MatrixXd& matrix) { return static_cast<std::size_t>(matrix.size()) * sizeof(double); }
std::size_t heapBytes(const Eigen::VectorXd& vector) { return static_cast<std::size_t>(vector.size()) * sizeof(double); }

std::size_t heapBytes(const Cell& cell)
{
    return isText(cell) ? heapBytes(std::get<std::string>(cell)) : 0;
}

std::size_t heapBytes(const ParameterInference& inference)
{
    return heapBytes(inference.estimates) + heapBytes(inference.standardErrors) + heapBytes(inference.tStatistics) +
           heapBytes(inference.pValues) + heapBytes(inference.lowerBounds) + heapBytes(inference.upperBounds) +
           heapBytes(inference.covariance);
}

std::size_t heapBytes(const PanelSummary& panel)
{
    return heapBytes(panel.groupLabels) + heapBytes(panel.groupEffects) +
           panel.periods.capacity() * sizeof(double) + heapBytes(panel.periodEffects);
}

std::size_t heapBytes(const TranslogDetails& translog)
{
    return sizeof translog + heapBytes(translog.meanLogInputs) + heapBytes(translog.elasticities);
}

} // namespace

std::size_t footprintBytes(const CellTable& table)
{
    // A kind and a slot per cell, plus the text of each text cell.
    std::size_t bytes = sizeof table + table.rows() * table.columns() * (sizeof(CellKind) + sizeof(double));
    for (std::size_t column = 0; column < table.columns(); ++column) {
        const CellKind* kinds = table.columnKinds(column);
        for (std::size_t row = 0; row < table.rows(); ++row)
            if (kinds[row] == CellKind::text) bytes += sizeof(std::string) + heapBytes(table.text(row, column));
    }
    return bytes;
}

std::size_t footprintBytes(const FitArguments& arguments)
{
    std::size_t bytes = sizeof arguments;
    for (const CellTable* table :
         {&arguments.output, &arguments.inputs, &arguments.controls, &arguments.groups, &arguments.trend})
        bytes += footprintBytes(*table) - sizeof *table; // the table object is inside `arguments`
    for (const Cell* option : {&arguments.form, &arguments.constantReturns, &arguments.errors, &arguments.level,
                               &arguments.effects, &arguments.incompleteRows})
        bytes += heapBytes(*option);
    return bytes;
}

std::size_t footprintBytes(const ProductionFit& fit)
{
    std::size_t bytes = sizeof fit + heapBytes(fit.inputLabels) + heapBytes(fit.controlLabels) +
                        heapBytes(fit.inference) + heapBytes(fit.regressionInference) + heapBytes(fit.residuals) +
                        heapBytes(fit.status.reason) + heapBytes(fit.returns.verdict) + heapBytes(fit.panel);
    if (fit.ces) bytes += sizeof *fit.ces;
    if (fit.translog) bytes += heapBytes(*fit.translog);
    return bytes;
}

} // namespace isoquant
