// Tail probabilities and critical values used by the fits; thin wrappers over Boost.Math that
// settle the edge cases (infinite statistics, undefined tests) in one place.
#pragma once

namespace isoquant {

// Two-sided p-value of a t statistic on `degreesOfFreedom`: 2·P(T > |t|). 0 for |t| = ∞, NaN for NaN.
double studentTwoSidedPValue(double t, double degreesOfFreedom);

// The t value with P(|T| ≤ t) = level: the (1+level)/2 quantile of Student t.
double studentCriticalValue(double level, double degreesOfFreedom);

// Upper-tail p-value P(F > f) of Fisher's F(d1, d2). 0 for f = ∞, NaN for NaN.
double fisherUpperPValue(double f, double numeratorDegreesOfFreedom, double denominatorDegreesOfFreedom);

// Upper-tail p-value P(X > x) of χ²(degrees of freedom). 0 for x = ∞, 1 for x ≤ 0, NaN for NaN.
double chiSquaredUpperPValue(double x, double degreesOfFreedom);

} // namespace isoquant
