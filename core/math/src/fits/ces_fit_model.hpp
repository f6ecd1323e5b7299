// The ces fit's model as the solver sees it (internal to the core; see ces_fit.hpp for the method).
// The solver works on (ln A, t, s, ν) with δ = 1/(1 + e^(−t)) and ρ = −1 + eˢ, so that every
// iterate is a CES with δ ∈ (0, 1) and ρ > −1; "raw" is (ln A, δ, ρ, ν).
#pragma once

#include "isoquant/math/forms/ces_columns.hpp"
#include "isoquant/math/numerics/nonlinear_least_squares.hpp"
#include "isoquant/math/fits/fit_result.hpp"

#include <Eigen/Dense>

#include <limits>

namespace isoquant::ces_fit {

inline constexpr Eigen::Index parameterCount = 4;

inline double logistic(double z)
{
    return z >= 0 ? 1.0 / (1.0 + std::exp(-z)) : std::exp(z) / (1.0 + std::exp(z));
}

// ln Y, ln x₂ and d = ln x₁ − ln x₂ of every row.
struct CesLogs {
    Eigen::VectorXd logOutput;
    Eigen::VectorXd logSecond;
    Eigen::VectorXd logRatio;
};

CesLogs logsOf(const ProductionData& data);

// The second column of the Jacobian: by δ itself (inference) or by its logit t (the solver).
enum class WeightColumn { byWeight, byLogit };

// Residuals and the Jacobian by δ at raw from one pass over the rows: what inference needs.
struct RawEvaluation {
    Eigen::VectorXd residuals;
    Eigen::MatrixXd jacobian;
};
// `evaluated`, when given, is the composite already evaluated at raw's δ and ρ (CesModel::evaluatedAt).
RawEvaluation evaluateRaw(const CesLogs& logs, const Eigen::Vector4d& raw, const CesColumns* evaluated = nullptr);

// (ln A, t, s, ν) ↔ (ln A, δ, ρ, ν)
Eigen::Vector4d toRaw(const Eigen::VectorXd& solver);
Eigen::Vector4d toSolver(const Eigen::Vector4d& raw);

// Residuals and Jacobian in solver coordinates. A residual evaluation computes the composite's
// derivatives too and keeps them for the last two points: the solver asks for the Jacobian at the
// point it accepted, which is the last one evaluated, or the one before when a trial step after it
// was rejected (as where Levenberg–Marquardt ends and the Gauss–Newton steps begin); the Jacobian
// then costs no exp or log.
class CesModel : public NonlinearModel {
public:
    explicit CesModel(const CesLogs& logs) : logs_(logs) {}
    Eigen::Index observationCount() const override { return logs_.logOutput.size(); }
    Eigen::Index parameterCount() const override { return ces_fit::parameterCount; }
    Eigen::VectorXd residuals(const Eigen::VectorXd& solver) const override;
    Eigen::MatrixXd jacobian(const Eigen::VectorXd& solver) const override;
    void residualsInto(const Eigen::VectorXd& solver, Eigen::VectorXd& residuals) const override;
    void jacobianInto(const Eigen::VectorXd& solver, Eigen::MatrixXd& jacobian) const override;
    // From the composite's columns: no n × 4 Jacobian is formed.
    void normalEquationsInto(const Eigen::VectorXd& solver, const Eigen::VectorXd& residuals, Eigen::MatrixXd& unused,
                             Eigen::MatrixXd& gram, Eigen::VectorXd& gradient) const override;
    // The composite's columns kept for δ and ρ exactly, if either of the last two points had them.
    const CesColumns* evaluatedAt(double weight, double curvature) const;

private:
    struct Evaluated {
        Eigen::Vector4d at = Eigen::Vector4d::Constant(std::numeric_limits<double>::quiet_NaN());
        Eigen::Vector2d shape = Eigen::Vector2d::Constant(std::numeric_limits<double>::quiet_NaN()); // (δ, ρ)
        CesColumns columns;
    };
    const CesColumns& columnsAt(const Eigen::VectorXd& solver) const;

    const CesLogs& logs_;
    // A cache, hence mutable: the last two points evaluated, the older one replaced next.
    mutable Evaluated evaluated_[2];
    mutable int older_ = 0;
};

} // namespace isoquant::ces_fit
