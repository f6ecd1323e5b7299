// Continuation for the tangency system (tangency_system.hpp), for technologies whose elasticities
// change sign near the data (a fitted translog with a large βᵢᵢ, say): there the marginal products
// are all positive only in a narrow wedge of input space, the equal-spending ray may not reach the
// level at all, and Levenberg–Marquardt started outside the wedge settles on a residual minimum
// that is not a root.
//
// The path: pick x₀ on the equal-spending ray xᵢ = eˢ/wᵢ where the smallest elasticity is
// largest. x₀ is exactly the tangency for the prices w⁰ᵢ = eᵢ(x₀)/x₀ᵢ (then wᵢxᵢ/μ = eᵢ with μ = 1)
// at its own level L₀. For t from 0 to 1 solve the system at
//   ln w(t) = (1 − t)·ln w⁰ + t·ln w,   L(t) = (1 − t)·L₀ + t·L,
// each from the previous answer, doubling the step in t after a success and halving it after a
// failure.
#include "tangency_system.hpp"

#include <algorithm>
#include <limits>

namespace isoquant::decisions_detail {

namespace {

// The path counts as broken when the step in t has been halved below 2⁻¹².
constexpr double smallestStep = 1.0 / 4096;
// Solves along the path, successful or not, before giving up.
constexpr int pathSolves = 200;
// Golden-section steps along the ray: 0.618⁸⁰ of the range is below 1e-14 of it.
constexpr int raySearchSteps = 80;
// The ray is searched for s in ±this, so that ln xᵢ = s − ln wᵢ stays within logBound for any
// price between e⁻¹⁰⁰ and e¹⁰⁰.
constexpr double rayLogRange = logBound - 100;

// minᵢ eᵢ(x), or −∞ where an elasticity is not finite.
double smallestElasticity(const Technology& technology, const Eigen::VectorXd& x)
{
    double smallest = std::numeric_limits<double>::infinity();
    for (Eigen::Index i = 0; i < x.size(); ++i) {
        const double elasticity = technology.elasticity(x, i);
        if (!std::isfinite(elasticity)) return -std::numeric_limits<double>::infinity();
        smallest = std::min(smallest, elasticity);
    }
    return smallest;
}

// x₀ above, by golden-section search for the largest minᵢ eᵢ over s (exact for the translog, whose
// elasticities are linear in s along a ray, so that their minimum is concave); empty where that is
// not positive.
std::optional<Eigen::VectorXd> widestPointOnPriceRay(const Technology& technology, const Eigen::VectorXd& prices)
{
    const Eigen::ArrayXd logDirection = -exactLog(prices.array());
    const auto bundleAt = [&](double s) -> Eigen::VectorXd { return exactExp(logDirection + s).matrix(); };
    const auto height = [&](double s) { return smallestElasticity(technology, bundleAt(s)); };
    const double ratio = (std::sqrt(5.0) - 1) / 2;
    double low = -rayLogRange, high = rayLogRange;
    double left = high - ratio * (high - low), right = low + ratio * (high - low);
    double leftHeight = height(left), rightHeight = height(right);
    for (int step = 0; step < raySearchSteps; ++step) {
        if (leftHeight < rightHeight) {
            low = left;
            left = right;
            leftHeight = rightHeight;
            right = low + ratio * (high - low);
            rightHeight = height(right);
        } else {
            high = right;
            right = left;
            rightHeight = leftHeight;
            left = high - ratio * (high - low);
            leftHeight = height(left);
        }
    }
    const Eigen::VectorXd best = bundleAt(0.5 * (low + high));
    if (!(smallestElasticity(technology, best) > 0) || !std::isfinite(technology.logOutput(best))) return std::nullopt;
    return best;
}

} // namespace

std::optional<Eigen::VectorXd> tangencyByContinuation(const Technology& technology, const Eigen::VectorXd& prices,
                                                      Closing closing, double logLevel,
                                                      const NumericalSolveOptions& options)
{
    const auto start = widestPointOnPriceRay(technology, prices);
    if (!start) return std::nullopt;
    const Eigen::Index k = prices.size();
    Eigen::ArrayXd startElasticities(k);
    for (Eigen::Index i = 0; i < k; ++i) startElasticities(i) = technology.elasticity(*start, i);
    const Eigen::ArrayXd logStart = exactLog(start->array());
    const Eigen::ArrayXd startLogPrices = exactLog(startElasticities) - logStart;
    // Σ w⁰ᵢx₀ᵢ = Σ eᵢ
    const double startLevel = closing == Closing::output ? technology.logOutput(*start) : std::log(startElasticities.sum());

    TangencySystem system(technology, prices, closing, logLevel);
    const Eigen::ArrayXd targetLogPrices = system.logPrices;
    Eigen::VectorXd u(k + 1);
    u << logStart.matrix(), 0.0;
    double reached = 0, step = 1;
    for (int solve = 0; solve < pathSolves && reached < 1; ++solve) {
        const double next = std::min(1.0, reached + step);
        system.logPrices = (1 - next) * startLogPrices + next * targetLogPrices;
        system.logLevel = (1 - next) * startLevel + next * logLevel;
        Eigen::VectorXd trial = u;
        if (solveSystem(system, trial, options) <= options.residualTolerance) {
            u = trial;
            reached = next;
            step *= 2;
        } else if ((step /= 2) < smallestStep) {
            return std::nullopt;
        }
    }
    if (reached < 1) return std::nullopt;
    return u;
}

} // namespace isoquant::decisions_detail
