#include "isoquant/math/fits/panel_summary.hpp"

namespace isoquant {

void requirePanelColumns(const PanelColumns& panel, Eigen::Index rows, DataPart rowsPart, EffectsKind effects,
                         CovarianceKind covariance)
{
    const auto n = static_cast<std::size_t>(rows);
    if (panel.hasGroups() && panel.groupOfRow.size() != n)
        throw InputError({DataPart::groups, rowsPart}, "{0}: has " + std::to_string(panel.groupOfRow.size()) +
                                                           " rows of data but {1} has " + std::to_string(n));
    if (panel.hasPeriods() && static_cast<std::size_t>(panel.periods.size()) != n)
        throw InputError({DataPart::periods, rowsPart}, "{0}: has " + std::to_string(panel.periods.size()) +
                                                            " rows of data but {1} has " + std::to_string(n));
    if (effects != EffectsKind::none && !panel.hasGroups())
        throw InputError({DataPart::effects, DataPart::groups},
                         "{0}: \"" + effectsWord(effects) +
                             "\" needs the {1} argument, a column naming each row's plant or firm");
    if (effects == EffectsKind::twoWay && !panel.hasPeriods())
        throw InputError({DataPart::effects, DataPart::periods},
                         "{0}: \"two-way\" needs the {1} argument, the column of periods (years)");
    if (covariance == CovarianceKind::cluster) {
        if (!panel.hasGroups())
            throw InputError({DataPart::covarianceKind, DataPart::groups},
                             "{0}: \"cluster\" needs the {1} argument, a column naming each row's plant or firm");
        if (panel.groupLabels.size() < 2)
            throw InputError({DataPart::groups},
                             "every row is in the same group; cluster-robust errors need at least 2 groups");
    }
}

PanelSummary summarisePanel(const PanelColumns& panel, EffectsKind effects, const PanelRegression& run,
                            const LeastSquaresResult& regression, double logScaleAtControlMeans)
{
    PanelSummary summary;
    summary.effects = effects;
    summary.groups = static_cast<Eigen::Index>(panel.groupLabels.size());
    summary.groupLabels = panel.groupLabels;
    if (effects != EffectsKind::none) {
        summary.withinRSquared = run.withinRSquared;
        summary.groupEffects = run.groupEffects;
    }
    if (effects == EffectsKind::twoWay) {
        summary.periods = run.periodValues;
        const auto later = static_cast<Eigen::Index>(run.periodValues.size()) - 1;
        summary.periodEffects.resize(later + 1);
        summary.periodEffects << 0.0, regression.inference.estimates.segment(run.firstPeriodColumn, later);
    }
    if (run.trendColumn) {
        summary.technicalChange = regression.inference.at(*run.trendColumn);
        summary.latestPeriod = panel.periods.maxCoeff();
        summary.trendLooksLikeDates = trendCountsDays(panel.periods);
    }
    summary.shiftsLogScale = effects != EffectsKind::none || run.trendColumn.has_value();
    summary.logScaleForPredictions = logScaleAtControlMeans + run.latestPeriodShift;
    if (effects != EffectsKind::none) {
        // ln A at the control means holds the plain mean of the group effects; predictions use the
        // mean over rows, Σ_g n_g·α_g / n.
        double rowWeighted = 0;
        for (const Eigen::Index group : panel.groupOfRow) rowWeighted += run.groupEffects(group);
        rowWeighted /= static_cast<double>(panel.groupOfRow.size());
        summary.logScaleForPredictions += rowWeighted - run.groupEffects.mean();
    }
    return summary;
}

} // namespace isoquant
