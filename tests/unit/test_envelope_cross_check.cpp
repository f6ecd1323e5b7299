// PRODENVELOPE's scores and targets against python3-scipy 1.10 linprog (HiGHS) on the same linear
// programs, recomputed at test time by tests/reference/envelope_check.py on two invented data sets
// (40 plants with 2 outputs and 3 inputs; 30 plants with 2 outputs and 2 inputs, zeros in about a
// fifth of the second output and input): every score under constant, variable and non-increasing
// returns in both orientations, and every input and output target of the second stage (slacks
// included); and the scores of 40 plants of sizes from 1 to 1e6 (where a tolerance absolute in the
// data's units misses the smallest plants' scores; envelope_check.py says why it gives no targets).
//
// Tolerance: 1e-7 relative (absolute below 1): both solvers stop at primal and dual feasibility
// tolerances of 1e-7 (Clp on columns scaled to a mean of 1, HiGHS on its own scaling), so an
// optimum is fixed to about that, though a vertex solution usually agrees to rounding.
//
// CTest runs the script first (test envelope_figures) and passes the file it wrote in the
// environment variable ISOQUANT_ENVELOPE_FIGURES; without that file this test is skipped.
#include "isoquant/sheet/functions/envelope_functions.hpp"
#include "cell_tables.hpp"
#include "reference_figures.hpp"

#include <boost/test/unit_test.hpp>

#include <algorithm>
#include <cmath>
#include <iomanip>
#include <map>
#include <string>

using isoquant::Cell;

namespace {

constexpr double linprogTolerance = 1e-7;

boost::test_tools::assertion_result figuresAvailable(boost::unit_test::test_unit_id)
{
    return isoquant::testing::referenceFiguresAvailable("ISOQUANT_ENVELOPE_FIGURES", "envelope figures");
}

struct Figure {
    std::string dataset, quantity, returns, orientation;
    std::size_t plant = 0, column = 0;
    double value = 0;
};

std::vector<Figure> readFigures()
{
    std::vector<Figure> figures;
    for (const auto& fields : isoquant::testing::readReferenceRows(
             isoquant::testing::referenceFiguresPath("ISOQUANT_ENVELOPE_FIGURES"))) {
        if (fields.size() != 7) throw std::runtime_error("envelope figures: a line without 7 fields");
        figures.push_back({fields[0], fields[1], fields[2], fields[3], std::stoul(fields[4]), std::stoul(fields[5]),
                           std::stod(fields[6])});
    }
    return figures;
}

struct Plants {
    Eigen::MatrixXd outputs, inputs;
};

// The data sets as the script drew them, from its "output" and "input" figures.
std::map<std::string, Plants> dataSets(const std::vector<Figure>& figures)
{
    std::map<std::string, std::map<std::string, std::pair<std::size_t, std::size_t>>> shapes;
    for (const auto& f : figures)
        if (f.quantity == "output" || f.quantity == "input") {
            auto& shape = shapes[f.dataset][f.quantity];
            shape = {std::max(shape.first, f.plant + 1), std::max(shape.second, f.column + 1)};
        }
    std::map<std::string, Plants> sets;
    for (const auto& [name, shape] : shapes) {
        const auto& outputs = shape.at("output");
        const auto& inputs = shape.at("input");
        sets[name] = {Eigen::MatrixXd(outputs.first, outputs.second), Eigen::MatrixXd(inputs.first, inputs.second)};
    }
    for (const auto& f : figures) {
        const auto row = static_cast<Eigen::Index>(f.plant), column = static_cast<Eigen::Index>(f.column);
        if (f.quantity == "output") sets[f.dataset].outputs(row, column) = f.value;
        if (f.quantity == "input") sets[f.dataset].inputs(row, column) = f.value;
    }
    return sets;
}

std::string whatFor(const Figure& figure)
{
    if (figure.quantity == "score") return "score";
    const std::string prefix = figure.quantity == "input_target" ? "input " : "output ";
    return "target " + prefix + std::to_string(figure.column + 1);
}

bool agrees(double actual, double expected)
{
    return std::isfinite(actual) && std::fabs(actual - expected) <= linprogTolerance * std::max(1.0, std::fabs(expected));
}

} // namespace

BOOST_AUTO_TEST_SUITE(envelope_cross_check)

BOOST_AUTO_TEST_CASE(scores_and_targets_agree_with_scipy_linprog, *boost::unit_test::precondition(figuresAvailable))
{
    const auto figures = readFigures();
    // Exactly the figures envelope_check.py writes: the data (40 × (2 + 3), 30 × (2 + 2) and
    // 40 × (2 + 3) values), then for each of 3 returns × 2 orientations a score and 5 (4) targets per
    // plant of the first two sets, a score per plant of the third.
    BOOST_TEST_REQUIRE(figures.size() ==
                       (40u * 5u + 30u * 4u + 40u * 5u) + 6u * (40u * (1u + 5u) + 30u * (1u + 4u) + 40u));
    const auto sets = dataSets(figures);
    std::map<std::string, Eigen::VectorXd> columns;
    std::size_t compared = 0;
    double largest = 0;
    for (const auto& f : figures) {
        if (f.quantity == "output" || f.quantity == "input") continue;
        const std::string key = f.dataset + "/" + f.returns + "/" + f.orientation + "/" + whatFor(f);
        if (!columns.count(key)) {
            const Plants& plants = sets.at(f.dataset);
            columns[key] = isoquant::testing::columnValues(isoquant::envelopeColumn(
                isoquant::testing::numberRange(plants.outputs), isoquant::testing::numberRange(plants.inputs),
                Cell(f.returns), Cell(f.orientation), Cell(whatFor(f))));
        }
        const double actual = columns[key](static_cast<Eigen::Index>(f.plant));
        BOOST_TEST(agrees(actual, f.value), std::setprecision(17) << key << " plant " << f.plant << ": core " << actual
                                                                  << ", linprog " << f.value);
        largest = std::max(largest, std::fabs(actual - f.value) / std::max(1.0, std::fabs(f.value)));
        ++compared;
    }
    BOOST_TEST(compared == 6u * (40u * 6u + 30u * 5u + 40u));
    BOOST_TEST_MESSAGE("compared " << compared << " envelope figures with scipy linprog; largest difference "
                                   << largest);
}

BOOST_AUTO_TEST_SUITE_END()
