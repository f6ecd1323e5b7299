// The math layer's errors name parts of the data; the sheet layer names the arguments that hold
// them (argument_names.hpp). The words are the product's own, so the checks are exact.
#include "isoquant/sheet/arguments/argument_names.hpp"
#include "isoquant/math/fits/production_fit.hpp"

#include <boost/test/unit_test.hpp>

#include <string>

namespace {

// Five rows whose trend column has four: the fit's own check on the periods.
isoquant::ProductionData dataWithShortTrend()
{
    isoquant::ProductionData data;
    data.output = Eigen::VectorXd::LinSpaced(5, 1.0, 2.0);
    data.inputs = Eigen::VectorXd::LinSpaced(5, 3.0, 9.0);
    data.controls.resize(5, 0);
    data.inputLabels = {"hours"};
    data.panel.periods = Eigen::VectorXd::LinSpaced(4, 2001, 2004);
    return data;
}

std::string caught(const std::function<void()>& action, bool asSheetShowsIt)
{
    try {
        action();
    } catch (const isoquant::InputError& error) {
        return asSheetShowsIt ? isoquant::sheetMessage(error) : std::string(error.what());
    }
    return "<no InputError>";
}

} // namespace

BOOST_AUTO_TEST_CASE(a_math_error_names_data_and_the_sheet_names_the_argument)
{
    const auto fit = [] { isoquant::fitProduction(dataWithShortTrend(), {}); };
    BOOST_TEST(caught(fit, false) == "periods: has 4 rows of data but output has 5");
    BOOST_TEST(caught(fit, true) == "trend: has 4 rows of data but output has 5");
}

BOOST_AUTO_TEST_CASE(parts_are_placed_where_the_detail_says_or_in_front)
{
    using isoquant::DataPart;
    const isoquant::InputError inFront({DataPart::cost, DataPart::output, DataPart::prices}, "too few rows");
    BOOST_TEST(isoquant::sheetMessage(inFront) == "cost, output and input prices: too few rows");
    const isoquant::InputError placed({DataPart::covarianceKind, DataPart::groups}, "{0}: \"cluster\" needs the {1} argument");
    BOOST_TEST(isoquant::sheetMessage(placed) == "errors: \"cluster\" needs the groups argument");
    BOOST_TEST(std::string(placed.what()) == "covariance kind: \"cluster\" needs the groups argument");
    const isoquant::InputError listed({DataPart::output, DataPart::inputs}, "too few rows: {parts} have 3 rows");
    BOOST_TEST(isoquant::sheetMessage(listed) == "too few rows: output and inputs have 3 rows");
}

BOOST_AUTO_TEST_CASE(a_message_written_by_the_sheet_layer_is_shown_as_it_is)
{
    const isoquant::InputError written("model: row 3 has no label");
    BOOST_TEST(written.parts().empty());
    BOOST_TEST(isoquant::sheetMessage(written) == "model: row 3 has no label");
}

BOOST_AUTO_TEST_CASE(every_part_is_held_by_an_argument_of_the_function_wizard)
{
    using isoquant::DataPart;
    BOOST_TEST(isoquant::argumentHolding(DataPart::periods) == isoquant::argument::trend);
    BOOST_TEST(isoquant::argumentHolding(DataPart::covarianceKind) == isoquant::argument::errors);
    BOOST_TEST(isoquant::argumentHolding(DataPart::prices) == isoquant::argument::inputPrices);
    BOOST_TEST(isoquant::argumentHolding(DataPart::constantReturns) == isoquant::argument::constantReturns);
}
