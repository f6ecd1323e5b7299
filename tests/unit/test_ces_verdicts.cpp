// The ces fit where it has no test of ν = 1 (a boundary optimum, no convergence, an optimum that is
// not identified) and the bounds of σ; the data the ces fit refuses as the other forms do.
// Property tests on invented data (seeded, generated_data.hpp): what is checked is the report's
// logic, so no outside figures (scipy's optimum near fixed proportions is in test_forms_cross_check).
#include "isoquant/math/forms/ces.hpp"
#include "isoquant/math/fits/ces_fit.hpp"
#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/math/forms/cobb_douglas.hpp"
#include "isoquant/sheet/tables/fit_table.hpp"
#include "isoquant/sheet/functions/form_comparison.hpp"
#include "isoquant/sheet/models/production_model.hpp"
#include "cell_tables.hpp"
#include "generated_data.hpp"
#include "input_error_message.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>

using isoquant::Cell;
using isoquant::testing::generate;

namespace {

// Rows of the ces table (form_tables.hpp).
constexpr std::size_t sigmaRow = 5, verdictRow = 15, formRow = 16, convergenceRow = 17;

isoquant::ProductionFitOptions cesOptions()
{
    isoquant::ProductionFitOptions options;
    options.form = isoquant::ProductionForm::ces;
    return options;
}

Cell text(const char* value) { return Cell(std::string(value)); }

// The verdict in the table, and PRODRETURNS on that table, both read `expected`.
void requireVerdict(const isoquant::ProductionFit& fit, const std::string& expected)
{
    BOOST_TEST(fit.returns.verdict == expected);
    const isoquant::CellTable table = isoquant::fitTable(fit);
    BOOST_TEST((table.at(verdictRow, 0) == text("verdict")));
    BOOST_TEST((table.at(verdictRow, 1) == Cell(expected)));
    BOOST_TEST(isoquant::returnsVerdictCell(table, Cell{}) == expected);
    BOOST_TEST((table.at(14, 4) == text("n/a"))); // no p-value of ν = 1
}

// The sigma row: estimate (a number, or "n/a"), then everything else empty or "n/a".
void requireSigmaRow(const isoquant::CellTable& table, const Cell& estimate, const Cell& second)
{
    BOOST_TEST((table.at(sigmaRow, 0) == text("sigma")));
    BOOST_TEST((table.at(sigmaRow, 1) == estimate));
    BOOST_TEST((table.at(sigmaRow, 2) == second));
}

isoquant::FitArguments argumentsOf(const isoquant::ProductionData& data)
{
    isoquant::FitArguments arguments;
    arguments.output = isoquant::testing::numberRange(data.output, {"y"});
    arguments.inputs = isoquant::testing::numberRange(data.inputs, data.inputLabels);
    return arguments;
}

std::string messageFor(isoquant::FitArguments arguments, const char* form)
{
    arguments.form = std::string(form);
    return isoquant::testing::messageOf([&] { isoquant::fitFromArguments(arguments); });
}

} // namespace

BOOST_AUTO_TEST_SUITE(ces_verdicts)

BOOST_AUTO_TEST_CASE(at_a_weight_boundary_nu_is_not_tested_and_sigma_is_not_identified)
{
    // Output rising with one input and falling with the other: outside the CES family, whose
    // δ ∈ [0, 1] gives no input a negative elasticity, so the optimum is δ = 1 or δ = 0.
    const isoquant::CobbDouglas firstOnly(0.2, Eigen::Vector2d(0.8, -0.15));
    const isoquant::CobbDouglas secondOnly(0.2, Eigen::Vector2d(-0.15, 0.8));
    const auto atOne = isoquant::fitCes(generate(firstOnly, 120, 301), cesOptions());
    const auto atZero = isoquant::fitCes(generate(secondOnly, 120, 303), cesOptions());
    BOOST_TEST((atOne.ces->boundary == isoquant::CesBoundary::firstInputOnly));
    BOOST_TEST((atZero.ces->boundary == isoquant::CesBoundary::secondInputOnly));
    for (const auto* fit : {&atOne, &atZero}) {
        requireVerdict(*fit, "not tested (boundary)");
        BOOST_TEST(std::isnan(fit->ces->substitutionElasticity)); // ρ is not identified, nor is σ
        const isoquant::CellTable table = isoquant::fitTable(*fit);
        requireSigmaRow(table, text("n/a"), text("n/a"));
        BOOST_TEST((table.at(sigmaRow, 5) == text("n/a")));
        BOOST_TEST((table.at(sigmaRow, 6) == text("n/a")));
    }
}

BOOST_AUTO_TEST_CASE(at_perfect_substitutes_and_at_fixed_proportions_nu_is_not_tested)
{
    // Inputs more than perfect substitutes (data from ρ = −1.5): the optimum is ρ = −1, σ infinite.
    const auto substitutes = isoquant::fitCes(generate(isoquant::Ces(0.2, 0.4, -1.5, 1.0), 120, 302), cesOptions());
    BOOST_TEST((substitutes.ces->boundary == isoquant::CesBoundary::perfectSubstitutes));
    requireVerdict(substitutes, "not tested (boundary)");
    const isoquant::CellTable substitutesTable = isoquant::fitTable(substitutes);
    requireSigmaRow(substitutesTable, text("n/a"), text("boundary"));
    BOOST_TEST((substitutesTable.at(sigmaRow, 5) == Cell{}));

    // Data from ρ = 10⁸ (fixed proportions): the solver stops near ρ = 2900, where the sum of squares
    // is flat; with the boundary distance raised to 10⁻³ that is σ < 10⁻³, the fixed-proportions edge.
    isoquant::CesFitOptions wide;
    wide.boundaryDistance = 1e-3;
    const auto fixed =
        isoquant::fitCes(generate(isoquant::Ces(0.2, 0.5, 1e8, 1.0), 120, 304, 0.02), cesOptions(), wide);
    BOOST_TEST_REQUIRE((fixed.ces->boundary == isoquant::CesBoundary::fixedProportions));
    requireVerdict(fixed, "not tested (boundary)");
    const isoquant::CellTable fixedTable = isoquant::fitTable(fixed);
    // σ = 1/(1+ρ) at the ρ reached, marked as a boundary value, with no bounds.
    requireSigmaRow(fixedTable, Cell(1 / (1 + fixed.inference.estimates(2))), text("boundary"));
    BOOST_TEST(fixed.ces->substitutionElasticity < 1e-3);
    BOOST_TEST((fixedTable.at(sigmaRow, 5) == Cell{}));
    BOOST_TEST(fixedTable.text(formRow, 2).find("fixed proportions") != std::string::npos);
}

BOOST_AUTO_TEST_CASE(without_convergence_nu_is_not_tested)
{
    isoquant::CesFitOptions stopped;
    stopped.solver.maximumEvaluations = 2;
    const auto fit = isoquant::fitCes(generate(isoquant::Ces(0.2, 0.4, 0.5, 0.9), 60, 305), cesOptions(), stopped);
    BOOST_TEST((fit.status.is(isoquant::FitStatusKind::notConverged)));
    requireVerdict(fit, "not tested (not converged)");
    const isoquant::CellTable table = isoquant::fitTable(fit);
    // σ = 1/(1+ρ) at the last point, without standard error or bounds.
    requireSigmaRow(table, Cell(1 / (1 + fit.inference.estimates(2))), text("n/a"));
    BOOST_TEST((table.at(sigmaRow, 5) == text("n/a")));
    BOOST_TEST((table.at(sigmaRow, 6) == text("n/a")));
}

BOOST_AUTO_TEST_CASE(sigma_bounds_are_the_bounds_of_rho_transformed)
{
    // Data from ρ = 3 with much noise (SD 0.4, 20 rows): ρ is estimated loosely.
    const isoquant::Ces truth(0.2, 0.5, 3.0, 1.0);
    const auto loose = isoquant::fitCes(generate(truth, 20, 2, 0.4), cesOptions());
    BOOST_TEST_REQUIRE((loose.status.converged()));
    BOOST_TEST_REQUIRE(loose.inference.lowerBounds(2) > -1);
    BOOST_TEST(loose.ces->substitutionLowerBound == 1 / (1 + loose.inference.upperBounds(2)));
    BOOST_TEST(loose.ces->substitutionUpperBound == 1 / (1 + loose.inference.lowerBounds(2)));
    // Not symmetric about σ: σ = 1/(1+ρ) is convex in ρ.
    BOOST_TEST(loose.ces->substitutionUpperBound - loose.ces->substitutionElasticity >
               loose.ces->substitutionElasticity - loose.ces->substitutionLowerBound);

    // Here the low bound of ρ is below −1: σ has no upper bound ("n/a"), and its lower bound stays
    // positive where σ − t·se(σ) (the delta-method interval) would be negative.
    const auto wider = isoquant::fitCes(generate(truth, 20, 6, 0.4), cesOptions());
    BOOST_TEST_REQUIRE(wider.inference.lowerBounds(2) < -1);
    const double critical = (wider.inference.upperBounds(2) - wider.inference.estimates(2)) / wider.inference.standardErrors(2);
    BOOST_TEST(wider.ces->substitutionElasticity - critical * wider.ces->substitutionStandardError < 0);
    BOOST_TEST(wider.ces->substitutionLowerBound > 0);
    BOOST_TEST(std::isinf(wider.ces->substitutionUpperBound));
    const isoquant::CellTable table = isoquant::fitTable(wider);
    BOOST_TEST((table.at(sigmaRow, 5) == Cell(wider.ces->substitutionLowerBound)));
    BOOST_TEST((table.at(sigmaRow, 6) == text("n/a")));
    BOOST_TEST(wider.returns.verdict == "constant"); // an interior optimum keeps its test
}

BOOST_AUTO_TEST_CASE(a_singular_hessian_at_the_optimum_is_not_identified)
{
    // Data from ρ = 50 (40 rows, noise SD 0.025): the optimum lies out on a ridge toward fixed
    // proportions (ρ ≈ 220), where JᵀJ is singular to rounding.
    const auto data = generate(isoquant::Ces(0.5, 0.4, 50, 0.9), 40, 1, 0.025);
    const auto fit = isoquant::fitCes(data, cesOptions());
    BOOST_TEST_REQUIRE((fit.status.is(isoquant::FitStatusKind::notIdentified)));
    requireVerdict(fit, "not tested (not identified)");
    const isoquant::CellTable table = isoquant::fitTable(fit);
    BOOST_TEST((table.at(convergenceRow, 1) == text("not identified")));
    BOOST_TEST(table.text(formRow, 2).find("not identified") != std::string::npos);
    BOOST_TEST((table.at(3, 2) == text("n/a"))); // no standard error of ρ
    BOOST_TEST(isoquant::testing::messageOf([&] { isoquant::readProductionModel(table); }) ==
               "model: the fit is not identified; its estimates are one optimum of many, so they are not used");
    const isoquant::CellTable comparison = isoquant::compareForms(argumentsOf(data));
    BOOST_TEST((comparison.at(7, 0) == text("ces vs cobb-douglas")));
    BOOST_TEST((comparison.at(7, 1) == text("n/a: the ces fit is not identified")));
}

BOOST_AUTO_TEST_CASE(a_constant_input_is_refused_as_cobb_douglas_refuses_it)
{
    auto data = generate(isoquant::CobbDouglas(0.2, Eigen::Vector2d(0.6, 0.3)), 40, 306);
    data.inputs.col(1).setConstant(7.5);
    const auto arguments = argumentsOf(data);
    const std::string expected = "inputs: 'x2' does not vary, so it cannot be told apart from ln A";
    BOOST_TEST(messageFor(arguments, "cobb-douglas") == expected);
    BOOST_TEST(messageFor(arguments, "ces") == expected);
    BOOST_TEST(isoquant::testing::messageOf([&] { isoquant::compareForms(arguments); }) == expected);
    BOOST_TEST(messageFor(arguments, "translog") != "<no InputError>");
}

BOOST_AUTO_TEST_CASE(input_ratios_that_differ_by_rounding_count_as_one)
{
    // Ratios 3 and 7, each formed two ways: 0.3/0.1 = 2.9999999999999996 and 0.7/0.1 =
    // 6.999999999999999 in doubles, so a comparison without tolerance saw four values.
    Eigen::MatrixXd inputs(8, 2);
    inputs << 0.3, 0.1, 3, 1, 0.6, 0.2, 6, 2, 0.7, 0.1, 7, 1, 1.4, 0.2, 14, 2;
    BOOST_TEST_REQUIRE(inputs(0, 0) / inputs(0, 1) != inputs(1, 0) / inputs(1, 1));
    isoquant::FitArguments arguments;
    arguments.output = isoquant::testing::numberRange(Eigen::VectorXd::LinSpaced(8, 2, 30), {"y"});
    arguments.inputs = isoquant::testing::numberRange(inputs, {"a", "b"});
    BOOST_TEST(messageFor(arguments, "ces") ==
               "inputs: the ratio of 'a' to 'b' takes fewer than three values; the ces form cannot tell its weight "
               "from its curvature");
}

BOOST_AUTO_TEST_SUITE_END()
