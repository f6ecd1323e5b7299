// Growth accounting: how much of output growth between adjacent periods came from each input,
// from returns to scale, and from total factor productivity (the Solow residual).
//
// For periods t = 2…n, growth is the natural-log difference
//   g_Y = ln Y_t − ln Y_{t−1},   gᵢ = ln xᵢ,t − ln xᵢ,t−1,
// and the weights wᵢ of the interval (output elasticities εᵢ of a technology, or cost shares)
// have the sum ν = Σᵢ wᵢ. Then
//   contribution of input i   cᵢ = (wᵢ/ν)·gᵢ
//   scale effect              s  = (ν − 1)·Σᵢ (wᵢ/ν)·gᵢ     (0 when ν = 1)
//   TFP growth                r  = g_Y − Σᵢ cᵢ − s           (the residual)
// so Σᵢ cᵢ + s = Σᵢ wᵢ·gᵢ and every period adds up to g_Y, to rounding. The total row of the
// span: output growth ln Y_n − ln Y_1, each contribution and the scale effect summed over the
// periods, and TFP growth again the residual (so it equals the sum of the periods' residuals, as
// log growth adds up over periods, to rounding).
#pragma once

#include "isoquant/math/forms/technology.hpp"

#include <Eigen/Dense>

#include <vector>

namespace isoquant {

struct GrowthComponents {
    double output = 0;           // g_Y
    Eigen::VectorXd inputs;      // cᵢ, one per input
    double scaleEffect = 0;      // s
    double productivity = 0;     // r, TFP growth
};

struct GrowthAccount {
    std::vector<GrowthComponents> periods; // periods 2…n, in order
    GrowthComponents total;                // the whole span, periods 1 to n
};

// The technology's output elasticities ∂ln Y/∂ln xᵢ at each period's input bundle, one row per
// period. They differ from period to period for a form whose elasticities vary (translog); for
// Cobb-Douglas every row holds its exponents.
Eigen::MatrixXd periodElasticities(const Technology& technology, const Eigen::MatrixXd& inputs);

// Weights of each interval from the weights of each period, Törnqvist style: the mean of the
// two adjacent periods, w̄ᵢ,t = ½(wᵢ,t−1 + wᵢ,t). n rows in, n − 1 rows out.
Eigen::MatrixXd tornqvistIntervalWeights(const Eigen::MatrixXd& periodWeights);

// The account of every interval. `output` has n ≥ 2 positive values, `inputs` n × k positive,
// `intervalWeights` (n − 1) × k; every interval's ν must be positive (the caller checks and names
// the period).
GrowthAccount accountForGrowth(const Eigen::VectorXd& output, const Eigen::MatrixXd& inputs,
                               const Eigen::MatrixXd& intervalWeights);

// Total factor productivity of each row: observed output over the technology's prediction,
// Y / f(x) = exp(ln Y − ln f(x) − shiftᵢ), where `logScaleShifts` (empty: all 0) moves each row's
// ln A to its own period: shiftᵢ = λ·(tᵢ − t_last) for a trend. 1 means exactly as predicted. On
// the sample a least-squares fit with a constant (or group effects) was fitted to, with each row
// at its own period's ln A, the mean of ln(Y/f(x)) is the mean residual, 0, so the geometric mean
// is 1.
Eigen::VectorXd productivityLevels(const Technology& technology, const Eigen::VectorXd& output,
                                   const Eigen::MatrixXd& inputs, const Eigen::VectorXd& logScaleShifts = {});

} // namespace isoquant
