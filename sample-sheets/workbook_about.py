"""The About sheet every sample workbook opens with, and the sharing note they all carry."""
from isoquant_office import set_values

import workbook_style as style

SHARING = ("Sharing: a colleague without the Isoquant extension sees #NAME? in every function cell, because "
           "LibreOffice keeps no stored results for add-in functions. Isoquant > Save a Copy for Colleagues "
           "writes a copy (.ods or .xlsx) in which those cells hold the values they show now, with a first "
           "sheet listing them; this workbook stays as it is. Isoquant > Fit the Array to Its Result sizes a "
           "table typed into one cell to exactly its rows and columns.")


def about_sheet(doc, title, paragraphs):
    sheet = doc.Sheets.getByIndex(0)
    sheet.Name = "About this workbook"
    rows = [[title]]
    for text in paragraphs:
        rows += [[None], [text]]
    set_values(sheet, "A1", rows)
    style.title(sheet.getCellRangeByName("A1"))
    style.wrapped_column(sheet, 0, width_mm=170)
    # Heights were set for the narrow default column; fit them to the wrapped text again.
    sheet.getCellRangeByName("A1:A%d" % len(rows)).Rows.OptimalHeight = True
    return sheet
