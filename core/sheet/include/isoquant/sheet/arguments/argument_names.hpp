// The names of the cell functions' arguments, as the Function Wizard shows them: the one table the
// add-in's function table (addin/function_table.cxx) and every message naming an argument take them
// from, so that a message names exactly what the user sees.
#pragma once

#include "isoquant/math/messages/input_error.hpp"

#include <string>

namespace isoquant {

namespace argument {
inline constexpr char output[] = "output";
inline constexpr char inputs[] = "inputs";
inline constexpr char form[] = "form";
inline constexpr char constantReturns[] = "constant returns";
inline constexpr char errors[] = "errors";
inline constexpr char level[] = "level";
inline constexpr char controls[] = "controls";
inline constexpr char groups[] = "groups";
inline constexpr char effects[] = "effects";
inline constexpr char trend[] = "trend";
inline constexpr char incompleteRows[] = "incomplete rows";
inline constexpr char covariance[] = "covariance";
inline constexpr char model[] = "model";
inline constexpr char input[] = "input";
inline constexpr char firstInput[] = "input i";
inline constexpr char secondInput[] = "input j";
inline constexpr char valuesOfFirstInput[] = "values of input i";
inline constexpr char what[] = "what";
inline constexpr char mean[] = "mean";
inline constexpr char table[] = "table";
inline constexpr char rowLabel[] = "row label";
inline constexpr char columnLabel[] = "column label";
inline constexpr char periods[] = "periods";
inline constexpr char names[] = "names";
inline constexpr char shares[] = "shares";
inline constexpr char quantities[] = "quantities";
inline constexpr char weights[] = "weights";
inline constexpr char base[] = "base";
inline constexpr char method[] = "method";
inline constexpr char kind[] = "kind";
inline constexpr char returns[] = "returns";
inline constexpr char targetOutput[] = "target output";
inline constexpr char inputPrices[] = "input prices";
inline constexpr char budget[] = "budget";
inline constexpr char outputPrice[] = "output price";
inline constexpr char outputLevel[] = "output level";
inline constexpr char cost[] = "cost";
inline constexpr char inefficiency[] = "inefficiency";
inline constexpr char outputs[] = "outputs";
inline constexpr char orientation[] = "orientation";
} // namespace argument

// The error about `argument`, written by the sheet layer: "<argument>: <detail>".
InputError argumentError(const std::string& argument, const std::string& detail);

// The argument that holds `part` of the data in the fitting functions (PRODFIT, PRODCOSTFIT, …):
// periods come from trend, the kind of standard errors from errors, prices from input prices.
std::string argumentHolding(DataPart part);

// The message of `error` as a cell shows it: the parts of the data it is about named by the
// arguments that hold them.
std::string sheetMessage(const InputError& error);

} // namespace isoquant
