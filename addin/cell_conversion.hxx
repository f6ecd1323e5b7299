// Converts Calc's arguments to the core's cells and the core's results back to Calc's values.
#pragma once

#include "isoquant/sheet/arguments/cells.hpp"

#include <com/sun/star/uno/Any.hxx>
#include <com/sun/star/uno/Sequence.hxx>
#include <rtl/ustring.hxx>

#include <string>

namespace isoquant::addin {

using rtl::OString;
using rtl::OUString;
using AnyTable = css::uno::Sequence<css::uno::Sequence<css::uno::Any>>;

std::string toUtf8(const OUString& text);
OUString fromUtf8(std::string_view text);

// A range argument. Calc passes an empty cell as an empty string; it becomes an empty cell.
CellTable toCellTable(const AnyTable& range, const std::string& argument);

// An optional single-value argument: void (omitted) becomes an empty cell; a one-cell range is
// read as that cell; a larger range is an InputError naming `argument`.
Cell toSingleCell(const css::uno::Any& value, const std::string& argument);

// An optional range argument: void becomes an empty table; a single value a one-cell table.
CellTable toOptionalTable(const css::uno::Any& value, const std::string& argument);

// Results: an empty cell is returned as an empty text, which Calc shows as a blank cell.
css::uno::Any toAny(const Cell& cell);
AnyTable toAnyTable(const CellTable& table);

// A table result as the `any` an array function returns. A table without numbers (verdict columns,
// messages) goes as sequence<sequence<string>>: LibreOffice 7.4 enters those texts in the
// document's shared-string pool, so that =, IF, COUNTIF, MATCH and VLOOKUP find them. A table
// with numbers and texts or empty cells must go as sequence<sequence<any>>, whose texts 7.4 does
// not pool (DEVELOPERS.md, "Texts in array results"); one of finite numbers only goes as
// sequence<sequence<double>> (no `any` per cell: a million-row column of marginal products).
css::uno::Any toResult(const CellTable& table);

} // namespace isoquant::addin
