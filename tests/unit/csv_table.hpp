// A small reader for the comma-separated data files in tests/data: a header row of column names,
// then rows of fields; a field may be in double quotes (the state panel quotes its text columns).
#pragma once

#include <string>
#include <vector>

namespace isoquant::testing {

class CsvTable {
public:
    // Throws std::runtime_error when the file cannot be read or a row has the wrong field count.
    static CsvTable read(const std::string& path);

    const std::vector<std::string>& header() const { return header_; }
    std::size_t rows() const { return rows_.size(); }
    // The column named `name` as numbers; throws std::runtime_error for an unknown name or a
    // field that is not a number.
    std::vector<double> numbers(const std::string& name) const;
    // The column named `name` as texts, quotes removed; throws std::runtime_error for an unknown name.
    std::vector<std::string> texts(const std::string& name) const;

private:
    std::vector<std::string> header_;
    std::vector<std::vector<std::string>> rows_;
};

} // namespace isoquant::testing
