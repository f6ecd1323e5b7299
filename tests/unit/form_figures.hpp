// The check shared by the cross-checks of translog and ces bounds against reference scripts whose
// rows are form,errors,quantity,index,value (decision_bounds_check.py, plan_bounds_check.py).
#pragma once

#include "covariance_tables.hpp"
#include "reference_data.hpp"
#include "relative_error.hpp"

#include <boost/test/unit_test.hpp>

#include <functional>
#include <map>
#include <string>
#include <vector>

namespace isoquant::testing {

using FormFigure = std::function<double(const CellTable&, const std::string&, std::size_t)>;

// Each row's value against coreFigure(table, quantity, index) to 1e-7 relative (the issue's), over
// the table its form and `errors` name: "ces", "typed": the typed ces with its block
// (typedCesWithBlock); "translog": the translog of Cobb & Douglas (1928) with that kind of errors
// and its block; "translog3": the same of the rice-farm panel's goutput on seed, urea and totlabor.
inline void checkFormFigures(const std::vector<std::vector<std::string>>& rows, const FormFigure& coreFigure)
{
    std::map<std::string, CellTable> tables{{"ces typed", typedCesWithBlock()}};
    for (const auto& fields : rows) {
        const std::string key = fields.at(0) + " " + fields.at(1);
        if (!tables.count(key)) {
            auto arguments = fields.at(0) == "translog3" ? riceFarmArguments({"seed", "urea", "totlabor"})
                                                         : cobbDouglas1928Arguments();
            arguments.form = std::string("translog");
            arguments.errors = fields.at(1);
            tables.emplace(key, tableWithBlock(fitFromArguments(arguments)));
        }
        const double expected = std::stod(fields.at(4));
        const double core = coreFigure(tables.at(key), fields.at(2), std::stoul(fields.at(3)));
        BOOST_TEST_CONTEXT(key << " " << fields.at(2) << " at " << fields.at(3))
        BOOST_TEST(closeTo(core, expected, 1e-7), core << " against " << expected);
    }
}

} // namespace isoquant::testing
