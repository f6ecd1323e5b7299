// The rows of the function table (function_table.cxx), one function per family: fitting, evaluating, productivity and growth, the shape of a technology.
#include "function_arguments.hxx"

namespace isoquant::addin {

// PRODFIT, PRODSTAT and PRODVALUE.
std::vector<FunctionInfo> productionFitFunctions()
{
    return {
        {"prodFit",
         "PRODFIT",
         "Fits a production function to output and inputs by least squares on logs. Returns a table (enter as an "
         "array formula): estimates with standard errors, t, p-values and confidence bounds, fit statistics, "
         "returns to scale with the test that it equals 1, and a verdict.",
         {outputArgument,
          inputsArgument,
          formArgument,
          constantReturnsArgument,
          errorsArgument,
          levelArgument,
          controlsArgument,
          groupsArgument,
          effectsArgument,
          trendArgument,
          incompleteRowsArgument,
          {argument::covariance,
           "TRUE to add below the table the estimated covariance matrix of the parameters (of the "
           "kind chosen by errors), one row per parameter, for bounds on derived numbers; the table is "
           "then max(7, q + 1) columns wide and 1 + q rows longer, q = p parameters (cobb-douglas 1 + k + m, "
           "translog 1 + k + k(k+1)/2 + m, ces 4), plus 1 for the row of the ln A the evaluators use when "
           "controls, effects or a trend shift it, and 1 for the trend's technical change per period. FALSE or "
           "empty: no block."}}},
        {"prodStat",
         "PRODSTAT",
         "One value of the PRODFIT table, looked up by row and column label, without an array formula.",
         {outputArgument,
          inputsArgument,
          {argument::rowLabel, "A row of the table: ln A, an input's label, R2, adjusted R2, residual SD, F, "
                               "log-likelihood, AIC, BIC, returns to scale, verdict, observations, smearing factor…; "
                               "with effects also \"effect of group <label>\" (and \"effect of period <year>\")."},
          {argument::columnLabel, "value (default), std. error, t, p-value, lower bound or upper bound."},
          formArgument,
          constantReturnsArgument,
          errorsArgument,
          levelArgument,
          controlsArgument,
          groupsArgument,
          effectsArgument,
          trendArgument,
          incompleteRowsArgument}},
        {"prodValue",
         "PRODVALUE",
         "One value of a table already on the sheet (PRODFIT, PRODCOSTFIT, …), looked up by row and column label: "
         "the quick way to show figures of one fit in many cells.",
         {{argument::table,
           "The whole table as the fitting function returned it, header row included, e.g. $I$1:$O$17."},
          {argument::rowLabel, "A row of the table: ln A, an input's label, R2, residual SD, F, AIC, returns to scale, "
                               "verdict, observations, smearing factor…"},
          {argument::columnLabel,
           "A word of the table's header row: value (default), std. error, t, p-value, lower bound "
           "or upper bound."}}},
    };
}

// The evaluators of a model: output, marginal products, elasticities, returns to scale.
std::vector<FunctionInfo> evaluatorFunctions()
{
    return {
        {"prodOutput",
         "PRODOUTPUT",
         "Output the model predicts for each row of inputs.",
         {modelArgument,
          bundlesArgument,
          {argument::mean,
           "TRUE for the mean prediction (the median times the table's smearing factor); FALSE or empty "
           "for the median prediction, exp of the fitted log."},
          {argument::what,
           "As for PRODMARGINAL (\"value\", \"std. error\", \"lower bound\", \"upper bound\"), and "
           "\"prediction lower\" or \"prediction upper\": the interval for one new plant's output, adding the "
           "residual variance."}}},
        {"prodMarginal",
         "PRODMARGINAL",
         "Marginal product of one input for each row of inputs: the extra output from one more unit of it.",
         {modelArgument, bundlesArgument, inputArgument, boundsArgument}},
        {"prodElasticity",
         "PRODELASTICITY",
         "Output elasticity of one input for each row of inputs: the % change in output per 1% more of it.",
         {modelArgument, bundlesArgument, inputArgument, boundsArgument}},
        {"prodScale",
         "PRODSCALE",
         "Returns to scale: the % change in output when every input rises by 1% (the sum of the elasticities).",
         {modelArgument,
          {argument::inputs, "Optional rows of input values: the result is then a column with one value per row."},
          boundsArgument}},
        {"prodReturns",
         "PRODRETURNS",
         "Verdict on returns to scale: increasing, constant or decreasing, by the test of returns to scale = 1 at "
         "the given level. A typed model without standard errors is judged by its returns to scale alone; a ces "
         "table without a test (boundary, not converged, not identified) gives its own \"not tested (...)\".",
         {modelArgument, {argument::level, "Confidence level of the test, between 0 and 1 (default 0.95)."}}},
    };
}

// Productivity and growth.
std::vector<FunctionInfo> growthFunctions()
{
    return {
        {"prodTfp",
         "PRODTFP",
         "Total factor productivity of each row: observed output divided by the output the model predicts from that "
         "row's inputs (1 = exactly as predicted). A column, one value per row. On the rows a PRODFIT table was "
         "fitted to, the geometric mean is 1 (with a trend, when periods is given).",
         {modelArgument,
          outputArgument,
          {argument::inputs,
           "Inputs of each row in the model's input order, as many rows as output. A first row of text "
           "names the inputs."},
          {argument::periods,
           "Optional, for a model with a trend: the period (year) of each row, as many rows as output. "
           "Each row is then compared with its own period's technology: ln A + technical change per "
           "period × (period - latest period)."},
          boundsArgument}},
        {"prodGrowth",
         "PRODGROWTH",
         "Growth accounting from one period to the next: output growth split into each input's contribution, a "
         "scale effect and TFP growth (the residual), in log differences, plus a total row. Returns a table (enter "
         "as an array formula). TFP growth excludes the scale effect: the Solow residual (output growth minus the "
         "contributions) = scale effect + TFP growth.",
         {{argument::output,
           "Output of each period, in time order: one column of positive numbers. A first row of text is "
           "read as a header."},
          {argument::inputs,
           "Input quantities of each period, one column per input, positive, as many periods as output. "
           "A first row of text names the inputs."},
          {argument::weights,
           "A model (a PRODFIT table or a typed model: its elasticities at each period's inputs) or cost "
           "shares of the inputs, one column per input and one row per period, each row summing to 1 "
           "within 0.01 (rescaled to exactly 1; fractions, not percent). A header such as \"labour "
           "share\" names the input."},
          {argument::method,
           "\"tornqvist\" (default: weights averaged over adjacent periods) or \"fixed\" (the constant "
           "elasticities of a cobb-douglas model)."},
          periodNamesArgument}},
        {"prodIndex",
         "PRODINDEX",
         "Chained quantity index of several inputs weighted by their cost shares: one value per period, the first "
         "period = 1 unless a base is given.",
         {{argument::quantities, "Quantities of each period, one column per input, positive. A first row of text names "
                                 "them."},
          {argument::shares,
           "Cost shares of the inputs in each period, the same shape as quantities, each row summing to 1 "
           "within 0.01 (rescaled to exactly 1; fractions, not percent). A header such as \"labour "
           "share\" names the input."},
          {argument::method, "\"tornqvist\" (default), \"laspeyres\", \"paasche\" or \"fisher\"."},
          {argument::base,
           "Value of the index in the first period, a positive number (default 1; 100 for percentages)."},
          periodNamesArgument}},
    };
}

// The shape of a technology: regularity, form comparison, second derivatives, substitution.
std::vector<FunctionInfo> shapeFunctions()
{
    return {
        {"prodRegular",
         "PRODREGULAR",
         "Whether the model is regular at each row of inputs: \"regular\" when every marginal product is positive "
         "and the isoquants are convex (bordered Hessian test), otherwise which condition fails. With a cost "
         "model (as for PRODCOST) each row holds the output then one price per input: \"regular\" when every "
         "fitted cost share is positive and cost is concave in prices.",
         {modelArgument,
          {argument::inputs,
           "One row of input values in the model's input order, or several rows: the result is then a "
           "column with one value per row. With a cost model: the output, then the prices."}}},
        {"prodCompare",
         "PRODCOMPARE",
         "Fits the cobb-douglas, ces and translog forms to the same rows and returns a table (enter as an array "
         "formula, 8 rows by 7 columns): log-likelihood, AIC and BIC with ranks, the F test of cobb-douglas within "
         "translog and the likelihood-ratio test of cobb-douglas within ces (rho = 0). AIC = -2LL + 2p and "
         "BIC = -2LL + p ln n, p the parameters column (sigma squared not counted).",
         {outputArgument,
          inputsArgument,
          {argument::level, "Level of the verdicts on the nested tests, between 0 and 1 (default 0.95)."}}},
        {"prodSecond",
         "PRODSECOND",
         "Second partial derivative of output for each row of inputs: how the marginal product of input i changes "
         "with one more unit of input j (of input i itself when j is omitted).",
         {modelArgument,
          bundlesArgument,
          firstInputArgument,
          {argument::secondInput, "Optional second input: its number or its label. Omitted: the same as input i."},
          boundsArgument}},
        {"prodInputReturns",
         "PRODINPUTRETURNS",
         "Returns to one input alone for each row of inputs: diminishing, constant or increasing, by whether its "
         "marginal product falls, stays or rises as more of it is used, the other inputs held. Says so where the "
         "marginal product is not positive.",
         {modelArgument, bundlesArgument, inputArgument}},
        {"prodPair",
         "PRODPAIR",
         "Technical relation of two inputs for each row of inputs: complements when more of one raises the "
         "marginal product of the other, substitutes when it lowers it, independent when it leaves it unchanged. "
         "Not the Allen notion: two-input Cobb-Douglas inputs are technical complements yet Allen substitutes "
         "(elasticity 1).",
         {modelArgument, bundlesArgument, firstInputArgument, secondInputArgument}},
        {"prodMrts",
         "PRODMRTS",
         "Marginal rate of technical substitution for each row of inputs: the units of input j that one more unit "
         "of input i replaces at unchanged output (marginal product of i over that of j).",
         {modelArgument, bundlesArgument, firstInputArgument, secondInputArgument, boundsArgument}},
        {"prodSubstitution",
         "PRODSUBSTITUTION",
         "Elasticity of substitution between inputs i and j for each row of inputs: the % change in the ratio of "
         "the two inputs per 1% change in their relative price along the isoquant.",
         {modelArgument,
          bundlesArgument,
          firstInputArgument,
          secondInputArgument,
          {argument::kind, "\"direct\" (default), \"allen\" or \"morishima\" (not symmetric: i and j in the order "
                           "given)."},
          {argument::what,
           "\"value\" (default), \"std. error\", \"lower bound\" or \"upper bound\", as for PRODMRTS. The "
           "cobb-douglas form fixes every elasticity of substitution at 1: std. error 0, both bounds 1; translog "
           "and ces: value -/+ t times the std. error."}}},
    };
}

} // namespace isoquant::addin
