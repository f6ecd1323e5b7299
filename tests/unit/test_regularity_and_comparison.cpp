// PRODREGULAR and PRODCOMPARE through their cell functions. Regularity is checked against the
// definition of quasi-concavity itself: on the isoquant through a bundle, the midpoint of two
// nearby points of the isoquant must give at least as much output (convex isoquants); the
// technologies are invented. The comparison uses Cobb & Douglas (1928) and the rice-farm panel
// (tests/data/README.md); its figures are cross-checked in test_forms_cross_check.cpp.
#include "isoquant/math/forms/ces.hpp"
#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/math/forms/cobb_douglas.hpp"
#include "isoquant/math/forms/regularity.hpp"
#include "isoquant/math/forms/translog.hpp"
#include "cell_tables.hpp"
#include "input_error_message.hpp"
#include "reference_data.hpp"

#include <boost/math/tools/roots.hpp>
#include <boost/test/unit_test.hpp>

#include <cmath>
#include <random>

using isoquant::Cell;

namespace {

const std::vector<std::string> labels{"a", "b"};

// The second input that puts (x₁, ·) on the isoquant Y = target (found by TOMS 748 on ln Y, which
// increases in x₂ where the marginal product of x₂ is positive); NaN when no second input within
// e^±10 of the guess reaches the target (an isoquant with an asymptote, as for strong complements).
double onIsoquant(const isoquant::Technology& technology, double first, double target, double guess)
{
    const auto gap = [&](double logSecond) {
        return technology.logOutput(Eigen::Vector2d(first, std::exp(logSecond))) - std::log(target);
    };
    boost::math::tools::eps_tolerance<double> tolerance(50);
    std::uintmax_t iterations = 200;
    const double low = std::log(guess) - 10, high = std::log(guess) + 10;
    if (!(gap(low) < 0 && gap(high) > 0)) return std::nan("");
    const auto root = boost::math::tools::toms748_solve(gap, low, high, tolerance, iterations);
    return std::exp((root.first + root.second) / 2);
}

// Quasi-concave near x by the definition: the midpoint of the isoquant points at x₁ ± h·x₁
// (h = 1e-2) yields at least Y(x). Returns the relative excess of the midpoint's output.
double midpointExcess(const isoquant::Technology& technology, const Eigen::Vector2d& x)
{
    const double target = technology.output(x);
    const double h = 1e-2 * x(0);
    const Eigen::Vector2d left(x(0) - h, onIsoquant(technology, x(0) - h, target, x(1)));
    const Eigen::Vector2d right(x(0) + h, onIsoquant(technology, x(0) + h, target, x(1)));
    return technology.output((left + right) / 2) / target - 1;
}

} // namespace

BOOST_AUTO_TEST_SUITE(regularity_and_comparison)

BOOST_AUTO_TEST_CASE(bordered_hessian_agrees_with_the_definition)
{
    // CES from complements to beyond perfect substitutes (ρ < −1 gives concave isoquants), and
    // translogs with interactions strong enough to bend isoquants either way. The midpoint excess
    // is of order h² ≈ 1e-4 times the curvature; cases within 1e-9 of zero (straight isoquants) are
    // not judged by it.
    std::vector<std::unique_ptr<isoquant::Technology>> technologies;
    for (const double rho : {-2.0, -1.5, -0.5, 0.0, 0.7, 3.0})
        technologies.push_back(std::make_unique<isoquant::Ces>(0.1, 0.4, rho, 0.9));
    for (const double own : {-0.3, -0.05, 0.2, 0.6}) {
        Eigen::Matrix2d beta;
        beta << own, -0.1, -0.1, own;
        technologies.push_back(std::make_unique<isoquant::Translog>(0.2, Eigen::Vector2d(0.5, 0.4), beta));
    }
    std::mt19937 engine(20260305);
    std::uniform_real_distribution<double> logInput(0.0, std::log(20.0));
    std::size_t judged = 0, regular = 0;
    for (const auto& technology : technologies) {
        for (int draw = 0; draw < 10; ++draw) {
            const Eigen::Vector2d x(std::exp(logInput(engine)), std::exp(logInput(engine)));
            const Eigen::Vector2d marginal = technology->gradient(x);
            if (!(marginal.array() > 0).all()) continue; // the isoquant is not a function x₂(x₁) here
            const double excess = midpointExcess(*technology, x);
            if (!(std::fabs(excess) >= 1e-9)) continue; // straight, or no isoquant point found
            const std::string phrase = isoquant::regularityPhrase(*technology, x, labels);
            BOOST_TEST((phrase == "regular") == (excess > 0), "at " << x.transpose() << ": " << phrase
                                                                    << ", midpoint excess " << excess);
            ++judged;
            regular += phrase == "regular";
        }
    }
    // Both verdicts occur, so the comparison means something.
    BOOST_TEST(judged >= 60u);
    BOOST_TEST(regular > 0u);
    BOOST_TEST(regular < judged);
}

BOOST_AUTO_TEST_CASE(phrases_name_what_fails)
{
    const Eigen::Vector2d x(2.0, 3.0);
    BOOST_TEST(isoquant::regularityPhrase(isoquant::CobbDouglas(0.0, Eigen::Vector2d(0.6, 0.3)), x, labels) == "regular");
    // The bordered minor is b₁b₂(b₁ + b₂): negative with b₂ = −0.3, positive with b₂ = −0.8.
    BOOST_TEST(isoquant::regularityPhrase(isoquant::CobbDouglas(0.0, Eigen::Vector2d(0.6, -0.3)), x, labels) ==
               "marginal product of b is not positive; not quasi-concave: the isoquant of a and b bends the wrong way");
    BOOST_TEST(isoquant::regularityPhrase(isoquant::CobbDouglas(0.0, Eigen::Vector2d(0.6, -0.8)), x, labels) ==
               "marginal product of b is not positive");
    BOOST_TEST(isoquant::regularityPhrase(isoquant::CobbDouglas(0.0, Eigen::Vector2d(-0.6, -0.3)), x, labels) ==
               "marginal products of a and b are not positive; not quasi-concave: the isoquant of a and b bends the "
               "wrong way");
    BOOST_TEST(isoquant::regularityPhrase(isoquant::Ces(0.0, 0.5, -1.5, 1.0), x, labels) ==
               "not quasi-concave: the isoquant of a and b bends the wrong way");
    // Perfect substitutes: straight isoquants, quasi-concave though not strictly.
    BOOST_TEST(isoquant::regularityPhrase(isoquant::Ces(0.0, 0.5, -1.0, 1.0), x, labels) == "regular");
    // One input: only the marginal product matters.
    BOOST_TEST(isoquant::regularityPhrase(isoquant::CobbDouglas(0.0, Eigen::VectorXd::Constant(1, 1.5)),
                                          Eigen::VectorXd::Constant(1, 2.0), {"a"}) == "regular");
}

BOOST_AUTO_TEST_CASE(regularity_column_reads_a_typed_ces_model)
{
    const auto model = isoquant::testing::typedRange({{std::string("form"), std::string("ces")},
                                                      {std::string("A"), 2.0},
                                                      {std::string("delta"), 0.4},
                                                      {std::string("sigma"), 4.0},
                                                      {std::string("nu"), 1.0},
                                                      {std::string("inputs"), std::string("hours")}});
    BOOST_TEST(isoquant::testing::messageOf([&] {
                   isoquant::regularityColumn(model, isoquant::testing::numberRange(Eigen::RowVector2d(1, 2)));
               }) == "model: the inputs row of a ces model must name two inputs");
    auto named = model;
    named.set(5, 1, std::string("machines"));
    const auto bundles = isoquant::testing::numberRange(Eigen::RowVector2d(1.0, 2.0));
    // The inputs row has one text cell; widen the model by a column for the second label.
    isoquant::CellTable wide(6, 3);
    for (std::size_t row = 0; row < 6; ++row)
        for (std::size_t column = 0; column < 2; ++column) wide.set(row, column, model.at(row, column));
    wide.set(5, 2, std::string("machines"));
    const isoquant::CellTable column = isoquant::regularityColumn(wide, bundles);
    BOOST_TEST((column.at(0, 0) == Cell(std::string("regular"))));
    BOOST_TEST((isoquant::marginalProductColumn(wide, bundles, std::string("machines")).at(0, 0) ==
                isoquant::marginalProductColumn(wide, bundles, 2.0).at(0, 0)));
}

BOOST_AUTO_TEST_CASE(comparison_table_layout)
{
    const auto arguments = isoquant::testing::cobbDouglas1928Arguments();
    const isoquant::CellTable table = isoquant::compareFormsTable(arguments.output, arguments.inputs, Cell{});
    BOOST_TEST(table.rows() == 8u);
    BOOST_TEST(table.columns() == 7u);
    const char* firstColumn[] = {"form", "cobb-douglas", "ces", "translog", nullptr, "nested test",
                                 "translog vs cobb-douglas", "ces vs cobb-douglas"};
    for (std::size_t row = 0; row < 8; ++row)
        if (firstColumn[row]) BOOST_TEST((table.at(row, 0) == Cell(std::string(firstColumn[row]))));
    BOOST_TEST((table.at(1, 1) == Cell(3.0)));
    BOOST_TEST((table.at(2, 1) == Cell(4.0)));
    BOOST_TEST((table.at(3, 1) == Cell(6.0)));
    // Ranks are a permutation of 1, 2, 3 by each criterion.
    for (std::size_t column : {5u, 6u}) {
        double sum = 0;
        for (std::size_t row = 1; row <= 3; ++row) sum += table.number(row, column);
        BOOST_TEST(sum == 6.0);
    }
    BOOST_TEST((table.at(7, 5) == Cell(std::string("chi-squared"))));
    // Cobb & Douglas (1928) fit their function well: neither test rejects it at 5% (LR p = 0.81 by
    // scipy, see forms_check.py; the translog F has p above 0.05 too).
    BOOST_TEST((table.at(6, 6) == Cell(std::string("cobb-douglas not rejected"))));
    BOOST_TEST((table.at(7, 6) == Cell(std::string("cobb-douglas not rejected"))));
}

BOOST_AUTO_TEST_CASE(comparison_says_which_form_cannot_be_fitted)
{
    const auto arguments = isoquant::testing::riceFarmArguments({"size", "totlabor", "seed"});
    const isoquant::CellTable table = isoquant::compareFormsTable(arguments.output, arguments.inputs, Cell{});
    BOOST_TEST((table.at(2, 1) ==
                Cell(std::string("not fitted: inputs: the ces form takes exactly two inputs; this range has 3 columns"))));
    BOOST_TEST((table.at(7, 1) == Cell(std::string("n/a: no ces fit"))));
    BOOST_TEST(table.number(1, 5) + table.number(3, 5) == 3.0);
    BOOST_TEST(isoquant::testing::messageOf([&] {
                   isoquant::compareFormsTable(arguments.output, arguments.inputs, std::string("high"));
               }) == "level: 'high' is not a confidence level; give a number between 0 and 1, such as 0.95");
}

BOOST_AUTO_TEST_SUITE_END()
