#include "isoquant/sheet/tables/growth_table.hpp"

namespace isoquant {

namespace {

void writeRow(CellTable& table, std::size_t row, Cell period, const GrowthComponents& components)
{
    std::size_t column = 0;
    table.set(row, column++, std::move(period));
    table.set(row, column++, components.output);
    for (Eigen::Index i = 0; i < components.inputs.size(); ++i) table.set(row, column++, components.inputs(i));
    table.set(row, column++, components.scaleEffect);
    table.set(row, column, components.productivity);
}

} // namespace

CellTable growthTable(const GrowthAccount& account, const std::vector<std::string>& inputLabels,
                      const std::vector<Cell>& periodNames)
{
    const std::size_t periods = account.periods.size() + 1;
    CellTable table(growthTableRows(periods), growthTableColumns(inputLabels.size()));
    std::size_t column = 0;
    table.set(0, column++, periodHeader);
    table.set(0, column++, outputGrowthHeader);
    for (const auto& label : inputLabels) table.set(0, column++, label);
    table.set(0, column++, scaleEffectHeader);
    table.set(0, column, productivityGrowthHeader);

    for (std::size_t interval = 0; interval < account.periods.size(); ++interval)
        writeRow(table, interval + 1, periodNames.empty() ? Cell(static_cast<double>(interval + 2)) : periodNames[interval + 1],
                 account.periods[interval]);
    writeRow(table, periods, std::string(totalLabel), account.total);
    return table;
}

} // namespace isoquant
