"""Checks on a computed workbook shared by the builder and the demo."""
from isoquant_office import get_cell  # first: it imports uno, which makes com.sun.star importable
from com.sun.star.sheet.CellFlags import FORMULA


def formula_cells(doc):
    """(sheet name, cell name) of every formula cell in the document."""
    for sheet in doc.Sheets:
        ranges = sheet.queryContentCells(FORMULA)
        for address in ranges.getRangeAddresses():
            for row in range(address.StartRow, address.EndRow + 1):
                for column in range(address.StartColumn, address.EndColumn + 1):
                    cell = sheet.getCellByPosition(column, row)
                    yield sheet.Name, cell.AbsoluteName.split(".")[-1].replace("$", "")


def formula_problems(doc):
    """Formula cells that show an error code or one of Isoquant's messages, as
    (sheet, cell, what it shows)."""
    problems = []
    for sheet_name, cell_name in formula_cells(doc):
        value = get_cell(doc.Sheets.getByName(sheet_name), cell_name)
        if isinstance(value, str) and (value.startswith("Error:") or value.startswith("Err:") or value.startswith("#")):
            problems.append((sheet_name, cell_name, value))
    return problems


def named_range(doc, name):
    """The cell range a workbook-level name refers to."""
    return doc.NamedRanges.getByName(name).getReferredCells()
