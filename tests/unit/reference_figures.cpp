#include "reference_figures.hpp"

#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <iostream>
#include <sstream>
#include <stdexcept>

namespace isoquant::testing {

const char* referenceFiguresPath(const char* variable)
{
    const char* path = std::getenv(variable);
    return path ? path : "";
}

bool referencesRequired()
{
    const char* required = std::getenv("ISOQUANT_REQUIRE_REFERENCES");
    return required && std::string(required) == "1";
}

boost::test_tools::assertion_result referenceFiguresAvailable(const char* variable, const std::string& what)
{
    const std::string path = referenceFiguresPath(variable);
    if (!path.empty() && std::filesystem::exists(path)) return true;
    if (referencesRequired()) {
        // Not the fixture's skip text: the case runs and fails reading the missing file.
        std::cout << what << " required but missing (" << variable << " unset or no file)\n";
        return true;
    }
    std::cout << what << " not available (" << variable << " unset or no file)\n";
    boost::test_tools::assertion_result result(false);
    result.message() << what << " not available";
    return result;
}

std::vector<std::vector<std::string>> readReferenceRows(const std::string& path)
{
    std::ifstream file(path);
    if (!file) throw std::runtime_error("reference figures cannot be read from '" + path + "'");
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
