#include "array_fitting.hxx"

#include "cell_conversion.hxx"
#include "user_dialogs.hxx"

#include <com/sun/star/beans/XPropertySet.hpp>
#include <com/sun/star/container/XIndexAccess.hpp>
#include <com/sun/star/document/XUndoManager.hpp>
#include <com/sun/star/document/XUndoManagerSupplier.hpp>
#include <com/sun/star/lang/XMultiServiceFactory.hpp>
#include <com/sun/star/sheet/CellFlags.hpp>
#include <com/sun/star/sheet/FormulaLanguage.hpp>
#include <com/sun/star/sheet/XFormulaOpCodeMapper.hpp>
#include <com/sun/star/sheet/XArrayFormulaRange.hpp>
#include <com/sun/star/sheet/XArrayFormulaTokens.hpp>
#include <com/sun/star/sheet/XCellRangeAddressable.hpp>
#include <com/sun/star/sheet/XCellRangesQuery.hpp>
#include <com/sun/star/sheet/XFormulaTokens.hpp>
#include <com/sun/star/sheet/XSheetCellCursor.hpp>
#include <com/sun/star/sheet/XSheetCellRanges.hpp>
#include <com/sun/star/sheet/XSpreadsheet.hpp>
#include <com/sun/star/sheet/XSpreadsheetDocument.hpp>
#include <com/sun/star/table/CellContentType.hpp>
#include <com/sun/star/view/XSelectionSupplier.hpp>

#include <optional>

namespace isoquant::addin {

namespace {

using css::uno::Reference;
using css::uno::UNO_QUERY;
using css::uno::UNO_QUERY_THROW;
using Tokens = css::uno::Sequence<css::sheet::FormulaToken>;

constexpr const char* undoTitle = "Fit the array to its result";

// The formula under the cursor: its block (the array's cells, or the one cell) and its tokens (so
// that it is entered again exactly, whatever the formula syntax settings).
struct FormulaUnderCursor {
    Reference<css::sheet::XSpreadsheet> sheet;
    css::table::CellRangeAddress block;
    bool isArray = false;
    Tokens tokens;
};

Reference<css::table::XCellRange> rangeAt(const Reference<css::sheet::XSpreadsheet>& sheet,
                                         const css::table::CellRangeAddress& area)
{
    return sheet->getCellRangeByPosition(area.StartColumn, area.StartRow, area.EndColumn, area.EndRow);
}

OUString nameOf(const Reference<css::table::XCellRange>& range)
{
    OUString name;
    Reference<css::beans::XPropertySet>(range, UNO_QUERY_THROW)->getPropertyValue("AbsoluteName") >>= name;
    return name.replaceAll("$", "");
}

std::optional<FormulaUnderCursor> formulaUnderCursor(const Reference<css::frame::XFrame>& frame, OUString& problem)
{
    const Reference<css::frame::XController> controller = frame.is() ? frame->getController() : nullptr;
    const Reference<css::sheet::XSpreadsheetDocument> document(controller.is() ? controller->getModel() : nullptr,
                                                               UNO_QUERY);
    const Reference<css::view::XSelectionSupplier> selection(controller, UNO_QUERY);
    if (!document.is() || !selection.is()) {
        problem = "This command works in a spreadsheet.";
        return std::nullopt;
    }
    const Reference<css::sheet::XCellRangeAddressable> selected(selection->getSelection(), UNO_QUERY);
    if (!selected.is()) {
        problem = "Put the cursor on one cell that holds a formula.";
        return std::nullopt;
    }
    const css::table::CellRangeAddress area = selected->getRangeAddress();
    FormulaUnderCursor formula;
    formula.sheet.set(
        Reference<css::container::XIndexAccess>(document->getSheets(), UNO_QUERY_THROW)->getByIndex(area.Sheet),
        UNO_QUERY_THROW);
    const Reference<css::table::XCell> cell = formula.sheet->getCellByPosition(area.StartColumn, area.StartRow);
    if (cell->getType() != css::table::CellContentType_FORMULA) {
        problem = "The cell under the cursor holds no formula.";
        return std::nullopt;
    }
    const Reference<css::sheet::XSheetCellCursor> cursor = formula.sheet->createCursorByRange(
        Reference<css::sheet::XSheetCellRange>(rangeAt(formula.sheet, {area.Sheet, area.StartColumn, area.StartRow,
                                                                       area.StartColumn, area.StartRow}),
                                               UNO_QUERY_THROW));
    cursor->collapseToCurrentArray();
    formula.block = Reference<css::sheet::XCellRangeAddressable>(cursor, UNO_QUERY_THROW)->getRangeAddress();
    formula.isArray = !Reference<css::sheet::XArrayFormulaRange>(cursor, UNO_QUERY_THROW)->getArrayFormula().isEmpty();
    const Reference<css::table::XCell> anchor =
        formula.sheet->getCellByPosition(formula.block.StartColumn, formula.block.StartRow);
    formula.tokens = formula.isArray ? Reference<css::sheet::XArrayFormulaTokens>(cursor, UNO_QUERY_THROW)->getArrayTokens()
                                     : Reference<css::sheet::XFormulaTokens>(anchor, UNO_QUERY_THROW)->getTokens();
    return formula;
}

void enterFormula(const FormulaUnderCursor& formula, const css::table::CellRangeAddress& area, bool asArray)
{
    if (asArray)
        Reference<css::sheet::XArrayFormulaTokens>(rangeAt(formula.sheet, area), UNO_QUERY_THROW)
            ->setArrayTokens(formula.tokens);
    else
        Reference<css::sheet::XFormulaTokens>(formula.sheet->getCellByPosition(area.StartColumn, area.StartRow),
                                              UNO_QUERY_THROW)
            ->setTokens(formula.tokens);
}

void removeFormula(const FormulaUnderCursor& formula)
{
    if (formula.isArray)
        Reference<css::sheet::XArrayFormulaRange>(rangeAt(formula.sheet, formula.block), UNO_QUERY_THROW)
            ->setArrayFormula(OUString());
    else
        formula.sheet->getCellByPosition(formula.block.StartColumn, formula.block.StartRow)->setFormula(OUString());
}

// ROWS() or COLUMNS() of the expression, computed by Calc as a one-cell array formula in the anchor
// cell itself (so that its relative references mean what they mean there and an expression such as
// B2:C6*2 is taken as an array); 0 when Calc answers with an error. The function's tokens come from
// the document's own opcode table.
sal_Int32 measured(const FormulaUnderCursor& formula, const Reference<css::frame::XFrame>& frame, const char* function)
{
    const Reference<css::sheet::XFormulaOpCodeMapper> mapper(
        Reference<css::lang::XMultiServiceFactory>(frame->getController()->getModel(), UNO_QUERY_THROW)
            ->createInstance("com.sun.star.sheet.FormulaOpCodeMapper"),
        UNO_QUERY_THROW);
    const Tokens wrapper = mapper->getMappings(
        sequenceOf<OUString>({OUString::createFromAscii(function), "(", ")"}), css::sheet::FormulaLanguage::ENGLISH);
    Tokens tokens(formula.tokens.getLength() + 3);
    tokens.getArray()[0] = wrapper[0];
    tokens.getArray()[1] = wrapper[1];
    for (sal_Int32 i = 0; i < formula.tokens.getLength(); ++i) tokens.getArray()[i + 2] = formula.tokens[i];
    tokens.getArray()[tokens.getLength() - 1] = wrapper[2];

    const css::table::CellRangeAddress anchorArea{formula.block.Sheet, formula.block.StartColumn,
                                                  formula.block.StartRow, formula.block.StartColumn,
                                                  formula.block.StartRow};
    const Reference<css::table::XCellRange> anchorRange = rangeAt(formula.sheet, anchorArea);
    Reference<css::sheet::XArrayFormulaTokens>(anchorRange, UNO_QUERY_THROW)->setArrayTokens(tokens);
    const Reference<css::table::XCell> anchor = anchorRange->getCellByPosition(0, 0);
    const double value = anchor->getError() == 0 ? anchor->getValue() : 0.0;
    Reference<css::sheet::XArrayFormulaRange>(anchorRange, UNO_QUERY_THROW)->setArrayFormula(OUString());
    return value >= 1 && value <= 1e9 ? static_cast<sal_Int32>(value) : 0;
}

// Cells with content in `area`: their count and the first one's name.
sal_Int64 occupiedCells(const FormulaUnderCursor& formula, const css::table::CellRangeAddress& area, OUString& first)
{
    using namespace css::sheet::CellFlags;
    const Reference<css::sheet::XSheetCellRanges> found =
        Reference<css::sheet::XCellRangesQuery>(rangeAt(formula.sheet, area), UNO_QUERY_THROW)
            ->queryContentCells(VALUE | DATETIME | STRING | ANNOTATION | FORMULA);
    sal_Int64 count = 0;
    for (const css::table::CellRangeAddress& part : found->getRangeAddresses()) {
        if (count == 0) first = nameOf(formula.sheet->getCellRangeByPosition(part.StartColumn, part.StartRow,
                                                                             part.StartColumn, part.StartRow));
        count += sal_Int64(part.EndColumn - part.StartColumn + 1) * (part.EndRow - part.StartRow + 1);
    }
    return count;
}

// Everything between enterUndoContext and leaveUndoContext is one step of Edit ▸ Undo.
class UndoStep {
public:
    explicit UndoStep(const Reference<css::frame::XFrame>& frame)
        : manager_(Reference<css::document::XUndoManagerSupplier>(frame->getController()->getModel(), UNO_QUERY_THROW)
                       ->getUndoManager())
    {
        manager_->enterUndoContext(OUString::createFromAscii(undoTitle));
    }
    ~UndoStep()
    {
        try {
            manager_->leaveUndoContext();
        } catch (const css::uno::Exception&) {
        }
    }
    UndoStep(const UndoStep&) = delete;
    UndoStep& operator=(const UndoStep&) = delete;

private:
    Reference<css::document::XUndoManager> manager_;
};

CommandOutcome refuse(const FormulaUnderCursor& formula, const OUString& why)
{
    enterFormula(formula, formula.block, formula.isArray);
    return {false, why};
}

} // namespace

CommandOutcome fitArrayToResult(const Reference<css::frame::XFrame>& frame,
                                const Reference<css::uno::XComponentContext>& context)
{
    OUString problem;
    const std::optional<FormulaUnderCursor> formula = formulaUnderCursor(frame, problem);
    if (!formula) return {false, problem};

    const UndoStep step(frame);
    removeFormula(*formula);
    const sal_Int32 rows = measured(*formula, frame, "ROWS");
    const sal_Int32 columns = measured(*formula, frame, "COLUMNS");
    if (rows == 0 || columns == 0)
        return refuse(*formula, "The formula's result has no size Calc can tell (it gives an error); nothing changed.");

    const css::table::CellRangeAddress sheetArea =
        Reference<css::sheet::XCellRangeAddressable>(formula->sheet, UNO_QUERY_THROW)->getRangeAddress();
    css::table::CellRangeAddress target = formula->block;
    if (sal_Int64(target.StartRow) + rows - 1 > sheetArea.EndRow ||
        sal_Int64(target.StartColumn) + columns - 1 > sheetArea.EndColumn)
        return refuse(*formula, "The result (" + OUString::number(rows) + " rows × " + OUString::number(columns) +
                                    " columns) does not fit on the sheet from here; nothing changed.");
    target.EndRow = target.StartRow + rows - 1;
    target.EndColumn = target.StartColumn + columns - 1;
    const OUString targetName = nameOf(rangeAt(formula->sheet, target));

    OUString firstOccupied;
    const sal_Int64 occupied = occupiedCells(*formula, target, firstOccupied);
    if (occupied > 0) {
        const OUString what = OUString::number(occupied) + OUString::createFromAscii(occupied == 1 ? " cell" : " cells") + " in " + targetName +
                              " (first: " + firstOccupied + ")";
        if (!askYesNo(frame, context, "The result needs " + targetName + ". Overwrite " + what + "?"))
            return refuse(*formula, "The result needs " + targetName + ", but " + what +
                                        " would be overwritten; nothing changed.");
    }
    enterFormula(*formula, target, true);
    return {true, "The array formula now fills " + targetName + " (" + OUString::number(rows) +
                      fromUtf8(rows == 1 ? " row × " : " rows × ") + OUString::number(columns) +
                      OUString::createFromAscii(columns == 1 ? " column)." : " columns).")};
}

} // namespace isoquant::addin
