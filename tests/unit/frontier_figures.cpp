#include "frontier_figures.hpp"

#include "reference_figures.hpp"

#include <sstream>
#include <stdexcept>

namespace isoquant::testing {

const std::vector<double>& FrontierFigures::at(const std::string& dataset, const std::string& form,
                                               const std::string& quantity) const
{
    const auto found = values.find({dataset, form, quantity});
    if (found == values.end()) throw std::runtime_error("no figure " + dataset + "/" + form + "/" + quantity);
    return found->second;
}

double FrontierFigures::one(const std::string& dataset, const std::string& form, const std::string& quantity) const
{
    return at(dataset, form, quantity).front();
}

FrontierFigures readFrontierFigures(const char* variable)
{
    FrontierFigures result;
    for (const auto& row : readReferenceRows(referenceFiguresPath(variable))) {
        if (row.at(1) == "data") {
            std::istringstream fields(row.at(4));
            std::vector<double> numbers;
            for (double number = 0; fields >> number;) numbers.push_back(number);
            result.data[row.at(0)].push_back(numbers);
        } else {
            result.values[{row.at(0), row.at(1), row.at(2)}].push_back(std::stod(row.at(4)));
        }
    }
    return result;
}

} // namespace isoquant::testing
