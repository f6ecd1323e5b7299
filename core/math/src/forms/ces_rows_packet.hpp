// One packet of rows of the CES composite at an interior δ (forms/ces_columns.hpp), written once
// for both widths: ces_columns.cpp instantiates it with two doubles, ces_rows_avx2.cpp with four.
// In an unnamed namespace, so that each file has its own copy (see column_kernels_avx2.cpp).
// Internal to the math library.
#pragma once

#include "numerics/column_kernels_packet.hpp"

#include <Eigen/Core>

namespace isoquant::ces_rows {

// What the rows share at one (δ, ρ), δ ∈ (0, 1).
struct Shape {
    double weight;        // δ
    double complement;    // 1 − δ
    double logWeight;     // ln δ
    double logComplement; // ln(1 − δ)
    double curvature;     // ρ
};

// The four output columns, each at the packet's first row.
struct Outputs {
    double* value;       // H
    double* byLogit;     // ∂H/∂t
    double* byWeight;    // ∂H/∂δ
    double* byCurvature; // ∂H/∂ρ
};

// As in ces.cpp: below this |u| ∂H/∂ρ comes from the series of d/du[K(u)/u].
inline constexpr double seriesLimit = 1e-3;

namespace {

// Both branches of each formula are formed and each row's own is chosen; a division by u = 0 in a
// branch not chosen is harmless. With a = ln δ + u, c = ln(1 − δ):
//   |u| ≤ 1: K = log1p(δ·expm1(u)),  π = δ·eᵘ/m with m = 1 + δ·expm1(u),  ∂H/∂δ = d·expm1(u)/(u·m);
//   |u| > 1: K = max(a, c) + log1p(r), r = e^(−|a − c|),  π = logistic(a − c),
//            π − δ = π(1 − δ) − δ(1 − π) (the two products differ by the factor eᵘ, at least e, so
//            their difference keeps its digits also where δ is near 1),  ∂H/∂δ = d·(π − δ)/(q·u);
//   H = d·K/u, ∂H/∂t = q·∂H/∂δ (q = δ(1 − δ)), ∂H/∂ρ = −d²·(u·π − K)/u², or below seriesLimit
//   −d²·(κ₂/2 + κ₃u/3 + κ₄u²/8 + κ₅u³/30) with the Bernoulli cumulants κ₂ = q, κ₃ = q(1 − 2δ),
//   κ₄ = q(1 − 6q), κ₅ = q(1 − 2δ)(1 − 12q); at u = 0: H = δ·d, ∂H/∂δ = d.
template <typename Packet> void compositePacket(const double* logRatio, const Shape& shape, const Outputs& out)
{
    using namespace Eigen::internal;
    const Packet one = pset1<Packet>(1.0);
    const Packet minusOne = pset1<Packet>(-1.0); // −x as (−1)·x: Eigen's pnegate gives −0 or +0 for 0 by width
    const Packet weight = pset1<Packet>(shape.weight);
    const Packet complement = pset1<Packet>(shape.complement);
    const double q = shape.weight * shape.complement;
    const Packet d = ploadu<Packet>(logRatio);
    const Packet u = pmul(pset1<Packet>(-shape.curvature), d);
    const Packet small = pcmp_le(pabs(u), one);
    const Packet a = padd(pset1<Packet>(shape.logWeight), u);
    const Packet c = pset1<Packet>(shape.logComplement);
    // expm1(u) of the rows with |u| ≤ 1 by its series; r = e^(−|a − c|) only where some row of the
    // packet has |u| > 1 (or u NaN): on the benchmark's rows at ρ = 0.5, about one packet in ten.
    const Packet expm1 = column_kernels::expm1OnUnitInterval(pselect(small, u, pzero(u)));
    Packet exp = pzero(u);
    if (predux_any(pandnot(ptrue(u), small))) exp = pexp(pselect(small, pzero(u), pmul(minusOne, pabs(psub(a, c)))));
    const Packet logged = column_kernels::log1p(pselect(small, pmul(weight, expm1), exp));
    const Packet cumulant = pselect(small, logged, padd(pmax(a, c), logged)); // K

    // Three divisions a row (Kahan's log1p, 1/u, and 1/m or 1/(1 + r)): the rest are products.
    const Packet mix = padd(one, pmul(weight, expm1));
    const Packet firstLarger = pcmp_le(c, a);
    const Packet reciprocal = pdiv(one, pselect(small, mix, padd(one, exp))); // 1/m or 1/(1 + r)
    const Packet larger = reciprocal;                                        // 1/(1 + r)
    const Packet smaller = pmul(exp, reciprocal);                            // r/(1 + r)
    const Packet share = pselect(small, pmul(pmul(weight, padd(one, expm1)), reciprocal),
                                 pselect(firstLarger, larger, smaller));
    const Packet gap = psub(pmul(share, complement), pmul(weight, pselect(firstLarger, smaller, larger))); // π − δ

    const Packet zero = pcmp_eq(u, pzero(u));
    const Packet overU = pdiv(one, u);
    const Packet dOverU = pmul(d, overU);
    const Packet byWeight = pselect(small, pmul(pmul(dOverU, expm1), reciprocal),
                                    pmul(dOverU, pmul(gap, pset1<Packet>(1 / q))));
    pstoreu(out.value, pselect(zero, pmul(weight, d), pmul(dOverU, cumulant)));
    pstoreu(out.byWeight, pselect(zero, d, byWeight));
    pstoreu(out.byLogit, pselect(zero, pmul(pset1<Packet>(q), d),
                                 pselect(small, pmul(pset1<Packet>(q), byWeight), pmul(dOverU, gap))));

    const double skew = 1 - 2 * shape.weight;
    // κ₂/2 + u·(κ₃/3 + u·(κ₄/8 + u·κ₅/30))
    const Packet slope = padd(pset1<Packet>(q / 2),
                              pmul(u, padd(pset1<Packet>(q * skew / 3),
                                           pmul(u, padd(pset1<Packet>(q * (1 - 6 * q) / 8),
                                                        pmul(u, pset1<Packet>(q * skew * (1 - 12 * q) / 30)))))));
    const Packet exact = pmul(psub(pmul(u, share), cumulant), pmul(overU, overU));
    const Packet series = pcmp_lt(pabs(u), pset1<Packet>(seriesLimit));
    pstoreu(out.byCurvature, pmul(minusOne, pmul(pmul(d, d), pselect(series, slope, exact))));
}

} // namespace
} // namespace isoquant::ces_rows
