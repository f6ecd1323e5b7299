// The boundary every cell function's call crosses: whatever the core throws becomes the cell's
// message, prefixed "Error: ". Nothing may escape to Calc: an exception shows only Err:502 or
// #VALUE!, and a crash would take the user's unsaved work with it.
#pragma once

#include "cell_conversion.hxx"

#include "isoquant/sheet/arguments/argument_names.hpp"

#include <com/sun/star/uno/Any.hxx>

#include <new>
#include <string>

namespace isoquant::addin {

using css::uno::Any;

// Every cell function runs through here: the message of any failure becomes the cell's text.
template <typename Compute>
inline std::string failureMessage(Compute&& compute)
{
    try {
        compute();
        return {};
    } catch (const InputError& error) {
        return "Error: " + sheetMessage(error);
    } catch (const std::bad_alloc&) {
        return "Error: not enough memory for a range this large";
    } catch (const std::exception& error) {
        return std::string("Error: internal problem (") + error.what() + "); please report it";
    } catch (const css::uno::Exception& error) {
        return "Error: internal problem (" + toUtf8(error.Message) + "); please report it";
    } catch (...) {
        return "Error: internal problem; please report it";
    }
}

template <typename Compute>
Any guardedTable(Compute&& compute)
{
    Any result;
    const std::string message = failureMessage([&] { result = toResult(compute()); });
    if (!message.empty()) return toResult(singleCell(message));
    return result;
}

// A result that is a list, one value per input, then any totals (PRODLEASTCOST, PRODBUDGET,
// PRODPROFIT), comes from the core as a row; it follows the orientation of the prices: prices in
// a column give a column, so that the array formula can be entered over a column.
inline CellTable orientedLike(const CellTable& row, const CellTable& prices)
{
    if (prices.rows() <= prices.columns() || row.rows() != 1) return row;
    CellTable column(row.columns(), 1);
    for (std::size_t c = 0; c < row.columns(); ++c) column.set(c, 0, row.at(0, c));
    return column;
}

template <typename Compute>
Any guardedValue(Compute&& compute)
{
    Any result;
    const std::string message = failureMessage([&] { result = toAny(compute()); });
    if (!message.empty()) return toAny(Cell(message));
    return result;
}

} // namespace isoquant::addin
