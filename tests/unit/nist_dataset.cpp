#include "nist_dataset.hpp"

#include <algorithm>
#include <cmath>
#include <fstream>
#include <regex>
#include <sstream>
#include <stdexcept>

namespace isoquant::testing {

namespace {

std::vector<std::string> readLines(const std::string& path)
{
    std::ifstream file(path);
    if (!file) throw std::runtime_error("cannot open " + path);
    std::vector<std::string> lines;
    for (std::string line; std::getline(file, line);) lines.push_back(line);
    return lines;
}

std::pair<int, int> lineRange(const std::vector<std::string>& lines, const std::string& section)
{
    const std::regex pattern(section + R"(\s*\(lines\s+(\d+)\s+to\s+(\d+)\))");
    std::smatch match;
    for (const auto& line : lines)
        if (std::regex_search(line, match, pattern)) return {std::stoi(match[1]), std::stoi(match[2])};
    throw std::runtime_error("no line range for " + section);
}

std::vector<double> numbersIn(const std::string& line)
{
    std::istringstream stream(line);
    std::vector<double> values;
    for (std::string word; stream >> word;) {
        try {
            std::size_t used = 0;
            const double value = std::stod(word, &used);
            if (used == word.size()) values.push_back(value);
        } catch (const std::exception&) {
        }
    }
    return values;
}

} // namespace

NistLinearDataset readNistLinearDataset(const std::string& path)
{
    const auto lines = readLines(path);
    NistLinearDataset dataset;
    dataset.name = path.substr(path.find_last_of('/') + 1);

    const auto [certifiedFirst, certifiedLast] = lineRange(lines, "Certified Values");
    std::vector<double> estimates;
    std::vector<double> deviations;
    const std::regex parameterLine(R"(^\s*B\d+\s)");
    for (int number = certifiedFirst; number <= certifiedLast; ++number) {
        const std::string& line = lines.at(number - 1);
        const auto values = numbersIn(line);
        if (std::regex_search(line, parameterLine) && values.size() == 2) {
            estimates.push_back(values[0]);
            deviations.push_back(values[1]);
        } else if (line.find("Standard Deviation") != std::string::npos && values.size() == 1) {
            dataset.certifiedResidualStandardDeviation = values[0];
        } else if (line.find("R-Squared") != std::string::npos && values.size() == 1) {
            dataset.certifiedRSquared = values[0];
        }
    }
    const auto parameters = static_cast<Eigen::Index>(estimates.size());
    dataset.certifiedEstimates = Eigen::Map<Eigen::VectorXd>(estimates.data(), parameters);
    dataset.certifiedStandardDeviations = Eigen::Map<Eigen::VectorXd>(deviations.data(), parameters);

    const auto [dataFirst, dataLast] = lineRange(lines, "Data");
    std::vector<std::vector<double>> rows;
    for (int number = dataFirst; number <= dataLast; ++number) {
        auto values = numbersIn(lines.at(number - 1));
        if (!values.empty()) rows.push_back(std::move(values));
    }
    const auto n = static_cast<Eigen::Index>(rows.size());
    const auto predictors = static_cast<Eigen::Index>(rows.front().size()) - 1;
    dataset.response.resize(n);
    dataset.design.resize(n, parameters);
    const bool withoutConstant = parameters == predictors;
    if (!withoutConstant) dataset.interceptColumn = 0;
    for (Eigen::Index i = 0; i < n; ++i) {
        dataset.response(i) = rows[i][0];
        if (withoutConstant) {
            for (Eigen::Index j = 0; j < parameters; ++j) dataset.design(i, j) = rows[i][j + 1];
        } else if (predictors == 1) {
            for (Eigen::Index j = 0; j < parameters; ++j) dataset.design(i, j) = std::pow(rows[i][1], j);
        } else {
            dataset.design(i, 0) = 1.0;
            for (Eigen::Index j = 1; j < parameters; ++j) dataset.design(i, j) = rows[i][j];
        }
    }
    return dataset;
}

double logRelativeError(double estimate, double certified)
{
    const double error = certified == 0 ? std::fabs(estimate) : std::fabs(estimate - certified) / std::fabs(certified);
    if (error == 0) return 15.0;
    return std::min(15.0, -std::log10(error));
}

} // namespace isoquant::testing
