#include "isoquant/math/fits/production_fit.hpp"

#include "isoquant/math/messages/input_error.hpp"

#include <string>

namespace isoquant {

namespace {

// The panel options (groups, effects, a trend, cluster errors) are built on the cobb-douglas fit so
// far; the other forms refuse them rather than fit without them.
void refusePanelOptions(const ProductionData& data, const ProductionFitOptions& options)
{
    const std::string form = " only with the cobb-douglas form, not with \"" + formWord(options.form) + "\"";
    if (options.effects != EffectsKind::none) throw InputError({DataPart::effects}, "group or period effects work" + form);
    if (data.panel.hasPeriods()) throw InputError({DataPart::periods}, "a trend works" + form);
    if (options.covariance == CovarianceKind::cluster) throw InputError({DataPart::covarianceKind}, "\"cluster\" works" + form);
    if (data.panel.hasGroups()) throw InputError({DataPart::groups}, "a group column works" + form);
}

} // namespace

ProductionFit fitProduction(const ProductionData& data, const ProductionFitOptions& options)
{
    if (options.form != ProductionForm::cobbDouglas) refusePanelOptions(data, options);
    if (options.form == ProductionForm::ces) return fitCes(data, options);
    if (options.form == ProductionForm::translog) return fitTranslog(data, options);
    return fitCobbDouglas(data, options);
}

} // namespace isoquant
