#include "isoquant/production_fit.hpp"

#include "isoquant/ces_fit.hpp"
#include "isoquant/distributions.hpp"
#include "isoquant/input_error.hpp"
#include "isoquant/text.hpp"
#include "isoquant/translog_fit.hpp"

#include <cmath>
#include <limits>

namespace isoquant {

namespace {

constexpr double notANumber = std::numeric_limits<double>::quiet_NaN();

// The regression behind a Cobb-Douglas fit, and how to map its parameters θ back to
// β = (ln A, b₁…b_k, c₁…c_m):  β = transform·θ + offset.
struct LogLinearDesign {
    Eigen::MatrixXd design;
    Eigen::VectorXd response;
    Eigen::MatrixXd transform;
    Eigen::VectorXd offset;
};

LogLinearDesign buildDesign(const ProductionData& data, bool constantReturns)
{
    const Eigen::Index n = data.output.size();
    const Eigen::Index k = data.inputs.cols();
    const Eigen::Index m = data.controls.cols();
    const Eigen::MatrixXd logInputs = data.inputs.array().log().matrix();
    const Eigen::Index slopes = constantReturns ? k - 1 : k;

    LogLinearDesign built;
    built.design.resize(n, 1 + slopes + m);
    built.design.col(0).setOnes();
    built.response = data.output.array().log().matrix();
    built.transform = Eigen::MatrixXd::Zero(1 + k + m, 1 + slopes + m);
    built.offset = Eigen::VectorXd::Zero(1 + k + m);
    built.transform(0, 0) = 1.0;
    for (Eigen::Index j = 0; j < m; ++j) built.transform(1 + k + j, 1 + slopes + j) = 1.0;
    built.design.rightCols(m) = data.controls;

    if (!constantReturns) {
        built.design.middleCols(1, k) = logInputs;
        for (Eigen::Index i = 0; i < k; ++i) built.transform(1 + i, 1 + i) = 1.0;
        return built;
    }
    // ln(Y/x_k) = ln A + Σ_{i<k} bᵢ ln(xᵢ/x_k) + …, and b_k = 1 − Σ_{i<k} bᵢ.
    const Eigen::VectorXd lastLog = logInputs.col(k - 1);
    built.response -= lastLog;
    for (Eigen::Index i = 0; i < slopes; ++i) {
        built.design.col(1 + i) = logInputs.col(i) - lastLog;
        built.transform(1 + i, 1 + i) = 1.0;
        built.transform(k, 1 + i) = -1.0;
    }
    built.offset(k) = 1.0;
    return built;
}

std::string listOfNames(const std::vector<std::string>& names)
{
    std::string text;
    for (std::size_t i = 0; i < names.size(); ++i) {
        if (i > 0) text += i + 1 == names.size() ? " and " : ", ";
        text += names[i];
    }
    return text;
}

// Names the inputs and controls behind collinear design columns, in the user's labels.
std::string collinearityMessage(const ProductionData& data, bool constantReturns,
                                const std::vector<Eigen::Index>& columns)
{
    const auto k = static_cast<Eigen::Index>(data.inputLabels.size());
    const Eigen::Index slopes = constantReturns ? k - 1 : k;
    bool withConstant = false;
    std::vector<std::string> names;
    std::size_t inputs = 0;
    std::size_t controls = 0;
    for (const Eigen::Index column : columns) {
        if (column == 0) {
            withConstant = true;
        } else if (column <= slopes) {
            names.push_back(quoted(data.inputLabels[static_cast<std::size_t>(column - 1)]));
            ++inputs;
        } else {
            names.push_back("control " + quoted(data.controlLabels[static_cast<std::size_t>(column - 1 - slopes)]));
            ++controls;
        }
    }
    const std::string argument = controls == 0 ? "inputs" : inputs == 0 ? "controls" : "inputs and controls";
    const std::string note =
        constantReturns ? " (as ratios to " + quoted(data.inputLabels.back()) + ", since constant returns are imposed)" : "";
    if (names.empty()) return "inputs: the data cannot identify ln A" + note;
    if (withConstant && names.size() == 1)
        return argument + ": " + names.front() + note + " does not vary, so it cannot be told apart from ln A";
    return argument + ": " + listOfNames(names) + (withConstant ? " together with ln A" : "") + note +
           " are collinear (inputs taken in logs); drop one of them";
}

ReturnsToScale returnsToScale(const ProductionFit& fit, const LeastSquaresResult& regression, Eigen::Index k,
                              bool constantReturns, double confidenceLevel)
{
    ReturnsToScale returns;
    returns.estimate = fit.estimates.segment(1, k).sum();
    if (constantReturns) {
        returns.imposed = true;
        returns.standardError = 0.0;
        returns.fStatistic = notANumber;
        returns.pValue = notANumber;
        returns.verdict = classifyReturnsToScale(returns.estimate, returns.pValue, confidenceLevel, true);
        return returns;
    }
    returns.standardError = std::sqrt(fit.covariance.block(1, 1, k, k).sum());
    Eigen::MatrixXd restriction = Eigen::MatrixXd::Zero(1, regression.parameters);
    restriction.block(0, 1, 1, k).setOnes();
    const WaldTest test = testLinearRestrictions(regression, restriction, Eigen::VectorXd::Ones(1));
    // An exact fit leaves nothing to test: the verdict then follows ν alone.
    const bool testable = regression.status != FitStatus::perfectFit;
    returns.fStatistic = testable ? test.fStatistic : notANumber;
    returns.pValue = testable ? test.pValue : notANumber;
    returns.verdict = classifyReturnsToScale(returns.estimate, returns.pValue, confidenceLevel, false);
    return returns;
}

} // namespace

std::string classifyReturnsToScale(double estimate, double pValue, double level, bool imposed)
{
    if (imposed) return "constant (imposed)";
    // Without a test, ν within this distance of 1 counts as 1: typed or exact-fit exponents carry rounding.
    constexpr double untestedTolerance = 1e-9;
    if (std::isnan(pValue)) {
        if (std::fabs(estimate - 1.0) <= untestedTolerance) return "constant";
        return estimate > 1 ? "increasing" : "decreasing";
    }
    if (pValue >= 1.0 - level) return "constant";
    return estimate > 1 ? "increasing" : "decreasing";
}

ProductionFit fitProduction(const ProductionData& data, const ProductionFitOptions& options)
{
    if (options.form == ProductionForm::ces) return fitCes(data, options);
    if (options.form == ProductionForm::translog) return fitTranslog(data, options);
    const Eigen::Index n = data.output.size();
    const Eigen::Index k = data.inputs.cols();
    const Eigen::Index m = data.controls.cols();
    if (k < 1) throw InputError("inputs: needs at least one column");

    const Eigen::VectorXd logOutput = data.output.array().log().matrix();
    const double totalSumOfSquares = (logOutput.array() - logOutput.mean()).matrix().squaredNorm();
    // Compared on the data, not on TSS: the mean of equal logs need not round back exactly.
    if (data.output.maxCoeff() == data.output.minCoeff())
        throw InputError("output: every row holds the same value; there is no variation to explain");

    const LogLinearDesign built = buildDesign(data, options.constantReturns);
    const Eigen::Index p = built.design.cols();
    if (n < p + 1)
        throw InputError("too few rows: output and inputs have " + std::to_string(n) + " rows of data for " +
                         std::to_string(p) + " parameters to estimate; need at least " + std::to_string(p + 1));

    LeastSquaresOptions regressionOptions;
    regressionOptions.covariance = options.covariance;
    regressionOptions.confidenceLevel = options.confidenceLevel;
    ProductionFit fit;
    try {
        fit.regression = fitLeastSquares(built.design, built.response, 0, regressionOptions);
    } catch (const CollinearColumns& collinear) {
        throw InputError(collinearityMessage(data, options.constantReturns, collinear.columns()));
    }
    const LeastSquaresResult& regression = fit.regression;

    fit.form = options.form;
    fit.inputLabels = data.inputLabels;
    fit.controlLabels = data.controlLabels;
    fit.status = regression.status;
    fit.estimates = built.transform * regression.coefficients + built.offset;
    fit.covariance = built.transform * regression.covariance * built.transform.transpose();
    fit.standardErrors = fit.covariance.diagonal().cwiseSqrt();
    fit.tStatistics = fit.estimates.cwiseQuotient(fit.standardErrors);
    const double df = regression.residualDegreesOfFreedom;
    const double critical = studentCriticalValue(options.confidenceLevel, df);
    fit.pValues.resize(fit.estimates.size());
    for (Eigen::Index j = 0; j < fit.estimates.size(); ++j)
        fit.pValues(j) = studentTwoSidedPValue(fit.tStatistics(j), df);
    fit.lowerBounds = fit.estimates - critical * fit.standardErrors;
    fit.upperBounds = fit.estimates + critical * fit.standardErrors;

    fit.rSquared = 1.0 - regression.residualSumOfSquares / totalSumOfSquares;
    fit.adjustedRSquared = 1.0 - (1.0 - fit.rSquared) * static_cast<double>(n - 1) / df;

    fit.returns = returnsToScale(fit, regression, k, options.constantReturns, options.confidenceLevel);
    fit.logScaleAtControlMeans = fit.estimates(0);
    if (m > 0) fit.logScaleAtControlMeans += data.controls.colwise().mean().dot(fit.estimates.tail(m));
    return fit;
}

} // namespace isoquant
