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

Eigen::VectorXd compositeColumn(const CesLogs& logs, double weight, double curvature)
{
    CesColumns columns;
    evaluateComposite(logs.logRatio, weight, curvature, CesParts::value, columns);
    return logs.logSecond + columns.value.matrix();
}

Eigen::VectorXd rawResiduals(const CesLogs& logs, const Eigen::Vector4d& raw)
{
    return logs.logOutput - (raw(0) + raw(3) * compositeColumn(logs, raw(1), raw(2)).array()).matrix();
}

namespace {

// ∂r/∂(ln A, δ or t, ρ, ν) from the composite's columns; r = ln Y − ln A − ν·(b + H).
void fillJacobian(const CesLogs& logs, const CesColumns& columns, double returnsToScale, Eigen::MatrixXd& jacobian)
{
    jacobian.resize(logs.logOutput.size(), parameterCount);
    jacobian.col(0).setConstant(-1.0);
    jacobian.col(1) = (-returnsToScale * columns.byWeight).matrix();
    jacobian.col(2) = (-returnsToScale * columns.byCurvature).matrix();
    jacobian.col(3) = -(logs.logSecond.array() + columns.value).matrix();
}

} // namespace

Eigen::MatrixXd rawJacobian(const CesLogs& logs, const Eigen::Vector4d& raw, WeightColumn weightColumn)
{
    CesColumns columns;
    evaluateComposite(logs.logRatio, raw(1), raw(2),
                      weightColumn == WeightColumn::byLogit ? CesParts::byLogit : CesParts::byWeight, columns);
    Eigen::MatrixXd jacobian;
    fillJacobian(logs, columns, raw(3), jacobian);
    return jacobian;
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
    if (!(solver.head<ces_fit::parameterCount>().array() == evaluatedAt_.array()).all()) {
        const Eigen::Vector4d raw = toRaw(solver);
        evaluateComposite(logs_.logRatio, raw(1), raw(2), CesParts::byLogit, columns_);
        evaluatedAt_ = solver.head<ces_fit::parameterCount>();
    }
    return columns_;
}

void CesModel::residualsInto(const Eigen::VectorXd& solver, Eigen::VectorXd& residuals) const
{
    const CesColumns& columns = columnsAt(solver);
    residuals = logs_.logOutput - (solver(0) + solver(3) * (logs_.logSecond.array() + columns.value)).matrix();
}

void CesModel::jacobianInto(const Eigen::VectorXd& solver, Eigen::MatrixXd& jacobian) const
{
    fillJacobian(logs_, columnsAt(solver), solver(3), jacobian);
    jacobian.col(2) *= std::exp(solver(2)); // dρ/ds = 1 + ρ
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
