// PRODFIT tables with their covariance block (covariance_block.hpp), as the block tests build and
// search them.
#pragma once

#include "isoquant/sheet/tables/covariance_block.hpp"
#include "isoquant/sheet/tables/fit_table.hpp"
#include "cell_tables.hpp"

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

// A typed ces model with a typed covariance block (classical, 20 degrees of freedom, level 0.95):
// CES_THETA, CES_COVARIANCE and CES_DEGREES_OF_FREEDOM of tests/reference/decision_bounds_check.py,
// invented (near the ces fit of Cobb & Douglas 1928, the correlations made up), typed here again.
inline CellTable typedCesWithBlock()
{
    const Cell none{};
    return typedRange({{std::string("form"), std::string("ces"), none, none, none},
                       {std::string("ln A"), -0.285, none, none, none},
                       {std::string("delta"), 0.831, none, none, none},
                       {std::string("rho"), -0.526, none, none, none},
                       {std::string("nu"), 1.064, none, none, none},
                       {std::string("covariance"), std::string("classical"), 20.0, 0.95, none},
                       {std::string("ln A"), 0.364816, -0.062816, 0.746544, -0.070668},
                       {std::string("delta"), -0.062816, 0.043264, -0.299936, 0.010816},
                       {std::string("rho"), 0.746544, -0.299936, 4.2436, -0.1339},
                       {std::string("nu"), -0.070668, 0.010816, -0.1339, 0.0169}});
}

} // namespace isoquant::testing
