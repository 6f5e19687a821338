"""The writer every example workbook is built with: a calculation sheet laid
out row by row (label | value | unit | source or note), tables whose columns
are filled with formulas, charts over those columns, and the cautions block.

Formula templates name other cells by key in braces:
  {key}  a single input or result  -> its absolute address, e.g. $B$7
  {col}  a table column            -> inside that table's rows, or in a table
                                      of the same group (tables that line up
                                      row by row, e.g. "months"): the cell of
                                      the same row; anywhere else: the
                                      column's whole range, e.g. $C$12:$C$23
A column's formula may also be a function of the row's offset in its table
that returns the template (for formulas that differ from row to row).
Every workbook uses the same colours, so inputs, results and notes are told
apart at a glance.
"""
import uno  # noqa: F401  (makes the com.sun.star modules importable)
from com.sun.star.awt import Rectangle
from com.sun.star.lang import Locale
from com.sun.star.table import CellAddress, CellRangeAddress

INPUT_COLOUR = 0xFFF2CC     # pale yellow: typed in by the engineer
RESULT_COLOUR = 0xE2F0D9    # pale green: computed
HEADING_COLOUR = 0xD9E1F2   # pale blue: section and table headings
NOTE_COLOUR = 0xF2F2F2      # grey: notes and cautions
FAIL_COLOUR = 0xF4CCCC      # pale red: a check that does not pass

BOLD = 150
ITALIC = 2
ROW_HEIGHT = 452            # 1/100 mm, Calc's default row height

CAUTIONS = [
    "Cautions. These figures are engineering estimates for an invented scenario; they do not replace a design "
    "checked against the applicable codes and standards by a licensed professional, whose judgement prevails.",
    "Stagnation: with no heat drawn, a collector in full sun reaches the stagnation temperature estimated in these "
    "workbooks, well above 100 °C; absorber plates, collector outlets, pipes and tanks burn skin on contact, and "
    "the fluid can boil. Components and the heat-transfer fluid must be rated for it.",
    "Scalding: water stored above about 50–60 °C scalds within seconds. Fit thermostatic mixing valves at the "
    "outlets as local codes require.",
    "Legionella: water stored or held too cool can grow Legionella. Keep stored water at the temperatures the "
    "local rules prescribe (a regular heat-up of the whole store where required).",
    "Pressure and frost: closed circuits need pressure relief valves and expansion vessels sized to code; "
    "circuits exposed to frost need freeze protection (antifreeze or drain-back) sized for the site's lowest "
    "temperature.",
    "Local codes, standards and licensed professional practice prevail over any figure in this workbook.",
]


def column_letter(index):
    letters = ""
    index += 1
    while index:
        index, rest = divmod(index - 1, 26)
        letters = chr(ord("A") + rest) + letters
    return letters


def cell_range(sheet, first_column, first_row, last_column, last_row):
    """The address of a block of cells on `sheet` (0-based, inclusive), as print areas and charts take it."""
    area = CellRangeAddress()
    area.Sheet = sheet.RangeAddress.Sheet
    area.StartColumn, area.StartRow, area.EndColumn, area.EndRow = first_column, first_row, last_column, last_row
    return area


class Column:
    """A table column: a header, a unit, and either input values or a formula template."""

    def __init__(self, key, header, unit, values=None, formula=None, number_format="0.00", width=None):
        assert (values is None) != (formula is None), "a column has values or a formula, not both"
        self.key, self.header, self.unit = key, header, unit
        self.values, self.formula = values, formula
        self.number_format, self.width = number_format, width


class Sheet:
    """Writes a calculation sheet from the top down; self.row is the next free row (0-based)."""

    def __init__(self, document, sheet, widths=(7600, 2400, 2000, 6200)):
        self.document = document
        self.sheet = sheet
        self.row = 0
        self.cells = {}     # key -> absolute address of a single cell
        self.columns = {}   # key -> (column index, first row, last row), 0-based
        self.widths = widths
        self.blocks = []    # (first, last) rows to keep on one printed page
        self.groups = {}    # table column key -> its group: tables of a group line up row by row
        for column, width in enumerate(widths):
            sheet.Columns.getByIndex(column).Width = width  # 1/100 mm
        page = document.StyleFamilies.getByName("PageStyles").getByName(sheet.PageStyle)
        page.ScaleToPagesX = 1  # print one page wide
        page.ScaleToPagesY = 0

    # -- addresses and formulas ----------------------------------------------
    def _absolute(self, column, row):
        return "$%s$%d" % (column_letter(column), row + 1)

    def ref(self, key):
        return self.cells[key]

    def range(self, key):
        column, first, last = self.columns[key]
        return "%s:%s" % (self._absolute(column, first), self._absolute(column, last))

    def cell_of(self, key, offset):
        """Absolute address of the offset-th cell of a table column."""
        column, first, last = self.columns[key]
        return self._absolute(column, first + offset)

    def _table_at(self, row):
        """(group, offset) of the table being written at `row`, or (None, None)."""
        for key, (column, first, last) in self.columns.items():
            if first <= row <= last:
                return self.groups.get(key), row - first
        return None, None

    def expand(self, template, row=None):
        """The template with {key} replaced by addresses; `row` is the table row being written, if any."""
        group, offset = (None, None) if row is None else self._table_at(row)
        if callable(template):
            template = template(offset)
        names = dict(self.cells)
        for key, (column, first, last) in self.columns.items():
            if row is not None and first <= row <= last:
                names[key] = "%s%d" % (column_letter(column), row + 1)
            elif group is not None and self.groups.get(key) == group:
                names[key] = "%s%d" % (column_letter(column), first + offset + 1)
            else:
                names[key] = self.range(key)
        return template.format(**names)

    def _cell(self, column, row=None):
        return self.sheet.getCellByPosition(column, self.row if row is None else row)

    def _fill(self, colour, first=0, last=None, row=None):
        row = self.row if row is None else row
        last = len(self.widths) - 1 if last is None else last
        self.sheet.getCellRangeByPosition(first, row, last, row).CellBackColor = colour

    def number_format(self, code):
        formats = self.document.NumberFormats
        locale = Locale()
        key = formats.queryKey(code, locale, False)
        return key if key != -1 else formats.addNew(code, locale)

    def _name(self, name, column, row):
        address = CellAddress()
        address.Sheet = self.sheet.RangeAddress.Sheet
        self.document.NamedRanges.addNewByName(
            name, "$'%s'.%s" % (self.sheet.Name, self._absolute(column, row)), address, 0)

    # -- rows -----------------------------------------------------------------
    def _full_width(self, text_or_formula, characters_per_line=None, last_column=None):
        """Text across all the sheet's columns of the current row, wrapped, the row made tall enough."""
        last_column = len(self.widths) - 1 if last_column is None else last_column
        if characters_per_line is None:
            characters_per_line = int(sum(self.widths[:last_column + 1]) / 205)  # about 2 mm a character at 10 pt
        cells = self.sheet.getCellRangeByPosition(0, self.row, last_column, self.row)
        cells.merge(True)
        cells.IsTextWrapped = True
        cells.VertJustify = 1  # com.sun.star.table.CellVertJustify2.TOP: the text starts at the top of its row
        cell = self._cell(0)
        if text_or_formula.startswith("="):
            cell.setFormula(text_or_formula)
        else:
            cell.setString(text_or_formula)
        lines = max(1, -(-len(cell.getString()) // characters_per_line))
        self.sheet.Rows.getByIndex(self.row).Height = 120 + 420 * lines  # 1/100 mm
        return cells

    def title(self, text, subtitle):
        self._cell(0).setString(text)
        self._cell(0).CharHeight = 14
        self._cell(0).CharWeight = BOLD
        self.row += 1
        self._full_width(subtitle).CharPosture = ITALIC
        self.row += 2

    def heading(self, text):
        self._fill(HEADING_COLOUR)
        self._cell(0).setString(text)
        self._cell(0).CharWeight = BOLD
        self.row += 1

    def _row(self, key, label, unit, note, colour):
        self._cell(0).setString(label)
        self._cell(2).setString(unit)
        self._cell(3).setString(note)
        self._fill(colour)  # across every column: the note runs on over the empty cells to its right
        if key:
            assert key not in self.cells and key not in self.columns, key
            self.cells[key] = self._absolute(1, self.row)

    def input(self, key, label, value, unit, note="", number_format=None):
        """An input the engineer may change: a number, or text (e.g. a model name)."""
        self._row(key, label, unit, note, INPUT_COLOUR)
        if isinstance(value, str):
            self._cell(1).setString(value)
        else:
            self._cell(1).setValue(value)
        if number_format:
            self._cell(1).NumberFormat = self.number_format(number_format)
        self.row += 1

    def result(self, key, label, formula, unit, note="", number_format="0.00", named=False):
        """A computed value; `named` makes it a key result (a named cell printed by the run command)."""
        self._row(key, label, unit, note, RESULT_COLOUR)
        cell = self._cell(1)
        cell.setFormula("=" + self.expand(formula))
        cell.NumberFormat = self.number_format(number_format)
        cell.CharWeight = BOLD
        if named:
            self._name(key, 1, self.row)
        self.row += 1

    def text_result(self, label, formula):
        """A label row, then the formula's text across the full width below it."""
        self._row(None, label, "", "", RESULT_COLOUR)
        self.row += 1
        self.document.calculateAll()  # the text's length sets the row height
        self._full_width("=" + self.expand(formula)).CellBackColor = RESULT_COLOUR
        self.row += 1

    def note(self, text):
        cells = self._full_width(text)
        cells.CharPosture = ITALIC
        cells.CellBackColor = NOTE_COLOUR
        self.row += 1

    def notes(self, lines):
        self.row += 1
        for line in lines:
            self.note(line)

    def space(self, rows=1):
        self.row += rows

    # -- tables ---------------------------------------------------------------
    def header(self, column, row, text, unit=""):
        """A table's column header "text [unit]", bold and wrapped, in the heading colour."""
        cell = self._cell(column, row)
        cell.setString("%s [%s]" % (text, unit) if unit else text)
        cell.CharWeight = BOLD
        cell.IsTextWrapped = True
        cell.CellBackColor = HEADING_COLOUR

    def _header_row(self, columns, first_column, first, last):
        """Headers of a table whose data rows are first..last, the columns registered for {key}."""
        for offset, column in enumerate(columns):
            index = first_column + offset
            assert column.key not in self.cells and column.key not in self.columns, column.key
            self.columns[column.key] = (index, first, last)
            self.header(index, first - 1, column.header, column.unit)
            if column.width:
                self.sheet.Columns.getByIndex(index).Width = column.width
        self.sheet.Rows.getByIndex(first - 1).Height = 2 * ROW_HEIGHT

    def table(self, columns, rows, first_column=0, group=None, header_lines=2):
        """A table of `rows` rows under a header row "header [unit]". Input columns are yellow, formula
        columns green (for thousands of rows see array_columns). Tables of one `group` line up row by row
        (see the module text). Returns the 0-based (first, last) data rows."""
        first, last = self.row + 1, self.row + rows
        for column in columns:
            if group is not None:
                self.groups[column.key] = group
        self._header_row(columns, first_column, first, last)
        self.sheet.Rows.getByIndex(first - 1).Height = header_lines * ROW_HEIGHT
        for offset, column in enumerate(columns):
            index = first_column + offset
            block = self.sheet.getCellRangeByPosition(index, first, index, last)
            if column.values is not None:
                assert len(column.values) == rows, column.key
                block.setDataArray(tuple((v,) for v in column.values))
                block.CellBackColor = INPUT_COLOUR
            else:
                for row in range(first, last + 1):
                    self._cell(index, row).setFormula("=" + self.expand(column.formula, row))
                block.CellBackColor = RESULT_COLOUR
            block.NumberFormat = self.number_format(column.number_format)
        self.row = last + 1
        return first, last

    def header_formula(self, key, formula):
        """Replaces a table column's header text with a formula (e.g. one naming an option's area)."""
        column, first, last = self.columns[key]
        self._cell(column, first - 1).setFormula("=" + self.expand(formula))

    def labels(self, key, header, values, column, first_row):
        """A column of row labels (not inputs: heading colour) under a header, usable as a table column."""
        self.columns[key] = (column, first_row, first_row + len(values) - 1)
        cell = self._cell(column, first_row - 1)
        cell.setString(header)
        cell.CharWeight = BOLD
        cell.CellBackColor = HEADING_COLOUR
        block = self.sheet.getCellRangeByPosition(column, first_row, column, first_row + len(values) - 1)
        block.setDataArray(tuple((v,) for v in values))
        block.CellBackColor = HEADING_COLOUR

    def array_columns(self, columns, beside, first_column):
        """Formula columns over the rows of the table column `beside`, each one array formula: a file stores
        the formula once per column instead of once per cell (an 8760-row year stays a quarter smaller)."""
        _, first, last = self.columns[beside]
        for offset, column in enumerate(columns):
            index = first_column + offset
            self.header(index, first - 1, column.header, column.unit)
            block = self.sheet.getCellRangeByPosition(index, first, index, last)
            block.setArrayFormula("=" + self.expand(column.formula))
            block.NumberFormat = self.number_format(column.number_format)
            block.CellBackColor = RESULT_COLOUR
            self.columns[column.key] = (index, first, last)

    # -- printed pages --------------------------------------------------------
    def page_break(self):
        """The current row starts a new printed page."""
        self.sheet.Rows.getByIndex(self.row).IsStartOfNewPage = True

    def keep(self, first_row):
        """Rows first_row .. the last one written belong on one printed page (see paginate)."""
        self.blocks.append((first_row, self.row - 1))

    def paginate(self):
        """A manual page break before each kept block that would otherwise run over the end of a page.
        Calc lays out no pages for a hidden document, so they are counted here from the row heights and the
        page style, at the scale that fits the used columns to one page wide."""
        style = self.document.StyleFamilies.getByName("PageStyles").getByName(self.sheet.PageStyle)
        usable = style.Height - style.TopMargin - style.BottomMargin - 200  # 2 mm to spare
        for on, height, distance in ((style.HeaderIsOn, style.HeaderHeight, style.HeaderBodyDistance),
                                     (style.FooterIsOn, style.FooterHeight, style.FooterBodyDistance)):
            if on:
                usable -= height + distance
        cursor = self.sheet.createCursor()
        cursor.gotoEndOfUsedArea(False)
        used_width = sum(self.sheet.Columns.getByIndex(c).Width for c in range(cursor.RangeAddress.EndColumn + 1))
        page = usable / min(1.0, (style.Width - style.LeftMargin - style.RightMargin) / used_width)
        rows = self.sheet.Rows
        for first, last in sorted(self.blocks):
            top = 0  # height used on the page before row `first`
            for row in range(first):
                height = rows.getByIndex(row).Height
                if rows.getByIndex(row).IsStartOfNewPage or top + height > page:
                    top = 0
                top += height
            block = sum(rows.getByIndex(row).Height for row in range(first, last + 1))
            if top + block > page and block <= page:
                rows.getByIndex(first).IsStartOfNewPage = True

    # -- charts ---------------------------------------------------------------
    def chart(self, name, title, x_key, y_keys, x_title, y_title, kind="xy", height_rows=18,
              first_column=0, last_column=3):
        """A chart below the current row over table columns: "xy" (lines through points, x numeric),
        "column" (bars per category of x) or "line" (categories of x). Series are named by the
        column headers."""
        ranges = []
        for key in [x_key] + list(y_keys):
            column, first, last = self.columns[key]
            ranges.append(cell_range(self.sheet, column, first - 1, column, last))  # header row: series names
        top = self._cell(first_column).Position
        right = self._cell(last_column + 1).Position
        area = Rectangle()
        area.X, area.Y = top.X + 100, top.Y + 100
        area.Width, area.Height = right.X - top.X - 200, height_rows * ROW_HEIGHT - 200
        self.sheet.Charts.addNewByName(name, area, tuple(ranges), True, kind != "xy")
        chart = self.sheet.Charts.getByName(name).EmbeddedObject
        diagram = {"xy": "com.sun.star.chart.XYDiagram", "column": "com.sun.star.chart.BarDiagram",
                   "line": "com.sun.star.chart.LineDiagram"}[kind]
        chart.Diagram = chart.createInstance(diagram)
        if kind == "column":
            chart.Diagram.Vertical = False  # bars stand upright
        chart.HasMainTitle = True
        chart.Title.String = title
        chart.HasLegend = len(y_keys) > 1
        diagram = chart.Diagram
        diagram.HasXAxisTitle = True
        diagram.XAxisTitle.String = x_title
        diagram.HasYAxisTitle = True
        diagram.YAxisTitle.String = y_title
        self.row += height_rows
        return chart


def mark_point(chart, series):
    """Draws one series of an XY chart as large red diamonds without a line (a marked point). The chart API
    counts the x values as series 0, so the first y series is 1."""
    from com.sun.star.awt import Size
    from com.sun.star.drawing.LineStyle import NONE
    row = chart.Diagram.getDataRowProperties(series)
    row.LineStyle = NONE
    row.SymbolType = 1          # com.sun.star.chart.ChartSymbolType.SYMBOL1, a diamond
    row.SymbolSize = Size(550, 550)
    row.LineColor = 0xC00000    # the symbol takes the series colour
    row.FillColor = 0xC00000
