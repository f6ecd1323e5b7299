// The function table's shared argument rows and its families (function_rows_*.cxx), private to
// the add-in: every name comes from the argument table of the sheet layer (argument_names.hpp).
#pragma once

#include "function_table.hxx"

#include "isoquant/sheet/arguments/argument_names.hpp"

#include <vector>

namespace isoquant::addin {

// Arguments shared by PRODFIT and PRODSTAT.
inline constexpr ArgumentInfo outputArgument{
    argument::output,
    "Output of each row (plant, branch or period): one column of positive numbers. A first row of text is "
    "read as a header."};
inline constexpr ArgumentInfo inputsArgument{
    argument::inputs,
    "Inputs of each row, one column per input (labour, capital, …), positive numbers, as many rows as "
    "output. A first row of text names the inputs."};
inline constexpr ArgumentInfo formArgument{
    argument::form, "Functional form: \"cobb-douglas\" (default), \"ces\" (exactly two inputs, by nonlinear least "
                    "squares) or \"translog\"."};
inline constexpr ArgumentInfo constantReturnsArgument{
    argument::constantReturns, "TRUE to impose constant returns to scale (exponents summing to 1); FALSE or empty to "
                               "estimate them freely."};
inline constexpr ArgumentInfo errorsArgument{
    argument::errors, "Standard errors: \"classical\" (default), \"hc1\" or \"hc3\" (robust to heteroskedasticity), or "
                      "\"cluster\" (robust within each group of the groups argument; tests then use G - 1 degrees of "
                      "freedom for G groups)."};
inline constexpr ArgumentInfo levelArgument{
    argument::level,
    "Confidence level of the bounds and of the returns-to-scale verdict, between 0 and 1 (default 0.95)."};
inline constexpr ArgumentInfo controlsArgument{
    argument::controls, "Optional extra columns entered as they are, not logged (a rate, a 0/1 dummy), as many rows as "
                        "output."};
inline constexpr ArgumentInfo groupsArgument{
    argument::groups,
    "Optional column naming the plant or firm of each row (numbers or texts), as many rows as output, "
    "a header row allowed. Needed for effects and for \"cluster\" errors."};
inline constexpr ArgumentInfo effectsArgument{
    argument::effects, "\"none\" (default: groups only define clusters), \"fixed\" (one effect per group, within "
                       "estimator) or \"two-way\" (group and period effects; the periods come from trend)."};
inline constexpr ArgumentInfo trendArgument{
    argument::trend, "Optional column of periods (years), as many rows as output: adds a time trend, reported as the "
                     "rate of technical change per period (per day for dates: use =YEAR(date) for years). With "
                     "\"two-way\" effects it gives the periods instead."};
inline constexpr ArgumentInfo incompleteRowsArgument{
    argument::incompleteRows,
    "TRUE to leave out rows with a blank or text cell (the table counts them); FALSE or empty: "
    "such a cell is an error. Empty rows below the data end it either way (whole columns "
    "work). A cell with an error value (#N/A) stops Calc before the call (Err:504)."};
// The optional last argument of PRODGROWTH and PRODINDEX.
inline constexpr ArgumentInfo periodNamesArgument{
    argument::periods, "Optional: the year or name of each period (numbers or texts), as many rows as the periods, a "
                       "header row allowed. They label the table's rows and the messages instead of 2, 3, …."};
inline constexpr ArgumentInfo modelArgument{
    argument::model,
    "A PRODFIT table, or a table typed by hand, labels in the first column and values in the second. "
    "Row 1: form | cobb-douglas (or ces, translog). Row 2: A | value (or ln A | value). Cobb-douglas: "
    "then one row per input, its label | its exponent. Ces: then delta, sigma (or rho) and nu rows, and "
    "optionally a row inputs | label 1 | label 2. Translog: then one row per input (label | first-order "
    "coefficient) and one per pair i <= j (label*label | coefficient, 0 without interaction). An "
    "optional smearing factor row serves PRODOUTPUT's mean."};
inline constexpr ArgumentInfo bundlesArgument{
    argument::inputs,
    "One row of input values in the model's input order, or several rows: the result is then a column "
    "with one value per row."};
inline constexpr ArgumentInfo inputArgument{argument::input, "Which input: its number (1 for the first) or its label."};
// The evaluators' optional last argument (issue 20).
inline constexpr ArgumentInfo boundsArgument{
    argument::what,
    "\"value\" (default), \"std. error\", \"lower bound\" or \"upper bound\": by the delta method from the "
    "covariance block of a PRODFIT table made with covariance TRUE, at its level and t distribution; output, "
    "marginal products, least-cost and budget amounts, TFP and rates of substitution get bounds on the log "
    "scale. "
    "Every form: cobb-douglas, translog and ces."};

// Arguments shared by the decision functions.
inline constexpr ArgumentInfo firstInputArgument{argument::firstInput,
                                          "The first input: its number (1 for the first) or its label."};
inline constexpr ArgumentInfo secondInputArgument{argument::secondInput, "The second input: its number or its label."};
inline constexpr ArgumentInfo targetArgument{argument::targetOutput, "The output to be produced, a positive number."};
inline constexpr ArgumentInfo pricesArgument{
    argument::inputPrices, "One positive price per input, in the model's input order: a row of prices gives a row of "
                           "results, a column of prices a column."};

// The families, in the order of the table.
std::vector<FunctionInfo> productionFitFunctions();
std::vector<FunctionInfo> evaluatorFunctions();
std::vector<FunctionInfo> growthFunctions();
std::vector<FunctionInfo> shapeFunctions();
std::vector<FunctionInfo> decisionFunctions();
std::vector<FunctionInfo> costModelFunctions();
std::vector<FunctionInfo> costFitFunctions();
std::vector<FunctionInfo> efficiencyFunctions();

} // namespace isoquant::addin
