// The ces fit's report at the point kept (internal to the core; the formulas are in ces_fit.hpp):
// classical inference where the optimum is interior, converged and identified; σ and its bounds;
// the fit statistics; the returns to scale and their verdict.
#pragma once

#include "fits/ces_fit_model.hpp"
#include "isoquant/math/fits/ces_fit.hpp"

namespace isoquant::ces_fit {

// `raw` is the point kept, with a boundary parameter already set to its boundary value; `details`
// its evaluations and boundary; `solverStatus` ok, notConverged or stopped with the solver's stop
// reason. The fit's status is settled here (ces_fit.hpp): a converged interior point whose
// Jacobian is rank deficient (rankTolerance) becomes notIdentified, a converged boundary point
// boundary, a converged interior one with zero residuals exactFit. `model` may already hold the
// composite at raw's δ and ρ (the solver's last points), which is then not evaluated again.
ProductionFit reportAt(const ProductionData& data, const CesModel& model, const CesLogs& logs, const Eigen::Vector4d& raw,
                       CesDetails details, FitStatus solverStatus, const ProductionFitOptions& options,
                       double rankTolerance);

} // namespace isoquant::ces_fit
