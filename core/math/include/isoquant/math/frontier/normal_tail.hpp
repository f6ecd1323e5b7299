// The standard normal's log distribution function and inverse Mills ratio, accurate far into the
// lower tail, where the frontier likelihoods and the conditional efficiencies evaluate them.
#pragma once

namespace isoquant {

// ln Φ(z). Above z = −37 from erfc (Φ(−37) ≈ 6e−300 is still a normal double); below, from the
// asymptotic series ln Φ(z) = ln φ(z) − ln(−z) + ln(1 − z⁻² + 3z⁻⁴ − 15z⁻⁶ + 105z⁻⁸ − 945z⁻¹⁰)
// (Abramowitz and Stegun 26.2.12), whose next term is below 1e−14 relative there.
double logNormalCdf(double z);

// φ(z)/Φ(z) = exp(ln φ(z) − ln Φ(z)).
double inverseMillsRatio(double z);

// Φ⁻¹(p) for 0 < p < 1.
double normalQuantile(double probability);

} // namespace isoquant
