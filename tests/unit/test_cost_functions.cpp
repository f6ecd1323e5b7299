// Cost functions (PRODCOSTFIT, PRODCOST over a cost model): recovery of a known technology from
// invented cost data (property tests, seeded), duality with the production model, the table's
// layout and the messages for bad input. The cross-check against python3-statsmodels is in
// test_cost_cross_check.cpp.
//
// The dual of the Cobb-Douglas technology y = A·Πᵢ xᵢ^bᵢ, ν = Σᵢ bᵢ (derived here, not looked up):
// minimising Σ wᵢxᵢ subject to y = A·Π xᵢ^bᵢ gives wᵢxᵢ = λ·bᵢ·y (first-order conditions), so
// C = λ·ν·y; putting xᵢ = λbᵢy/wᵢ into the constraint gives y = A·(λy)^ν·Π(bᵢ/wᵢ)^bᵢ, so
//   C(y, w) = ν·(y/A)^(1/ν)·Πᵢ (wᵢ/bᵢ)^(bᵢ/ν),
//   ln C = [ln ν − (ln A)/ν − Σᵢ (bᵢ/ν) ln bᵢ] + (1/ν) ln y + Σᵢ (bᵢ/ν) ln wᵢ.
#include "isoquant/sheet/functions/cost_functions.hpp"
#include "isoquant/sheet/tables/cost_table.hpp"
#include "isoquant/sheet/models/cost_model.hpp"
#include "isoquant/sheet/functions/decision_functions.hpp"
#include "cell_tables.hpp"
#include "input_error_message.hpp"
#include "relative_error.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>
#include <random>

using isoquant::Cell;
using isoquant::CellTable;
using isoquant::testing::closeTo;
using isoquant::testing::messageOf;
using isoquant::testing::numberRange;
using isoquant::testing::typedRange;

namespace {

// A laundry chain's technology (invented): A = 2.5, washing labour 0.5, machines 0.3, energy 0.4.
const double scale = 2.5;
const Eigen::Vector3d exponents(0.5, 0.3, 0.4);
const std::vector<std::string> inputLabels{"labour", "machines", "energy"};

double returnsToScale() { return exponents.sum(); }

double dualConstant()
{
    const double nu = returnsToScale();
    double constant = std::log(nu) - std::log(scale) / nu;
    for (Eigen::Index i = 0; i < exponents.size(); ++i) constant -= exponents(i) / nu * std::log(exponents(i));
    return constant;
}

double dualLogCost(double output, const Eigen::VectorXd& prices)
{
    const double nu = returnsToScale();
    return dualConstant() + std::log(output) / nu + (exponents / nu).dot(prices.array().log().matrix());
}

// n plants: output log-uniform over [1, 1000], prices log-uniform over [1, 50], the dual cost times
// exp(noise), noise normal with SD `noise`.
isoquant::CostFitArguments laundryData(int n, std::uint32_t seed, double noise)
{
    std::mt19937 engine(seed);
    std::uniform_real_distribution<double> logOutput(0.0, std::log(1000.0)), logPrice(0.0, std::log(50.0));
    std::normal_distribution<double> disturbance(0.0, noise);
    Eigen::MatrixXd cost(n, 1), output(n, 1), prices(n, 3);
    for (int row = 0; row < n; ++row) {
        output(row, 0) = std::exp(logOutput(engine));
        for (int i = 0; i < 3; ++i) prices(row, i) = std::exp(logPrice(engine));
        cost(row, 0) = std::exp(dualLogCost(output(row, 0), prices.row(row).transpose()) + disturbance(engine));
    }
    isoquant::CostFitArguments arguments;
    arguments.cost = numberRange(cost, {"cost"});
    arguments.output = numberRange(output, {"washes"});
    arguments.prices = numberRange(prices, inputLabels);
    return arguments;
}

// The estimate in the row labelled `label`, column `column` (1 = value).
double tableNumber(const CellTable& table, const std::string& label, std::size_t column = 1)
{
    for (std::size_t row = 0; row < table.rows(); ++row)
        if (table.isText(row, 0) && table.text(row, 0) == label && table.isNumber(row, column))
            return table.number(row, column);
    return std::nan("");
}

// Within four standard errors of the truth: a seeded draw, so deterministic; a correct estimator
// misses this with probability 6e-5 per check (common practice, no source), a wrong formula
// (a missing 1/ν, a price taken as the numeraire's) by dozens of standard errors.
void requireNear(const CellTable& table, const std::string& label, double truth)
{
    const double value = tableNumber(table, label), error = tableNumber(table, label, 2);
    BOOST_TEST(std::fabs(value - truth) <= 4 * error, label << ": " << value << " vs " << truth << " (se " << error << ")");
}

CellTable dualCostModel()
{
    const double nu = returnsToScale();
    return typedRange({{std::string("form"), std::string("cobb-douglas cost")},
                       {std::string("constant"), dualConstant()},
                       {std::string("output"), 1.0 / nu},
                       {std::string("labour"), exponents(0) / nu},
                       {std::string("machines"), exponents(1) / nu},
                       {std::string("energy"), exponents(2) / nu}});
}

CellTable productionModel()
{
    return typedRange({{std::string("form"), std::string("cobb-douglas")},
                       {std::string("A"), scale},
                       {std::string("labour"), exponents(0)},
                       {std::string("machines"), exponents(1)},
                       {std::string("energy"), exponents(2)}});
}

const std::vector<std::string> measures{"total", "marginal", "average", "cost elasticity", "returns to scale"};

} // namespace

BOOST_AUTO_TEST_SUITE(cost_functions)

BOOST_AUTO_TEST_CASE(cobb_douglas_cost_fit_recovers_the_dual_of_a_known_technology)
{
    const CellTable table = isoquant::costFitTable(isoquant::costFitFromArguments(laundryData(300, 20261202, 0.02)));
    const double nu = returnsToScale();
    requireNear(table, "constant", dualConstant());
    requireNear(table, "output", 1.0 / nu);
    for (Eigen::Index i = 0; i < 3; ++i) requireNear(table, inputLabels[static_cast<std::size_t>(i)], exponents(i) / nu);
    requireNear(table, "cost elasticity", 1.0 / nu);
    requireNear(table, "returns to scale", nu);
    BOOST_TEST(table.text(0, 0) == "Cobb-Douglas cost fit");
    BOOST_TEST(table.rows() == isoquant::costFitTableRows(isoquant::CostForm::cobbDouglas, 3));
    BOOST_TEST(table.rows() == 22u); // k + 19 with k = 3
}

BOOST_AUTO_TEST_CASE(noise_free_cost_data_give_the_dual_to_rounding)
{
    // Logs of exact products over 60 rows: the normal equations reproduce the parameters to
    // rounding, 1e-9 relative allows the condition number (about 1e2) times 1e-13 many times over.
    const isoquant::CostFit fit = isoquant::costFitFromArguments(laundryData(60, 7, 0.0));
    BOOST_TEST(closeTo(fit.summary.inference.estimates(1), 1.0 / returnsToScale(), 1e-9));
    BOOST_TEST(closeTo(fit.summary.inference.estimates(0), dualConstant(), 1e-9));
    BOOST_TEST(closeTo(fit.summary.inference.estimates(4), exponents(2) / returnsToScale(), 1e-9)); // the implied price
    const CellTable table = isoquant::costFitTable(fit);
    BOOST_TEST(table.text(table.rows() - 2, 2).find("exact") != std::string::npos);
}

BOOST_AUTO_TEST_CASE(translog_cost_fit_of_cobb_douglas_data_finds_no_second_order_terms)
{
    isoquant::CostFitArguments arguments = laundryData(400, 99, 0.02);
    arguments.form = std::string("translog");
    const CellTable table = isoquant::costFitTable(isoquant::costFitFromArguments(arguments));
    BOOST_TEST(table.text(0, 0) == "translog cost fit");
    BOOST_TEST(table.rows() == isoquant::costFitTableRows(isoquant::CostForm::translog, 3));
    BOOST_TEST(table.rows() == 32u); // 2k + k(k+1)/2 + 20 with k = 3
    const double nu = returnsToScale();
    for (std::size_t i = 0; i < 3; ++i) requireNear(table, inputLabels[i], exponents(static_cast<Eigen::Index>(i)) / nu);
    requireNear(table, "output*output", 0.0);
    requireNear(table, "labour*energy", 0.0);
    requireNear(table, "energy*energy", 0.0);
    requireNear(table, "energy*output", 0.0);
    requireNear(table, "cost elasticity", 1.0 / nu);
    // Homogeneity: the price coefficients sum to 1, each row of βᵢⱼ and the βᵢ_y to 0 (rounding: 1e-12).
    double prices = 0, energyRow = 0, withOutput = 0;
    for (const auto& label : inputLabels) {
        prices += tableNumber(table, label);
        withOutput += tableNumber(table, label + "*output");
    }
    energyRow = tableNumber(table, "labour*energy") + tableNumber(table, "machines*energy") +
                tableNumber(table, "energy*energy");
    BOOST_TEST(std::fabs(prices - 1.0) <= 1e-12);
    BOOST_TEST(std::fabs(energyRow) <= 1e-12);
    BOOST_TEST(std::fabs(withOutput) <= 1e-12);
}

BOOST_AUTO_TEST_CASE(cost_model_matches_the_production_model_through_duality)
{
    // Both routes are closed forms in double: equal to 1e-12 relative (the tolerance).
    const Eigen::Vector3d prices(14.0, 6.5, 0.3);
    for (const double output : {1.0, 250.0, 40000.0})
        for (const auto& measure : measures) {
            const CellTable viaProduction =
                isoquant::costCell(productionModel(), output, numberRange(prices.transpose()), measure);
            const CellTable viaCost = isoquant::costModelColumn(dualCostModel(), numberRange(Eigen::MatrixXd::Constant(1, 1, output)),
                                                                numberRange(prices.transpose()), measure);
            BOOST_TEST(closeTo(viaCost.number(0, 0), viaProduction.number(0, 0), 1e-12), measure << " at " << output);
        }
}

BOOST_AUTO_TEST_CASE(cost_model_gives_a_column_for_a_column_of_outputs)
{
    Eigen::MatrixXd outputs(3, 1), prices(3, 3);
    outputs << 10, 200, 3000;
    prices << 14, 6.5, 0.3, 15, 6, 0.35, 16, 7, 0.25;
    const CellTable column = isoquant::costModelColumn(dualCostModel(), numberRange(outputs, {"washes"}),
                                                       numberRange(prices, inputLabels), std::string("average"));
    BOOST_TEST_REQUIRE(column.rows() == 3u);
    for (Eigen::Index row = 0; row < 3; ++row)
        BOOST_TEST(closeTo(column.number(static_cast<std::size_t>(row), 0),
                           std::exp(dualLogCost(outputs(row, 0), prices.row(row).transpose())) / outputs(row, 0), 1e-12));
    // A production model gives the same column through its least-cost plans (duality, 1e-12 as above).
    for (const auto& measure : measures) {
        const CellTable viaProduction = isoquant::costColumn(productionModel(), numberRange(outputs, {"washes"}),
                                                             numberRange(prices, inputLabels), measure);
        const CellTable viaCost = isoquant::costColumn(dualCostModel(), numberRange(outputs, {"washes"}),
                                                       numberRange(prices, inputLabels), measure);
        BOOST_TEST_REQUIRE(viaProduction.rows() == 3u);
        for (std::size_t row = 0; row < 3; ++row)
            BOOST_TEST(closeTo(viaProduction.number(row, 0), viaCost.number(row, 0), 1e-12), measure << ", row " << row);
    }
    // One row of prices serves every output.
    const CellTable shared = isoquant::costModelColumn(dualCostModel(), numberRange(outputs),
                                                       numberRange(prices.topRows(1)), std::string("cost elasticity"));
    for (std::size_t row = 0; row < 3; ++row) BOOST_TEST(closeTo(shared.number(row, 0), 1.0 / returnsToScale(), 1e-12));
}

BOOST_AUTO_TEST_CASE(fitted_cost_table_reads_back_as_a_cost_model)
{
    isoquant::CostFitArguments arguments = laundryData(200, 5, 0.05);
    arguments.form = std::string("translog");
    const isoquant::CostFit fit = isoquant::costFitFromArguments(arguments);
    const CellTable table = isoquant::costFitTable(fit);
    BOOST_TEST(isoquant::isCostModel(table));
    BOOST_TEST(!isoquant::isCostModel(productionModel()));
    const isoquant::CostModel model = isoquant::readCostModel(table);
    BOOST_TEST(model.translog);
    // At the sample's mean logs the model's elasticity is the table's cost elasticity (1e-12: the
    // same sums in another order).
    const double output = std::exp(fit.meanLogOutput);
    const Eigen::VectorXd prices = fit.meanLogPrices.array().exp().matrix();
    BOOST_TEST(closeTo(model.costElasticity(output, prices), tableNumber(table, "cost elasticity"), 1e-12));
}

BOOST_AUTO_TEST_CASE(translog_fit_finds_the_efficient_scale_of_a_u_shaped_average_cost)
{
    // An invented translog cost with a U-shaped average cost: ln C = 1 + 0.6 ln y + ½·0.1 (ln y)²
    // + 0.7 ln w₁ + 0.3 ln w₂, so ε = 0.6 + 0.1 ln y is 1 at y* = e⁴ at any prices (exact).
    std::mt19937 engine(42);
    std::uniform_real_distribution<double> logOutput(0.0, 8.0), logPrice(0.0, std::log(20.0));
    std::normal_distribution<double> disturbance(0.0, 0.02);
    const int n = 200;
    Eigen::MatrixXd cost(n, 1), output(n, 1), prices(n, 2);
    for (int row = 0; row < n; ++row) {
        const double ly = logOutput(engine), l1 = logPrice(engine), l2 = logPrice(engine);
        output(row, 0) = std::exp(ly);
        prices(row, 0) = std::exp(l1);
        prices(row, 1) = std::exp(l2);
        cost(row, 0) = std::exp(1.0 + 0.6 * ly + 0.05 * ly * ly + 0.7 * l1 + 0.3 * l2 + disturbance(engine));
    }
    isoquant::CostFitArguments arguments;
    arguments.cost = numberRange(cost);
    arguments.output = numberRange(output);
    arguments.prices = numberRange(prices, {"labour", "energy"});
    arguments.form = std::string("translog");
    const CellTable table = isoquant::costFitTable(isoquant::costFitFromArguments(arguments));
    const double lowest = std::exp(4.0);
    requireNear(table, "efficient scale", lowest);
    requireNear(table, "output*output", 0.1);
    // Read back as a model: average cost is lowest at the table's efficient scale, at prices whose
    // logs are the sample's means (the scale is defined there).
    const double found = tableNumber(table, "efficient scale");
    const Eigen::RowVector2d meanPrices(std::exp(prices.col(0).array().log().mean()),
                                        std::exp(prices.col(1).array().log().mean()));
    auto figure = [&](double level, const char* what) {
        return isoquant::costModelColumn(table, numberRange(Eigen::MatrixXd::Constant(1, 1, level)),
                                         numberRange(meanPrices), std::string(what))
            .number(0, 0);
    };
    BOOST_TEST(closeTo(figure(found, "cost elasticity"), 1.0, 1e-12)); // the defining equation, to rounding
    BOOST_TEST(figure(found, "average") < figure(found * 1.01, "average"));
    BOOST_TEST(figure(found, "average") < figure(found / 1.01, "average"));
}

BOOST_AUTO_TEST_SUITE_END()
