// Where the ces fit starts (internal to the core; the method is described in ces_fit.hpp): the
// Kmenta approximation and the best points of a grid over ρ on which δ is searched with ln A and
// ν concentrated out, on all rows or on evenly spaced ones.
#pragma once

#include "fits/ces_fit_model.hpp"

#include <vector>

namespace isoquant::ces_fit {

// Rows ⌊k·n/m⌋, k = 0, …, m − 1: every (n/m)-th row, from the first; all n rows when n ≤ m.
CesLogs evenlySpacedRows(const CesLogs& logs, Eigen::Index m);

// The Kmenta start, then the best grid points, from the rows of evenlySpacedRows (the grid on at
// most 250 of them, evenly spaced again), each as (ln A, δ, ρ, ν).
std::vector<Eigen::Vector4d> startValues(const CesLogs& logs, Eigen::Index searchRows);

// Each start (in solver coordinates) moved to the optimum the solver reaches from it on the
// sample rows; starts that reach the same minimum are kept once. `model` is on all rows: a moved
// start must have finite residuals there (its evaluation stays in the model's cache for the run).
std::vector<Eigen::VectorXd> movedOnSample(const CesModel& model, const CesLogs& sample,
                                           const std::vector<Eigen::VectorXd>& starts,
                                           const NonlinearLeastSquaresOptions& options);

} // namespace isoquant::ces_fit
