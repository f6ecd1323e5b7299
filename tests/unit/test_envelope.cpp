// PRODENVELOPE (data envelopment, core/sheet/include/isoquant/sheet/functions/envelope_functions.hpp):
// small textbook examples whose scores are known, and properties any envelope must have.
// The scores against python3-scipy linprog are in test_envelope_cross_check.cpp.
#include "isoquant/sheet/functions/envelope_functions.hpp"
#include "cell_tables.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>
#include <random>

using isoquant::Cell;
using isoquant::CellTable;
using isoquant::envelopeColumn;
using isoquant::testing::columnValues;
using isoquant::testing::columnValuesUnder;
using isoquant::testing::numberRange;

namespace {

// The LPs are solved by Clp to its tolerances (1e-7 primal and dual, on values scaled to a mean
// of 1), and a vertex solution is exact up to rounding: 1e-9 absolute on scores of at most 1.
constexpr double lpTolerance = 1e-9;

Eigen::VectorXd scores(const Eigen::MatrixXd& outputs, const Eigen::MatrixXd& inputs, const char* returns,
                       const char* orientation = "input", const char* what = "score")
{
    return columnValues(envelopeColumn(numberRange(outputs), numberRange(inputs), Cell(std::string(returns)),
                                       Cell(std::string(orientation)), Cell(std::string(what))));
}

bool allClose(const Eigen::VectorXd& actual, const Eigen::VectorXd& expected, double tolerance)
{
    return actual.size() == expected.size() && ((actual - expected).cwiseAbs().array() <= tolerance).all();
}

// Random plants: 2 outputs, 3 inputs, log-uniform on [1, 100] (invented, for the properties).
struct Plants {
    Eigen::MatrixXd outputs, inputs;
};
Plants randomPlants(int rows, unsigned seed)
{
    std::mt19937 generator(seed);
    std::uniform_real_distribution<double> logAmount(0.0, std::log(100.0));
    Plants plants{Eigen::MatrixXd(rows, 2), Eigen::MatrixXd(rows, 3)};
    for (int row = 0; row < rows; ++row) {
        for (int r = 0; r < 2; ++r) plants.outputs(row, r) = std::exp(logAmount(generator));
        for (int i = 0; i < 3; ++i) plants.inputs(row, i) = std::exp(logAmount(generator));
    }
    return plants;
}

const char* const allReturns[] = {"constant", "variable", "non-increasing"};
const char* const allOrientations[] = {"input", "output"};

} // namespace

BOOST_AUTO_TEST_SUITE(envelope)

// Two inputs, one output of 1, six stores A–F: (4,3), (7,3), (8,1), (4,2), (2,4), (10,1); constant
// returns, input orientation: A 6/7 = 0.8571, B 12/19 = 0.6316, C, D, E, F 1 (F with a slack of 2 in
// the first input against C). Cooper, Seiford and Tone, Data Envelopment Analysis (2nd ed. 2007),
// example 3.1 (from memory); the fractions are where the ray through A meets the facet D–E
// (x₁ + x₂ = 6) and the ray through B the facet C–D (x₁ + 4x₂ = 12).
BOOST_AUTO_TEST_CASE(six_stores_two_inputs_constant_returns)
{
    Eigen::MatrixXd inputs(6, 2), outputs = Eigen::MatrixXd::Ones(6, 1);
    inputs << 4, 3, 7, 3, 8, 1, 4, 2, 2, 4, 10, 1;
    Eigen::VectorXd expected(6);
    expected << 6.0 / 7.0, 12.0 / 19.0, 1, 1, 1, 1;
    BOOST_TEST(allClose(scores(outputs, inputs, "constant"), expected, lpTolerance));
    // F's target of the first input is C's 8, not its own 10: the slack of the second stage.
    const Eigen::VectorXd target = columnValuesUnder(
        envelopeColumn(numberRange(outputs, {"sales"}), numberRange(inputs, {"staff", "area"}), Cell(), Cell(),
                       Cell(std::string("target staff"))),
        "target staff");
    BOOST_TEST(std::fabs(target(5) - 8.0) <= lpTolerance);
    BOOST_TEST(std::fabs(target(0) - 4.0 * 6.0 / 7.0) <= lpTolerance); // A: θ·x, no slack
}

// One output, two inputs, five firms (y; x₁, x₂): (1; 2, 5), (2; 2, 4), (3; 6, 6), (1; 3, 2),
// (2; 6, 2); constant returns, input orientation: 0.5, 1, 0.833, 0.714, 1. Coelli, Rao, O'Donnell
// and Battese, An Introduction to Efficiency and Productivity Analysis (2nd ed. 2005), the
// constant-returns example of chapter 6 (from memory); per unit of output the frontier runs
// through firms 2 (1, 2) and 5 (3, 1), x₁ + 2x₂ = 5, so firm 3 scores 5/6 and firm 4 5/7, and
// firm 1 reaches it on the vertical part above firm 2, x₁ = 1: 1/2.
BOOST_AUTO_TEST_CASE(five_firms_constant_returns)
{
    Eigen::MatrixXd outputs(5, 1), inputs(5, 2);
    outputs << 1, 2, 3, 1, 2;
    inputs << 2, 5, 2, 4, 6, 6, 3, 2, 6, 2;
    Eigen::VectorXd expected(5);
    expected << 0.5, 1, 5.0 / 6.0, 5.0 / 7.0, 1;
    BOOST_TEST(allClose(scores(outputs, inputs, "constant"), expected, lpTolerance));
}

// One input, one output, five firms (y; x): (1; 2), (2; 4), (3; 3), (4; 5), (5; 6). Constant
// returns: y/x over the best ratio 1, so 0.5, 0.5, 1, 0.8, 0.833; variable returns, input
// orientation: 1, 0.625, 1, 0.9, 1; scale efficiency 0.5, 0.8, 1, 0.889, 0.833. Coelli et al.
// (2005), the variable-returns example of chapter 6 (from memory); the variable-returns frontier
// runs through (x, y) = (2, 1), (3, 3), (6, 5): y = 2 at x = 2.5 and y = 4 at x = 4.5.
BOOST_AUTO_TEST_CASE(five_firms_variable_returns_and_scale)
{
    Eigen::MatrixXd outputs(5, 1), inputs(5, 1);
    outputs << 1, 2, 3, 4, 5;
    inputs << 2, 4, 3, 5, 6;
    Eigen::VectorXd constant(5), variable(5);
    constant << 0.5, 0.5, 1, 0.8, 5.0 / 6.0;
    variable << 1, 0.625, 1, 0.9, 1;
    BOOST_TEST(allClose(scores(outputs, inputs, "constant"), constant, lpTolerance));
    BOOST_TEST(allClose(scores(outputs, inputs, "variable"), variable, lpTolerance));
    BOOST_TEST(allClose(scores(outputs, inputs, "constant", "input", "scale efficiency"),
                        constant.cwiseQuotient(variable), lpTolerance));
    // Output orientation under constant returns is the same ratio (1/φ = θ).
    BOOST_TEST(allClose(scores(outputs, inputs, "constant", "output"), constant, lpTolerance));
}

// Property: a plant that defines the frontier scores 1 under every returns and orientation. The
// plant made best in every ratio (the least of every input, the most of every output) is on it.
BOOST_AUTO_TEST_CASE(a_plant_on_the_frontier_scores_one)
{
    Plants plants = randomPlants(30, 7);
    plants.outputs.row(4) = plants.outputs.colwise().maxCoeff();
    plants.inputs.row(4) = plants.inputs.colwise().minCoeff();
    for (const char* returns : allReturns)
        for (const char* orientation : allOrientations) {
            const Eigen::VectorXd score = scores(plants.outputs, plants.inputs, returns, orientation);
            BOOST_TEST(std::fabs(score(4) - 1.0) <= lpTolerance, returns << ", " << orientation);
            BOOST_TEST((score.array() <= 1.0 + lpTolerance).all(), returns << ", " << orientation);
            BOOST_TEST((score.array() > 0.0).all(), returns << ", " << orientation);
        }
}

// Property: under constant returns, doubling one plant's inputs halves its input-oriented score
// (θ x is the same point of the cone); the other plants' scores do not rise.
BOOST_AUTO_TEST_CASE(doubling_inputs_halves_the_constant_returns_score)
{
    Plants plants = randomPlants(25, 11);
    const Eigen::VectorXd before = scores(plants.outputs, plants.inputs, "constant");
    plants.inputs.row(9) *= 2.0;
    const Eigen::VectorXd after = scores(plants.outputs, plants.inputs, "constant");
    BOOST_TEST(std::fabs(after(9) - before(9) / 2.0) <= lpTolerance);
}

// Property: scores do not depend on the units of any input or output (each column scaled by its
// own factor, from 1e-3 to 1e4).
BOOST_AUTO_TEST_CASE(scores_do_not_depend_on_units)
{
    const Plants plants = randomPlants(20, 3);
    Plants rescaled = plants;
    rescaled.inputs.col(0) *= 1000.0;
    rescaled.inputs.col(2) *= 0.001;
    rescaled.outputs.col(1) *= 1e4;
    for (const char* returns : allReturns)
        for (const char* orientation : allOrientations)
            BOOST_TEST(allClose(scores(rescaled.outputs, rescaled.inputs, returns, orientation),
                                scores(plants.outputs, plants.inputs, returns, orientation), lpTolerance),
                       returns << ", " << orientation);
}

// Property: under constant returns a plant's score does not depend on its size: scaling all its
// inputs and outputs by 1e-6 (a plant a millionth of the others' size) or 1e6 leaves every score
// as it was (the frontier is a cone, and the plant's own ray is the same).
BOOST_AUTO_TEST_CASE(constant_returns_scores_do_not_depend_on_a_plants_size)
{
    const Plants plants = randomPlants(30, 5);
    for (const double factor : {1e-6, 1e6})
        for (const char* orientation : allOrientations) {
            Plants resized = plants;
            resized.outputs.row(12) *= factor;
            resized.inputs.row(12) *= factor;
            BOOST_TEST(allClose(scores(resized.outputs, resized.inputs, "constant", orientation),
                                scores(plants.outputs, plants.inputs, "constant", orientation), lpTolerance),
                       factor << ", " << orientation);
        }
}

// The result's header cell, the peers text by row number and by name, and targets of an output.
BOOST_AUTO_TEST_CASE(header_peers_and_names)
{
    Eigen::MatrixXd outputs(5, 1), inputs(5, 1);
    outputs << 1, 2, 3, 4, 5;
    inputs << 2, 4, 3, 5, 6;
    const CellTable headedOutputs = numberRange(outputs, {"visits"}), headedInputs = numberRange(inputs, {"nurses"});
    const CellTable score = envelopeColumn(headedOutputs, headedInputs, Cell(), Cell(), Cell());
    BOOST_TEST(score.rows() == 6u);
    BOOST_TEST(score.text(0, 0) == "efficiency");
    // Constant returns: every plant's peer is the third data row (row 4 with the header), λ = y/3.
    const CellTable peers =
        envelopeColumn(headedOutputs, headedInputs, Cell(), Cell(), Cell(std::string("peers")));
    BOOST_TEST(peers.text(0, 0) == "peers");
    BOOST_TEST(peers.text(1, 0) == "row 4 (0.3333)");
    BOOST_TEST(peers.text(3, 0) == "row 4 (1)");
    const CellTable names = isoquant::testing::typedRange(
        {{Cell("clinic")}, {Cell("North")}, {Cell("South")}, {Cell("East")}, {Cell("West")}, {Cell(12.0)}});
    const CellTable named = envelopeColumn(headedOutputs, headedInputs, Cell(std::string("variable")), Cell(),
                                           Cell(std::string("peers")), names);
    // Variable returns: the second clinic (x = 4, y = 2) is compared with the mix of North (2, 1)
    // and East (3, 3) that makes y = 2, λ = 1/2 each.
    BOOST_TEST(named.text(2, 0) == "North (0.5), East (0.5)");
    BOOST_TEST(named.text(5, 0) == "12 (1)");
    const Eigen::VectorXd visits = columnValuesUnder(
        envelopeColumn(headedOutputs, headedInputs, Cell(), Cell(std::string("output")), Cell(std::string("TARGET Visits"))),
        "target visits");
    BOOST_TEST(std::fabs(visits(0) - 2.0) <= lpTolerance); // x = 2 at the best ratio 1
    // Two plants under a header: the header cell and two values.
    BOOST_TEST(envelopeColumn(numberRange(outputs.topRows(2), {"visits"}), numberRange(inputs.topRows(2), {"nurses"}),
                              Cell(), Cell(), Cell())
                   .rows() == 3u);
}

BOOST_AUTO_TEST_SUITE_END()
