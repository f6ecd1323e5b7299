// Invented, seeded period series for the growth and index tests: input quantities that wander
// (log random walks), cost shares, and output made exactly by a known technology times a known
// TFP path, Y_t = A_t·f(x_t), with no noise, so the TFP path is there to be recovered.
#pragma once

#include "isoquant/sheet/arguments/cells.hpp"
#include "isoquant/math/forms/technology.hpp"

#include <Eigen/Dense>

#include <random>
#include <vector>

namespace isoquant::testing {

// n periods × k inputs, each ln xᵢ a random walk from ln 100 with normal steps of SD 0.08.
Eigen::MatrixXd wanderingQuantities(std::mt19937& engine, Eigen::Index periods, Eigen::Index inputs);

// n × k cost shares: each row positive and summing to 1 (to rounding), drifting over periods.
Eigen::MatrixXd driftingShares(std::mt19937& engine, Eigen::Index periods, Eigen::Index inputs);

// ln A_t: a random walk from 0 with drift 0.01 and normal steps of SD 0.02.
Eigen::VectorXd productivityPath(std::mt19937& engine, Eigen::Index periods);

// Y_t = exp(ln A_t + ln f(x_t)).
Eigen::VectorXd outputOf(const Technology& technology, const Eigen::VectorXd& logProductivity,
                         const Eigen::MatrixXd& quantities);

// A typed Cobb-Douglas model range: form, ln A, one exponent row per label.
CellTable typedCobbDouglas(double logScale, const Eigen::VectorXd& exponents, const std::vector<std::string>& labels);

// A translog technology, ln Y = a + Σᵢ bᵢ ln xᵢ + ½ Σᵢⱼ gᵢⱼ ln xᵢ ln xⱼ (g symmetric), standing in
// for the core's translog form (not on this branch yet) to exercise PRODGROWTH's per-period
// elasticities through the Technology interface: εᵢ(x) = bᵢ + Σⱼ gᵢⱼ ln xⱼ.
class TranslogStandIn : public Technology {
public:
    TranslogStandIn(double constant, Eigen::VectorXd linear, Eigen::MatrixXd quadratic)
        : constant_(constant), linear_(std::move(linear)), quadratic_(std::move(quadratic)) {}

    ProductionForm form() const override { return ProductionForm::translog; }
    Eigen::Index inputCount() const override { return linear_.size(); }
    double logOutput(const Eigen::VectorXd& inputs) const override;
    double output(const Eigen::VectorXd& inputs) const override;
    double marginalProduct(const Eigen::VectorXd& inputs, Eigen::Index input) const override;
    double elasticity(const Eigen::VectorXd& inputs, Eigen::Index input) const override;
    double scaleElasticity(const Eigen::VectorXd& inputs) const override;
    // Not needed by growth accounting: throws std::logic_error.
    double secondPartial(const Eigen::VectorXd&, Eigen::Index, Eigen::Index) const override;
    std::optional<double> constantScaleElasticity() const override { return std::nullopt; }

private:
    double constant_;
    Eigen::VectorXd linear_;
    Eigen::MatrixXd quadratic_;
};

} // namespace isoquant::testing
