// `what` of PRODTFP, PRODSECOND, PRODMRTS, PRODBUDGET and PRODSUBSTITUTION (bound_functions.hpp):
// the plain function answers first (its checks, messages and sentences unchanged), then each of
// its numbers is replaced by its standard error or bound (delta_method.hpp), with the gradient of
// the Cobb-Douglas form given beside each function.
#include "isoquant/sheet/functions/bound_functions.hpp"

#include "functions/delta_method.hpp"

#include "isoquant/sheet/functions/growth_functions.hpp"

#include <cmath>

namespace isoquant {

using namespace delta_method;

CellTable productivityColumnWithBounds(const CellTable& model, const CellTable& output, const CellTable& inputs,
                                       const CellTable& periods, const Cell& what)
{
    const Statistic statistic = readWhat(what, false);
    const CellTable values = productivityColumn(model, output, inputs, periods);
    if (statistic == Statistic::value) return values;
    // TFP = Y/f(x) with Y observed: ln TFP = ln Y − ln A − Σ bᵢ ln xᵢ, so g of ln TFP is minus g of
    // ln f(x): (−1, −ln x₁ … −ln x_k, 0 …). Positive by nature: bounds on the log scale.
    const BoundsModel read = readBoundsModel(model, statistic, true);
    return boundsOfValueColumn(values, inputs, read, statistic, [&](const Eigen::VectorXd& bundle, double tfp) {
        return Linearised{tfp, -logOutputGradient(read, bundle), true};
    });
}

} // namespace isoquant
