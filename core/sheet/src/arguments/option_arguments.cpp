#include "isoquant/sheet/arguments/option_arguments.hpp"

#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/math/messages/text.hpp"

#include <cmath>

namespace isoquant {

namespace {

bool isDefault(const Cell& cell)
{
    return isEmpty(cell) || (isText(cell) && std::get<std::string>(cell).empty());
}

std::string describe(const Cell& cell)
{
    return isText(cell) ? quoted(std::get<std::string>(cell)) : formatNumber(std::get<double>(cell));
}

} // namespace

std::string formWord(ProductionForm form)
{
    switch (form) {
    case ProductionForm::cobbDouglas: return "cobb-douglas";
    case ProductionForm::ces: return "ces";
    case ProductionForm::translog: return "translog";
    }
    return "cobb-douglas";
}

ProductionForm readFormArgument(const Cell& cell)
{
    if (isDefault(cell)) return ProductionForm::cobbDouglas;
    if (isText(cell)) {
        const std::string& word = std::get<std::string>(cell);
        for (const auto form : {ProductionForm::cobbDouglas, ProductionForm::ces, ProductionForm::translog})
            if (equalsIgnoringCase(word, formWord(form))) return form;
    }
    throw InputError("form: " + describe(cell) + " is not a form; use \"cobb-douglas\", \"ces\" or \"translog\"");
}

bool readSwitchArgument(const Cell& cell, const std::string& argument)
{
    if (isDefault(cell)) return false;
    if (isNumber(cell)) {
        const double value = std::get<double>(cell);
        if (value == 0 || value == 1) return value == 1;
    }
    throw InputError(argument + ": " + describe(cell) + " is not TRUE or FALSE (1 or 0)");
}

CovarianceKind readErrorsArgument(const Cell& cell)
{
    if (isDefault(cell)) return CovarianceKind::classical;
    if (isText(cell)) {
        const std::string& word = std::get<std::string>(cell);
        if (equalsIgnoringCase(word, "classical")) return CovarianceKind::classical;
        if (equalsIgnoringCase(word, "hc1")) return CovarianceKind::hc1;
        if (equalsIgnoringCase(word, "hc3")) return CovarianceKind::hc3;
        if (equalsIgnoringCase(word, "cluster")) return CovarianceKind::cluster;
    }
    throw InputError("errors: " + describe(cell) +
                     " is not a kind of standard error; use \"classical\", \"hc1\", \"hc3\" or \"cluster\"");
}

double readLevelArgument(const Cell& cell, const std::string& argument)
{
    if (isDefault(cell)) return 0.95;
    if (isNumber(cell)) {
        const double level = std::get<double>(cell);
        if (level > 0 && level < 1) return level;
    }
    throw InputError(argument + ": " + describe(cell) + " is not a confidence level; give a number between 0 and 1, such as 0.95");
}

} // namespace isoquant
