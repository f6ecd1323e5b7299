"""Driving a private headless LibreOffice with the Isoquant extension installed: for the
integration tests, the sample workbooks' generator, the demo and the benchmarks.

Run with /usr/bin/python3 (Debian's UNO bridge, python3-uno, imports only there), with this
folder's parent on the path: from the repository root, PYTHONPATH=addin/python. CMake passes it
to every test and target that runs Python.

    from isoquant_office import HeadlessOffice, get_cell, set_formula, set_values

    with HeadlessOffice(extension_path="build/isoquant.oxt") as office:
        doc = office.new_calc()
        sheet = doc.Sheets.getByIndex(0)
        set_values(sheet, "A1", [[1, 2], [3, None]])
        set_formula(sheet, "C1", "=SUM(A1:B2)")
        print(get_cell(sheet, "C1"))   # 6.0

- office: HeadlessOffice, the office on a throw-away profile (start, install, stop, documents).
- session: CalcSession, one office and one spreadsheet for a whole test module or benchmark.
- cells: writing and reading cells, the formula grammar of the UNO API, Calc's error texts.
- command_line: --extension and --output of the scripts that start an office.
- process_memory: the office's soffice.bin process and its memory figures from /proc.
"""

from .cells import (ERROR_TEXT, error_text, get_cell, get_range, recalc, set_array_formula, set_formula,
                    set_values, set_values_in_blocks)
from .command_line import extension_and_output
from .office import HeadlessOffice, find_soffice
from .session import CalcSession

__all__ = ["CalcSession", "ERROR_TEXT", "HeadlessOffice", "error_text", "extension_and_output", "find_soffice",
           "get_cell", "get_range", "recalc", "set_array_formula", "set_formula", "set_values", "set_values_in_blocks"]
