#include "reference_figures.hpp"

#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <iostream>
#include <sstream>

namespace isoquant::testing {

const char* referenceFiguresPath(const char* variable) { return std::getenv(variable); }

boost::test_tools::assertion_result referenceFiguresAvailable(const char* variable, const std::string& what)
{
    const char* path = referenceFiguresPath(variable);
    if (path && std::filesystem::exists(path)) return true;
    std::cout << what << " not available (" << variable << " unset or no file)\n";
    boost::test_tools::assertion_result result(false);
    result.message() << what << " not available";
    return result;
}

std::vector<std::vector<std::string>> readReferenceRows(const std::string& path)
{
    std::ifstream file(path);
    std::vector<std::vector<std::string>> rows;
    std::string line;
    std::getline(file, line); // header
    while (std::getline(file, line)) {
        std::vector<std::string> fields;
        std::istringstream stream(line);
        std::string field;
        while (std::getline(stream, field, ',')) fields.push_back(field);
        rows.push_back(std::move(fields));
    }
    return rows;
}

} // namespace isoquant::testing
