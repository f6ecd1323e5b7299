#include "isoquant/math/fits/ces_fit.hpp"
#include "isoquant/sheet/tables/form_tables.hpp"

#include "tables/table_writer.hpp"

namespace isoquant {

namespace {

std::string boundaryNote(const ProductionFit& fit)
{
    const std::string noErrors = "; no standard errors at a boundary";
    switch (fit.ces->boundary) {
    case CesBoundary::firstInputOnly:
        return "note: optimum on the boundary delta = 1: output follows " + fit.inputLabels[0] +
               " alone and rho is not identified" + noErrors;
    case CesBoundary::secondInputOnly:
        return "note: optimum on the boundary delta = 0: output follows " + fit.inputLabels[1] +
               " alone and rho is not identified" + noErrors;
    case CesBoundary::perfectSubstitutes:
        return "note: optimum on the boundary rho = -1: the inputs are perfect substitutes (sigma infinite)" +
               noErrors;
    case CesBoundary::fixedProportions:
        return "note: optimum at the limit rho -> infinity: the inputs are used in fixed proportions (sigma 0); "
               "rho shows the value reached" + noErrors;
    case CesBoundary::none: break;
    }
    return "";
}

std::string cesNote(const ProductionFit& fit)
{
    switch (fit.status.kind) {
    case FitStatusKind::notIdentified:
        return "note: not identified: the sum of squares is flat along some direction at the point reached "
               "(singular Hessian); the estimates are one optimum of many and have no standard errors";
    case FitStatusKind::notConverged:
    case FitStatusKind::stopped:
        return "note: the fit did not converge; the estimates are the solver's last values, not an optimum";
    case FitStatusKind::boundary: return boundaryNote(fit);
    case FitStatusKind::ok:
    case FitStatusKind::illConditioned:
    case FitStatusKind::exactFit: break;
    }
    return statusNote(fit);
}

bool onBoundary(const ProductionFit& fit, Eigen::Index parameter)
{
    switch (fit.ces->boundary) {
    case CesBoundary::firstInputOnly:
    case CesBoundary::secondInputOnly: return parameter == 1;
    case CesBoundary::perfectSubstitutes:
    case CesBoundary::fixedProportions: return parameter == 2;
    case CesBoundary::none: break;
    }
    return false;
}

} // namespace

std::size_t cesFitTableRows() { return 20; }

CellTable cesFitTable(const ProductionFit& fit)
{
    const CesDetails& ces = *fit.ces;
    TableWriter writer(cesFitTableRows(), fit.status.is(FitStatusKind::exactFit));
    writer.headerRow(cesTitle);
    const char* labels[] = {logScaleLabel, weightLabel, curvatureLabel, returnsParameterLabel};
    for (Eigen::Index j = 0; j < 4; ++j) {
        if (onBoundary(fit, j))
            writer.put(labels[j], {fit.inference.estimates(j), std::string(boundaryText)});
        else
            writer.parameterRow(labels[j], fit, j);
    }
    if (ces.boundary == CesBoundary::perfectSubstitutes || ces.boundary == CesBoundary::fixedProportions)
        writer.put(substitutionLabel, {ces.substitutionElasticity, std::string(boundaryText)});
    else
        writer.put(substitutionLabel, {ces.substitutionElasticity, writer.undefinedIfExact(ces.substitutionStandardError),
                                       Cell{}, Cell{}, writer.undefinedIfExact(ces.substitutionLowerBound),
                                       writer.undefinedIfExact(ces.substitutionUpperBound)});
    writer.skipRow();

    writer.fitStatisticRows(fit, false);
    writer.returnsRows(fit.returns);
    writer.textRow(formLabel, {formWord(fit.form), cesNote(fit)});
    writer.textRow(convergenceLabel, {convergenceWord(fit.status.kind),
                                      std::to_string(ces.evaluations) + " evaluations; " + fit.status.reason});
    writer.textRow(inputsLabel, {fit.inputLabels[0], fit.inputLabels[1]});
    writer.valueRow(smearingLabel, fit.smearingFactor);
    return writer.finish();
}

} // namespace isoquant
