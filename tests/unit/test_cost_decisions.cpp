// PRODLEASTCOST, PRODEFFICIENTSCALE, PRODPRICEELASTICITY and PRODREGULAR over cost models and, by
// duality, production models (cost_decisions.hpp). Sources beside each check: the Cobb-Douglas dual
// is derived in test_cost_functions.cpp; the CES dual C(w, y) = (y/A)^(1/ν)·[δ^σ w₁^(1−σ) +
// (1−δ)^σ w₂^(1−σ)]^(1/(1−σ)), σ = 1/(1+ρ) (from memory, as in test_decision_cells.cpp); Shephard's
// lemma and the symmetry of ∂xᵢ/∂wⱼ are checked by central finite differences (step h = 1e-4
// relative: truncation O(h²) ≈ 1e-8, rounding ≈ 1e-16/h = 1e-12; tolerance 1e-6 relative). The
// efficient scale against a scipy minimisation is checked in tests/integration/test_cost_in_calc.py.
// Invented models.
#include "isoquant/sheet/functions/cost_functions.hpp"
#include "isoquant/sheet/functions/decision_functions.hpp"
#include "isoquant/sheet/functions/cost_decisions.hpp"
#include "cell_tables.hpp"
#include "input_error_message.hpp"
#include "relative_error.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>
#include <functional>

using isoquant::Cell;
using isoquant::CellTable;
using isoquant::testing::closeTo;
using isoquant::testing::messageOf;
using isoquant::testing::numberRange;
using isoquant::testing::typedRange;

namespace {

constexpr double differenceTolerance = 1e-6; // finite differences, see the file comment
constexpr double dualityTolerance = 1e-10;   // two closed forms of the same number, a few roundings apart

std::string text(const char* word) { return word; }

// A bakery chain's technology (invented): A = 3, labour 0.45, ovens 0.35 (ν = 0.8).
CellTable cobbDouglasProduction()
{
    return typedRange({{text("form"), text("cobb-douglas")}, {text("A"), 3.0}, {text("labour"), 0.45}, {text("ovens"), 0.35}});
}

// Its exact dual (test_cost_functions.cpp): constant ln ν − ln A/ν − Σ (bᵢ/ν) ln bᵢ, output 1/ν, prices bᵢ/ν.
CellTable cobbDouglasDual()
{
    const double nu = 0.8, a = 0.45, b = 0.35;
    const double constant = std::log(nu) - std::log(3.0) / nu - a / nu * std::log(a) - b / nu * std::log(b);
    return typedRange({{text("form"), text("cobb-douglas cost")}, {text("constant"), constant}, {text("output"), 1 / nu},
                       {text("labour"), a / nu}, {text("ovens"), b / nu}});
}

CellTable cesProduction()
{
    return typedRange({{text("form"), text("ces"), Cell{}}, {text("A"), 2.0, Cell{}}, {text("delta"), 0.4, Cell{}},
                       {text("rho"), 0.5, Cell{}}, {text("nu"), 0.9, Cell{}},
                       {text("inputs"), text("labour"), text("ovens")}});
}

double cesDualCost(double output, double w1, double w2)
{
    const double sigma = 1 / 1.5;
    const double bracket = std::pow(0.4, sigma) * std::pow(w1, 1 - sigma) + std::pow(0.6, sigma) * std::pow(w2, 1 - sigma);
    return std::pow(output / 2.0, 1 / 0.9) * std::pow(bracket, 1 / (1 - sigma));
}

// A laundry chain's translog cost function (invented), homogeneous in prices (rows of βᵢⱼ and the
// βᵢ_y sum to 0), with a U-shaped average cost (output*output > 0).
CellTable translogCost()
{
    return typedRange({{text("form"), text("translog cost")}, {text("constant"), 1.2}, {text("output"), 0.55},
                       {text("labour"), 0.5}, {text("energy"), 0.2}, {text("machines"), 0.3},
                       {text("output*output"), 0.08}, {text("labour*labour"), 0.10}, {text("labour*energy"), -0.04},
                       {text("labour*machines"), -0.06}, {text("energy*energy"), 0.07}, {text("energy*machines"), -0.03},
                       {text("machines*machines"), 0.09}, {text("labour*output"), 0.02}, {text("energy*output"), -0.01},
                       {text("machines*output"), -0.01}});
}

CellTable pricesOf(const Eigen::VectorXd& prices) { return numberRange(prices.transpose()); }

double number(const CellTable& table, std::size_t row = 0, std::size_t column = 0)
{
    BOOST_TEST_REQUIRE(table.isNumber(row, column));
    return table.number(row, column);
}

Eigen::VectorXd amounts(const CellTable& model, double output, const Eigen::VectorXd& prices)
{
    const CellTable row = isoquant::leastCostAnyRow(model, output, pricesOf(prices));
    Eigen::VectorXd x(prices.size());
    for (Eigen::Index i = 0; i < prices.size(); ++i) x(i) = number(row, 0, static_cast<std::size_t>(i));
    return x;
}

double totalCost(const CellTable& model, double output, const Eigen::VectorXd& prices)
{
    return number(isoquant::costColumn(model, numberRange(Eigen::MatrixXd::Constant(1, 1, output)), pricesOf(prices),
                                       text("total")));
}

// Central difference of f in the relative step h·wⱼ.
double centralDifference(const std::function<double(const Eigen::VectorXd&)>& f, Eigen::VectorXd prices, Eigen::Index j)
{
    const double step = 1e-4 * prices(j);
    prices(j) += step;
    const double up = f(prices);
    prices(j) -= 2 * step;
    return (up - f(prices)) / (2 * step);
}

double elasticity(const CellTable& model, double output, const Eigen::VectorXd& prices, double i, double j,
                  const char* kind)
{
    return number(isoquant::priceElasticityColumn(model, numberRange(Eigen::MatrixXd::Constant(1, 1, output)),
                                                  pricesOf(prices), i, j, text(kind)));
}

} // namespace

BOOST_AUTO_TEST_SUITE(cost_decisions)

// Duality (Cobb-Douglas): the production model's least-cost plan and cost equal the dual cost model's.
BOOST_AUTO_TEST_CASE(cobb_douglas_least_cost_agrees_with_its_dual_cost_model)
{
    const Eigen::Vector2d prices(18.0, 45.0);
    for (const double output : {3.0, 250.0, 40000.0}) {
        const Eigen::VectorXd viaProduction = amounts(cobbDouglasProduction(), output, prices);
        const Eigen::VectorXd viaCost = amounts(cobbDouglasDual(), output, prices);
        for (Eigen::Index i = 0; i < 2; ++i) BOOST_TEST(closeTo(viaCost(i), viaProduction(i), dualityTolerance));
        BOOST_TEST(closeTo(totalCost(cobbDouglasDual(), output, prices), totalCost(cobbDouglasProduction(), output, prices),
                           dualityTolerance));
    }
}

// Duality (CES): the production model's plan and cost equal the exact CES dual, its demands ∂C/∂wᵢ.
BOOST_AUTO_TEST_CASE(ces_least_cost_agrees_with_the_exact_dual_cost_function)
{
    const Eigen::Vector2d prices(18.0, 45.0);
    const double output = 400.0;
    auto dual = [&](const Eigen::VectorXd& w) { return cesDualCost(output, w(0), w(1)); };
    BOOST_TEST(closeTo(totalCost(cesProduction(), output, prices), dual(prices), dualityTolerance));
    const Eigen::VectorXd plan = amounts(cesProduction(), output, prices);
    for (Eigen::Index i = 0; i < 2; ++i) BOOST_TEST(closeTo(plan(i), centralDifference(dual, prices, i), differenceTolerance));
}

// Shephard's lemma on a translog cost model: ∂C/∂wᵢ = xᵢ, and ∂xᵢ/∂wⱼ = ∂xⱼ/∂wᵢ.
BOOST_AUTO_TEST_CASE(translog_cost_model_obeys_shephard_and_symmetry)
{
    const CellTable model = translogCost();
    const Eigen::Vector3d prices(1.4, 0.9, 1.2);
    const double output = 30.0;
    const Eigen::VectorXd x = amounts(model, output, prices);
    auto cost = [&](const Eigen::VectorXd& w) { return totalCost(model, output, w); };
    for (Eigen::Index i = 0; i < 3; ++i) BOOST_TEST(closeTo(x(i), centralDifference(cost, prices, i), differenceTolerance));
    for (Eigen::Index i = 0; i < 3; ++i)
        for (Eigen::Index j = i + 1; j < 3; ++j) {
            const double xiWj = centralDifference([&](const Eigen::VectorXd& w) { return amounts(model, output, w)(i); }, prices, j);
            const double xjWi = centralDifference([&](const Eigen::VectorXd& w) { return amounts(model, output, w)(j); }, prices, i);
            BOOST_TEST(closeTo(xiWj, xjWi, differenceTolerance));
            // The demand elasticity is wⱼ·∂xᵢ/∂wⱼ / xᵢ.
            BOOST_TEST(closeTo(elasticity(model, output, prices, i + 1.0, j + 1.0, "demand"), xiWj * prices(j) / x(i),
                               differenceTolerance));
        }
}

// Allen and Morishima from the dual cost model equal PRODSUBSTITUTION's on the production model at
// the least-cost bundle (Cobb-Douglas: both 1); and from the CES production model by duality they
// equal C·Cᵢⱼ/(Cᵢ·Cⱼ) of the exact CES dual by finite differences (σ = 1/(1+ρ) = 2/3).
BOOST_AUTO_TEST_CASE(allen_and_morishima_agree_across_duality)
{
    const Eigen::Vector2d prices(18.0, 45.0);
    const Eigen::VectorXd bundle = amounts(cobbDouglasProduction(), 250.0, prices);
    for (const char* kind : {"allen", "morishima"}) {
        const double fromProduction =
            number(isoquant::substitutionColumn(cobbDouglasProduction(), numberRange(bundle.transpose()), 1.0, 2.0, text(kind)));
        BOOST_TEST(closeTo(elasticity(cobbDouglasDual(), 250.0, prices, 1, 2, kind), fromProduction, dualityTolerance));
        BOOST_TEST(closeTo(elasticity(cobbDouglasProduction(), 250.0, prices, 1, 2, kind), fromProduction, dualityTolerance));
    }
    const double output = 400.0;
    auto dual = [&](const Eigen::VectorXd& w) { return cesDualCost(output, w(0), w(1)); };
    const double c1 = centralDifference(dual, prices, 0), c2 = centralDifference(dual, prices, 1);
    const double c12 = centralDifference([&](const Eigen::VectorXd& w) { return centralDifference(dual, w, 0); }, prices, 1);
    const double allen = dual(prices) * c12 / (c1 * c2);
    BOOST_TEST(closeTo(allen, 2.0 / 3.0, 1e-5)); // a second difference: truncation and rounding near 1e-7
    BOOST_TEST(closeTo(elasticity(cesProduction(), output, prices, 1, 2, "allen"), allen, 1e-5));
    const Eigen::VectorXd cesBundle = amounts(cesProduction(), output, prices);
    const double cesMorishima =
        number(isoquant::substitutionColumn(cesProduction(), numberRange(cesBundle.transpose()), 1.0, 2.0, text("morishima")));
    BOOST_TEST(closeTo(elasticity(cesProduction(), output, prices, 1, 2, "morishima"), cesMorishima, dualityTolerance));
    // Two inputs: Morishima = Allen = σ for the CES (Blackorby and Russell 1989, from memory).
    BOOST_TEST(closeTo(cesMorishima, 2.0 / 3.0, 1e-9));
}

// Demand elasticities by duality from the Cobb-Douglas production model: with cost shares
// sⱼ = bⱼ/ν and Allen elasticity 1, ηᵢⱼ = sⱼ and ηᵢᵢ = sᵢ − 1, as from its exact dual cost model.
BOOST_AUTO_TEST_CASE(demand_elasticities_by_duality_from_a_production_model)
{
    const Eigen::Vector2d prices(18.0, 45.0);
    const double shares[2] = {0.45 / 0.8, 0.35 / 0.8};
    for (int i = 1; i <= 2; ++i)
        for (int j = 1; j <= 2; ++j) {
            const double expected = shares[j - 1] - (i == j ? 1.0 : 0.0);
            BOOST_TEST(closeTo(elasticity(cobbDouglasProduction(), 250.0, prices, i, j, "demand"), expected, dualityTolerance));
            BOOST_TEST(closeTo(elasticity(cobbDouglasDual(), 250.0, prices, i, j, "demand"), expected, dualityTolerance));
        }
}

// The efficient scale of a translog cost model is where the cost elasticity is 1, and average cost
// is higher 1% either side; for a translog production model whose returns fall with size, the same.
BOOST_AUTO_TEST_CASE(efficient_scale_is_the_bottom_of_average_cost)
{
    const Eigen::Vector3d prices(1.4, 0.9, 1.2);
    const double scale = number(isoquant::efficientScaleCell(translogCost(), pricesOf(prices)));
    auto figure = [&](const CellTable& model, double output, const char* what, const Eigen::VectorXd& w) {
        return number(isoquant::costColumn(model, numberRange(Eigen::MatrixXd::Constant(1, 1, output)), pricesOf(w), text(what)));
    };
    BOOST_TEST(closeTo(figure(translogCost(), scale, "cost elasticity", prices), 1.0, 1e-12));
    BOOST_TEST(figure(translogCost(), scale * 1.01, "average", prices) > figure(translogCost(), scale, "average", prices));
    BOOST_TEST(figure(translogCost(), scale / 1.01, "average", prices) > figure(translogCost(), scale, "average", prices));

    const CellTable production = typedRange({{text("form"), text("translog")}, {text("ln A"), 0.5}, {text("labour"), 0.7},
                                             {text("ovens"), 0.6}, {text("labour*labour"), -0.05},
                                             {text("labour*ovens"), 0.0}, {text("ovens*ovens"), -0.04}});
    const Eigen::Vector2d twoPrices(18.0, 45.0);
    const double productionScale = number(isoquant::efficientScaleCell(production, pricesOf(twoPrices)));
    BOOST_TEST(closeTo(figure(production, productionScale, "cost elasticity", twoPrices), 1.0, 1e-9));
    BOOST_TEST(figure(production, productionScale * 1.01, "average", twoPrices) >
               figure(production, productionScale, "average", twoPrices));
    BOOST_TEST(figure(production, productionScale / 1.01, "average", twoPrices) >
               figure(production, productionScale, "average", twoPrices));
}

BOOST_AUTO_TEST_CASE(efficient_scale_says_when_average_cost_has_no_bottom)
{
    const Eigen::Vector2d prices(18.0, 45.0);
    auto answer = [&](const CellTable& model) { return isoquant::efficientScaleCell(model, pricesOf(prices)).text(0, 0); };
    // ν = 0.8: decreasing returns everywhere, so average cost rises with output.
    BOOST_TEST(answer(cobbDouglasProduction()) ==
               "No efficient scale: average cost rises at every output in this model (decreasing returns throughout)");
    BOOST_TEST(answer(cobbDouglasDual()) ==
               "No efficient scale: average cost rises at every output in this model (decreasing returns throughout)");
    const CellTable increasing = typedRange({{text("form"), text("cobb-douglas cost")}, {text("constant"), 0.1},
                                             {text("output"), 0.8}, {text("labour"), 0.6}, {text("ovens"), 0.4}});
    BOOST_TEST(answer(increasing) ==
               "No efficient scale: average cost falls at every output in this model (increasing returns throughout)");
    const CellTable humped = typedRange({{text("form"), text("translog cost")}, {text("constant"), 0.1}, {text("output"), 0.8},
                                         {text("labour"), 0.6}, {text("ovens"), 0.4}, {text("output*output"), -0.05}});
    BOOST_TEST(answer(humped) == "No efficient scale: returns to scale rise with output in this model, so average cost "
                                 "has a highest point, not a lowest");
}

// PRODREGULAR with a cost model: M = βᵢⱼ + sᵢsⱼ − δᵢⱼsᵢ negative semidefinite and every share positive.
BOOST_AUTO_TEST_CASE(regularity_of_cost_models)
{
    Eigen::MatrixXd rows(3, 4);
    rows << 30, 1.4, 0.9, 1.2, // shares about 0.60, 0.14, 0.26, M negative semidefinite: regular
        30, 0.001, 0.9, 1.2,      // labour so cheap that its share 0.5 + 0.1·ln 0.001 + … turns negative
        30, 1.4, 3000, 1.2;       // energy dear: shares 0.27, 0.71, 0.02 and M has the eigenvalue 0.106 > 0
                                  // (numpy.linalg.eigvalsh, run when this test was written)
    const CellTable column = isoquant::regularityAnyColumn(translogCost(), numberRange(rows, {"washes", "labour", "energy", "machines"}));
    BOOST_TEST_REQUIRE(column.rows() == 4u);
    BOOST_TEST(column.text(1, 0) == "regular");
    BOOST_TEST(column.text(2, 0).rfind("fitted share of labour is not positive", 0) == 0);
    BOOST_TEST(column.text(3, 0) == "cost not concave in prices (the Hessian of cost in the prices is not negative semidefinite)");
    const CellTable convex = typedRange({{text("form"), text("translog cost")}, {text("constant"), 0.0}, {text("output"), 1.0},
                                         {text("labour"), 0.5}, {text("energy"), 0.5}, {text("labour*labour"), 0.5},
                                         {text("labour*energy"), -0.5}, {text("energy*energy"), 0.5}});
    BOOST_TEST(isoquant::regularityAnyColumn(convex, numberRange(Eigen::RowVector3d(10, 1, 1))).text(0, 0) ==
               "cost not concave in prices (the Hessian of cost in the prices is not negative semidefinite)");
    BOOST_TEST(isoquant::regularityAnyColumn(cobbDouglasDual(), numberRange(Eigen::RowVector3d(10, 3, 7))).text(0, 0) == "regular");
}

BOOST_AUTO_TEST_CASE(bad_input_names_the_argument_and_row)
{
    const Eigen::Vector3d prices(1.4, 0.9, 1.2);
    Eigen::MatrixXd outputs(3, 1);
    outputs << 100, -4, 300;
    BOOST_TEST(messageOf([&] { isoquant::priceElasticityColumn(translogCost(), numberRange(outputs, {"washes"}), pricesOf(prices), 1.0, 2.0, Cell{}); }) ==
               "output: row 3 is -4; logs need positive values");
    BOOST_TEST(messageOf([&] { isoquant::priceElasticityColumn(translogCost(), numberRange(Eigen::MatrixXd::Constant(1, 1, 5.0)), pricesOf(prices), text("soap"), 2.0, Cell{}); }) ==
               "input i: 'soap' is not an input of the model; its inputs are 'labour', 'energy', 'machines'");
    BOOST_TEST(messageOf([&] { isoquant::priceElasticityColumn(translogCost(), numberRange(Eigen::MatrixXd::Constant(1, 1, 5.0)), pricesOf(prices), 1.0, 2.0, text("cross")); }) ==
               "kind: 'cross' is not a kind; use \"demand\", \"allen\" or \"morishima\"");
    BOOST_TEST(messageOf([&] { isoquant::priceElasticityColumn(translogCost(), numberRange(Eigen::MatrixXd::Constant(1, 1, 5.0)), pricesOf(prices), 2.0, 2.0, text("morishima")); }) ==
               "input j: is the same input as input i; the Morishima elasticity needs two different inputs");
    BOOST_TEST(messageOf([&] { isoquant::priceElasticityColumn(translogCost(), numberRange(outputs.cwiseAbs(), {"washes"}), numberRange(Eigen::MatrixXd::Constant(2, 3, 1.0)), 1.0, 2.0, Cell{}); }) ==
               "input prices: has 2 rows of data but output has 3 rows; give one row of prices per output, or one row for all");
    BOOST_TEST(messageOf([&] { isoquant::efficientScaleCell(translogCost(), numberRange(Eigen::RowVector2d(1, 2))); }) ==
               "input prices: give one price per input, 3 numbers in a row or a column (the model has 3 inputs)");
    BOOST_TEST(messageOf([&] { isoquant::leastCostAnyRow(translogCost(), -3.0, pricesOf(prices)); }).rfind("target output:", 0) == 0);
    Eigen::MatrixXd rows(2, 3);
    rows << 10, 1, 1, 10, 1, 2;
    BOOST_TEST(messageOf([&] { isoquant::regularityAnyColumn(translogCost(), numberRange(rows)); }) ==
               "inputs: has 3 columns; with a cost model give the output and then one price per input (4 columns)");
    Eigen::MatrixXd withZero(2, 4);
    withZero << 10, 1, 1, 1, 10, 1, 0, 1;
    BOOST_TEST(messageOf([&] { isoquant::regularityAnyColumn(translogCost(), numberRange(withZero, {"washes", "labour", "energy", "machines"})); }) ==
               "inputs: row 3, column 3 is 0; logs need positive values");
}

BOOST_AUTO_TEST_SUITE_END()
