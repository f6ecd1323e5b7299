// PRODCOMPARE: the three forms fitted to the same rows, ranked by AIC and BIC, with the tests of
// Cobb-Douglas nested in each of the others.
//
// Layout (8 rows × 7 columns):
//   form | parameters | log-likelihood | AIC | BIC | AIC rank | BIC rank        header
//   cobb-douglas, ces, translog                                                one row each
//   (empty row)
//   nested test | statistic | df1 | df2 | p-value | distribution | verdict     header
//   translog vs cobb-douglas   Wald F of all βᵢⱼ = 0 (the translog table's Cobb-Douglas test), on F(q, n−p)
//   ces vs cobb-douglas        likelihood ratio of ρ = 0, LR = 2·(LL_ces − LL_cd) = n·ln(RSS_cd/RSS_ces),
//                              on χ²(1): Cobb-Douglas is the CES at ρ = 0, an interior point of
//                              ρ > −1, with δ and ν identified there (νδ and ν(1−δ) are its exponents)
// A form that cannot be fitted to these data (ces with other than two inputs, too few rows…)
// shows why in place of its figures, is left out of the ranks, and its test is "n/a". The verdict
// is "cobb-douglas rejected" when p < 1 − level, else "cobb-douglas not rejected". Rank 1 is the
// lowest criterion; all log-likelihoods are Gaussian on ln Y of the same rows, so they compare.
#pragma once

#include "isoquant/sheet/functions/production_functions.hpp"

namespace isoquant {

// Throws InputError when the data do not allow even the Cobb-Douglas fit.
CellTable compareForms(const FitArguments& arguments);

} // namespace isoquant
