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


def refuse_formula_problems(doc, path):
    problems = formula_problems(doc)
    if problems:
        raise SystemExit("%s: formula cells show problems: %s" % (path, problems[:10]))


def check_workbook(doc, path, true_values):
    """No formula cell shows an error or a message, and each labelled estimate of the table named
    fitted_technology lies within 3 standard errors of its true value."""
    refuse_formula_problems(doc, path)
    table = named_range(doc, "fitted_technology").getDataArray()
    for label, truth in true_values.items():
        row = next(r for r in table if r[0] == label)
        estimate, error = row[1], row[2]
        if abs(estimate - truth) > 3 * error:
            raise SystemExit("%s: %s %.4f is more than 3 SE (%.4f) from the true %.3f"
                             % (path, label, estimate, error, truth))
        print("  %s %.4f (SE %.4f), true %.3f" % (label, estimate, error, truth))
