// PRODFIT tables with their covariance block (covariance_block.hpp), as the block tests build and
// search them.
#pragma once

#include "isoquant/sheet/tables/covariance_block.hpp"
#include "isoquant/sheet/tables/fit_table.hpp"

namespace isoquant::testing {

// The fit's table with the block, as PRODFIT's covariance TRUE gives it.
inline CellTable tableWithBlock(const ProductionFit& fit)
{
    return fitTableWithCovariance(fitTable(fit), fit, 1.0);
}

// The matrix the block holds: the fit's covariance, then with a shifted ln A (fit.shiftedScale) its
// covariances and variance as one more row and column, then with a trend (fit.trendCovariance) λ's.
inline Eigen::MatrixXd blockMatrixOf(const ProductionFit& fit)
{
    Eigen::MatrixXd matrix = fit.inference.covariance;
    auto append = [&matrix](const Eigen::VectorXd& withEarlier, double variance) {
        const Eigen::Index p = matrix.rows();
        matrix.conservativeResize(p + 1, p + 1);
        matrix.col(p).head(p) = withEarlier;
        matrix.row(p).head(p) = withEarlier.transpose();
        matrix(p, p) = variance;
    };
    if (fit.shiftedScale) append(fit.shiftedScale->withParameters, fit.shiftedScale->variance);
    if (fit.trendCovariance) {
        Eigen::VectorXd withEarlier(matrix.rows());
        withEarlier << fit.trendCovariance->withParameters, fit.trendCovariance->withShiftedScale;
        append(withEarlier, fit.trendCovariance->variance);
    }
    return matrix;
}

// The first row labelled "covariance" (the table's row count when there is none).
inline std::size_t blockRow(const CellTable& table)
{
    for (std::size_t row = 0; row < table.rows(); ++row)
        if (table.isText(row, 0) && table.text(row, 0) == "covariance") return row;
    return table.rows();
}

} // namespace isoquant::testing
