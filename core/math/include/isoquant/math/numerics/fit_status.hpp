// One status per fit result, as data: what a caller checks before trusting the numbers. Every
// production fit (ProductionFit::status) and every least-squares run (LeastSquaresResult::status)
// carries one; the kind says what happened and the reason says it in words.
#pragma once

#include <string>

namespace isoquant {

enum class FitStatusKind {
    ok,             // an optimum with standard errors and tests
    illConditioned, // full rank, but the scaled condition number exceeds the warning level: the
                    // numbers are returned and fragile
    exactFit,       // every residual is zero: standard errors are zero and tests are undefined
    notConverged,   // the solver's evaluation limit ended the iterations before a convergence test
                    // held: the estimates are its last values, not an optimum
    stopped,        // the solver could not go on (a Jacobian that is not finite at an accepted point)
    boundary,       // a converged optimum on the edge of the parameter space: no standard errors
    notIdentified   // a converged interior optimum where JᵀJ is singular: one optimum of many, no
                    // standard errors
};

struct FitStatus {
    FitStatusKind kind = FitStatusKind::ok;
    // Why, in words: for a nonlinear fit the solver's account of how its iterations ended (also
    // when it converged); for least squares what makes the status other than ok; else empty.
    std::string reason;

    bool is(FitStatusKind other) const { return kind == other; }
    // Whether the convergence row says "converged": false where the solver ended without an
    // optimum (notConverged, stopped) or at one that is not unique (notIdentified).
    bool converged() const
    {
        return kind != FitStatusKind::notConverged && kind != FitStatusKind::stopped &&
               kind != FitStatusKind::notIdentified;
    }
};

// The convergence row's word for a run that converged; a typed ces model must say it.
inline constexpr const char* convergedText = "converged";

// The word of a nonlinear fit's convergence row: "converged" (every kind at an optimum, so also
// boundary and exactFit), "not converged", "stopped" or "not identified".
std::string convergenceWord(FitStatusKind kind);

} // namespace isoquant
