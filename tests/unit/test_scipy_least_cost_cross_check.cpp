// Least-cost bundles against scipy.optimize (python3-scipy from Debian) recomputed at test time by
// tests/reference/scipy_least_cost_check.py: SLSQP minimising cost on the isoquant, for invented
// Cobb-Douglas and CES technologies. Compared: PRODLEASTCOST's core on a typed Cobb-Douglas model,
// the CES closed form, and the numerical solve on both.
// Tolerance: SLSQP stops when the cost changes by less than ftol = 1e-15 relative; at a minimum
// the cost is quadratic in the bundle's error, so the bundle is right to about √1e-15 ≈ 3e-8
// relative times a curvature factor of order 1; 1e-6 allows thirty times that. A wrong exponent
// or weight in a formula moves the bundle by 1e-3 or more.
//
// CTest runs the script first (test scipy_least_cost_figures) and passes the file it wrote in the
// environment variable ISOQUANT_SCIPY_LEAST_COST; without that file this test is skipped.
#include "solved_plan.hpp"
#include "isoquant/math/decisions/ces_closed_forms.hpp"
#include "isoquant/sheet/functions/decision_functions.hpp"
#include "isoquant/math/decisions/numerical_decisions.hpp"
#include "ces_test_technology.hpp"
#include "cell_tables.hpp"
#include "relative_error.hpp"

#include "reference_figures.hpp"

#include <boost/test/unit_test.hpp>

#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <iostream>
#include <sstream>

using isoquant::testing::closeTo;

namespace {

constexpr double scipyTolerance = 1e-6;

const char* figuresPath() { return isoquant::testing::referenceFiguresPath("ISOQUANT_SCIPY_LEAST_COST"); }

boost::test_tools::assertion_result figuresAvailable(boost::unit_test::test_unit_id)
{
    return isoquant::testing::referenceFiguresAvailable("ISOQUANT_SCIPY_LEAST_COST", "scipy figures");
}

std::vector<std::string> fieldsOf(const std::string& line, char separator)
{
    std::vector<std::string> fields;
    std::istringstream stream(line);
    std::string field;
    while (std::getline(stream, field, separator)) fields.push_back(field);
    return fields;
}

Eigen::VectorXd numbersOf(const std::string& field)
{
    const auto parts = fieldsOf(field, ';');
    Eigen::VectorXd values(static_cast<Eigen::Index>(parts.size()));
    for (std::size_t i = 0; i < parts.size(); ++i) values(static_cast<Eigen::Index>(i)) = std::stod(parts[i]);
    return values;
}

isoquant::CellTable typedCobbDouglas(const Eigen::VectorXd& parameters)
{
    isoquant::CellTable model(static_cast<std::size_t>(parameters.size()) + 1, 2);
    model.set(0, 0, std::string("form"));
    model.set(0, 1, std::string("cobb-douglas"));
    model.set(1, 0, std::string("A"));
    model.set(1, 1, parameters(0));
    for (Eigen::Index i = 1; i < parameters.size(); ++i) {
        model.set(static_cast<std::size_t>(i) + 1, 0, "input " + std::to_string(i));
        model.set(static_cast<std::size_t>(i) + 1, 1, parameters(i));
    }
    return model;
}

void compare(const std::string& what, const Eigen::VectorXd& actual, const Eigen::VectorXd& scipy)
{
    BOOST_TEST_REQUIRE(actual.size() == scipy.size());
    for (Eigen::Index i = 0; i < scipy.size(); ++i)
        BOOST_TEST(closeTo(actual(i), scipy(i), scipyTolerance), what << ", input " << i + 1);
}

} // namespace

BOOST_AUTO_TEST_SUITE(scipy_least_cost_cross_check)

BOOST_AUTO_TEST_CASE(least_cost_bundles_agree_with_scipy, *boost::unit_test::precondition(figuresAvailable))
{
    int compared = 0;
    for (const auto& fields : isoquant::testing::readReferenceRows(figuresPath())) {
        BOOST_TEST_REQUIRE(fields.size() == 7u);
        const std::string& name = fields[0];
        const Eigen::VectorXd parameters = numbersOf(fields[2]), prices = numbersOf(fields[3]);
        const double target = std::stod(fields[4]);
        const Eigen::VectorXd scipy = numbersOf(fields[5]);
        if (fields[1] == "cobb-douglas") {
            const auto row = isoquant::leastCostRow(typedCobbDouglas(parameters), target,
                                                    isoquant::testing::numberRange(prices.transpose()));
            Eigen::VectorXd cells(static_cast<Eigen::Index>(row.columns()));
            for (std::size_t i = 0; i < row.columns(); ++i) cells(static_cast<Eigen::Index>(i)) = row.number(0, i);
            compare(name + " (PRODLEASTCOST)", cells, scipy);
            const isoquant::CobbDouglas technology(std::log(parameters(0)), parameters.tail(parameters.size() - 1));
            compare(name + " (numerical)", isoquant::testing::requireSolved(isoquant::solveLeastCost(technology, target, prices)).inputs, scipy);
        } else {
            const isoquant::CesParameters ces{parameters(0), parameters(1), parameters(2), parameters(3)};
            compare(name + " (CES closed form)",
                    isoquant::leastCostPlan(isoquant::cesCost(ces, Eigen::Vector2d(prices)), target).inputs, scipy);
            compare(name + " (numerical)",
                    isoquant::testing::requireSolved(isoquant::solveLeastCost(isoquant::testing::CesTestTechnology(ces), target, prices)).inputs, scipy);
        }
        ++compared;
    }
    BOOST_TEST(compared == 6);
}

BOOST_AUTO_TEST_SUITE_END()
