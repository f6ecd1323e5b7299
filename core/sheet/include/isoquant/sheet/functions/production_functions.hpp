// The cell functions' logic on plain cells: argument reading, fitting and evaluation.
// The add-in converts Calc's arguments to cells, calls these, and maps results and errors back.
// Every function throws InputError with a message that names the argument (and row) at fault.
#pragma once

#include "isoquant/sheet/arguments/cells.hpp"
#include "isoquant/sheet/models/model_table.hpp"
#include "isoquant/math/fits/production_fit.hpp"

#include <cstddef>
#include <string>
#include <vector>

namespace isoquant {

// The arguments of PRODFIT (and the fit part of PRODSTAT), as the user gave them. A fit depends
// on nothing else, so equal arguments give the same fit (the cache relies on that).
struct FitArguments {
    CellTable output;
    CellTable inputs;
    CellTable controls; // empty when omitted
    Cell form;
    Cell constantReturns;
    Cell errors;
    Cell level;
    CellTable groups; // empty when omitted
    Cell effects;
    CellTable trend;  // empty when omitted
    Cell incompleteRows;

    bool operator==(const FitArguments& other) const
    {
        return output == other.output && inputs == other.inputs && controls == other.controls &&
               form == other.form && constantReturns == other.constantReturns && errors == other.errors &&
               level == other.level && groups == other.groups && effects == other.effects &&
               trend == other.trend && incompleteRows == other.incompleteRows;
    }
};

// Rows at the bottom that are empty in every range argument (output, inputs, controls, groups,
// trend) end the data: a whole column such as B:B is cut after its last value. Blank rows inside
// the data are not cut (they still need the incomplete-rows switch). Ranges of different heights
// are returned as they are, for the shape check to name.
FitArguments withoutTrailingEmptyRows(FitArguments arguments);

// The data and options of a fit as read from its arguments (after withoutTrailingEmptyRows).
// Throws InputError naming the argument (and row) at fault.
struct FitInput {
    ProductionData data;
    ProductionFitOptions options;
    bool dropIncomplete = false;
    std::vector<bool> incomplete; // the rows dropped, when dropIncomplete
    std::size_t firstDataRow = 1; // 1-based, as in messages
};
FitInput readFitInput(const FitArguments& arguments);

// Fits after withoutTrailingEmptyRows.
ProductionFit fitFromArguments(const FitArguments& arguments);

// Evaluators. `inputs` holds one row of input values per bundle (an optional header row of text
// is skipped), as many columns as the model has inputs; each returns a column, one value per row.
// `mean` TRUE: the mean prediction, exp(fitted ln Y) times the model's smearing factor; else the
// median, exp(fitted ln Y).
CellTable outputColumn(const ModelTable& model, const CellTable& inputs, const Cell& mean = {});
CellTable marginalProductColumn(const ModelTable& model, const CellTable& inputs, const Cell& input);
CellTable elasticityColumn(const ModelTable& model, const CellTable& inputs, const Cell& input);
// ν; a column of ν per row when `inputs` is not empty.
CellTable scaleColumn(const ModelTable& model, const CellTable& inputs);
// The returns-to-scale verdict at confidence level `level` (empty: 0.95); a table whose verdict row
// reads "not tested (…)" gives that row (untestedVerdict in production_model.hpp).
std::string returnsVerdictCell(const ModelTable& model, const Cell& level);

// PRODREGULAR: per row of inputs, "regular" or the condition that fails, in words (regularity.hpp).
CellTable regularityColumn(const ModelTable& model, const CellTable& inputs);

// PRODCOMPARE: the three forms on the same rows (form_comparison.hpp); `level` as for PRODFIT.
CellTable compareFormsTable(const CellTable& output, const CellTable& inputs, const Cell& level);

} // namespace isoquant
