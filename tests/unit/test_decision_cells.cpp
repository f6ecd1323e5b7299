// The decision cell functions on cells as a user would type them: layouts, agreement with the
// core they call, the isoquant through PRODOUTPUT, and the exact messages for bad input. The
// models and prices are invented (a bakery's labour and ovens).
#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/sheet/functions/decision_functions.hpp"
#include "isoquant/math/forms/homogeneous_cost.hpp"
#include "cell_tables.hpp"
#include "input_error_message.hpp"
#include "relative_error.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>

using isoquant::Cell;
using isoquant::CellTable;
using isoquant::testing::closeTo;
using isoquant::testing::messageOf;
using isoquant::testing::numberRange;
using isoquant::testing::typedRange;

namespace {

// Results that pass through the same double arithmetic as the core call they are compared with:
// equal to 1e-13 relative (a different order of a few operations at most).
constexpr double sameTolerance = 1e-13;
// Every isoquant point must give its output level back through PRODOUTPUT to 1e-9 relative (the rule).
constexpr double isoquantTolerance = 1e-9;

CellTable bakery(double labour = 0.7, double ovens = 0.5)
{
    return typedRange({{std::string("form"), std::string("cobb-douglas")},
                       {std::string("A"), 3.0},
                       {std::string("labour"), labour},
                       {std::string("ovens"), ovens}});
}

CellTable threeInputs()
{
    return typedRange({{std::string("form"), std::string("cobb-douglas")},
                       {std::string("ln A"), 0.4},
                       {std::string("labour"), 0.4},
                       {std::string("ovens"), 0.3},
                       {std::string("flour"), 0.2}});
}

CellTable pricesRow(double a, double b) { return numberRange(Eigen::RowVector2d(a, b)); }

double number(const CellTable& table, std::size_t row, std::size_t column)
{
    BOOST_TEST_REQUIRE(table.isNumber(row, column));
    return table.number(row, column);
}

std::string text(const CellTable& table)
{
    BOOST_TEST_REQUIRE(table.isText(0, 0));
    return table.text(0, 0);
}

} // namespace

BOOST_AUTO_TEST_SUITE(decision_cells)

BOOST_AUTO_TEST_CASE(isoquant_points_give_the_level_back_through_prodoutput)
{
    const Eigen::VectorXd labour = Eigen::VectorXd::LinSpaced(25, 2.0, 60.0);
    const CellTable points = isoquant::isoquantColumn(bakery(), 400.0, numberRange(labour, {"labour"}), {}, {});
    BOOST_TEST_REQUIRE(points.rows() == 25u);
    Eigen::MatrixXd bundles(25, 2);
    bundles.col(0) = labour;
    bundles.col(1) = isoquant::testing::columnValues(points);
    const Eigen::VectorXd output = isoquant::testing::columnValues(isoquant::outputColumn(bakery(), numberRange(bundles)));
    for (Eigen::Index row = 0; row < 25; ++row) BOOST_TEST(closeTo(output(row), 400.0, isoquantTolerance));

    // Three inputs: full rows, the column of input j (ovens) not read; flour held at each row's value.
    Eigen::MatrixXd rows(4, 3);
    rows << 5, 0, 2, 10, 0, 2, 20, 0, 3, 40, 0, 3;
    CellTable range = numberRange(rows, {"labour", "ovens", "flour"});
    range.set(2, 1, std::string("ignored"));
    range.set(3, 1, Cell{});
    const CellTable ovens = isoquant::isoquantColumn(threeInputs(), 12.0, range, std::string("labour"), 2.0);
    for (Eigen::Index row = 0; row < 4; ++row) rows(row, 1) = number(ovens, static_cast<std::size_t>(row), 0);
    const Eigen::VectorXd output3 = isoquant::testing::columnValues(isoquant::outputColumn(threeInputs(), numberRange(rows)));
    for (Eigen::Index row = 0; row < 4; ++row) BOOST_TEST(closeTo(output3(row), 12.0, isoquantTolerance));
}

BOOST_AUTO_TEST_CASE(isoquant_says_where_no_amount_exists)
{
    // Y = 3·L^0.7·K^0.5 = 1e250 at L = 1 needs K = (1e250/3)^2 ≈ 1e499, beyond every double.
    const CellTable points = isoquant::isoquantColumn(bakery(), 1e250, numberRange(Eigen::VectorXd::Ones(1)), {}, {});
    BOOST_TEST(text(points) == "no amount of 'ovens' gives this output with 'labour' at 1");
}

BOOST_AUTO_TEST_CASE(least_cost_row_cost_and_rate_agree)
{
    const CellTable bundle = isoquant::leastCostRow(bakery(), 400.0, pricesRow(18.0, 45.0));
    BOOST_TEST_REQUIRE((bundle.rows() == 1u && bundle.columns() == 2u));
    const Eigen::Vector2d x(number(bundle, 0, 0), number(bundle, 0, 1));
    // Prices as a column, with a header row as a row: the same answer.
    BOOST_TEST((isoquant::leastCostRow(bakery(), 400.0, numberRange(Eigen::Vector2d(18.0, 45.0))) == bundle));
    BOOST_TEST((isoquant::leastCostRow(bakery(), 400.0, numberRange(Eigen::RowVector2d(18.0, 45.0), {"wage", "oven"})) ==
                bundle));
    // The rate of technical substitution there equals the price ratio (tangency).
    const CellTable rate = isoquant::technicalRateColumn(bakery(), numberRange(x.transpose()), 1.0, 2.0);
    BOOST_TEST(closeTo(number(rate, 0, 0), 18.0 / 45.0, 1e-12));
    const double total = number(isoquant::costCell(bakery(), 400.0, pricesRow(18.0, 45.0), {}), 0, 0);
    BOOST_TEST(closeTo(total, 18.0 * x(0) + 45.0 * x(1), sameTolerance));
    const double average = number(isoquant::costCell(bakery(), 400.0, pricesRow(18.0, 45.0), std::string("average")), 0, 0);
    BOOST_TEST(closeTo(average, total / 400.0, sameTolerance));
    // Homogeneous of degree ν: marginal cost = C/(ν·y) (homogeneous_cost.hpp).
    const double marginal = number(isoquant::costCell(bakery(), 400.0, pricesRow(18.0, 45.0), std::string("Marginal")), 0, 0);
    BOOST_TEST(closeTo(marginal, total / (1.2 * 400.0), 1e-12));
}

BOOST_AUTO_TEST_CASE(budget_and_profit_rows)
{
    const CellTable budget = isoquant::budgetRow(bakery(), 5000.0, pricesRow(18.0, 45.0));
    BOOST_TEST_REQUIRE(budget.columns() == 3u);
    // (common practice, no source) Cobb-Douglas budget shares bᵢ/Σb: 0.7/1.2 and 0.5/1.2.
    BOOST_TEST(closeTo(18.0 * number(budget, 0, 0) / 5000.0, 0.7 / 1.2, 1e-12));
    BOOST_TEST(closeTo(45.0 * number(budget, 0, 1) / 5000.0, 0.5 / 1.2, 1e-12));
    const double output = number(isoquant::outputColumn(bakery(), numberRange(Eigen::RowVector2d(number(budget, 0, 0),
                                                                                                   number(budget, 0, 1)))),
                                 0, 0);
    BOOST_TEST(closeTo(number(budget, 0, 2), output, 1e-12));

    const CellTable profit = isoquant::profitRow(bakery(0.45, 0.35), 2.5, pricesRow(18.0, 45.0));
    BOOST_TEST_REQUIRE(profit.columns() == 4u);
    // Profit (1 − ν)·p·y at the maximum of a homogeneous technology (Euler's theorem).
    BOOST_TEST(closeTo(number(profit, 0, 3), 0.2 * 2.5 * number(profit, 0, 2), 1e-12));
    BOOST_TEST(text(isoquant::profitRow(bakery(), 2.5, pricesRow(18.0, 45.0))) ==
               "No finite profit maximum: returns to scale are increasing (1.2), so profit grows without limit as "
               "every input is scaled up");
}

BOOST_AUTO_TEST_CASE(curvature_words_and_elasticities_per_row)
{
    Eigen::MatrixXd bundles(2, 2);
    bundles << 10, 4, 30, 9;
    const CellTable rows = numberRange(bundles, {"labour", "ovens"});
    // Two data rows under a header row: each result starts with a header cell of its own.
    const CellTable returns = isoquant::inputReturnsColumn(bakery(), rows, std::string("ovens"));
    BOOST_TEST((returns.at(0, 0) == Cell(std::string("returns to ovens"))));
    BOOST_TEST((returns.at(1, 0) == Cell(std::string("diminishing")) && returns.at(2, 0) == Cell(std::string("diminishing"))));
    const CellTable pair = isoquant::inputPairColumn(bakery(), rows, 1.0, 2.0);
    BOOST_TEST((pair.at(0, 0) == Cell(std::string("labour with ovens"))));
    BOOST_TEST((pair.at(2, 0) == Cell(std::string("complements"))));
    for (const char* kind : {"direct", "allen", "morishima"}) {
        const CellTable sigma = isoquant::substitutionColumn(bakery(), rows, 2.0, 1.0, std::string(kind));
        BOOST_TEST((sigma.at(0, 0) == Cell(std::string("elasticity of substitution, ovens and labour"))));
        BOOST_TEST(closeTo(number(sigma, 1, 0), 1.0, 1e-12));
    }
    // Own second partial: b(b − 1)·Y/x² (Cobb-Douglas calculus), and the cross partial bᵢbⱼY/(xᵢxⱼ).
    const double y = 3.0 * std::pow(10.0, 0.7) * std::pow(4.0, 0.5);
    const CellTable own = isoquant::secondPartialColumn(bakery(), rows, 1.0, {});
    BOOST_TEST((own.at(0, 0) == Cell(std::string("second derivative in labour"))));
    BOOST_TEST(closeTo(number(own, 1, 0), 0.7 * -0.3 * y / 100.0, 1e-12));
    const CellTable cross = isoquant::secondPartialColumn(bakery(), rows, 1.0, 2.0);
    BOOST_TEST((cross.at(0, 0) == Cell(std::string("cross derivative in labour and ovens"))));
    BOOST_TEST(closeTo(number(cross, 1, 0), 0.7 * 0.5 * y / 40.0, 1e-12));
}

// Inputs headed in another order than the model's are taken by their labels (issue 14, item 2);
// a label the model lacks or an input without a column is named.
BOOST_AUTO_TEST_CASE(inputs_are_matched_to_the_model_by_label)
{
    using isoquant::testing::messageOf;
    Eigen::MatrixXd bundles(1, 2);
    bundles << 4, 10; // ovens, labour
    const CellTable swapped = numberRange(bundles, {"Ovens", "LABOUR"});
    Eigen::MatrixXd inOrder(1, 2);
    inOrder << 10, 4;
    const CellTable ordered = numberRange(inOrder, {"labour", "ovens"});
    // One data row under a header: the plain value, as a single-cell formula shows it.
    BOOST_TEST(number(isoquant::marginalProductColumn(bakery(), swapped, std::string("labour")), 0, 0) ==
               number(isoquant::marginalProductColumn(bakery(), ordered, std::string("labour")), 0, 0));
    BOOST_TEST(number(isoquant::technicalRateColumn(bakery(), swapped, 1.0, 2.0), 0, 0) ==
               number(isoquant::technicalRateColumn(bakery(), ordered, 1.0, 2.0), 0, 0));
    BOOST_TEST(messageOf([&] { isoquant::outputColumn(bakery(), numberRange(inOrder, {"labour", "flour"})); }) ==
               "inputs: the column headed 'flour' is not an input of the model; its inputs are 'labour', 'ovens'");
    BOOST_TEST(messageOf([&] { isoquant::outputColumn(bakery(), numberRange(bundles.leftCols(1), {"labour"})); }) ==
               "inputs: no column is headed 'ovens', an input of the model; its inputs are 'labour', 'ovens'");
    BOOST_TEST(messageOf([&] { isoquant::outputColumn(bakery(), numberRange(inOrder, {"labour", "Labour"})); }) ==
               "inputs: the label 'Labour' heads two columns; give every column its own label");
}

BOOST_AUTO_TEST_CASE(bad_input_is_named)
{
    using isoquant::testing::messageOf;
    const CellTable model = bakery();
    BOOST_TEST(messageOf([&] { isoquant::leastCostRow(model, 400.0, pricesRow(18.0, 0.0)); }) ==
               "input prices: the price of input 2 is 0; prices must be positive");
    BOOST_TEST(messageOf([&] { isoquant::leastCostRow(model, 400.0, numberRange(Eigen::RowVector3d(1, 2, 3))); }) ==
               "input prices: give one price per input, 2 numbers in a row or a column (the model has 2 inputs)");
    BOOST_TEST(messageOf([&] { isoquant::costCell(model, -5.0, pricesRow(18.0, 45.0), {}); }) ==
               "target output: is -5; it must be positive");
    BOOST_TEST(messageOf([&] { isoquant::costCell(model, 5.0, pricesRow(18.0, 45.0), std::string("mean")); }) ==
               "what: 'mean' is not a cost measure; use \"total\", \"marginal\", \"average\", "
               "\"cost elasticity\" or \"returns to scale\"");
    BOOST_TEST(messageOf([&] { isoquant::budgetRow(model, std::string("lots"), pricesRow(18.0, 45.0)); }) ==
               "budget: holds text 'lots'; give a positive number");
    BOOST_TEST(messageOf([&] { isoquant::profitRow(model, Cell{}, pricesRow(18.0, 45.0)); }) ==
               "output price: is empty; give a positive number");
    const CellTable rows = numberRange(Eigen::RowVector2d(10, 4));
    BOOST_TEST(messageOf([&] { isoquant::secondPartialColumn(model, rows, 3.0, {}); }) ==
               "input i: 3 is not an input number; the model has 2 inputs");
    BOOST_TEST(messageOf([&] { isoquant::inputPairColumn(model, rows, 1.0, std::string("labour")); }) ==
               "input j: is the same input as input i ('labour'); give two different inputs");
    BOOST_TEST(messageOf([&] { isoquant::substitutionColumn(model, rows, 1.0, 2.0, std::string("hicks")); }) ==
               "kind: 'hicks' is not a kind; use \"direct\", \"allen\" or \"morishima\"");
    BOOST_TEST(messageOf([&] { isoquant::isoquantColumn(model, 0.0, rows, {}, {}); }) ==
               "output level: is 0; it must be positive");
    BOOST_TEST(messageOf([&] { isoquant::isoquantColumn(threeInputs(), 5.0, numberRange(Eigen::Vector2d(1, 2)), {}, {}); }) ==
               "values of input i: the model has 3 inputs; give one column per input (the others are held at the "
               "values in each row)");
    BOOST_TEST(messageOf([&] { isoquant::leastCostRow(bakery(0.7, -0.1), 5.0, pricesRow(1.0, 1.0)); }) ==
               "model: the exponent of 'ovens' is -0.1; more of that input never raises output, so no plan with a "
               "positive amount of it is best (every exponent must be positive)");
}

// A fitted or typed ces model takes the ces closed form: the cost-minimising bundle of the textbook
// dual, C(w, y) = (y/A)^(1/ν)·[δ^σ w₁^(1−σ) + (1−δ)^σ w₂^(1−σ)]^(1/(1−σ)) with σ = 1/(1+ρ) (from
// memory), and xᵢ = ∂C/∂wᵢ, checked here by the total cost and the tangency of the bundle.
BOOST_AUTO_TEST_CASE(ces_models_use_the_ces_closed_form)
{
    const CellTable model = typedRange({{std::string("form"), std::string("ces"), Cell{}},
                                        {std::string("A"), 2.0, Cell{}},
                                        {std::string("delta"), 0.4, Cell{}},
                                        {std::string("rho"), 0.5, Cell{}},
                                        {std::string("nu"), 0.9, Cell{}},
                                        {std::string("inputs"), std::string("labour"), std::string("ovens")}});
    const double sigma = 1 / 1.5;
    const double bracket = std::pow(0.4, sigma) * std::pow(18.0, 1 - sigma) + std::pow(0.6, sigma) * std::pow(45.0, 1 - sigma);
    const double textbookCost = std::pow(400.0 / 2.0, 1 / 0.9) * std::pow(bracket, 1 / (1 - sigma));
    const CellTable bundle = isoquant::leastCostRow(model, 400.0, pricesRow(18.0, 45.0));
    BOOST_TEST_REQUIRE((bundle.rows() == 1u && bundle.columns() == 2u));
    const Eigen::Vector2d x(number(bundle, 0, 0), number(bundle, 0, 1));
    BOOST_TEST(closeTo(18.0 * x(0) + 45.0 * x(1), textbookCost, 1e-10));
    const CellTable produced = isoquant::outputColumn(model, numberRange(x.transpose()));
    BOOST_TEST(closeTo(number(produced, 0, 0), 400.0, 1e-10));
    const CellTable rate = isoquant::technicalRateColumn(model, numberRange(x.transpose()), 1.0, 2.0);
    BOOST_TEST(closeTo(number(rate, 0, 0), 18.0 / 45.0, 1e-10));
}

// A ces model with ν = 0.95 at prices where the profit maximum y* = (ν·p/c)^(ν/(1−ν)) (the
// homogeneous-cost formula of homogeneous_cost.hpp) is a speck: at p = 5 it is 7.12e-16 (c =
// 29.78 from the textbook ces cost function, computed here), reported as producing nothing; at
// p = 40 it is 102.6, a plan.
BOOST_AUTO_TEST_CASE(no_profitable_size_is_said_in_words)
{
    const CellTable model = typedRange({{std::string("form"), std::string("ces"), Cell{}},
                                        {std::string("A"), 2.0, Cell{}},
                                        {std::string("delta"), 0.4, Cell{}},
                                        {std::string("rho"), 0.5, Cell{}},
                                        {std::string("nu"), 0.95, Cell{}},
                                        {std::string("inputs"), std::string("labour"), std::string("ovens")}});
    const double sigma = 1 / 1.5;
    const double bracket = std::pow(0.4, sigma) * std::pow(18.0, 1 - sigma) + std::pow(0.6, sigma) * std::pow(45.0, 1 - sigma);
    const double unitCost = std::pow(2.0, -1 / 0.95) * std::pow(bracket, 1 / (1 - sigma));
    BOOST_TEST(std::pow(0.95 * 5.0 / unitCost, 19.0) < 1e-6);
    BOOST_TEST(text(isoquant::profitRow(model, 5.0, pricesRow(18.0, 45.0))) ==
               "No profitable size: producing nothing is best at these prices (the best output, 7.12e-16, is below a "
               "millionth of one unit)");
    const CellTable plan = isoquant::profitRow(model, 40.0, pricesRow(18.0, 45.0));
    BOOST_TEST_REQUIRE(plan.columns() == 4u);
    BOOST_TEST(closeTo(number(plan, 0, 2), std::pow(0.95 * 40.0 / unitCost, 19.0), 1e-9));
}

BOOST_AUTO_TEST_SUITE_END()
