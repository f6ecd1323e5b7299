"""Reading and writing cells of a spreadsheet through UNO.

Formulas go through the UNO API grammar (XCell.setFormula, setArrayFormula):
English function names, '.' as decimal point and ';' as the argument separator,
"=ROUND(A1;2)". Observed in 7.4: ',' is no separator there; "=ROUND(1,2)" and
"=SUM(1,2)" give #NAME?. Inline arrays use ';' between columns and '|' between
rows, "={1;2|3;4}" ("{1,2;3,4}" gives Err:539). The range intersection operator
is '!' ("A1:B2!B2:C3"; a space gives Err:509). getFormula() answers in the same
grammar; an add-in function comes back as "<SERVICE NAME>.<METHOD>(...)" in
capitals (e.g. "=ORG.EXAMPLE.PROBE.PROBE.PROBETWICE(21)").
"""

# Calc's error codes (cell.getError()) and the text a cell shows for them; codes not
# listed show as "Err:<code>" (e.g. 502, 504, 509, 511, 520, 522, 539 seen in 7.4).
# All checked against the office's own display text except 521, which could not be
# provoked through the API (an empty intersection gave #REF!).
ERROR_TEXT = {
    503: "#NUM!",
    519: "#VALUE!",
    521: "#NULL!",
    524: "#REF!",
    525: "#NAME?",
    532: "#DIV/0!",
    32767: "#N/A",
}

# com.sun.star.sheet.FormulaResult flags, as reported by a cell's FormulaResultType2.
_RESULT_STRING = 2
_RESULT_ERROR = 4


def error_text(code):
    """The text Calc shows for an error code, e.g. 504 -> "Err:504", 525 -> "#NAME?"."""
    return ERROR_TEXT.get(code, "Err:%d" % code)


def _origin(sheet, name):
    address = sheet.getCellRangeByName(name).getRangeAddress()
    return address.StartColumn, address.StartRow


def set_values(sheet, top_left, rows):
    """Write a rectangle of numbers/strings starting at top_left ("A1").

    None makes the cell empty. Strings are stored as text, never parsed as numbers or
    formulas. All rows must have the same length."""
    rows = [list(row) for row in rows]
    if not rows or not rows[0]:
        return
    width = len(rows[0])
    if any(len(row) != width for row in rows):
        raise ValueError("set_values needs rows of equal length")
    data = []
    for row in rows:
        out = []
        for value in row:
            if value is None:
                out.append("")  # setDataArray leaves a cell empty for ""
            elif isinstance(value, str):
                out.append(value)
            else:
                out.append(float(value))
        data.append(tuple(out))
    col, row = _origin(sheet, top_left)
    target = sheet.getCellRangeByPosition(col, row, col + width - 1, row + len(rows) - 1)
    target.setDataArray(tuple(data))


def set_formula(sheet, cell, formula):
    """One cell formula, English names, ';' between arguments: "=ROUND(A1;2)"."""
    sheet.getCellRangeByName(cell).getCellByPosition(0, 0).setFormula(formula)


def set_array_formula(sheet, cell_range, formula):
    """An array formula over cell_range ("G2:M17"), like Ctrl+Shift+Enter."""
    sheet.getCellRangeByName(cell_range).setArrayFormula(formula)


def _cell_value(cell):
    code = cell.getError()
    if code:
        return error_text(code)
    kind = cell.getType().value  # CellContentType: EMPTY, VALUE, TEXT, FORMULA
    if kind == "EMPTY":
        return None
    if kind == "VALUE":
        return cell.getValue()
    if kind == "TEXT":
        return cell.getString()
    if cell.FormulaResultType2 == _RESULT_STRING:
        return cell.getString()
    return cell.getValue()


def get_cell(sheet, cell):
    """A cell's value: float, str, None for an empty cell, or an error text such as
    "Err:504" or "#NAME?"."""
    return _cell_value(sheet.getCellRangeByName(cell).getCellByPosition(0, 0))


def get_range(sheet, cell_range):
    """Values of cell_range as a list of rows, each value as get_cell returns it."""
    rng = sheet.getCellRangeByName(cell_range)
    # getDataArray reads everything in one call but gives "" for empty cells and
    # hides errors: fix those up from two queries instead of asking cell by cell.
    rows = [list(row) for row in rng.getDataArray()]
    start_col, start_row = _origin(sheet, cell_range)

    def positions(ranges):
        for address in ranges.getRangeAddresses():
            for r in range(address.StartRow, address.EndRow + 1):
                for c in range(address.StartColumn, address.EndColumn + 1):
                    yield r - start_row, c - start_col

    for r, c in positions(rng.queryEmptyCells()):
        rows[r][c] = None
    for r, c in positions(rng.queryFormulaCells(_RESULT_ERROR)):
        rows[r][c] = _cell_value(rng.getCellByPosition(c, r))
    return rows


def recalc(doc):
    """Recalculate every formula in doc, not only the dirty ones."""
    doc.calculateAll()


def set_values_in_blocks(sheet, header, rows, block_rows=50000):
    """The texts of `header` in row 1 from column A, then `rows` (sequences of numbers, e.g. a numpy
    array) under it, block_rows rows to each setDataArray call, so that no single UNO call carries
    a million rows."""
    width = len(header)
    sheet.getCellRangeByPosition(0, 0, width - 1, 0).setDataArray((tuple(header),))
    for start in range(0, len(rows), block_rows):
        block = rows[start:start + block_rows]
        target = sheet.getCellRangeByPosition(0, start + 1, width - 1, start + len(block))
        target.setDataArray(tuple(tuple(float(v) for v in row) for row in block))
