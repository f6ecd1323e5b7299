"""Formatting for the sample workbooks: one look for all of them."""
import uno
from com.sun.star.awt import Rectangle
from com.sun.star.table import CellRangeAddress
from com.sun.star.chart.ChartAxisLabelPosition import OUTSIDE_START
from com.sun.star.table.CellHoriJustify import LEFT, RIGHT

DATA_FILL = 0xFFF6D5   # pale yellow: cells the reader may change
HEADER_FILL = 0xDDE8F0  # pale blue-grey
BOLD = 150.0            # com.sun.star.awt.FontWeight.BOLD


def title(cell_range):
    cell_range.CharWeight = BOLD
    cell_range.CharHeight = 14.0


def header(cell_range):
    cell_range.CharWeight = BOLD
    cell_range.CellBackColor = HEADER_FILL


def align_right(cell_range):
    cell_range.HoriJustify = RIGHT


def align_left(cell_range):
    cell_range.HoriJustify = LEFT


def input_cells(cell_range):
    cell_range.CellBackColor = DATA_FILL


def wrapped_column(sheet, column, width_mm):
    columns = sheet.Columns.getByIndex(column)
    columns.Width = width_mm * 100
    columns.IsTextWrapped = True


def column_widths(sheet, widths_mm):
    for letter, width in widths_mm.items():
        sheet.Columns.getByName(letter).Width = width * 100


def number_format(doc, cell_range, code):
    formats = doc.NumberFormats
    locale = uno.createUnoStruct("com.sun.star.lang.Locale")
    key = formats.queryKey(code, locale, False)
    if key == -1:
        key = formats.addNew(code, locale)
    cell_range.NumberFormat = key


def _address(sheet, name):
    address = sheet.getCellRangeByName(name).getRangeAddress()
    return CellRangeAddress(address.Sheet, address.StartColumn, address.StartRow, address.EndColumn,
                            address.EndRow)


def scatter_chart(sheet, name, heading, actual_range, fitted_range, anchor, size_mm):
    """An XY chart of points, actual output against fitted output (both ranges with a header cell),
    placed at anchor; no legend. Calc takes the leftmost of the two columns as x, so the axis
    titles follow the columns' order."""
    fitted_left = _address(sheet, fitted_range).StartColumn < _address(sheet, actual_range).StartColumn
    x_range, y_range = (fitted_range, actual_range) if fitted_left else (actual_range, fitted_range)
    x_title, y_title = ("fitted", "actual") if fitted_left else ("actual", "fitted")
    chart = xy_lines_chart(sheet, name, heading, x_range, y_range, anchor, size_mm, x_title, y_title)
    chart.HasLegend = False
    chart.Diagram.getDataRowProperties(0).Lines = False
    return chart


def xy_lines_chart(sheet, name, heading, x_range, y_range, anchor, size_mm, x_title, y_title):
    """An XY chart with lines of each column of y_range (header cells name the series, shown in a
    legend) against x_range (with a header cell), placed at anchor."""
    position = sheet.getCellRangeByName(anchor).Position
    rectangle = Rectangle(position.X, position.Y, size_mm[0] * 100, size_mm[1] * 100)
    charts = sheet.Charts
    charts.addNewByName(name, rectangle, (_address(sheet, x_range), _address(sheet, y_range)), True, False)
    chart = charts.getByName(name).EmbeddedObject
    chart.setDiagram(chart.createInstance("com.sun.star.chart.XYDiagram"))
    chart.HasMainTitle = True
    chart.Title.String = heading
    chart.HasLegend = True
    diagram = chart.Diagram
    diagram.HasXAxisTitle = True
    diagram.XAxisTitle.String = x_title
    diagram.HasYAxisTitle = True
    diagram.YAxisTitle.String = y_title
    plain_chart_background(chart)
    return chart


def stacked_columns_chart(sheet, name, heading, categories, series, anchor, size_mm):
    """Stacked columns of the series ranges (each with a header cell naming its series), one stack
    per category cell (with a header cell above them), placed at anchor."""
    chart = _column_chart(sheet, name, heading, (categories,) + tuple(series), anchor, size_mm)
    chart.HasLegend = True
    chart.Diagram.Stacked = True
    # Year labels below the plot, not on the zero line among the negative bars.
    chart.Diagram.XAxis.LabelPosition = OUTSIDE_START
    plain_chart_background(chart)
    return chart


def columns_with_error_bars_chart(sheet, name, heading, categories, values, below, above, anchor, size_mm):
    """Upright columns of values (with a header cell), one per category cell (with a header cell
    above them), each with an error bar reaching down by its cell of below and up by its cell of
    above (lengths, not bounds; both without a header cell), placed at anchor; no legend."""
    chart = _column_chart(sheet, name, heading, (categories, values), anchor, size_mm)
    chart.HasLegend = False
    series = chart.Diagram.getDataRowProperties(0)
    series.ErrorBarStyle = uno.getConstantByName("com.sun.star.chart.ErrorBarStyle.FROM_DATA")
    series.ErrorIndicator = uno.Enum("com.sun.star.chart.ChartErrorIndicatorType", "TOP_AND_BOTTOM")
    series.ErrorBarRangeNegative = _representation(sheet, below)
    series.ErrorBarRangePositive = _representation(sheet, above)
    plain_chart_background(chart)
    return chart


def _column_chart(sheet, name, heading, ranges, anchor, size_mm):
    """Upright columns of each range after the first (with a header cell naming its series), one
    per cell of the first (the categories, with a header cell above them), placed at anchor."""
    position = sheet.getCellRangeByName(anchor).Position
    rectangle = Rectangle(position.X, position.Y, size_mm[0] * 100, size_mm[1] * 100)
    addresses = tuple(_address(sheet, cell_range) for cell_range in ranges)
    sheet.Charts.addNewByName(name, rectangle, addresses, True, True)
    chart = sheet.Charts.getByName(name).EmbeddedObject
    chart.setDiagram(chart.createInstance("com.sun.star.chart.BarDiagram"))
    chart.HasMainTitle = True
    chart.Title.String = heading
    chart.Diagram.Vertical = False  # upright columns
    return chart


def _representation(sheet, cell_range):
    """A range as the chart's data provider names it: $'Sheet name'.$E$2:$E$41."""
    return sheet.getCellRangeByName(cell_range).AbsoluteName


def one_page_wide(doc, sheet, landscape, one_page_high=False):
    """Print the sheet on A4 (landscape or portrait) scaled down to one page across and, with
    one_page_high, one page down (otherwise as many as its rows need), so that no table or chart is
    cut between pages."""
    styles = doc.StyleFamilies.getByName("PageStyles")
    name = "One page wide%s%s" % (", one high" if one_page_high else "", ", landscape" if landscape else "")
    if not styles.hasByName(name):
        styles.insertByName(name, doc.createInstance("com.sun.star.style.PageStyle"))
        page = styles.getByName(name)
        page.IsLandscape = landscape
        page.Width, page.Height = (29700, 21000) if landscape else (21000, 29700)
        page.ScaleToPagesX = 1
        page.ScaleToPagesY = 1 if one_page_high else 0
    sheet.PageStyle = name


def plain_chart_background(chart):
    """A white plot area with the default grey grid: easier to read in print than the grey wall."""
    chart.Diagram.Wall.FillColor = 0xFFFFFF


def new_sheet(doc, name):
    doc.Sheets.insertNewByName(name, doc.Sheets.Count)
    return doc.Sheets.getByName(name)


def add_name(doc, name, sheet, cell_range):
    doc.NamedRanges.addNewByName(name, "$'%s'.%s" % (sheet.Name, cell_range),
                                 sheet.getCellRangeByName("A1").CellAddress, 0)
