#include "reference_data.hpp"

#include "isoquant/sheet/functions/bound_functions.hpp"

#include "cell_tables.hpp"
#include "csv_table.hpp"
#include "test_data.hpp"

namespace isoquant::testing {

namespace {

CellTable columnsOf(const CsvTable& table, const std::vector<std::string>& names)
{
    Eigen::MatrixXd values(static_cast<Eigen::Index>(table.rows()), static_cast<Eigen::Index>(names.size()));
    for (std::size_t column = 0; column < names.size(); ++column) {
        const auto numbers = table.numbers(names[column]);
        for (std::size_t row = 0; row < numbers.size(); ++row)
            values(static_cast<Eigen::Index>(row), static_cast<Eigen::Index>(column)) = numbers[row];
    }
    return numberRange(values, names);
}

FitArguments argumentsFrom(const std::string& file, const std::string& output,
                           const std::vector<std::string>& inputs, const std::vector<std::string>& controls)
{
    const CsvTable table = CsvTable::read(dataPath(file));
    FitArguments arguments;
    arguments.output = columnsOf(table, {output});
    arguments.inputs = columnsOf(table, inputs);
    if (!controls.empty()) arguments.controls = columnsOf(table, controls);
    return arguments;
}

CellTable textColumn(const CsvTable& table, const std::string& name)
{
    const auto texts = table.texts(name);
    CellTable column(texts.size() + 1, 1);
    column.set(0, 0, name);
    for (std::size_t row = 0; row < texts.size(); ++row) column.set(row + 1, 0, texts[row]);
    return column;
}

} // namespace

FitArguments statePanelWithPanelColumns()
{
    const CsvTable table = CsvTable::read(dataPath("us_states_produc_1970_1986.csv"));
    FitArguments arguments = statePanelArguments();
    arguments.groups = textColumn(table, "state");
    arguments.trend = columnsOf(table, {"year"});
    return arguments;
}

FitArguments riceFarmsArguments()
{
    const CsvTable table = CsvTable::read(dataPath("rice_farms_panel.csv"));
    FitArguments arguments = argumentsFrom("rice_farms_panel.csv", "goutput", {"seed", "urea", "totlabor", "size"}, {});
    arguments.groups = columnsOf(table, {"id"});
    return arguments;
}

FitArguments cobbDouglas1928Arguments()
{
    return argumentsFrom("cobb_douglas_1928.csv", "P", {"L", "C"}, {});
}

FitArguments statePanelArguments()
{
    return argumentsFrom("us_states_produc_1970_1986.csv", "gsp", {"pcap", "pc", "emp"}, {"unemp"});
}

FitArguments riceFarmArguments(const std::vector<std::string>& inputs)
{
    return argumentsFrom("rice_farms_panel.csv", "goutput", inputs, {});
}

CostFitArguments riceFarmCostArguments(bool withShares)
{
    const auto table = CsvTable::read(dataPath("rice_farms_panel.csv"));
    const std::vector<std::string> prices{"pseed", "purea", "wage"}, quantities{"seed", "urea", "totlabor"};
    const auto n = static_cast<Eigen::Index>(table.rows());
    Eigen::MatrixXd spending(n, 3), output(n, 1), priceValues(n, 3);
    const auto goutput = table.numbers("goutput");
    for (Eigen::Index i = 0; i < 3; ++i) {
        const auto price = table.numbers(prices[static_cast<std::size_t>(i)]);
        const auto quantity = table.numbers(quantities[static_cast<std::size_t>(i)]);
        for (Eigen::Index row = 0; row < n; ++row) {
            priceValues(row, i) = price[static_cast<std::size_t>(row)];
            spending(row, i) = price[static_cast<std::size_t>(row)] * quantity[static_cast<std::size_t>(row)];
        }
    }
    for (Eigen::Index row = 0; row < n; ++row) output(row, 0) = goutput[static_cast<std::size_t>(row)];
    const Eigen::VectorXd cost = spending.rowwise().sum();
    CostFitArguments arguments;
    arguments.cost = numberRange(cost, {"cost"});
    arguments.output = numberRange(output, {"goutput"});
    arguments.prices = numberRange(priceValues, prices);
    if (withShares)
        arguments.shares = numberRange((spending.array().colwise() / cost.array()).matrix(), {"seed share", "urea share", "labour share"});
    return arguments;
}

CostFitArguments riceFarmCostPanelArguments()
{
    CostFitArguments arguments = riceFarmCostArguments();
    const auto table = CsvTable::read(dataPath("rice_farms_panel.csv"));
    arguments.groups = columnsOf(table, {"id"});
    arguments.controls = columnsOf(table, {"size"});
    const auto n = static_cast<Eigen::Index>(table.rows());
    Eigen::MatrixXd seasons(n, 1);
    for (Eigen::Index row = 0; row < n; ++row) seasons(row, 0) = static_cast<double>(row % 6 + 1); // 6 rows a farm
    arguments.trend = numberRange(seasons, {"season"});
    return arguments;
}

CostPoint riceFarmCostPoint(std::size_t dataRow)
{
    static const CostFitArguments data = riceFarmCostArguments();
    CostPoint point;
    point.output.set(0, 0, data.output.at(dataRow + 1, 0)); // under the header
    for (std::size_t i = 0; i < 3; ++i) point.prices.set(0, i, data.prices.at(dataRow + 1, i));
    return point;
}

double riceFarmCostBound(const ModelTable& table, const std::string& quantity, std::size_t dataRow)
{
    const CostPoint point = riceFarmCostPoint(dataRow);
    const bool lower = quantity == "bound_lower_total";
    const std::string what = lower ? "total" : quantity.substr(std::string("bound_se_").size());
    return costColumnWithBounds(table, point.output, point.prices, what,
                                std::string(lower ? "lower bound" : "std. error"))
        .number(0, 0);
}

} // namespace isoquant::testing
