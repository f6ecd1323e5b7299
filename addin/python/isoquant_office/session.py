"""CalcSession: one office with the extension and one spreadsheet, kept for a series of uses."""

from .office import HeadlessOffice


class CalcSession:
    """An office with the extension and a new spreadsheet, shared by a whole test module or a
    benchmark run (starting an office with an extension takes about 10 s):

        CALC = CalcSession("build/isoquant.oxt", prepare=write_data)
        setUpModule, tearDownModule = CALC.start, CALC.stop

    Between start() and stop(): office (the HeadlessOffice), doc (the spreadsheet), sheet (its
    first sheet, filled by prepare(sheet) when one is given)."""

    def __init__(self, extension_path, prepare=None):
        self.extension_path = extension_path
        self.prepare = prepare
        self.office = None
        self.doc = None
        self.sheet = None

    def start(self):
        """Starts the office and opens the spreadsheet; the office is stopped again if starting
        or preparing fails."""
        office = HeadlessOffice(extension_path=self.extension_path)
        office.__enter__()
        try:
            doc = office.new_calc()
            sheet = doc.Sheets.getByIndex(0)
            if self.prepare is not None:
                self.prepare(sheet)
        except BaseException:
            office.__exit__(None, None, None)
            raise
        self.office, self.doc, self.sheet = office, doc, sheet

    def stop(self):
        if self.office is not None:
            self.office.__exit__(None, None, None)
        self.office = self.doc = self.sheet = None

    def new_sheet(self, name):
        """A new empty sheet called name, after the last one."""
        sheets = self.doc.Sheets
        sheets.insertNewByName(name, sheets.getCount())
        return sheets.getByName(name)
