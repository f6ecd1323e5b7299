// `what` of PRODOUTPUT, PRODMARGINAL, PRODELASTICITY, PRODSCALE and the decisions on translog and
// ces tables with their covariance block (issue 20, form_gradients.hpp): where the table itself
// states the same quantity with its inference, `what` must give the table's figures (the translog's elasticities
// and returns to scale at the sample mean of the logs; the ces's nu), and the words a model cannot
// answer get a message naming the argument. Data: Cobb & Douglas (1928) and the Munnell (1990) state
// panel (tests/data/README.md). The figures themselves are checked against statsmodels and numpy in
// test_form_bounds_cross_check.cpp and tests/integration/test_form_bounds_in_calc.py.
#include "isoquant/math/fits/translog_fit.hpp"
#include "isoquant/sheet/functions/bound_functions.hpp"
#include "isoquant/sheet/functions/decision_functions.hpp"
#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/sheet/tables/covariance_block.hpp"
#include "isoquant/sheet/tables/fit_table.hpp"
#include "cell_tables.hpp"
#include "covariance_tables.hpp"
#include "input_error_message.hpp"
#include "reference_data.hpp"
#include "relative_error.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>

using isoquant::testing::closeTo;
using isoquant::testing::messageOf;

namespace {

isoquant::ProductionFit fitOf(isoquant::FitArguments arguments, const std::string& form)
{
    arguments.form = form;
    return isoquant::fitFromArguments(arguments);
}

double first(const isoquant::CellTable& column) { return column.number(0, 0); }

const std::array<const char*, 3> words{"std. error", "lower bound", "upper bound"};

} // namespace

BOOST_AUTO_TEST_SUITE(form_bounds)

// At the bundle exp(l̄) (l̄ the sample mean of the log inputs) εᵢ and ν are the table's own
// "elasticity <label>" and "returns to scale" rows, with the same gradient: 1e-9 relative (exp and
// log of l̄ round).
BOOST_AUTO_TEST_CASE(translog_elasticities_at_the_mean_are_the_tables)
{
    const auto fit = fitOf(isoquant::testing::cobbDouglas1928Arguments(), "translog");
    const auto table = isoquant::testing::tableWithBlock(fit);
    const Eigen::VectorXd mean = fit.translog->meanLogInputs;
    isoquant::CellTable bundle(1, 2);
    for (std::size_t i = 0; i < 2; ++i) bundle.set(0, i, std::exp(mean(static_cast<Eigen::Index>(i))));
    const auto& elasticities = fit.translog->elasticities;
    for (Eigen::Index i = 0; i < 2; ++i) {
        const double input = static_cast<double>(i + 1);
        const double expected[] = {elasticities.standardErrors(i), elasticities.lowerBounds(i),
                                   elasticities.upperBounds(i)};
        for (std::size_t word = 0; word < 3; ++word)
            BOOST_TEST(closeTo(first(isoquant::elasticityColumnWithBounds(table, bundle, input, std::string(words[word]))),
                               expected[word], 1e-9));
    }
    BOOST_TEST(closeTo(first(isoquant::scaleColumnWithBounds(table, bundle, std::string("std. error"))),
                       fit.returns.standardError, 1e-9));
}

// The ces's ν is a parameter: PRODSCALE's bounds are the table's bounds of nu (1e-12 relative: the
// same t quantile, computed twice). Output and a marginal product get bounds on the log scale
// (lower·upper = value², 1e-12), and "value" is the plain function's answer.
BOOST_AUTO_TEST_CASE(ces_scale_is_the_tables_nu_and_output_bounds_are_on_the_log_scale)
{
    const auto fit = fitOf(isoquant::testing::cobbDouglas1928Arguments(), "ces");
    const auto table = isoquant::testing::tableWithBlock(fit);
    BOOST_TEST(closeTo(first(isoquant::scaleColumnWithBounds(table, {}, std::string("lower bound"))),
                       fit.inference.lowerBounds(3), 1e-12));
    BOOST_TEST(closeTo(first(isoquant::scaleColumnWithBounds(table, {}, std::string("upper bound"))),
                       fit.inference.upperBounds(3), 1e-12));
    const auto bundle = isoquant::testing::typedRange({{150.0, 200.0}});
    const double output = first(isoquant::outputColumn(table, bundle));
    BOOST_TEST(first(isoquant::outputColumnWithBounds(table, bundle, {}, std::string("value"))) == output);
    const double low = first(isoquant::outputColumnWithBounds(table, bundle, {}, std::string("lower bound")));
    const double high = first(isoquant::outputColumnWithBounds(table, bundle, {}, std::string("upper bound")));
    BOOST_TEST(low < output);
    BOOST_TEST(output < high);
    BOOST_TEST(closeTo(low * high, output * output, 1e-12));
    const double marginal = first(isoquant::marginalProductColumn(table, bundle, 2.0));
    const double marginalLow = first(isoquant::marginalProductColumnWithBounds(table, bundle, 2.0, std::string("lower bound")));
    const double marginalHigh = first(isoquant::marginalProductColumnWithBounds(table, bundle, 2.0, std::string("upper bound")));
    BOOST_TEST(closeTo(marginalLow * marginalHigh, marginal * marginal, 1e-12));
}

// PRODMRTS of a translog where both elasticities are positive and of a ces, the least-cost amounts
// and the budget plan's output: bounds on the log scale (lower·upper = value², 1e-12); PRODSECOND's
// bounds are value ∓ t·se (their mean is the value, 1e-12). Prices (4, 3), output 180 and budget
// 1000 invented. The figures: test_decision_bounds_cross_check.cpp, test_plan_bounds_cross_check.cpp.
BOOST_AUTO_TEST_CASE(decisions_answer_on_translog_and_ces_tables)
{
    using namespace isoquant;
    const auto bundle = testing::typedRange({{150.0, 200.0}});
    const auto prices = testing::typedRange({{4.0, 3.0}});
    const Cell low = std::string("lower bound"), high = std::string("upper bound");
    for (const char* form : {"translog", "ces"}) {
        const auto table = testing::tableWithBlock(fitOf(testing::cobbDouglas1928Arguments(), form));
        BOOST_TEST_CONTEXT(form)
        {
            const double rate = first(technicalRateColumnWithBounds(table, bundle, 1.0, 2.0, {}));
            const double rateLow = first(technicalRateColumnWithBounds(table, bundle, 1.0, 2.0, low));
            BOOST_TEST(rateLow < rate);
            BOOST_TEST(closeTo(rateLow * first(technicalRateColumnWithBounds(table, bundle, 1.0, 2.0, high)),
                               rate * rate, 1e-12));
            const double partial = first(secondPartialColumnWithBounds(table, bundle, 1.0, 2.0, {}));
            const double below = first(secondPartialColumnWithBounds(table, bundle, 1.0, 2.0, low));
            const double above = first(secondPartialColumnWithBounds(table, bundle, 1.0, 2.0, high));
            BOOST_TEST(closeTo((below + above) / 2, partial, 1e-12));
            BOOST_TEST(first(substitutionColumnWithBounds(table, bundle, 1.0, 2.0, {}, std::string("std. error"))) > 0);
            // The plans: amounts and output on the log scale.
            const double amount = leastCostRow(table, 180.0, prices).number(0, 1);
            BOOST_TEST(closeTo(leastCostRowWithBounds(table, 180.0, prices, low).number(0, 1) *
                                   leastCostRowWithBounds(table, 180.0, prices, high).number(0, 1),
                               amount * amount, 1e-12));
            const double output = budgetRow(table, 1000.0, prices).number(0, 2);
            const double outputLow = budgetRowWithBounds(table, 1000.0, prices, low).number(0, 2);
            BOOST_TEST(outputLow < output);
            BOOST_TEST(closeTo(outputLow * budgetRowWithBounds(table, 1000.0, prices, high).number(0, 2),
                               output * output, 1e-12));
        }
    }
}

BOOST_AUTO_TEST_CASE(words_other_forms_cannot_answer_get_a_message)
{
    const auto translog = isoquant::testing::tableWithBlock(fitOf(isoquant::testing::cobbDouglas1928Arguments(), "translog"));
    const auto bundle = isoquant::testing::typedRange({{150.0, 200.0}});
    BOOST_TEST(messageOf([&] { isoquant::scaleColumnWithBounds(translog, {}, std::string("std. error")); }) ==
               "inputs: the translog's returns to scale and their bounds vary with the inputs; give a row of inputs");
    // With a control the evaluators' ln A is at the control's mean, the block's last row: output is
    // answered (its figures: test_shifted_bounds_cross_check.cpp), and so are the elasticities.
    const auto controlled = isoquant::testing::tableWithBlock(fitOf(isoquant::testing::statePanelArguments(), "translog"));
    const auto three = isoquant::testing::typedRange({{20000.0, 30000.0, 1000.0}});
    BOOST_TEST(first(isoquant::outputColumnWithBounds(controlled, three, {}, std::string("std. error"))) > 0);
    BOOST_TEST(std::isfinite(first(isoquant::elasticityColumnWithBounds(controlled, three, 1.0, std::string("std. error")))));
    // So are TFP (through that shifted ln A) and the MRTS (free of it); the observed output is invented.
    const auto observed = isoquant::testing::typedRange({{30000.0}});
    BOOST_TEST(first(isoquant::productivityColumnWithBounds(controlled, observed, three, {}, std::string("std. error"))) > 0);
    BOOST_TEST(first(isoquant::technicalRateColumnWithBounds(controlled, three, 1.0, 3.0, std::string("std. error"))) > 0);
    // A typed ces at delta = 1 with a block typed by hand: no derivative in delta there.
    const auto edge = isoquant::testing::typedRange(
        {{std::string("form"), std::string("ces"), isoquant::Cell{}, isoquant::Cell{}, isoquant::Cell{}},
         {std::string("ln A"), 0.0, isoquant::Cell{}, isoquant::Cell{}, isoquant::Cell{}},
         {std::string("delta"), 1.0, isoquant::Cell{}, isoquant::Cell{}, isoquant::Cell{}},
         {std::string("rho"), 0.5, isoquant::Cell{}, isoquant::Cell{}, isoquant::Cell{}},
         {std::string("nu"), 1.0, isoquant::Cell{}, isoquant::Cell{}, isoquant::Cell{}},
         {std::string("covariance"), std::string("classical"), 20.0, 0.95, isoquant::Cell{}},
         {std::string("ln A"), 0.01, 0.0, 0.0, 0.0},
         {std::string("delta"), 0.0, 0.01, 0.0, 0.0},
         {std::string("rho"), 0.0, 0.0, 0.01, 0.0},
         {std::string("nu"), 0.0, 0.0, 0.0, 0.01}});
    BOOST_TEST(messageOf([&] { isoquant::marginalProductColumnWithBounds(edge, bundle, 1.0, std::string("std. error")); }) ==
               "what: the ces parameters lie on the edge of their range (delta 0 or 1), where this quantity has no "
               "derivative in them; bounds need an interior fit");
}

BOOST_AUTO_TEST_SUITE_END()
