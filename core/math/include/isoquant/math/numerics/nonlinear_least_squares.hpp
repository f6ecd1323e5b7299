// Nonlinear least squares: minimise Σ rᵢ(θ)² by Levenberg–Marquardt (Eigen's unsupported
// NonLinearOptimization module, a port of MINPACK's lmder), with classical inference at the optimum.
//
// This is the engine under the CES fit and the entry point the NIST StRD nonlinear checks call.
// "Did not converge" is a status of the result, not an error: the caller decides what to show.
#pragma once

#include "isoquant/math/numerics/parameter_inference.hpp"

#include <Eigen/Dense>

#include <functional>
#include <optional>
#include <string>

namespace isoquant {

// A model as the solver sees it: residuals r(θ) = y − f(θ) and their Jacobian ∂r/∂θ.
class NonlinearModel {
public:
    virtual ~NonlinearModel() = default;
    virtual Eigen::Index observationCount() const = 0;
    virtual Eigen::Index parameterCount() const = 0;
    // A residual that is not finite marks θ as outside the model's domain: the solver rejects a
    // step that lands there as it rejects one that increases the sum of squares.
    virtual Eigen::VectorXd residuals(const Eigen::VectorXd& parameters) const = 0;
    // n × p
    virtual Eigen::MatrixXd jacobian(const Eigen::VectorXd& parameters) const = 0;
    // The same into the caller's buffers, which the solver keeps from one evaluation to the next;
    // a model that evaluates whole columns overrides these to write in place.
    virtual void residualsInto(const Eigen::VectorXd& parameters, Eigen::VectorXd& residuals) const
    {
        residuals = this->residuals(parameters);
    }
    virtual void jacobianInto(const Eigen::VectorXd& parameters, Eigen::MatrixXd& jacobian) const
    {
        jacobian = this->jacobian(parameters);
    }
    // JᵀJ (p × p) and Jᵀr (p) at θ for the residuals r at θ, what a Gauss–Newton step needs. This
    // forms J in `jacobianBuffer` and takes dot products of its columns (for the few columns of a
    // model a fifth of the cost of Eigen's general matrix product, which packs J into blocks
    // first); a model that knows J's columns as scaled columns of its own overrides it to form
    // the sums without J.
    virtual void normalEquationsInto(const Eigen::VectorXd& parameters, const Eigen::VectorXd& residuals,
                                     Eigen::MatrixXd& jacobianBuffer, Eigen::MatrixXd& gram,
                                     Eigen::VectorXd& gradient) const;
};

struct NonlinearLeastSquaresOptions {
    // MINPACK ftol: stop when both the actual and the predicted relative reduction of the sum of
    // squares in one step are at most this. 0 (the default) turns the test off: a flat sum of
    // squares (a parameter with a large standard error) then does not end the iterations before
    // the parameters themselves settle (xtol) or no reduction is possible at machine precision.
    double relativeReductionTolerance = 0;
    // MINPACK xtol: stop when the step bound Δ is at most this times ‖D·θ‖, D the diagonal scaling
    // by the Jacobian's column norms (a relative change of θ of about this size).
    double relativeStepTolerance = 1e-15;
    // MINPACK gtol: stop when the cosine of the angle between r and every column of the Jacobian is
    // at most this (0: this test is off).
    double gradientTolerance = 0;
    // Residual evaluations (Jacobian evaluations not counted) after which the solver stops, with
    // the status evaluationLimit.
    Eigen::Index maximumEvaluations = 4000;
    // Bounds are θ ∓ t_{(1+level)/2}(n−p)·se.
    double confidenceLevel = 0.95;
    // The Jacobian counts as rank deficient (standard errors undefined, shown as NaN) when its
    // smallest singular value, after scaling every column to unit norm, is at most this fraction
    // of the largest.
    double rankTolerance = 1e-12;
};

enum class NonlinearStatus {
    converged,       // a MINPACK convergence test held (ftol, xtol or gtol; or no further
                     // reduction is possible at machine precision)
    evaluationLimit, // maximumEvaluations reached before any convergence test held
    stopped,         // the Jacobian was not finite at an accepted point
    notIdentified    // set by a caller, never by the solver: a convergence test held, but the
                     // Jacobian is rank deficient there (JᵀJ, the Gauss–Newton Hessian, singular),
                     // so the optimum is not unique and has no standard errors
};

// Classical inference from the Jacobian J at θ (taken by value: a caller that no longer needs it
// moves it in, and its storage holds the factorisation): V = s²·(JᵀJ)⁻¹, s² = RSS/(n−p); t = θ/se on
// t(n−p) (inferParameters). Standard errors are NaN when J is rank deficient (see rankTolerance).
ParameterInference nonlinearInference(Eigen::MatrixXd jacobian, const Eigen::VectorXd& residuals,
                                      const Eigen::VectorXd& parameters, double confidenceLevel,
                                      double rankTolerance);

// The summary a nonlinear fit fills from its residuals alone: n, p, RSS, n − p (also the inference
// degrees of freedom) and s = √(RSS/(n−p)); R², the likelihood and the rest are the caller's.
FitSummary nonlinearSummary(const Eigen::VectorXd& residuals, Eigen::Index parameterCount);

struct NonlinearLeastSquaresResult {
    Eigen::VectorXd parameters;
    Eigen::VectorXd residuals;
    ParameterInference inference; // estimates = parameters
    FitSummary summary;           // nonlinearSummary
    Eigen::Index observations = 0;
    Eigen::Index evaluations = 0;         // residual evaluations
    Eigen::Index jacobianEvaluations = 0;
    NonlinearStatus status = NonlinearStatus::converged;
    std::string stopReason; // which MINPACK test ended the iterations, in words
};

// Requires n > p ≥ 1 and finite residuals at `start` (std::invalid_argument otherwise).
NonlinearLeastSquaresResult fitNonlinearLeastSquares(const NonlinearModel& model, const Eigen::VectorXd& start,
                                                     const NonlinearLeastSquaresOptions& options = {});

// The solver alone, for a caller that tries several starts and infers at the one it keeps: as
// fitNonlinearLeastSquares but with `inference` and `summary` left empty (no Jacobian at the end).
NonlinearLeastSquaresResult minimizeSumOfSquares(const NonlinearModel& model, const Eigen::VectorXd& start,
                                                 const NonlinearLeastSquaresOptions& options);

// What minimizeByGaussNewton asks of its steps. Each rule ends the run without a result, and the
// caller then runs Levenberg–Marquardt from the same start.
struct GaussNewtonOptions {
    // Steps at most. From the optimum of an evenly spaced tenth of the rows each step shrinks the
    // next by a factor of 100 to 1,000 on the ces benchmark data, and five reach rounding.
    int maximumSteps = 10;
    // The step is solved from the normal equations of J·S (S scales every column of J to unit
    // norm); they are given up where the ratio of the largest to the smallest eigenvalue of
    // S·JᵀJ·S exceeds this. At 1e10 the step keeps about six digits (u·κ² ≤ 1e-6), which is all a
    // Gauss–Newton iteration needs: the point it settles at solves Jᵀr = 0, formed from J and r,
    // not from the normal equations (common practice, no source).
    double conditionLimit = 1e10;
    // A step may raise the sum of squares by this relative amount at most (its rounding, near the
    // optimum); more means the linear model of r no longer holds over the step.
    double sumOfSquaresSlack = 1e-10;
    // A point has settled, and is the result, where the step it would take next is at most this
    // times s = √(RSS/(n − p)) in ‖J·Δ‖, a move of about this many standard errors. That step is
    // known once the point is evaluated (the normal equations are formed with the residuals), so no
    // evaluation is spent past it; and since every step taken was at most slowestShrink times the
    // one before, the point lies within settledLength/(1 − slowestShrink) standard errors of the
    // optimum the steps converge to (on the ces benchmark, where the last steps shrink by a factor
    // of about 300, within 1e-11; before, the run took that step and one evaluation more, and its
    // estimates moved by about 1e-13 relative) (common practice, no source).
    double settledLength = 1e-10;
    // Each step must be at most this fraction of the one before. Where the steps shrink more
    // slowly (a ridge of the sum of squares, far from a quadratic bowl) Gauss–Newton would need
    // many evaluations and Levenberg–Marquardt does at least as well. Measured on the ces fit of
    // 1,000,000 rows near fixed proportions that does not converge: 1.58 s with any shorter step
    // allowed, 1.32 s with this rule, 1.28 s without Gauss–Newton steps (common practice, no source).
    double slowestShrink = 0.5;
};

// Gauss–Newton steps from a start already close to an optimum (the optimum of a sample of the
// rows) until the point reached would take a step shorter than settledLength; empty (and the caller runs Levenberg–Marquardt)
// where r or J is not finite, the scaled normal equations are too ill-conditioned, the sum of
// squares rises, a step is not shorter than slowestShrink times the one before, or the steps have
// not settled within maximumSteps. A step costs one residual and one Jacobian evaluation and a p × p
// solve, where a Levenberg–Marquardt iteration factorises the n × p Jacobian. The result has
// status converged and no inference or summary, as minimizeSumOfSquares.
//
// `known`, when given, is asked about each point a step leads to before that point is evaluated;
// where it holds, the run ends there with status stopped, the point as its parameters and no
// residuals (the start search stops a run that has come to an optimum another start reached).
std::optional<NonlinearLeastSquaresResult>
minimizeByGaussNewton(const NonlinearModel& model, const Eigen::VectorXd& start, const GaussNewtonOptions& options = {},
                      const std::function<bool(const Eigen::VectorXd&)>& known = {});

// Gauss–Newton steps Δ = −J⁺·r from θ (meant for a converged θ), at most maximumSteps, each taken
// only while the step that would follow it is shorter in ‖J·Δ‖, the part of r the model could still
// explain. Why: the solver's tests look at the sum of squares, which within (Δθ/se)² ≈ ε·n of
// the optimum (ε the rounding of a residual) changes by no more than its own rounding, so runs from
// different starts stop up to about √(ε·n)·se apart; J⁺·r is linear in r and fixes the stationary
// point to the rounding of the residuals. J counts as rank deficient, and θ is returned as it
// is, when |R_kk| ≤ rankTolerance·|R_11| in its column-pivoted QR; likewise where r or J is not finite.
Eigen::VectorXd refinedByGaussNewton(const NonlinearModel& model, const Eigen::VectorXd& parameters, int maximumSteps,
                                     double rankTolerance);

} // namespace isoquant
