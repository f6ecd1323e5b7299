#include "isoquant/growth_table.hpp"

namespace isoquant {

namespace {

void writeRow(CellTable& table, std::size_t row, Cell period, const GrowthComponents& components)
{
    std::size_t column = 0;
    table.at(row, column++) = std::move(period);
    table.at(row, column++) = components.output;
    for (Eigen::Index i = 0; i < components.inputs.size(); ++i) table.at(row, column++) = components.inputs(i);
    table.at(row, column++) = components.scaleEffect;
    table.at(row, column) = components.productivity;
}

} // namespace

CellTable growthTable(const GrowthAccount& account, const std::vector<std::string>& inputLabels)
{
    const std::size_t periods = account.periods.size() + 1;
    CellTable table(growthTableRows(periods), growthTableColumns(inputLabels.size()));
    std::size_t column = 0;
    table.at(0, column++) = periodHeader;
    table.at(0, column++) = outputGrowthHeader;
    for (const auto& label : inputLabels) table.at(0, column++) = label;
    table.at(0, column++) = scaleEffectHeader;
    table.at(0, column) = productivityGrowthHeader;

    for (std::size_t interval = 0; interval < account.periods.size(); ++interval)
        writeRow(table, interval + 1, static_cast<double>(interval + 2), account.periods[interval]);
    writeRow(table, periods, std::string(totalLabel), account.total);
    return table;
}

} // namespace isoquant
