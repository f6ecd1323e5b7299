#include "cell_conversion.hxx"

#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/sheet/arguments/range_limits.hpp"

#include <rtl/string.hxx>

#include <algorithm>
#include <cmath>

namespace isoquant::addin {

namespace {

Cell scalarCell(const css::uno::Any& value, const std::string& argument)
{
    switch (value.getValueTypeClass()) {
    // Numbers first and without the generic extraction: a million-row range is mostly numbers.
    case css::uno::TypeClass_DOUBLE: return *static_cast<const double*>(value.getValue());
    case css::uno::TypeClass_VOID: return Cell{};
    case css::uno::TypeClass_STRING: {
        // Read in place, as >>= does, without a reference-counted copy.
        const OUString& text = *static_cast<const OUString*>(value.getValue());
        if (text.isEmpty()) return Cell{};
        return toUtf8(text);
    }
    case css::uno::TypeClass_BOOLEAN: return value.get<bool>() ? 1.0 : 0.0;
    default: {
        double number = 0;
        if (value >>= number) return number;
        throw InputError(argument + ": holds a value of a kind Isoquant cannot read");
    }
    }
}

} // namespace

std::string toUtf8(const OUString& text)
{
    // ASCII (labels and option words nearly always are) is its own UTF-8: copied unit by unit,
    // with no intermediate OString.
    const sal_Unicode* units = text.getStr();
    const auto length = static_cast<std::size_t>(text.getLength());
    if (std::all_of(units, units + length, [](sal_Unicode unit) { return unit < 0x80; })) {
        std::string ascii(length, '\0');
        std::copy(units, units + length, ascii.begin());
        return ascii;
    }
    const OString encoded = OUStringToOString(text, RTL_TEXTENCODING_UTF8);
    return std::string(encoded.getStr(), static_cast<std::size_t>(encoded.getLength()));
}

OUString fromUtf8(std::string_view text)
{
    return OUString(text.data(), static_cast<sal_Int32>(text.size()), RTL_TEXTENCODING_UTF8);
}

CellTable toCellTable(const AnyTable& range, const std::string& argument)
{
    const auto rows = static_cast<std::size_t>(range.getLength());
    std::size_t columns = 0;
    for (const auto& row : range) columns = std::max(columns, static_cast<std::size_t>(row.getLength()));
    // Before the copy is made, so that an oversized range costs no memory of ours.
    checkRangeSize(rows, columns, argument);
    CellTable table(rows, columns);
    for (std::size_t r = 0; r < rows; ++r) {
        const auto& row = range[static_cast<sal_Int32>(r)];
        const css::uno::Any* cells = row.getConstArray();
        for (sal_Int32 c = 0; c < row.getLength(); ++c) {
            // Numbers straight into the table: a million-row range is mostly numbers, and this
            // way a number cell costs no allocation and no temporary Cell.
            const css::uno::TypeClass type = cells[c].getValueTypeClass();
            if (type == css::uno::TypeClass_DOUBLE)
                table.set(r, static_cast<std::size_t>(c), *static_cast<const double*>(cells[c].getValue()));
            else if (type == css::uno::TypeClass_VOID)
                continue; // already empty: a whole column's empty tail costs no call per cell
            else
                table.set(r, static_cast<std::size_t>(c), scalarCell(cells[c], argument));
        }
    }
    return table;
}

Cell toSingleCell(const css::uno::Any& value, const std::string& argument)
{
    // A plain value (nearly always) goes straight to scalarCell, without a try at extracting a range.
    if (value.getValueTypeClass() != css::uno::TypeClass_SEQUENCE) return scalarCell(value, argument);
    AnyTable range;
    if (value >>= range) {
        if (range.getLength() == 1 && range[0].getLength() == 1) return scalarCell(range[0][0], argument);
        throw InputError(argument + ": give a single value, not a range");
    }
    return scalarCell(value, argument);
}

CellTable toOptionalTable(const css::uno::Any& value, const std::string& argument)
{
    AnyTable range;
    if (value >>= range) return toCellTable(range, argument);
    const Cell cell = scalarCell(value, argument);
    if (isEmpty(cell)) return CellTable{};
    return singleCell(cell);
}

css::uno::Any toAny(const Cell& cell)
{
    if (isNumber(cell)) return css::uno::Any(std::get<double>(cell));
    if (isText(cell)) return css::uno::Any(fromUtf8(std::get<std::string>(cell)));
    return css::uno::Any(OUString());
}

AnyTable toAnyTable(const CellTable& table)
{
    AnyTable result(static_cast<sal_Int32>(table.rows()));
    auto* rows = result.getArray();
    for (std::size_t r = 0; r < table.rows(); ++r) {
        css::uno::Sequence<css::uno::Any> row(static_cast<sal_Int32>(table.columns()));
        auto* cells = row.getArray();
        for (std::size_t c = 0; c < table.columns(); ++c) {
            switch (table.kind(r, c)) {
            case CellKind::number: cells[c] <<= table.number(r, c); break;
            case CellKind::text: cells[c] <<= fromUtf8(table.text(r, c)); break;
            case CellKind::empty: cells[c] <<= OUString(); break;
            }
        }
        rows[r] = std::move(row);
    }
    return result;
}

namespace {

bool holdsNumbers(const CellTable& table)
{
    for (std::size_t c = 0; c < table.columns(); ++c) {
        const CellKind* kinds = table.columnKinds(c);
        if (std::find(kinds, kinds + table.rows(), CellKind::number) != kinds + table.rows()) return true;
    }
    return false;
}

css::uno::Sequence<css::uno::Sequence<OUString>> toTextTable(const CellTable& table)
{
    css::uno::Sequence<css::uno::Sequence<OUString>> result(static_cast<sal_Int32>(table.rows()));
    auto* rows = result.getArray();
    for (std::size_t r = 0; r < table.rows(); ++r) {
        css::uno::Sequence<OUString> row(static_cast<sal_Int32>(table.columns()));
        auto* cells = row.getArray();
        for (std::size_t c = 0; c < table.columns(); ++c)
            if (table.isText(r, c)) cells[c] = fromUtf8(table.text(r, c));
        rows[r] = std::move(row);
    }
    return result;
}

// Every cell a finite number: the table can go as sequence<sequence<double>>, which Calc reads as
// it reads the same numbers in `any`s (ScUnoAddInCall::SetResult puts each into the result matrix)
// without a type test and an `any` per cell. NaN and infinities keep the `any` route they had.
bool holdsFiniteNumbersOnly(const CellTable& table)
{
    for (std::size_t c = 0; c < table.columns(); ++c) {
        const CellKind* kinds = table.columnKinds(c);
        const double* slots = table.columnSlots(c);
        for (std::size_t r = 0; r < table.rows(); ++r)
            if (kinds[r] != CellKind::number || !std::isfinite(slots[r])) return false;
    }
    return table.rows() > 0 && table.columns() > 0;
}

css::uno::Sequence<css::uno::Sequence<double>> toNumberTable(const CellTable& table)
{
    css::uno::Sequence<css::uno::Sequence<double>> result(static_cast<sal_Int32>(table.rows()));
    auto* rows = result.getArray();
    for (std::size_t r = 0; r < table.rows(); ++r) {
        css::uno::Sequence<double> row(static_cast<sal_Int32>(table.columns()));
        auto* cells = row.getArray();
        for (std::size_t c = 0; c < table.columns(); ++c) cells[c] = table.columnSlots(c)[r];
        rows[r] = std::move(row);
    }
    return result;
}

} // namespace

css::uno::Any toResult(const CellTable& table)
{
    if (holdsFiniteNumbersOnly(table)) return css::uno::Any(toNumberTable(table));
    if (holdsNumbers(table)) return css::uno::Any(toAnyTable(table));
    return css::uno::Any(toTextTable(table));
}

} // namespace isoquant::addin
