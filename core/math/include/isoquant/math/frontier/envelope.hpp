// Data envelopment: each plant's efficiency against the hull of all plants, by linear programming
// (COIN-OR Clp). Envelopment form, for plant o with inputs x_o (m) and outputs y_o (s), over the
// intensities λ ≥ 0 of all n plants:
//   input orientation   min θ  s.t.  Σⱼ λⱼ xᵢⱼ ≤ θ xᵢₒ,  Σⱼ λⱼ yᵣⱼ ≥ yᵣₒ       score θ ≤ 1
//   output orientation  max φ  s.t.  Σⱼ λⱼ xᵢⱼ ≤ xᵢₒ,   Σⱼ λⱼ yᵣⱼ ≥ φ yᵣₒ     score 1/φ ≤ 1
// with no condition on Σⱼ λⱼ under constant returns (Charnes, Cooper and Rhodes 1978), Σⱼ λⱼ = 1
// under variable returns (Banker, Charnes and Cooper 1984) and Σⱼ λⱼ ≤ 1 under non-increasing
// returns. The second stage keeps θ (or φ) at its optimum and maximises the sum of the slacks
// Σᵢ sᵢ⁻ + Σᵣ sᵣ⁺ in the data's own units (the textbook two-stage model); its λ gives the peers and
// the targets Σⱼ λⱼ xᵢⱼ and Σⱼ λⱼ yᵣⱼ, slacks included.
//
// Values must be finite and non-negative, every plant with a positive input and a positive output,
// and the positive values of a column within a ratio of maximumAmountRatio (the sheet layer checks
// this and names the cell): the scaled values then stay far from underflow.
#pragma once

#include <Eigen/Dense>

#include <memory>
#include <utility>
#include <vector>

namespace isoquant {

// Largest ratio of two positive values in one column: beyond it the smaller amounts are below the
// LP solver's tolerance relative to the larger (1e-7 × 1e-5 of slack for rounding), and real data
// spanning more than twelve orders of magnitude in one column is an error of units.
inline constexpr double maximumAmountRatio = 1e12;

enum class EnvelopeReturns { constant, variable, nonIncreasing };
enum class EnvelopeOrientation { input, output };

enum class EnvelopeStatus {
    solved,
    unbounded, // no finite optimum (impossible when every plant has a positive input)
    failed     // the LP solver stopped without an optimum
};

struct PlantEnvelope {
    EnvelopeStatus status = EnvelopeStatus::failed;
    double score = 0;                                 // θ, or 1/φ
    std::vector<std::pair<Eigen::Index, double>> peers; // (plant, λ) with λ > 0, from the second stage
    Eigen::VectorXd inputTargets;                     // Σⱼ λⱼ xᵢⱼ, m values (second stage only)
    Eigen::VectorXd outputTargets;                    // Σⱼ λⱼ yᵣⱼ, s values (second stage only)
};

// One LP model per stage, built once and changed plant by plant (the θ column's coefficients and
// the right-hand sides), each solve warm-started from the previous plant's basis.
class EnvelopeSolver {
public:
    // outputs: n × s, inputs: n × m, n ≥ 1 rows of plants.
    EnvelopeSolver(const Eigen::MatrixXd& outputs, const Eigen::MatrixXd& inputs, EnvelopeReturns returns,
                   EnvelopeOrientation orientation);
    ~EnvelopeSolver();
    EnvelopeSolver(const EnvelopeSolver&) = delete;
    EnvelopeSolver& operator=(const EnvelopeSolver&) = delete;

    // The score of `plant`; with `secondStage`, also its peers and targets.
    PlantEnvelope solve(Eigen::Index plant, bool secondStage);

    struct Models; // the two Clp models and the data (envelope.cpp), kept out of this header

private:
    std::unique_ptr<Models> models_;
};

// A plant's LP is solved for μ = λ/c, c the largest of its own amounts after each column is divided
// by its largest value (envelope.cpp); μ at or below this counts as zero when peers are listed: the solver's
// own tolerance.
inline constexpr double peerWeightThreshold = 1e-7;

} // namespace isoquant
