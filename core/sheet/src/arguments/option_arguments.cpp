#include "isoquant/sheet/arguments/option_arguments.hpp"

#include "isoquant/sheet/arguments/argument_names.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/math/messages/text.hpp"

#include <cmath>

namespace isoquant {

std::string describe(const Cell& cell)
{
    if (isText(cell)) return quoted(std::get<std::string>(cell));
    return isNumber(cell) ? formatNumber(std::get<double>(cell)) : std::string("an empty cell");
}

std::string unknownChoiceMessage(const Cell& cell, const std::string& argument, const std::string& what,
                                 const std::vector<std::string>& words)
{
    std::string offered;
    for (std::size_t i = 0; i < words.size(); ++i) {
        if (i > 0) offered += i + 1 == words.size() ? " or " : ", ";
        offered += "\"" + words[i] + "\"";
    }
    return argument + ": " + describe(cell) + " is not " + what + "; use " + offered;
}

ProductionForm readFormArgument(const Cell& cell)
{
    return readChoice<ProductionForm>(cell, argument::form, "a form",
                                      {{"cobb-douglas", ProductionForm::cobbDouglas},
                                       {"ces", ProductionForm::ces},
                                       {"translog", ProductionForm::translog}},
                                      ProductionForm::cobbDouglas);
}

bool readSwitchArgument(const Cell& cell, const std::string& argument)
{
    if (isOmitted(cell)) return false;
    if (isNumber(cell)) {
        const double value = std::get<double>(cell);
        if (value == 0 || value == 1) return value == 1;
    }
    throw InputError(argument + ": " + describe(cell) + " is not TRUE or FALSE (1 or 0)");
}

CovarianceKind readErrorsArgument(const Cell& cell)
{
    return readChoice<CovarianceKind>(cell, argument::errors, "a kind of standard error",
                                      {{"classical", CovarianceKind::classical},
                                       {"hc1", CovarianceKind::hc1},
                                       {"hc3", CovarianceKind::hc3},
                                       {"cluster", CovarianceKind::cluster}},
                                      CovarianceKind::classical);
}

double readLevelArgument(const Cell& cell, const std::string& argument)
{
    if (isOmitted(cell)) return 0.95;
    if (isNumber(cell)) {
        const double level = std::get<double>(cell);
        if (level > 0 && level < 1) return level;
    }
    throw InputError(argument + ": " + describe(cell) + " is not a confidence level; give a number between 0 and 1, such as " +
                     localDecimal("0.95"));
}

} // namespace isoquant
