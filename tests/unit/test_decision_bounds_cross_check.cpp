// Standard errors and bounds of the decisions' derived numbers on translog and ces models (issue 20:
// PRODTFP, PRODSECOND, PRODMRTS and PRODSUBSTITUTION with `what`), against
// tests/reference/decision_bounds_check.py, recomputed at test time:
// - translog: a PRODFIT table with its covariance block of the Cobb & Douglas (1928) data
//   (tests/data/README.md), against python3-statsmodels' covariance of the same OLS regression
//   (classical and HC1) and a complex-step gradient in numpy of each quantity written from the
//   textbook partials f_i, f_ij (not the core's scaled local shape);
// - ces: a typed model with a typed covariance block (the script's CES_THETA and CES_COVARIANCE,
//   invented, typed here again), so the covariance and parameters are the table's own; the
//   gradient again numpy's complex step.
// At (100, 100) the translog's εC is negative, so its MRTS takes the path of a quantity that is not
// positive (value ∓ t·se), checked as well. With two inputs the direct, Allen and Morishima
// elasticities coincide in value, so three inputs too: the translog of the rice-farm panel
// (Feng and Horrace 2012; goutput on seed, urea, totlabor; statsmodels' covariance, classical and
// HC1), where Allen's and Morishima's differ and Morishima's is checked in both orders.
//
// Tolerance: 1e-7 relative on every figure (the issue's). Both gradients are exact to rounding; the
// two covariance matrices agree to about 1e-12, and gᵀVg cancels up to five digits here, which
// leaves 1e-7 room to spare and still catches a wrong term (a slope's sign, a missing ½).
#include "isoquant/sheet/functions/bound_functions.hpp"
#include "cell_tables.hpp"
#include "form_figures.hpp"
#include "reference_figures.hpp"

#include <boost/test/unit_test.hpp>

#include <array>
#include <cctype>
#include <map>
#include <string>

namespace {

using isoquant::Cell;

boost::test_tools::assertion_result figuresAvailable(boost::unit_test::test_unit_id)
{
    return isoquant::testing::referenceFiguresAvailable("ISOQUANT_DECISION_BOUNDS_FIGURES",
                                                        "translog and ces decision bounds figures");
}

// decision_bounds_check.py's BUNDLES (L, C) and OBSERVED outputs.
constexpr std::array<std::array<double, 2>, 3> bundles{{{150.0, 200.0}, {250.0, 400.0}, {100.0, 100.0}}};
constexpr std::array<double, 3> observed{160.0, 230.0, 110.0};

// decision_bounds_check.py's RICE_BUNDLES (seed, urea, totlabor).
constexpr std::array<std::array<double, 3>, 2> riceBundles{{{10.0, 60.0, 250.0}, {20.0, 100.0, 430.0}}};

// A three-input figure "<kind>_<i>_<j>" (kind direct, allen, morishima, second or mrts; inputs
// numbered from 1) of the translog of the rice-farm panel.
double threeInputFigure(const isoquant::CellTable& model, const std::string& name, const Cell& what,
                        std::size_t bundle)
{
    const isoquant::CellTable inputs = isoquant::testing::typedRange(
        {{riceBundles[bundle][0], riceBundles[bundle][1], riceBundles[bundle][2]}});
    const std::string kind = name.substr(0, name.find('_'));
    const double i = name[name.size() - 3] - '0', j = name[name.size() - 1] - '0';
    if (kind == "second") return isoquant::secondPartialColumnWithBounds(model, inputs, i, j, what).number(0, 0);
    if (kind == "mrts") return isoquant::technicalRateColumnWithBounds(model, inputs, i, j, what).number(0, 0);
    return isoquant::substitutionColumnWithBounds(model, inputs, i, j, kind, what).number(0, 0);
}

// The core's figure for a quantity of decision_bounds_check.py ("mrts_se", "second_LC_upper",
// "morishima_2_1_lower", …).
double coreFigure(const isoquant::CellTable& model, const std::string& quantity, std::size_t bundle)
{
    isoquant::CellTable inputs(1, 2), output(1, 1);
    inputs.set(0, 0, bundles[bundle][0]);
    inputs.set(0, 1, bundles[bundle][1]);
    output.set(0, 0, observed[bundle]);
    const std::map<std::string, std::string> words{
        {"se", "std. error"}, {"lower", "lower bound"}, {"upper", "upper bound"}};
    const auto split = quantity.rfind('_');
    const std::string name = quantity.substr(0, split);
    const Cell what = words.at(quantity.substr(split + 1));
    if (std::isdigit(static_cast<unsigned char>(name.back()))) return threeInputFigure(model, name, what, bundle);
    const std::map<char, double> input{{'L', 1.0}, {'C', 2.0}};
    if (name == "tfp") return isoquant::productivityColumnWithBounds(model, output, inputs, {}, what).number(0, 0);
    if (name.rfind("second_", 0) == 0)
        return isoquant::secondPartialColumnWithBounds(model, inputs, input.at(name[7]), input.at(name[8]), what)
            .number(0, 0);
    if (name == "mrts") return isoquant::technicalRateColumnWithBounds(model, inputs, 1.0, 2.0, what).number(0, 0);
    if (name.rfind("substitution_", 0) == 0)
        return isoquant::substitutionColumnWithBounds(model, inputs, 1.0, 2.0, name.substr(13), what).number(0, 0);
    throw std::runtime_error("unknown quantity " + quantity);
}

} // namespace

BOOST_AUTO_TEST_SUITE(decision_bounds_cross_check)

BOOST_AUTO_TEST_CASE(translog_and_ces_decision_bounds_agree_with_numpy, *boost::unit_test::precondition(figuresAvailable))
{
    const auto rows = isoquant::testing::readReferenceRows(
        isoquant::testing::referenceFiguresPath("ISOQUANT_DECISION_BOUNDS_FIGURES"));
    // (translog classical, translog hc1, typed ces) × 3 bundles × 8 quantities × 3 words, and the
    // three-input translog (classical, hc1) × 2 bundles × 9 quantities × 3 words.
    BOOST_TEST_REQUIRE(rows.size() == 3u * 3u * 24u + 2u * 2u * 27u);
    isoquant::testing::checkFormFigures(rows, coreFigure);
}

BOOST_AUTO_TEST_SUITE_END()
