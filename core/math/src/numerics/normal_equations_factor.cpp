// The normal-equations route of the least-squares factor (least_squares_factor.hpp).
#include "numerics/least_squares_factor.hpp"

#include "isoquant/math/numerics/column_products.hpp"

#include "isoquant/math/numerics/exact_elementwise.hpp"

#include <Eigen/Cholesky>

#include <array>
#include <cmath>
#include <limits>
#include <stdexcept>

namespace isoquant {

namespace {

// The Gram matrix is formed from the unscaled values, so it is used only when every column's
// squared norm is finite and at least 2^−900: the products that underflow (below 2^−1022) then add
// up to at most n·2^−1022, a relative n·2^−122 that no digit of the result can see. Other columns
// take the Householder route, which scales before it squares (and names a value that is not finite).
bool withinGramRange(double squaredNorm) { return squaredNorm >= std::ldexp(1.0, -900); }

// One step of refinement makes the coefficients as accurate as the Householder route's when
// c·u·κ² is well below 1 (u = 2⁻⁵³, κ the condition number of the column-scaled design): the step
// contracts the normal equations' error by about that factor (Higham, Accuracy and Stability of
// Numerical Algorithms, 2nd ed., ch. 20, on refinement for least squares; from memory). With
// u·κ² ≤ 1e-9 the error left after the step is below 1e-17 relative, c up to a few hundred. The
// default doublePrecisionErrorLimit already keeps κ below about 900 (u·κ² ≤ 9e-11); this bound
// holds the route when that limit is raised.
constexpr double squaredConditionLimit = 1e-9;

// The held columns at one block's first row, as the column_products kernels take them; a column of
// ones (nullptr in HeldColumns) points to a block of ones.
class HeldBlocks {
public:
    using Columns = std::array<const double*, column_products::maxColumns + 1>;

    explicit HeldBlocks(Eigen::Index rowsPerBlock) : ones_(Eigen::VectorXd::Ones(rowsPerBlock)) {}

    // The design's columns (at most maxColumns), then the response.
    Columns columnsWithResponse(const HeldColumns& held, Eigen::Index first) const
    {
        if (held.design.size() > static_cast<std::size_t>(column_products::maxColumns))
            throw std::logic_error("HeldBlocks: more held columns than the kernels take");
        Columns columns{};
        std::size_t j = 0;
        for (; j < held.design.size(); ++j) columns[j] = held.design[j] == nullptr ? ones_.data() : held.design[j] + first;
        columns[j] = held.response + first;
        return columns;
    }

private:
    Eigen::VectorXd ones_;
};

// gram's lower triangle += the products of `count` rows of columns (width = gram.rows()).
void addHeldCrossProducts(const HeldBlocks::Columns& columns, Eigen::Index count, Eigen::MatrixXd& gram)
{
    constexpr int mostPairs = column_products::maxColumns * (column_products::maxColumns + 1) / 2;
    double sums[mostPairs][column_products::lanes] = {};
    const auto width = static_cast<int>(gram.rows());
    column_products::addCrossProducts(columns.data(), width, static_cast<std::size_t>(count), sums);
    int t = 0;
    for (int j = 0; j < width; ++j)
        for (int k = j; k < width; ++k, ++t) gram(k, j) += column_products::laneTotal(sums[t]);
}

} // namespace

std::optional<DoubleRouteFactor> factorByNormalEquations(const RegressionRows& rows, Eigen::Index rowsPerFill,
                                                         Eigen::Index rowsPerSum)
{
    const Eigen::Index n = rows.rows();
    const Eigen::Index p = rows.columns();
    const Eigen::Index width = p + 1; // the design and the response
    const Eigen::Index fillRows = std::max<Eigen::Index>(1, std::min(rowsPerFill, n));
    const Eigen::Index sumRows = std::max<Eigen::Index>(1, std::min(rowsPerSum, fillRows));

    // One pass: G = [X y]ᵀ[X y] and the response's moments. A value that is not finite makes its
    // column's diagonal entry so; so does a square that overflows.
    Eigen::MatrixXd block;
    Eigen::MatrixXd gram = Eigen::MatrixXd::Zero(width, width);
    DoubleRouteFactor result;
    double counted = 0;
    const HeldBlocks heldBlocks(sumRows);
    for (Eigen::Index first = 0; first < n; first += fillRows) {
        const Eigen::Index filled = std::min(fillRows, n - first);
        // Rows held in memory are summed where they are, a few columns at a time in one pass.
        if (const std::optional<HeldColumns> held = width <= column_products::maxColumns ? rows.holdRows(first, filled)
                                                                                         : std::nullopt) {
            for (Eigen::Index sumFirst = first; sumFirst < first + filled; sumFirst += sumRows) {
                const Eigen::Index count = std::min(sumRows, first + filled - sumFirst);
                addToMoments(result.response, counted, Eigen::Map<const Eigen::VectorXd>(held->response + sumFirst, count));
                addHeldCrossProducts(heldBlocks.columnsWithResponse(*held, sumFirst), count, gram);
            }
            continue;
        }
        block.resize(fillRows, width);
        rows.fill(first, block.topLeftCorner(filled, p), block.col(p).head(filled));
        for (Eigen::Index sumFirst = 0; sumFirst < filled; sumFirst += sumRows) {
            auto rowsOfBlock = block.middleRows(sumFirst, std::min(sumRows, filled - sumFirst));
            addToMoments(result.response, counted, rowsOfBlock.col(p));
            // The lower triangle, a column at a time: Eigen's transposed matrix-vector product forms
            // several dot products per pass over the block, so their additions do not wait on each
            // other (one dot product at a time waits on its own additions; rankUpdate packs the
            // block first, which costs more than these few columns take).
            for (Eigen::Index j = 0; j < width; ++j)
                gram.col(j).tail(width - j).noalias() += rowsOfBlock.rightCols(width - j).transpose() * rowsOfBlock.col(j);
        }
    }
    gram.triangularView<Eigen::StrictlyUpper>() = gram.transpose();
    if (!gram.allFinite()) return std::nullopt;
    for (Eigen::Index j = 0; j < width; ++j)
        if (!withinGramRange(gram(j, j))) return std::nullopt;

    // D G D with D the powers of two that give the design's columns unit order; the response is
    // scaled the same way (s). ‖X·e_j‖² = G_jj.
    Eigen::VectorXd scales(width);
    for (Eigen::Index j = 0; j < width; ++j) scales(j) = unitScale(std::sqrt(gram(j, j)));
    const Eigen::MatrixXd scaledGram = scales.asDiagonal() * gram * scales.asDiagonal();
    const Eigen::LLT<Eigen::MatrixXd> cholesky(scaledGram.topLeftCorner(p, p));
    if (cholesky.info() != Eigen::Success) return std::nullopt;

    LeastSquaresFactor& factor = result.factor;
    factor.columnScales = scales.head(p);
    factor.permutation.setIdentity(p);
    factor.upper = cholesky.matrixU();
    if (!factor.upper.allFinite()) return std::nullopt;
    addSingularValues(factor);
    const double largestValue = factor.singularValues(0);
    const double smallestValue = factor.singularValues(p - 1);
    if (!(smallestValue > 0)) return std::nullopt;
    const double condition = largestValue / smallestValue;
    if (unitRoundoff * condition * condition > squaredConditionLimit) return std::nullopt;

    // Rᵀz = D·Xᵀy·s, c = R⁻¹z (scaled units), b = D·c/s; ‖r·s‖² = (s²·yᵀy − ‖z‖²), whose
    // cancellation only matters for the error estimate's second term, which it then leaves small.
    const Eigen::VectorXd projected =
        factor.upper.transpose().triangularView<Eigen::Lower>().solve(scaledGram.col(p).head(p));
    const Eigen::VectorXd scaledCoefficients = factor.upper.triangularView<Eigen::Upper>().solve(projected);
    factor.coefficients = factor.columnScales.cwiseProduct(scaledCoefficients) / scales(p);
    factor.upperInverse = factor.upper.triangularView<Eigen::Upper>().solve(Eigen::MatrixXd::Identity(p, p));
    const double residualNorm = std::sqrt(std::max(0.0, scaledGram(p, p) - projected.squaredNorm()));
    result.errorEstimate = householderErrorEstimate(condition, largestValue, residualNorm, scaledCoefficients.norm());
    return result;
}

void residualsOfHeldRows(const HeldColumns& held, Eigen::Index first, const Eigen::VectorXd& coefficients,
                         Eigen::Ref<Eigen::VectorXd> residuals)
{
    const Eigen::Index count = residuals.size();
    residuals = Eigen::Map<const Eigen::VectorXd>(held.response + first, count);
    for (std::size_t j = 0; j < held.design.size(); ++j) {
        const double coefficient = coefficients(static_cast<Eigen::Index>(j));
        if (held.design[j] == nullptr)
            residuals.array() -= coefficient;
        else
            residuals -= coefficient * Eigen::Map<const Eigen::VectorXd>(held.design[j] + first, count);
    }
}

namespace {

// Σᵢ xᵢⱼ·vᵢ over the rows first … first + v.size() − 1 of held column j (a column of ones: Σv).
double heldColumnDot(const HeldColumns& held, std::size_t j, Eigen::Index first, const Eigen::Ref<const Eigen::VectorXd>& v)
{
    const double* column = held.design[j];
    return column == nullptr ? v.sum() : Eigen::Map<const Eigen::VectorXd>(column + first, v.size()).dot(v);
}

// Xᵀr with r = y − X·b over held columns, in place (no block is copied, so the pass reads each value
// once from memory), summed `rowsPerSum` rows at a time; visit(first, r, Σr²) sees each block of
// residuals while it is in cache. Up to maxColumns columns, one pass a block forms r, Xᵀr and Σr²
// (column_products.hpp); wider designs form the residuals `rowsPerFill` rows at a time and then
// each column's product.
template <typename Visit>
Eigen::VectorXd heldGradient(const HeldColumns& held, Eigen::Index rows, Eigen::Index rowsPerFill, Eigen::Index rowsPerSum,
                             const Eigen::VectorXd& coefficients, Visit&& visit)
{
    const Eigen::Index p = coefficients.size();
    Eigen::VectorXd gradient = Eigen::VectorXd::Zero(p);
    const Eigen::Index fillRows = std::max<Eigen::Index>(1, std::min(rowsPerFill, rows));
    const Eigen::Index sumRows = std::max<Eigen::Index>(1, std::min(rowsPerSum, fillRows));
    if (p <= column_products::maxColumns) {
        const HeldBlocks blocks(sumRows);
        Eigen::VectorXd residuals(sumRows);
        for (Eigen::Index first = 0; first < rows; first += sumRows) {
            const Eigen::Index count = std::min(sumRows, rows - first);
            const HeldBlocks::Columns columns = blocks.columnsWithResponse(held, first);
            double products[column_products::maxColumns][column_products::lanes] = {};
            double squares[column_products::lanes] = {};
            column_products::addResidualProducts(columns.data(), static_cast<int>(p), columns[static_cast<std::size_t>(p)],
                                                 coefficients.data(), static_cast<std::size_t>(count), residuals.data(),
                                                 products, squares);
            for (Eigen::Index j = 0; j < p; ++j) gradient(j) += column_products::laneTotal(products[j]);
            visit(first, residuals.head(count), column_products::laneTotal(squares));
        }
        return gradient;
    }
    Eigen::VectorXd residuals(fillRows);
    forEachHeldBlock(held, rows, fillRows, coefficients, residuals, [&](Eigen::Index first, const auto& filled) {
        for (Eigen::Index sumFirst = 0; sumFirst < filled.size(); sumFirst += sumRows) {
            const auto blockResiduals = filled.segment(sumFirst, std::min(sumRows, filled.size() - sumFirst));
            for (Eigen::Index j = 0; j < p; ++j)
                gradient(j) += heldColumnDot(held, static_cast<std::size_t>(j), first + sumFirst, blockResiduals);
            visit(first + sumFirst, blockResiduals, blockResiduals.squaredNorm());
        }
    });
    return gradient;
}

// Σ v and Σ xⱼ·v over the rows first … first + v.size() − 1 of the held design, added to total and
// weighted (one pass up to maxColumns columns, column_products.hpp).
void addHeldWeightedSums(const HeldColumns& held, const HeldBlocks& blocks, Eigen::Index first,
                         const Eigen::Ref<const Eigen::VectorXd>& v, CompensatedSum& total, Eigen::VectorXd& weighted)
{
    const Eigen::Index p = weighted.size();
    if (p > column_products::maxColumns) {
        total.add(v.sum());
        for (Eigen::Index j = 0; j < p; ++j) weighted(j) += heldColumnDot(held, static_cast<std::size_t>(j), first, v);
        return;
    }
    double sums[column_products::maxColumns + 1][column_products::lanes] = {};
    column_products::addWeightedSums(blocks.columnsWithResponse(held, first).data(), static_cast<int>(p), v.data(),
                                     static_cast<std::size_t>(v.size()), sums);
    total.add(column_products::laneTotal(sums[0]));
    for (Eigen::Index j = 0; j < p; ++j) weighted(j) += column_products::laneTotal(sums[1 + j]);
}

struct RefinementStep {
    Eigen::VectorXd projected; // z = R⁻ᵀ·D·Xᵀr
    Eigen::VectorXd delta;     // δ = D·R⁻¹·z, added to the coefficients
};

// δ = (XᵀX)⁻¹·Xᵀr through the factor: XᵀX = D⁻¹RᵀRD⁻¹, so δ = D·R⁻¹R⁻ᵀ·D·Xᵀr; b += δ.
RefinementStep applyRefinement(LeastSquaresFactor& factor, const Eigen::VectorXd& gradient)
{
    RefinementStep step;
    step.projected = factor.upper.transpose().triangularView<Eigen::Lower>().solve(factor.columnScales.cwiseProduct(gradient));
    step.delta = factor.columnScales.cwiseProduct(factor.upper.triangularView<Eigen::Upper>().solve(step.projected));
    factor.coefficients += step.delta;
    return step;
}

// E ≤ 2⁻⁶⁰·Σe^r (least_squares_factor.hpp, refineWithResidualSums).
const double firstOrderExpsLimit = std::ldexp(1.0, -60);

} // namespace

void refineCoefficients(const RegressionRows& rows, Eigen::Index rowsPerFill, Eigen::Index rowsPerBlock, LeastSquaresFactor& factor)
{
    if (const std::optional<HeldColumns> held = rows.heldColumns()) {
        applyRefinement(factor, heldGradient(*held, rows.rows(), rowsPerFill, rowsPerBlock, factor.coefficients,
                                             [](Eigen::Index, const auto&, double) {}));
        return;
    }
    Eigen::VectorXd gradient = Eigen::VectorXd::Zero(rows.columns());
    Eigen::VectorXd residuals(std::max<Eigen::Index>(1, std::min(rowsPerBlock, rows.rows())));
    forEachBlock(rows, rowsPerBlock, [&](Eigen::Index, const auto& design, const auto& response) {
        auto blockResiduals = residuals.head(design.rows());
        blockResiduals = response;
        blockResiduals.noalias() -= design * factor.coefficients;
        gradient.noalias() += design.transpose() * blockResiduals;
    });
    applyRefinement(factor, gradient);
}

std::optional<ResidualSums> refineWithResidualSums(const HeldColumns& held, Eigen::Index rows, Eigen::Index rowsPerFill,
                                                   Eigen::Index rowsPerBlock, LeastSquaresFactor& factor, bool sumExps)
{
    const Eigen::Index p = factor.coefficients.size();
    CompensatedSum squares;
    CompensatedSum exps;
    Eigen::VectorXd weightedExps = Eigen::VectorXd::Zero(p); // Σ xᵢⱼ·e^{rᵢ}
    const Eigen::Index blockRows = std::max<Eigen::Index>(1, std::min(rowsPerBlock, rows));
    Eigen::VectorXd blockExps(blockRows);
    const HeldBlocks blocks(blockRows);
    const Eigen::VectorXd gradient = heldGradient(
        held, rows, rowsPerFill, rowsPerBlock, factor.coefficients, [&](Eigen::Index first, const auto& residuals, double blockSquares) {
            squares.add(blockSquares);
            if (!sumExps) return;
            auto blockOfExps = blockExps.head(residuals.size());
            blockOfExps = residuals;
            exactExpsInPlace(blockOfExps.data(), blockOfExps.size());
            addHeldWeightedSums(held, blocks, first, blockOfExps, exps, weightedExps);
        });
    const RefinementStep step = applyRefinement(factor, gradient);
    ResidualSums sums;
    sums.squares = std::max(0.0, squares.value() - step.projected.squaredNorm());
    if (!sumExps) return sums;
    double largestShift = 0; // m ≤ Σⱼ|δⱼ|·‖X·eⱼ‖, ‖X·eⱼ‖ = ‖R·eⱼ‖/Dⱼ
    for (Eigen::Index j = 0; j < p; ++j)
        largestShift += std::fabs(step.delta(j)) * factor.upper.col(j).norm() / factor.columnScales(j);
    if (!(0.5 * largestShift * largestShift * std::exp(largestShift) <= firstOrderExpsLimit)) return std::nullopt;
    sums.exps = exps.value() - step.delta.dot(weightedExps);
    return sums;
}

} // namespace isoquant
