#include "fits/ces_fit_model.hpp"

#include "isoquant/math/forms/ces.hpp"
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
    const CesCompositeCurve curve(weight, curvature);
    Eigen::VectorXd column(logs.logOutput.size());
    for (Eigen::Index i = 0; i < column.size(); ++i) column(i) = logs.logSecond(i) + curve.value(logs.logRatio(i));
    return column;
}

Eigen::VectorXd rawResiduals(const CesLogs& logs, const Eigen::Vector4d& raw)
{
    return logs.logOutput - (raw(0) + raw(3) * compositeColumn(logs, raw(1), raw(2)).array()).matrix();
}

// H and its derivatives are taken once per row.
Eigen::MatrixXd rawJacobian(const CesLogs& logs, const Eigen::Vector4d& raw, WeightColumn weightColumn)
{
    const Eigen::Index n = logs.logOutput.size();
    const CesCompositeCurve curve(raw(1), raw(2));
    Eigen::MatrixXd jacobian(n, parameterCount);
    for (Eigen::Index i = 0; i < n; ++i) {
        const CesComposite composite = curve.at(logs.logRatio(i));
        jacobian(i, 0) = -1.0;
        // ∂/∂t stays finite even where δ rounds to 0 or 1
        const double byWeight = weightColumn == WeightColumn::byLogit ? composite.byWeightLogit : composite.byWeight;
        jacobian(i, 1) = -raw(3) * byWeight;
        jacobian(i, 2) = -raw(3) * composite.byCurvature;
        jacobian(i, 3) = -(logs.logSecond(i) + composite.value);
    }
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

Eigen::VectorXd CesModel::residuals(const Eigen::VectorXd& solver) const { return rawResiduals(logs_, toRaw(solver)); }

Eigen::MatrixXd CesModel::jacobian(const Eigen::VectorXd& solver) const
{
    Eigen::MatrixXd jacobian = rawJacobian(logs_, toRaw(solver), WeightColumn::byLogit);
    jacobian.col(2) *= std::exp(solver(2)); // dρ/ds = 1 + ρ
    return jacobian;
}

} // namespace isoquant::ces_fit
