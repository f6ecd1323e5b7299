#include "isoquant/sheet/functions/form_comparison.hpp"

#include "isoquant/sheet/arguments/argument_names.hpp"
#include "isoquant/math/fits/production_fit.hpp"
#include "isoquant/math/numerics/distributions.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/sheet/arguments/option_arguments.hpp"
#include "isoquant/math/fits/translog_fit.hpp"

#include "tables/table_writer.hpp"

#include <algorithm>
#include <array>
#include <optional>

namespace isoquant {

namespace {

constexpr std::array<ProductionForm, 3> forms{ProductionForm::cobbDouglas, ProductionForm::ces,
                                              ProductionForm::translog};

struct Candidate {
    std::optional<ProductionFit> fit;
    std::string reason; // why there is no fit
};

// The rank (1 = lowest) of each fitted candidate's criterion; 0 for the others.
std::array<double, 3> ranks(const std::array<Candidate, 3>& candidates, double FitSummary::*criterion)
{
    std::array<double, 3> rank{};
    for (std::size_t a = 0; a < 3; ++a) {
        if (!candidates[a].fit) continue;
        rank[a] = 1;
        for (std::size_t b = 0; b < 3; ++b)
            if (candidates[b].fit && candidates[b].fit->summary.*criterion < candidates[a].fit->summary.*criterion)
                ++rank[a];
    }
    return rank;
}

std::string verdict(double pValue, double level)
{
    if (std::isnan(pValue)) return "";
    return pValue < 1.0 - level ? "cobb-douglas rejected" : "cobb-douglas not rejected";
}

// A ces fit gives a likelihood ratio only at an interior, converged, identified optimum.
std::string cesUnusable(const ProductionFit& ces)
{
    if (ces.status.is(FitStatusKind::notIdentified)) return "n/a: the ces fit is not identified";
    if (!ces.status.converged()) return "n/a: the ces fit did not converge";
    if (ces.ces->boundary != CesBoundary::none) return "n/a: the ces optimum is on a boundary";
    return "";
}

} // namespace

CellTable compareForms(const FitArguments& arguments)
{
    const double level = readLevelArgument(arguments.level, argument::level);
    // Read once; each form is fitted to the same data (the Cobb-Douglas first: its errors are the call's).
    FitInput input = readFitInput(arguments);
    std::array<Candidate, 3> candidates;
    for (std::size_t f = 0; f < forms.size(); ++f) {
        input.options.form = forms[f];
        try {
            candidates[f].fit = fitProduction(input.data, input.options);
        } catch (const InputError& error) {
            if (forms[f] == ProductionForm::cobbDouglas) throw;
            candidates[f].reason = "not fitted: " + sheetMessage(error);
        }
    }

    TableWriter writer(8, false);
    writer.textRow("form", {"parameters", "log-likelihood", "AIC", "BIC", "AIC rank", "BIC rank"});
    const auto aicRanks = ranks(candidates, &FitSummary::aic);
    const auto bicRanks = ranks(candidates, &FitSummary::bic);
    for (std::size_t f = 0; f < forms.size(); ++f) {
        if (!candidates[f].fit) {
            writer.textRow(formWord(forms[f]), {candidates[f].reason});
            continue;
        }
        const FitSummary& summary = candidates[f].fit->summary;
        writer.put(formWord(forms[f]), {static_cast<double>(summary.parameters), summary.logLikelihood, summary.aic,
                                        summary.bic, aicRanks[f], bicRanks[f]});
    }
    writer.skipRow();
    writer.textRow("nested test", {"statistic", "df1", "df2", "p-value", "distribution", "verdict"});

    const ProductionFit& cobbDouglas = *candidates[0].fit;
    if (const auto& translog = candidates[2].fit) {
        const WaldTest& test = translog->translog->cobbDouglasTest;
        const bool exact = translog->status.is(FitStatusKind::exactFit);
        const double f = exact ? notANumber : test.fStatistic;
        const double p = exact ? notANumber : test.pValue;
        // Under cluster errors with q > G − 1 the test is undefined: the verdict cell says why.
        const std::string conclusion =
            test.exceedsClusters ? tooFewGroupsNote("the test", test.numeratorDegreesOfFreedom,
                                                    translog->summary.clusterCount)
                                 : verdict(p, level);
        writer.put("translog vs cobb-douglas", {f, test.numeratorDegreesOfFreedom, test.denominatorDegreesOfFreedom,
                                                p, std::string("F"), conclusion});
    } else {
        writer.textRow("translog vs cobb-douglas", {"n/a: no translog fit"});
    }
    const std::string unusable = candidates[1].fit ? cesUnusable(*candidates[1].fit) : "n/a: no ces fit";
    if (unusable.empty()) {
        // LR = 2·(LL_ces − LL_cd); the CES nests the Cobb-Douglas, so it is ≥ 0 up to rounding.
        const double ratio = std::max(0.0, 2 * (candidates[1].fit->summary.logLikelihood -
                                                cobbDouglas.summary.logLikelihood));
        const double p = chiSquaredUpperPValue(ratio, 1);
        writer.put("ces vs cobb-douglas", {ratio, 1.0, Cell{}, p, std::string("chi-squared"), verdict(p, level)});
    } else {
        writer.textRow("ces vs cobb-douglas", {unusable});
    }
    return writer.finish();
}

} // namespace isoquant
