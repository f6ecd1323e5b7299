#include "function_table.hxx"

#include "isoquant/text.hpp"

namespace isoquant::addin {

namespace {

// Arguments shared by PRODFIT and PRODSTAT.
constexpr ArgumentInfo outputArgument{
    "output", "Output of each row (plant, branch or period): one column of positive numbers. A first row of text is "
              "read as a header."};
constexpr ArgumentInfo inputsArgument{
    "inputs", "Inputs of each row, one column per input (labour, capital, …), positive numbers, as many rows as "
              "output. A first row of text names the inputs."};
constexpr ArgumentInfo formArgument{
    "form", "Functional form: \"cobb-douglas\" (default), \"ces\" (exactly two inputs, by nonlinear least "
            "squares) or \"translog\"."};
constexpr ArgumentInfo constantReturnsArgument{
    "constant returns", "TRUE to impose constant returns to scale (exponents summing to 1); FALSE or empty to "
                        "estimate them freely."};
constexpr ArgumentInfo errorsArgument{
    "errors", "Standard errors: \"classical\" (default), \"hc1\" or \"hc3\" (robust to heteroskedasticity)."};
constexpr ArgumentInfo levelArgument{
    "level", "Confidence level of the bounds and of the returns-to-scale verdict, between 0 and 1 (default 0.95)."};
constexpr ArgumentInfo controlsArgument{
    "controls", "Optional extra columns entered as they are, not logged (a rate, a 0/1 dummy), as many rows as "
                "output."};
constexpr ArgumentInfo modelArgument{
    "model", "A PRODFIT table, or a typed table of labels and values: a form row (cobb-douglas, ces or "
             "translog), ln A (or A), then the form's parameter rows (see the README)."};
constexpr ArgumentInfo bundlesArgument{
    "inputs", "One row of input values in the model's input order, or several rows: the result is then a column "
              "with one value per row."};
constexpr ArgumentInfo inputArgument{"input", "Which input: its number (1 for the first) or its label."};

} // namespace

const std::vector<FunctionInfo>& functionTable()
{
    static const std::vector<FunctionInfo> table{
        {"prodFit", "PRODFIT",
         "Fits a production function to output and inputs by least squares on logs. Returns a table (enter as an "
         "array formula): estimates with standard errors, t, p-values and confidence bounds, fit statistics, "
         "returns to scale with the test that it equals 1, and a verdict.",
         {outputArgument, inputsArgument, formArgument, constantReturnsArgument, errorsArgument, levelArgument,
          controlsArgument}},
        {"prodStat", "PRODSTAT",
         "One value of the PRODFIT table, looked up by row and column label, without an array formula.",
         {outputArgument, inputsArgument,
          {"row label", "A row of the table: ln A, an input's label, R2, adjusted R2, residual SD, F, "
                        "log-likelihood, AIC, BIC, returns to scale, verdict, observations…"},
          {"column label", "estimate (default), std. error, t, p-value, low or high."},
          formArgument, constantReturnsArgument, errorsArgument, levelArgument, controlsArgument}},
        {"prodOutput", "PRODOUTPUT", "Output the model predicts for each row of inputs.", {modelArgument, bundlesArgument}},
        {"prodMarginal", "PRODMARGINAL",
         "Marginal product of one input for each row of inputs: the extra output from one more unit of it.",
         {modelArgument, bundlesArgument, inputArgument}},
        {"prodElasticity", "PRODELASTICITY",
         "Output elasticity of one input for each row of inputs: the % change in output per 1% more of it.",
         {modelArgument, bundlesArgument, inputArgument}},
        {"prodScale", "PRODSCALE",
         "Returns to scale: the % change in output when every input rises by 1% (the sum of the elasticities).",
         {modelArgument,
          {"inputs", "Optional rows of input values: the result is then a column with one value per row."}}},
        {"prodReturns", "PRODRETURNS",
         "Verdict on returns to scale: increasing, constant or decreasing, by the test of returns to scale = 1 at "
         "the given level. A typed model without standard errors is judged by its returns to scale alone.",
         {modelArgument, {"level", "Confidence level of the test, between 0 and 1 (default 0.95)."}}},
        {"prodRegular", "PRODREGULAR",
         "Whether the model is regular at each row of inputs: \"regular\" when every marginal product is positive "
         "and the isoquants are convex (bordered Hessian test), otherwise which condition fails.",
         {modelArgument, bundlesArgument}},
        {"prodCompare", "PRODCOMPARE",
         "Fits the cobb-douglas, ces and translog forms to the same rows and returns a table (enter as an array "
         "formula, 8 rows by 7 columns): log-likelihood, AIC and BIC with ranks, the F test of cobb-douglas within "
         "translog and the likelihood-ratio test of cobb-douglas within ces (rho = 0).",
         {outputArgument, inputsArgument,
          {"level", "Level of the verdicts on the nested tests, between 0 and 1 (default 0.95)."}}},
    };
    return table;
}

const FunctionInfo* findByProgrammaticName(std::string_view name)
{
    for (const auto& function : functionTable())
        if (function.programmaticName == name) return &function;
    return nullptr;
}

const FunctionInfo* findByDisplayName(std::string_view name)
{
    for (const auto& function : functionTable())
        if (equalsIgnoringCase(function.displayName, name)) return &function;
    return nullptr;
}

} // namespace isoquant::addin
