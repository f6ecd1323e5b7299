#include "isoquant/math/frontier/envelope.hpp"

#include <ClpSimplex.hpp>
#include <CoinPackedMatrix.hpp>

#include <algorithm>
#include <cmath>
#include <limits>

namespace isoquant {

namespace {

constexpr double infinity = std::numeric_limits<double>::infinity();

// Each column divided by its largest value (an all-zero column is left as it is; the largest, not
// the mean, since a sum of values near 1e308 overflows): the columns are then on one scale, and
// with the per-plant factor below Clp's absolute tolerances (1e-7) mean the same in every unit.
// Scores and intensities λ do not change, since every constraint is scaled row by row.
Eigen::MatrixXd scaledByColumnMaxima(const Eigen::MatrixXd& values)
{
    Eigen::MatrixXd scaled = values;
    for (Eigen::Index column = 0; column < values.cols(); ++column) {
        const double largest = values.col(column).maxCoeff();
        if (largest > 0) scaled.col(column) /= largest;
    }
    return scaled;
}

} // namespace

struct EnvelopeSolver::Models {
    Eigen::MatrixXd outputs, inputs;     // as given, for the targets
    Eigen::MatrixXd scaledOutputs, scaledInputs;
    EnvelopeOrientation orientation;
    EnvelopeReturns returns;
    ClpSimplex scoreModel;  // stage one: min θ (or max φ)
    ClpSimplex slackModel;  // stage two: θ fixed, max Σ slacks
    Eigen::Index plants() const { return inputs.rows(); }
    int intensityColumns() const { return static_cast<int>(inputs.rows()); }
    int scoreColumn() const { return intensityColumns(); } // θ or φ, after the λ columns
    int inputRows() const { return static_cast<int>(inputs.cols()); }
    int outputRows() const { return static_cast<int>(outputs.cols()); }
    // The factor c of plant o: the largest of its scaled inputs and outputs.
    double plantScale(Eigen::Index plant) const;
    // Plant o's θ coefficients and right-hand sides in `model` (see envelope.hpp), divided by c.
    void setPlant(ClpSimplex& model, Eigen::Index plant) const;
};

namespace {

// Columns λ₁…λₙ, then θ (or φ); rows: inputs, outputs, Σ λ. θ's coefficients are placeholders
// (−1) in the rows that change plant by plant, so the matrix's structure never changes.
CoinPackedMatrix envelopeMatrix(const Eigen::MatrixXd& outputs, const Eigen::MatrixXd& inputs,
                                EnvelopeOrientation orientation)
{
    const auto m = static_cast<int>(inputs.cols()), s = static_cast<int>(outputs.cols());
    CoinPackedMatrix matrix(true, m + s + 1, 0);
    std::vector<int> rows;
    std::vector<double> values;
    for (Eigen::Index plant = 0; plant < inputs.rows(); ++plant) {
        rows.clear();
        values.clear();
        for (int i = 0; i < m; ++i)
            if (inputs(plant, i) != 0) rows.push_back(i), values.push_back(inputs(plant, i));
        for (int r = 0; r < s; ++r)
            if (outputs(plant, r) != 0) rows.push_back(m + r), values.push_back(outputs(plant, r));
        rows.push_back(m + s);
        values.push_back(1.0);
        matrix.appendCol(static_cast<int>(rows.size()), rows.data(), values.data());
    }
    rows.clear();
    values.clear();
    const bool input = orientation == EnvelopeOrientation::input;
    for (int row = input ? 0 : m; row < (input ? m : m + s); ++row) rows.push_back(row), values.push_back(-1.0);
    matrix.appendCol(static_cast<int>(rows.size()), rows.data(), values.data());
    return matrix;
}

// The Σ λ row is free here; setPlant gives it its bounds.
void loadModel(ClpSimplex& model, const CoinPackedMatrix& matrix, const std::vector<double>& objective)
{
    const int columns = matrix.getNumCols(), rows = matrix.getNumRows();
    std::vector<double> columnLower(static_cast<std::size_t>(columns), 0.0),
        columnUpper(static_cast<std::size_t>(columns), infinity);
    std::vector<double> rowLower(static_cast<std::size_t>(rows), -infinity), rowUpper(static_cast<std::size_t>(rows), infinity);
    model.setLogLevel(0);
    model.loadProblem(matrix, columnLower.data(), columnUpper.data(), objective.data(), rowLower.data(),
                      rowUpper.data());
    model.scaling(0); // the values are scaled already (scaledByColumnMaxima, plantScale)
}

} // namespace

double EnvelopeSolver::Models::plantScale(Eigen::Index plant) const
{
    return std::max(scaledInputs.row(plant).maxCoeff(), scaledOutputs.row(plant).maxCoeff());
}

// The LP of plant o is solved for μ = λ / c, every row divided by c: its right-hand sides and θ's
// coefficients are then at most 1 in size, one of them 1, so Clp's absolute tolerance (1e-7) is
// relative to plant o's own amounts. Without it a plant a millionth of the largest one's size would have
// its constraints met to within 10 % only. Σ λ = 1 becomes Σ μ = 1/c.
void EnvelopeSolver::Models::setPlant(ClpSimplex& model, Eigen::Index plant) const
{
    const int m = inputRows(), s = outputRows(), score = scoreColumn();
    const bool input = orientation == EnvelopeOrientation::input;
    const double scale = plantScale(plant);
    for (int i = 0; i < m; ++i) {
        const double x = scaledInputs(plant, i) / scale;
        if (input) model.modifyCoefficient(i, score, -x, true);
        model.setRowBounds(i, -infinity, input ? 0.0 : x);
    }
    for (int r = 0; r < s; ++r) {
        const double y = scaledOutputs(plant, r) / scale;
        if (!input) model.modifyCoefficient(m + r, score, -y, true);
        model.setRowBounds(m + r, input ? y : 0.0, infinity);
    }
    // Σ λ: free under constant returns, = 1 under variable, ≤ 1 under non-increasing returns.
    model.setRowBounds(m + s, returns == EnvelopeReturns::variable ? 1.0 / scale : -infinity,
                       returns == EnvelopeReturns::constant ? infinity : 1.0 / scale);
    // modifyCoefficient changes only the column copy: drop the row copy the last solve kept.
    model.setNewRowCopy(nullptr);
}

namespace {

// Warm start from the current basis: by the dual simplex after a change of plant (the old basis
// stays dual feasible for the same objective), by the primal simplex for the second stage started
// from the first stage's optimal basis (primal feasible with θ fixed at its optimum). Should that
// end without a verdict, once more from the slack basis.
EnvelopeStatus solveModel(ClpSimplex& model, bool primalFirst)
{
    if (primalFirst)
        model.primal();
    else
        model.dual();
    if (!model.isProvenOptimal() && !model.isProvenDualInfeasible()) {
        model.allSlackBasis(true);
        model.primal();
    }
    if (model.isProvenOptimal()) return EnvelopeStatus::solved;
    if (model.isProvenDualInfeasible()) return EnvelopeStatus::unbounded;
    return EnvelopeStatus::failed;
}

} // namespace

EnvelopeSolver::EnvelopeSolver(const Eigen::MatrixXd& outputs, const Eigen::MatrixXd& inputs,
                               EnvelopeReturns returns, EnvelopeOrientation orientation)
    : models_(std::make_unique<Models>())
{
    Models& models = *models_;
    models.outputs = outputs;
    models.inputs = inputs;
    models.scaledOutputs = scaledByColumnMaxima(outputs);
    models.scaledInputs = scaledByColumnMaxima(inputs);
    models.orientation = orientation;
    models.returns = returns;
    const CoinPackedMatrix matrix = envelopeMatrix(models.scaledOutputs, models.scaledInputs, orientation);
    const auto n = static_cast<std::size_t>(inputs.rows());

    // Stage one minimises θ, or −φ.
    std::vector<double> scoreObjective(n + 1, 0.0);
    scoreObjective[n] = orientation == EnvelopeOrientation::input ? 1.0 : -1.0;
    loadModel(models.scoreModel, matrix, scoreObjective);

    // Stage two maximises Σᵢ sᵢ⁻ + Σᵣ sᵣ⁺ = const − Σⱼ λⱼ (Σᵢ xᵢⱼ − Σᵣ yᵣⱼ) in the data's units,
    // so it minimises Σⱼ λⱼ cⱼ with cⱼ = Σᵢ xᵢⱼ − Σᵣ yᵣⱼ, divided by max |cⱼ| (the same optimum,
    // coefficients near 1).
    const Eigen::VectorXd slackCost = inputs.rowwise().sum() - outputs.rowwise().sum();
    const double largest = slackCost.cwiseAbs().maxCoeff();
    std::vector<double> slackObjective(n + 1, 0.0);
    for (std::size_t j = 0; j < n; ++j)
        slackObjective[j] = largest > 0 ? slackCost(static_cast<Eigen::Index>(j)) / largest : 0.0;
    loadModel(models.slackModel, matrix, slackObjective);
}

EnvelopeSolver::~EnvelopeSolver() = default;

PlantEnvelope EnvelopeSolver::solve(Eigen::Index plant, bool secondStage)
{
    Models& models = *models_;
    PlantEnvelope result;
    models.setPlant(models.scoreModel, plant);
    result.status = solveModel(models.scoreModel, false);
    if (result.status != EnvelopeStatus::solved) return result;
    const double optimum = models.scoreModel.primalColumnSolution()[models.scoreColumn()];
    result.score = models.orientation == EnvelopeOrientation::input ? optimum : 1.0 / optimum;
    if (!secondStage) return result;

    ClpSimplex& slacks = models.slackModel;
    models.setPlant(slacks, plant);
    slacks.setColumnBounds(models.scoreColumn(), optimum, optimum);
    slacks.copyinStatus(models.scoreModel.statusArray());
    result.status = solveModel(slacks, true);
    if (result.status != EnvelopeStatus::solved) return result;
    // λ = c·μ; μ is what the solver's tolerances apply to, so the threshold is taken on it.
    const Eigen::Map<const Eigen::VectorXd> solved(slacks.primalColumnSolution(), models.plants());
    const Eigen::VectorXd intensities = models.plantScale(plant) * solved;
    for (Eigen::Index j = 0; j < models.plants(); ++j)
        if (solved(j) > peerWeightThreshold) result.peers.emplace_back(j, intensities(j));
    result.inputTargets = models.inputs.transpose() * intensities;
    result.outputTargets = models.outputs.transpose() * intensities;
    return result;
}

} // namespace isoquant
