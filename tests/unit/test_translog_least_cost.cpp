// Least cost, PRODCOST and the budget split of the translog fitted to Cobb & Douglas (1928)
// (tests/data/cobb_douglas_1928.csv, source in tests/data/README.md) at prices (2, 3). Its
// elasticities change sign inside the data (β_LL ≈ −4.5), so both marginal products are positive
// only in a narrow wedge, and the equal-spending ray does not reach outputs above about 155: the
// solver's direct start used to leave the wedge or miss the level, and it answered "Did not
// converge" for every output from 100 to 260.
//
// translog_least_cost: each answer against its own conditions, computed here from the technology's
// marginal products and second partials (not from the solver's code): output = target, wᵢ/fᵢ = λ
// for both inputs, and an isoquant bowed towards the origin, f_LL·f_C² − 2f_LC·f_L·f_C + f_CC·f_L² < 0.
// translog_least_cost_cross_check: the bundles, marginal costs and "no plan" verdicts against
// statsmodels + scipy, recomputed at test time by tests/reference/translog_least_cost_check.py
// (test translog_least_cost_figures), at prices (2, 3) and also (1, 5), where no equal-spending
// ray meets the wedge at all; the file is named by the environment variable
// ISOQUANT_TRANSLOG_LEAST_COST_FIGURES, and the case is skipped without it.
#include "isoquant/math/decisions/numerical_decisions.hpp"
#include "isoquant/math/forms/translog.hpp"
#include "isoquant/sheet/functions/decision_functions.hpp"
#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/sheet/models/model_table.hpp"
#include "isoquant/sheet/tables/fit_table.hpp"
#include "cell_tables.hpp"
#include "reference_data.hpp"
#include "reference_figures.hpp"
#include "relative_error.hpp"
#include "solved_plan.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>
#include <sstream>

using isoquant::testing::closeTo;
using isoquant::testing::requireSolved;

namespace {

const Eigen::Vector2d prices(2.0, 3.0);

// The solver accepts an answer when each of its equations (dimensionless, of order 1) holds to
// 1e-9 absolutely; carried into the ratios below, with the moderate curvature of this isoquant
// at the plans (the walk in the reference script shows no near-straight piece), 1e-7 relative.
constexpr double conditionTolerance = 1e-7;
// The scipy bundles are exact to about 1e-13 (a closed-form isoquant and a bracketed root of the
// tangency gap); the core's to the acceptance rule above: 1e-7 relative.
constexpr double scipyTolerance = 1e-7;
// The core's fitted coefficients against statsmodels' OLS of the same design: both solve the same
// least squares problem (condition number of the translog design about 1e5), so they agree to
// well within 1e-9 relative; the plans move by less than that times the isoquant's curvature.
constexpr double coefficientTolerance = 1e-9;

isoquant::ModelTable translogModel()
{
    auto arguments = isoquant::testing::cobbDouglas1928Arguments();
    arguments.form = "translog";
    return isoquant::ModelTable(isoquant::fitTable(isoquant::fitFromArguments(arguments)));
}

const isoquant::Technology& technologyOf(const isoquant::ModelTable& model) { return *model.production().technology; }

// f_LL·f_C² − 2f_LC·f_L·f_C + f_CC·f_L², negative where the isoquant is bowed towards the origin.
double borderedCurvature(const isoquant::Technology& technology, const Eigen::VectorXd& x)
{
    const double first = technology.marginalProduct(x, 0), second = technology.marginalProduct(x, 1);
    return technology.secondPartial(x, 0, 0) * second * second -
           2 * technology.secondPartial(x, 0, 1) * first * second + technology.secondPartial(x, 1, 1) * first * first;
}

void checkConditions(const isoquant::Technology& technology, const isoquant::ProductionPlan& plan, double target)
{
    BOOST_TEST(closeTo(technology.output(plan.inputs), target, conditionTolerance), "output " << target);
    for (Eigen::Index i = 0; i < 2; ++i)
        BOOST_TEST(closeTo(prices(i) / technology.marginalProduct(plan.inputs, i), plan.marginalCost, conditionTolerance),
                   "output " << target << ", input " << i + 1);
    BOOST_TEST(borderedCurvature(technology, plan.inputs) < 0, "output " << target);
}

Eigen::VectorXd rowValues(const isoquant::CellTable& row)
{
    Eigen::VectorXd values(static_cast<Eigen::Index>(row.columns()));
    for (std::size_t i = 0; i < row.columns(); ++i) values(static_cast<Eigen::Index>(i)) = row.number(0, i);
    return values;
}

isoquant::Cell costOf(const isoquant::ModelTable& model, double target, const std::string& what)
{
    return isoquant::costCell(model, target, isoquant::testing::numberRange(prices.transpose()), what).at(0, 0);
}

} // namespace

BOOST_AUTO_TEST_SUITE(translog_least_cost)

BOOST_AUTO_TEST_CASE(least_cost_plans_meet_their_conditions)
{
    const auto model = translogModel();
    for (double target = 150; target <= 260; target += 10)
        checkConditions(technologyOf(model), requireSolved(isoquant::solveLeastCost(technologyOf(model), target, prices)),
                        target);
}

BOOST_AUTO_TEST_CASE(cells_and_budget_give_the_same_plans)
{
    // PRODLEASTCOST and PRODCOST answer from the same solve; PRODBUDGET at the plan's cost is the
    // dual problem and must return the same bundle with the target as its output.
    const auto model = translogModel();
    const auto priceRow = isoquant::testing::numberRange(prices.transpose());
    for (const double target : {150.0, 170.0, 215.0, 260.0}) {
        const auto plan = requireSolved(isoquant::solveLeastCost(technologyOf(model), target, prices));
        const Eigen::VectorXd cells = rowValues(isoquant::leastCostRow(model, target, priceRow));
        BOOST_TEST_REQUIRE(cells.size() == 2);
        BOOST_TEST((cells == plan.inputs));
        BOOST_TEST(std::get<double>(costOf(model, target, "total")) == plan.cost);
        BOOST_TEST(std::get<double>(costOf(model, target, "marginal")) == plan.marginalCost);
        const Eigen::VectorXd budget = rowValues(isoquant::budgetRow(model, plan.cost, priceRow));
        BOOST_TEST_REQUIRE(budget.size() == 3);
        for (Eigen::Index i = 0; i < 2; ++i)
            BOOST_TEST(closeTo(budget(i), plan.inputs(i), conditionTolerance), "output " << target << ", input " << i + 1);
        BOOST_TEST(closeTo(budget(2), target, conditionTolerance), "output " << target);
    }
}

BOOST_AUTO_TEST_CASE(no_plan_below_the_tangency_path_is_said_so)
{
    // Below about 144 no bundle on the isoquant with both marginal products positive has the price
    // ratio as its rate of substitution (the walk in tests/reference/translog_least_cost_check.py);
    // the solver must say it found nothing rather than return a bundle.
    const auto model = translogModel();
    for (const double target : {100.0, 120.0, 140.0}) {
        const auto plan = isoquant::solveLeastCost(technologyOf(model), target, prices);
        BOOST_TEST(!plan.solved(), "output " << target);
        BOOST_TEST(plan.status.reason.rfind("Did not converge: the numerical search for the least-cost bundle", 0) == 0,
                   plan.status.reason);
        const auto cell = costOf(model, target, "total");
        BOOST_TEST(std::holds_alternative<std::string>(cell), "output " << target);
    }
}

BOOST_AUTO_TEST_SUITE_END()

namespace {

boost::test_tools::assertion_result figuresAvailable(boost::unit_test::test_unit_id)
{
    return isoquant::testing::referenceFiguresAvailable("ISOQUANT_TRANSLOG_LEAST_COST_FIGURES",
                                                        "translog least-cost figures");
}

Eigen::VectorXd numbersOf(const std::string& field)
{
    std::vector<double> numbers;
    std::istringstream stream(field);
    std::string part;
    while (std::getline(stream, part, ';')) numbers.push_back(std::stod(part));
    return Eigen::Map<const Eigen::VectorXd>(numbers.data(), static_cast<Eigen::Index>(numbers.size()));
}

} // namespace

BOOST_AUTO_TEST_SUITE(translog_least_cost_cross_check)

BOOST_AUTO_TEST_CASE(plans_agree_with_scipy, *boost::unit_test::precondition(figuresAvailable))
{
    const auto rows = isoquant::testing::readReferenceRows(
        isoquant::testing::referenceFiguresPath("ISOQUANT_TRANSLOG_LEAST_COST_FIGURES"));
    BOOST_TEST_REQUIRE(rows.size() == 12u);
    BOOST_TEST_REQUIRE(rows[0][0] == "parameters");
    // statsmodels' coefficients: a0, a_L, a_C, B_LL, B_LC, B_CC
    const Eigen::VectorXd coefficients = numbersOf(rows[0][3]);
    BOOST_TEST_REQUIRE(coefficients.size() == 6);
    Eigen::Matrix2d interactions;
    interactions << coefficients(3), coefficients(4), coefficients(4), coefficients(5);
    const isoquant::Translog statsmodelsTranslog(coefficients(0), coefficients.segment(1, 2), interactions);

    const auto model = translogModel();
    const auto& fitted = dynamic_cast<const isoquant::Translog&>(technologyOf(model));
    BOOST_TEST(closeTo(fitted.logScale, coefficients(0), coefficientTolerance));
    for (Eigen::Index i = 0; i < 2; ++i) {
        BOOST_TEST(closeTo(fitted.firstOrder(i), coefficients(1 + i), coefficientTolerance));
        for (Eigen::Index j = 0; j < 2; ++j)
            BOOST_TEST(closeTo(fitted.interactions(i, j), interactions(i, j), coefficientTolerance));
    }

    int plans = 0;
    for (std::size_t r = 1; r < rows.size(); ++r) {
        const Eigen::VectorXd w = numbersOf(rows[r][1]);
        const auto priceRow = isoquant::testing::numberRange(w.transpose());
        const double target = std::stod(rows[r][2]);
        const std::string where = "prices " + rows[r][1] + ", output " + rows[r][2];
        const bool scipyHasPlan = rows[r][0] == "plan";
        for (const isoquant::Technology* technology : {static_cast<const isoquant::Technology*>(&statsmodelsTranslog),
                                                       &technologyOf(model)}) {
            const auto plan = isoquant::solveLeastCost(*technology, target, w);
            BOOST_TEST(plan.solved() == scipyHasPlan, where << ": " << plan.status.reason);
            if (!plan.solved() || !scipyHasPlan) continue;
            const Eigen::VectorXd scipy = numbersOf(rows[r][3]); // L, C, marginal cost
            for (Eigen::Index i = 0; i < 2; ++i)
                BOOST_TEST(closeTo(plan.inputs(i), scipy(i), scipyTolerance), where << ", input " << i + 1);
            BOOST_TEST(closeTo(plan.marginalCost, scipy(2), scipyTolerance), where);
            const Eigen::VectorXd budget = rowValues(isoquant::budgetRow(model, w.dot(scipy.head(2)), priceRow));
            for (Eigen::Index i = 0; i < 2; ++i)
                BOOST_TEST(closeTo(budget(i), scipy(i), scipyTolerance), "budget for " << where << ", input " << i + 1);
        }
        plans += scipyHasPlan ? 1 : 0;
    }
    BOOST_TEST(plans == 8);
}

BOOST_AUTO_TEST_SUITE_END()
