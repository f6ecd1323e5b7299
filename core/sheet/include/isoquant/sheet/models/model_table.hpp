// A model range as the evaluators take it: its cells, and the production model read from them on
// first use and kept, so that the many calls over one range read it once. Copies share the cells
// and the model. Safe to use from several threads.
//
// Who keeps a ModelTable keeps its model: the add-in's ModelRanges keeps one per recent model
// range (the only place that compares ranges by content); a CellTable passed where a ModelTable
// is taken (the unit tests, PRODGROWTH's weights) is read for that call alone.
#pragma once

#include "isoquant/sheet/arguments/cells.hpp"
#include "isoquant/sheet/models/production_model.hpp"

#include <memory>

namespace isoquant {

class ModelTable {
public:
    // Implicit: any table of cells is a model range not read yet.
    ModelTable(CellTable cells);

    const CellTable& cells() const;

    // readProductionModel(cells()), read on the first call and kept. An error (InputError) is not
    // kept: the next call reads the cells again, and throws again.
    const ProductionModel& production() const;

private:
    struct Shared;
    std::shared_ptr<Shared> shared_;
};

} // namespace isoquant
