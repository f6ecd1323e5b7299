#include "reference_data.hpp"

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

} // namespace isoquant::testing
