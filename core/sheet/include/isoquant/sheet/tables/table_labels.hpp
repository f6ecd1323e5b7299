// The fixed words of the PRODFIT table, shared by the writer and the model reader.
#pragma once

#include <array>
#include <cstddef>

namespace isoquant {

// The header row: its first cell names the table (a title below), the others name the columns.
inline constexpr std::array<const char*, 6> columnLabels{"value",   "std. error",  "t",
                                                         "p-value", "lower bound", "upper bound"};
inline constexpr std::size_t tableColumns = 1 + columnLabels.size();
inline constexpr const char* cobbDouglasTitle = "Cobb-Douglas fit";
inline constexpr const char* cesTitle = "ces fit";
inline constexpr const char* translogTitle = "translog fit";
// The titles a model reader skips as the header row.
inline constexpr std::array<const char*, 3> tableTitles{cobbDouglasTitle, cesTitle, translogTitle};
inline constexpr const char* logScaleLabel = "ln A";
inline constexpr const char* scaleLabel = "A"; // a hand-typed model may give A instead of ln A
inline constexpr const char* controlSuffix = " (control)";
inline constexpr const char* observationsLabel = "observations";
inline constexpr const char* rSquaredLabel = "R2";
inline constexpr const char* adjustedRSquaredLabel = "adjusted R2";
inline constexpr const char* residualSdLabel = "residual SD";
inline constexpr const char* overallTestLabel = "F (slopes = 0)";
inline constexpr const char* logLikelihoodLabel = "log-likelihood";
inline constexpr const char* aicLabel = "AIC";
inline constexpr const char* bicLabel = "BIC";
inline constexpr const char* returnsLabel = "returns to scale";
inline constexpr const char* verdictLabel = "verdict";
inline constexpr const char* formLabel = "form";
inline constexpr const char* controlMeansLabel = "ln A at control means";
inline constexpr const char* notAvailableText = "n/a";
inline constexpr const char* imposedText = "imposed";

// Labels of the statistic rows, which are never inputs.
inline constexpr std::array<const char*, 12> statisticLabels{
    observationsLabel, rSquaredLabel,  adjustedRSquaredLabel, residualSdLabel,
    overallTestLabel,  logLikelihoodLabel, aicLabel,           bicLabel,
    returnsLabel,      verdictLabel,   formLabel,             controlMeansLabel};

// Rows of the estimation options, after the rows above (fit_table.hpp).
inline constexpr const char* smearingLabel = "smearing factor";
inline constexpr const char* groupsLabel = "groups";
inline constexpr const char* effectsLabel = "effects";
inline constexpr const char* withinRSquaredLabel = "within R2";
inline constexpr const char* periodsLabel = "periods";
inline constexpr const char* technicalChangeLabel = "technical change per period";
inline constexpr const char* predictionScaleLabel = "ln A for predictions";
inline constexpr const char* latestPeriodLabel = "latest period";
inline constexpr const char* droppedRowsLabel = "incomplete rows dropped";
// PRODSTAT answers these, followed by a group's or a period's label, from the fit itself.
inline constexpr const char* groupEffectPrefix = "effect of group ";
inline constexpr const char* periodEffectPrefix = "effect of period ";

inline constexpr std::array<const char*, 9> optionStatisticLabels{
    smearingLabel,        groupsLabel,           effectsLabel,         withinRSquaredLabel, periodsLabel,
    technicalChangeLabel, predictionScaleLabel,  latestPeriodLabel,    droppedRowsLabel};

// Rows of the ces and translog tables (form_tables.hpp).
inline constexpr const char* weightLabel = "delta";
inline constexpr const char* curvatureLabel = "rho";
inline constexpr const char* returnsParameterLabel = "nu";
inline constexpr const char* substitutionLabel = "sigma";
inline constexpr const char* convergenceLabel = "convergence";
inline constexpr const char* inputsLabel = "inputs";
inline constexpr const char* elasticityPrefix = "elasticity ";
inline constexpr const char* cobbDouglasTestLabel = "Cobb-Douglas test";
inline constexpr const char* boundaryText = "boundary";

// Statistic rows only the ces and translog tables have (besides "elasticity <label>").
inline constexpr std::array<const char*, 3> formStatisticLabels{convergenceLabel, inputsLabel, cobbDouglasTestLabel};

} // namespace isoquant
