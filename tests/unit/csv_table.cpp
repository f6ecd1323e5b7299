#include "csv_table.hpp"

#include <algorithm>
#include <fstream>
#include <stdexcept>

namespace isoquant::testing {

namespace {

std::vector<std::string> splitFields(const std::string& line)
{
    std::vector<std::string> fields(1);
    bool quoted = false;
    for (const char character : line) {
        if (character == '"') quoted = !quoted;
        else if (character == ',' && !quoted) fields.emplace_back();
        else if (character != '\r') fields.back() += character;
    }
    return fields;
}

} // namespace

CsvTable CsvTable::read(const std::string& path)
{
    std::ifstream file(path);
    if (!file) throw std::runtime_error("cannot open " + path);
    CsvTable table;
    std::string line;
    if (!std::getline(file, line)) throw std::runtime_error(path + ": no header row");
    table.header_ = splitFields(line);
    while (std::getline(file, line)) {
        if (line.empty() || line == "\r") continue;
        auto fields = splitFields(line);
        if (fields.size() != table.header_.size())
            throw std::runtime_error(path + ": row " + std::to_string(table.rows_.size() + 2) + " has " +
                                     std::to_string(fields.size()) + " fields, the header " +
                                     std::to_string(table.header_.size()));
        table.rows_.push_back(std::move(fields));
    }
    return table;
}

std::vector<std::string> CsvTable::texts(const std::string& name) const
{
    const auto found = std::find(header_.begin(), header_.end(), name);
    if (found == header_.end()) throw std::runtime_error("no column " + name);
    const auto column = static_cast<std::size_t>(found - header_.begin());
    std::vector<std::string> values;
    values.reserve(rows_.size());
    for (const auto& row : rows_) values.push_back(row[column]);
    return values;
}

std::vector<double> CsvTable::numbers(const std::string& name) const
{
    std::vector<double> values;
    for (const auto& text : texts(name)) {
        std::size_t used = 0;
        const double value = std::stod(text, &used);
        if (used != text.size()) throw std::runtime_error("not a number in " + name + ": " + text);
        values.push_back(value);
    }
    return values;
}

} // namespace isoquant::testing
