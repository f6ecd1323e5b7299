// Continuation for the tangency system (tangency_system.hpp), for technologies whose elasticities
// change sign near the data (a fitted translog with a large βᵢᵢ, say): there the marginal products
// are all positive only in a narrow wedge of input space, the equal-spending ray may not reach the
// level at all, and Levenberg–Marquardt started outside the wedge settles on a residual minimum
// that is not a root.
//
// The path: pick a bundle x₀ where every elasticity is positive (pathStarts: along rays of a few
// spending mixes, the nearest first). x₀ is exactly the tangency for the prices w⁰ᵢ = eᵢ(x₀)/x₀ᵢ
// (then wᵢxᵢ/μ = eᵢ with μ = 1) at its own level L₀. For t from 0 to 1 solve the system at
//   ln w(t) = (1 − t)·ln w⁰ + t·ln w,   L(t) = (1 − t)·L₀ + t·L,
// each from the previous answer, doubling the step in t after a success and halving it after a
// failure. A few starts are tried; the first path that ends in an answer the caller accepts wins.
#include "tangency_system.hpp"

#include <algorithm>
#include <limits>
#include <utility>
#include <vector>

namespace isoquant::decisions_detail {

namespace {

// The path counts as broken when the step in t has been halved below 2⁻¹².
constexpr double smallestStep = 1.0 / 4096;
// Solves along the path, successful or not, before giving up.
constexpr int pathSolves = 200;
// Paths tried, from the nearest starts (pathStarts), before the search gives up.
constexpr std::size_t pathAttempts = 4;
// Golden-section steps along the ray: 0.618⁸⁰ of the range is below 1e-14 of it.
constexpr int raySearchSteps = 80;
// The ray is searched for s in ±this, so that ln xᵢ = s + ln(shareᵢ/wᵢ) stays within logBound for
// any price between e⁻⁹⁰ and e⁹⁰ (a share is at least 1/20·1/(k − 1)).
constexpr double rayLogRange = logBound - 100;

Eigen::ArrayXd elasticitiesAt(const Technology& technology, const Eigen::VectorXd& x)
{
    Eigen::ArrayXd elasticities(x.size());
    for (Eigen::Index i = 0; i < x.size(); ++i) elasticities(i) = technology.elasticity(x, i);
    return elasticities;
}

// minᵢ eᵢ(x), or −∞ where an elasticity is not finite.
double smallestElasticity(const Technology& technology, const Eigen::VectorXd& x)
{
    const Eigen::ArrayXd elasticities = elasticitiesAt(technology, x);
    return elasticities.allFinite() ? elasticities.minCoeff() : -std::numeric_limits<double>::infinity();
}

// The bundle on the ray ln x = s + direction where the smallest elasticity is largest, by
// golden-section search over s (exact for the translog, whose elasticities are linear in s along a
// ray, so that their minimum is concave); empty where that is not positive.
std::optional<Eigen::VectorXd> widestPointOnRay(const Technology& technology, const Eigen::ArrayXd& logDirection)
{
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

// Points x₀ to start the path from, the nearest first: the widest point on the ray of each
// spending mix (equal spending; each input's share at 1/20 … 19/20 with the rest split equally),
// ordered by how far the prices that make x₀ a tangency, w⁰ᵢ ∝ eᵢ/x₀ᵢ, are from w in relative
// terms: maxᵢ |ln(w⁰ᵢ/wᵢ) − mean|.
std::vector<Eigen::VectorXd> pathStarts(const Technology& technology, const Eigen::VectorXd& prices)
{
    const Eigen::Index k = prices.size();
    std::vector<Eigen::ArrayXd> mixes{Eigen::ArrayXd::Constant(k, 1.0 / static_cast<double>(k))};
    for (Eigen::Index i = 0; i < k && k > 1; ++i)
        for (int twentieths = 1; twentieths < 20; ++twentieths) {
            const double share = twentieths / 20.0;
            Eigen::ArrayXd mix = Eigen::ArrayXd::Constant(k, (1 - share) / static_cast<double>(k - 1));
            mix(i) = share;
            mixes.push_back(mix);
        }
    std::vector<std::pair<double, Eigen::VectorXd>> starts;
    for (const Eigen::ArrayXd& mix : mixes) {
        const auto start = widestPointOnRay(technology, exactLog(mix) - exactLog(prices.array()));
        if (!start) continue;
        Eigen::ArrayXd logRatio = exactLog(elasticitiesAt(technology, *start)) - exactLog(start->array()) -
                                  exactLog(prices.array());
        logRatio -= logRatio.mean();
        starts.emplace_back(logRatio.abs().maxCoeff(), *start);
    }
    std::stable_sort(starts.begin(), starts.end(), [](const auto& a, const auto& b) { return a.first < b.first; });
    std::vector<Eigen::VectorXd> bundles;
    for (auto& start : starts) bundles.push_back(std::move(start.second));
    return bundles;
}

// u at the end of the path from x₀, or empty where it breaks.
std::optional<Eigen::VectorXd> followPath(const Technology& technology, const Eigen::VectorXd& prices, Closing closing,
                                          double logLevel, const Eigen::VectorXd& start,
                                          const NumericalSolveOptions& options)
{
    const Eigen::Index k = prices.size();
    const Eigen::ArrayXd startElasticities = elasticitiesAt(technology, start);
    const Eigen::ArrayXd logStart = exactLog(start.array());
    const Eigen::ArrayXd startLogPrices = exactLog(startElasticities) - logStart;
    // Σ w⁰ᵢx₀ᵢ = Σ eᵢ
    const double startLevel = closing == Closing::output ? technology.logOutput(start) : std::log(startElasticities.sum());

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

} // namespace

std::optional<Eigen::VectorXd> tangencyByContinuation(const Technology& technology, const Eigen::VectorXd& prices,
                                                      Closing closing, double logLevel,
                                                      const NumericalSolveOptions& options,
                                                      const std::function<bool(const Eigen::VectorXd&)>& acceptable)
{
    const std::vector<Eigen::VectorXd> starts = pathStarts(technology, prices);
    for (std::size_t attempt = 0; attempt < starts.size() && attempt < pathAttempts; ++attempt) {
        const auto reached = followPath(technology, prices, closing, logLevel, starts[attempt], options);
        if (reached && acceptable(*reached)) return reached;
    }
    return std::nullopt;
}

} // namespace isoquant::decisions_detail
