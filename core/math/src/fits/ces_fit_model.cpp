#include "fits/ces_fit_model.hpp"

#include "isoquant/math/numerics/exact_elementwise.hpp"

#include <cmath>

namespace isoquant::ces_fit {

CesLogs logsOf(const ProductionData& data)
{
    CesLogs logs;
    logs.logOutput = exactLog(data.output.array()).matrix();
    logs.logSecond = exactLog(data.inputs.col(1).array()).matrix();
    logs.logRatio = (exactLog(data.inputs.col(0).array()) - logs.logSecond.array()).matrix();
    return logs;
}

namespace {

// ∂r/∂(ln A, δ or t, ρ, ν) from the composite's columns; r = ln Y − ln A − ν·(b + H).
void fillJacobian(const CesLogs& logs, const CesColumns& columns, WeightColumn weightColumn, double returnsToScale,
                  Eigen::MatrixXd& jacobian)
{
    jacobian.resize(logs.logOutput.size(), parameterCount);
    jacobian.col(0).setConstant(-1.0);
    jacobian.col(1) =
        (-returnsToScale * (weightColumn == WeightColumn::byLogit ? columns.byLogit : columns.byWeight)).matrix();
    jacobian.col(2) = (-returnsToScale * columns.byCurvature).matrix();
    jacobian.col(3) = -(logs.logSecond.array() + columns.value).matrix();
}

// Into `residuals`, whose storage is reused when it already has the rows.
void residualsFrom(const CesLogs& logs, const CesColumns& columns, double logScale, double returnsToScale,
                   Eigen::VectorXd& residuals)
{
    residuals = logs.logOutput - (logScale + returnsToScale * (logs.logSecond.array() + columns.value)).matrix();
}

} // namespace

RawEvaluation evaluateRaw(const CesLogs& logs, const Eigen::Vector4d& raw, const CesColumns* evaluated)
{
    CesColumns columns;
    if (!evaluated) {
        evaluateComposite(logs.logRatio, raw(1), raw(2), columns);
        evaluated = &columns;
    }
    RawEvaluation evaluation;
    residualsFrom(logs, *evaluated, raw(0), raw(3), evaluation.residuals);
    fillJacobian(logs, *evaluated, WeightColumn::byWeight, raw(3), evaluation.jacobian);
    return evaluation;
}

Eigen::Vector4d toRaw(const Eigen::VectorXd& solver)
{
    return {solver(0), logistic(solver(1)), std::expm1(solver(2)), solver(3)};
}

Eigen::Vector4d toSolver(const Eigen::Vector4d& raw)
{
    return {raw(0), std::log(raw(1) / (1 - raw(1))), std::log1p(raw(2)), raw(3)};
}

const CesColumns& CesModel::columnsAt(const Eigen::VectorXd& solver) const
{
    const Eigen::Vector4d at = solver.head<ces_fit::parameterCount>();
    for (const Evaluated& kept : evaluated_)
        if ((kept.at.array() == at.array()).all()) return kept.columns;
    Evaluated& slot = evaluated_[older_];
    older_ = 1 - older_;
    const Eigen::Vector4d raw = toRaw(solver);
    evaluateComposite(logs_.logRatio, raw(1), raw(2), slot.columns);
    slot.at = at;
    slot.shape = {raw(1), raw(2)};
    return slot.columns;
}

const CesColumns* CesModel::evaluatedAt(double weight, double curvature) const
{
    for (const Evaluated& kept : evaluated_)
        if (kept.shape(0) == weight && kept.shape(1) == curvature) return &kept.columns;
    return nullptr;
}

void CesModel::residualsInto(const Eigen::VectorXd& solver, Eigen::VectorXd& residuals) const
{
    residualsFrom(logs_, columnsAt(solver), solver(0), solver(3), residuals);
}

void CesModel::jacobianInto(const Eigen::VectorXd& solver, Eigen::MatrixXd& jacobian) const
{
    fillJacobian(logs_, columnsAt(solver), WeightColumn::byLogit, solver(3), jacobian);
    jacobian.col(2) *= std::exp(solver(2)); // dρ/ds = 1 + ρ
}

// J's columns are −1, −ν·∂H/∂t, −ν·(1 + ρ)·∂H/∂ρ and −(b + H) (fillJacobian, jacobianInto): JᵀJ
// and Jᵀr are the sums of their products (cesNormalSums, one pass over the rows), the constant
// factors taken out of each sum.
void CesModel::normalEquationsInto(const Eigen::VectorXd& solver, const Eigen::VectorXd& residuals, Eigen::MatrixXd&,
                                   Eigen::MatrixXd& gram, Eigen::VectorXd& gradient) const
{
    const std::array<double, cesNormalSumCount> total = cesNormalSums(columnsAt(solver), logs_.logSecond, residuals);
    const Eigen::Index n = logs_.logOutput.size();
    const double factors[] = {-1.0, -solver(3), -solver(3) * std::exp(solver(2)), -1.0};
    gram.resize(ces_fit::parameterCount, ces_fit::parameterCount);
    gram(0, 0) = static_cast<double>(n);
    gram(1, 0) = total[0];
    gram(2, 0) = total[1];
    gram(3, 0) = total[2];
    gram(1, 1) = total[3];
    gram(2, 1) = total[4];
    gram(3, 1) = total[5];
    gram(2, 2) = total[6];
    gram(3, 2) = total[7];
    gram(3, 3) = total[8];
    gradient.resize(ces_fit::parameterCount);
    gradient << total[9], total[10], total[11], total[12];
    for (Eigen::Index j = 0; j < ces_fit::parameterCount; ++j) {
        gradient(j) *= factors[j];
        for (Eigen::Index k = 0; k <= j; ++k) gram(k, j) = gram(j, k) *= factors[j] * factors[k];
    }
}

Eigen::VectorXd CesModel::residuals(const Eigen::VectorXd& solver) const
{
    Eigen::VectorXd residuals;
    residualsInto(solver, residuals);
    return residuals;
}

Eigen::MatrixXd CesModel::jacobian(const Eigen::VectorXd& solver) const
{
    Eigen::MatrixXd jacobian;
    jacobianInto(solver, jacobian);
    return jacobian;
}

} // namespace isoquant::ces_fit
