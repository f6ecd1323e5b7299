// The plan of a decision that must have one: the test stops, saying why, when its status says
// there is none (a plan without a solution has no amounts to compare).
#pragma once

#include "isoquant/math/decisions/production_plan.hpp"

#include <boost/test/unit_test.hpp>

namespace isoquant::testing {

inline ProductionPlan requireSolved(ProductionPlan plan)
{
    BOOST_TEST_REQUIRE(plan.solved(), "no plan: " << plan.status.reason);
    return plan;
}

} // namespace isoquant::testing
