#include "colleague_copy.hxx"

#include "production_functions.hxx"
#include "user_dialogs.hxx"

#include <com/sun/star/beans/XPropertySet.hpp>
#include <com/sun/star/container/XIndexAccess.hpp>
#include <com/sun/star/container/XNamed.hpp>
#include <com/sun/star/frame/Desktop.hpp>
#include <com/sun/star/frame/XComponentLoader.hpp>
#include <com/sun/star/frame/XStorable.hpp>
#include <com/sun/star/sheet/CellFlags.hpp>
#include <com/sun/star/sheet/XArrayFormulaRange.hpp>
#include <com/sun/star/sheet/XCellRangeAddressable.hpp>
#include <com/sun/star/sheet/XCellRangeData.hpp>
#include <com/sun/star/sheet/XCellRangesQuery.hpp>
#include <com/sun/star/sheet/XSheetCellCursor.hpp>
#include <com/sun/star/sheet/XSheetCellRanges.hpp>
#include <com/sun/star/sheet/XSpreadsheet.hpp>
#include <com/sun/star/sheet/XSpreadsheetDocument.hpp>
#include <com/sun/star/sheet/XSpreadsheets.hpp>
#include <com/sun/star/text/XTextRange.hpp>
#include <com/sun/star/util/XCloseable.hpp>
#include <osl/file.hxx>

#include <ctime>
#include <vector>

namespace isoquant::addin {

namespace {

using css::uno::Any;
using css::uno::Reference;
using css::uno::Sequence;
using css::uno::UNO_QUERY;
using css::uno::UNO_QUERY_THROW;
using DataArray = Sequence<Sequence<Any>>;

// An Isoquant formula's block (the array's cells, or one cell) and the values it shows.
struct FrozenBlock {
    sal_Int32 sheet = 0;
    css::table::CellRangeAddress area;
    bool isArray = false;
    OUString formula;
    DataArray values;
};

Reference<css::sheet::XSpreadsheet> sheetAt(const Reference<css::sheet::XSpreadsheetDocument>& document, sal_Int32 index)
{
    return Reference<css::sheet::XSpreadsheet>(
        Reference<css::container::XIndexAccess>(document->getSheets(), UNO_QUERY_THROW)->getByIndex(index),
        UNO_QUERY_THROW);
}

Reference<css::table::XCellRange> rangeAt(const Reference<css::sheet::XSpreadsheet>& sheet,
                                         const css::table::CellRangeAddress& area)
{
    return sheet->getCellRangeByPosition(area.StartColumn, area.StartRow, area.EndColumn, area.EndRow);
}

bool contains(const css::table::CellRangeAddress& area, sal_Int32 column, sal_Int32 row)
{
    return column >= area.StartColumn && column <= area.EndColumn && row >= area.StartRow && row <= area.EndRow;
}

// Calc's API writes an add-in call by the add-in's service name ("ORG.ISOQUANT.CALC.
// PRODUCTIONFUNCTIONS.PRODFIT(…)"), whatever the user typed.
bool callsIsoquant(const OUString& formula)
{
    return formula.toAsciiUpperCase().indexOf(OUString::createFromAscii(serviceName).toAsciiUpperCase() + ".") >= 0;
}

// The values a block shows; an error value (Calc gives it as void) is kept as the text it shows.
DataArray shownValues(const Reference<css::sheet::XSpreadsheet>& sheet, const css::table::CellRangeAddress& area)
{
    DataArray values = Reference<css::sheet::XCellRangeData>(rangeAt(sheet, area), UNO_QUERY_THROW)->getDataArray();
    for (sal_Int32 r = 0; r < values.getLength(); ++r) {
        Sequence<Any>& row = values.getArray()[r];
        for (sal_Int32 c = 0; c < row.getLength(); ++c)
            if (!row[c].hasValue())
                row.getArray()[c] <<= Reference<css::text::XTextRange>(
                                          sheet->getCellByPosition(area.StartColumn + c, area.StartRow + r), UNO_QUERY_THROW)
                                          ->getString();
    }
    return values;
}

void collectSheet(const Reference<css::sheet::XSpreadsheet>& sheet, sal_Int32 index, std::vector<FrozenBlock>& blocks)
{
    const Reference<css::sheet::XSheetCellRanges> formulas =
        Reference<css::sheet::XCellRangesQuery>(sheet, UNO_QUERY_THROW)->queryContentCells(css::sheet::CellFlags::FORMULA);
    const std::size_t firstOfSheet = blocks.size();
    for (const css::table::CellRangeAddress& part : formulas->getRangeAddresses())
        for (sal_Int32 column = part.StartColumn; column <= part.EndColumn; ++column)
            for (sal_Int32 row = part.StartRow; row <= part.EndRow; ++row) {
                bool covered = false;
                for (std::size_t b = firstOfSheet; b < blocks.size() && !covered; ++b)
                    covered = blocks[b].isArray && contains(blocks[b].area, column, row);
                if (covered) continue;
                const Reference<css::table::XCell> cell = sheet->getCellByPosition(column, row);
                const OUString formula = cell->getFormula();
                if (!callsIsoquant(formula)) continue;
                FrozenBlock block;
                block.sheet = index;
                block.area = {static_cast<sal_Int16>(index), column, row, column, row};
                block.isArray = formula.startsWith("{");
                if (block.isArray) {
                    const Reference<css::sheet::XSheetCellCursor> cursor = sheet->createCursorByRange(
                        Reference<css::sheet::XSheetCellRange>(rangeAt(sheet, block.area), UNO_QUERY_THROW));
                    cursor->collapseToCurrentArray();
                    block.area = Reference<css::sheet::XCellRangeAddressable>(cursor, UNO_QUERY_THROW)->getRangeAddress();
                    block.formula = Reference<css::sheet::XArrayFormulaRange>(cursor, UNO_QUERY_THROW)->getArrayFormula();
                } else {
                    block.formula = Reference<css::beans::XPropertySet>(cell, UNO_QUERY_THROW)
                                        ->getPropertyValue("FormulaLocal")
                                        .get<OUString>();
                }
                block.values = shownValues(sheet, block.area);
                blocks.push_back(std::move(block));
            }
}

std::vector<FrozenBlock> isoquantBlocks(const Reference<css::sheet::XSpreadsheetDocument>& document)
{
    std::vector<FrozenBlock> blocks;
    const sal_Int32 sheets = Reference<css::container::XIndexAccess>(document->getSheets(), UNO_QUERY_THROW)->getCount();
    for (sal_Int32 index = 0; index < sheets; ++index) collectSheet(sheetAt(document, index), index, blocks);
    return blocks;
}

void freeze(const Reference<css::sheet::XSpreadsheetDocument>& copy, const std::vector<FrozenBlock>& blocks)
{
    for (const FrozenBlock& block : blocks) {
        const Reference<css::sheet::XSpreadsheet> sheet = sheetAt(copy, block.sheet);
        const Reference<css::table::XCellRange> range = rangeAt(sheet, block.area);
        if (block.isArray)
            Reference<css::sheet::XArrayFormulaRange>(range, UNO_QUERY_THROW)->setArrayFormula(OUString());
        else
            sheet->getCellByPosition(block.area.StartColumn, block.area.StartRow)->setFormula(OUString());
        Reference<css::sheet::XCellRangeData>(range, UNO_QUERY_THROW)->setDataArray(block.values);
    }
}

OUString utcNow()
{
    const std::time_t now = std::time(nullptr);
    std::tm parts{};
    gmtime_r(&now, &parts);
    char text[32];
    std::strftime(text, sizeof text, "%Y-%m-%d %H:%M UTC", &parts);
    return OUString::createFromAscii(text);
}

// A first sheet saying what was frozen, when, and from which cells.
void addNoteSheet(const Reference<css::sheet::XSpreadsheetDocument>& copy, const std::vector<FrozenBlock>& blocks,
                  const Sequence<OUString>& sheetNames)
{
    OUString name = "About this copy";
    for (int suffix = 2; copy->getSheets()->hasByName(name); ++suffix) name = "About this copy " + OUString::number(suffix);
    copy->getSheets()->insertNewByName(name, 0);
    const Reference<css::sheet::XSpreadsheet> note(copy->getSheets()->getByName(name), UNO_QUERY_THROW);
    const auto text = [](const OUString& value) { return Any(value); };
    std::vector<Sequence<Any>> rows;
    rows.push_back(sequenceOf<Any>({text("Written by Isoquant's \"Save a copy for colleagues\" on " + utcNow() + "."), text(""), text("")}));
    rows.push_back(sequenceOf<Any>({text("Each cell listed held an Isoquant formula and now holds the value it showed then; "
                         "built-in formulas are unchanged. Edits to the data no longer change these values."),
                    text(""), text("")}));
    rows.push_back(sequenceOf<Any>({text(""), text(""), text("")}));
    rows.push_back(sequenceOf<Any>({text("sheet"), text("cells"), text("formula")}));
    for (const FrozenBlock& block : blocks) {
        const Reference<css::sheet::XSpreadsheet> sheet = sheetAt(copy, block.sheet + 1);
        OUString cells;
        Reference<css::beans::XPropertySet>(rangeAt(sheet, block.area), UNO_QUERY_THROW)->getPropertyValue("AbsoluteName") >>= cells;
        const sal_Int32 dot = cells.lastIndexOf('.');
        rows.push_back(sequenceOf<Any>({text(sheetNames[block.sheet]), text(cells.copy(dot + 1).replaceAll("$", "")), text(block.formula)}));
    }
    Sequence<Sequence<Any>> data(static_cast<sal_Int32>(rows.size()));
    for (std::size_t r = 0; r < rows.size(); ++r) data.getArray()[r] = rows[r];
    Reference<css::sheet::XCellRangeData>(note->getCellRangeByPosition(0, 0, 2, static_cast<sal_Int32>(rows.size()) - 1),
                                          UNO_QUERY_THROW)
        ->setDataArray(data);
}

css::beans::PropertyValue property(const char* name, const Any& value)
{
    css::beans::PropertyValue result;
    result.Name = OUString::createFromAscii(name);
    result.Value = value;
    return result;
}

OUString filterFor(const OUString& url)
{
    const OUString lower = url.toAsciiLowerCase();
    if (lower.endsWith(".ods")) return "calc8";
    if (lower.endsWith(".xlsx")) return "Calc MS Excel 2007 XML";
    return OUString();
}

// Writes the document to a temporary file, opens that copy hidden, freezes it, saves it as `url`.
void writeFrozenCopy(const Reference<css::uno::XComponentContext>& context,
                     const Reference<css::frame::XStorable>& original, const std::vector<FrozenBlock>& blocks,
                     const OUString& url, const OUString& filter)
{
    OUString temporary;
    if (osl::FileBase::createTempFile(nullptr, nullptr, &temporary) != osl::FileBase::E_None)
        throw css::uno::RuntimeException("cannot create a temporary file");
    original->storeToURL(temporary, sequenceOf({property("FilterName", Any(OUString("calc8"))), property("Overwrite", Any(true))}));
    const Reference<css::lang::XComponent> loaded = css::frame::Desktop::create(context)->loadComponentFromURL(
        temporary, "_blank", 0, sequenceOf({property("Hidden", Any(true))}));
    const Reference<css::sheet::XSpreadsheetDocument> copy(loaded, UNO_QUERY_THROW);
    try {
        const Sequence<OUString> sheetNames = copy->getSheets()->getElementNames();
        freeze(copy, blocks);
        addNoteSheet(copy, blocks, sheetNames);
        Reference<css::frame::XStorable>(copy, UNO_QUERY_THROW)
            ->storeToURL(url, sequenceOf({property("FilterName", Any(filter)), property("Overwrite", Any(true))}));
    } catch (...) {
        Reference<css::util::XCloseable>(loaded, UNO_QUERY_THROW)->close(true);
        osl::File::remove(temporary);
        throw;
    }
    Reference<css::util::XCloseable>(loaded, UNO_QUERY_THROW)->close(true);
    osl::File::remove(temporary);
}

} // namespace

CommandOutcome saveCopyForColleagues(const Reference<css::frame::XFrame>& frame,
                                     const Reference<css::uno::XComponentContext>& context,
                                     const Sequence<css::beans::PropertyValue>& arguments)
{
    const Reference<css::frame::XController> controller = frame.is() ? frame->getController() : nullptr;
    const Reference<css::sheet::XSpreadsheetDocument> document(controller.is() ? controller->getModel() : nullptr,
                                                               UNO_QUERY);
    if (!document.is()) return {false, "This command works in a spreadsheet."};
    const std::vector<FrozenBlock> blocks = isoquantBlocks(document);
    if (blocks.empty()) return {false, "Nothing to freeze: no cell of this document calls an Isoquant function."};

    OUString url;
    for (const css::beans::PropertyValue& argument : arguments)
        if (argument.Name == "URL") argument.Value >>= url;
    if (url.isEmpty()) url = chooseSaveFile(context);
    if (url.isEmpty()) return {false, "No file chosen; nothing written."};
    const OUString filter = filterFor(url);
    if (filter.isEmpty()) return {false, "Give a file name ending in .ods or .xlsx; nothing written."};

    writeFrozenCopy(context, Reference<css::frame::XStorable>(document, UNO_QUERY_THROW), blocks, url, filter);
    sal_Int64 cells = 0;
    for (const FrozenBlock& block : blocks)
        cells += sal_Int64(block.area.EndColumn - block.area.StartColumn + 1) * (block.area.EndRow - block.area.StartRow + 1);
    return {true, "Wrote " + url + ": " + OUString::number(cells) + OUString::createFromAscii(cells == 1 ? " cell" : " cells") + " of " +
                      OUString::number(static_cast<sal_Int64>(blocks.size())) +
                      OUString::createFromAscii(blocks.size() == 1 ? " Isoquant formula" : " Isoquant formulas") +
                      " frozen to values; this document is unchanged."};
}

} // namespace isoquant::addin
