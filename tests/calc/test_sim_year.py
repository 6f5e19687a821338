#!/usr/bin/python3
"""SIM_YEAR as an array formula in real Calc: an invented hourly year written
into a sheet (8760 rows of weather and load), the formula entered over a
13x8 range (monthly) and an 8760x5 range (hourly), and every cell compared
with what the core gives for the same numbers (solarith-codegen evaluate).
Also: the optional controls range omitted, given, and given with a blank
cell; wrong row counts; FN_DIAGNOSE's message in a cell; each argument in
turn replaced by hostile input (text, blank and error cells, 1e308 in a range,
a million rows, a 1024-column row), which the generic hostile sheet cannot
do for SIM_YEAR because its ranges are too long to write inline.

The weather and load are INVENTED (smooth formulas, no climate file), the
same kind of year as tests/unit/invented_year.hpp.
"""
import math
import os
import subprocess
import unittest

from calc_support import outcome
from office import Office

HOURS = 8760
COLLECTOR = (4.0, 0.78, 3.5, 0.015, 0.1, 0.015)
TANK = (0.3, 1.5, 1.6, 10.0, 50.0, 18.0)
CONTROLS = (7.0, 2.0, 95.0)
OTHER_CONTROLS = (12.0, 4.0, 60.0)
RANGES = "$data.A1:$data.C8760; $data.D1:$data.E8760; $data.G1:$data.L1; $data.G2:$data.L2"


def invented_year():
    """([(T_ambient, G, incidence)], [(draw, T_cold)]), 8760 rows each: invented."""
    profile = [0, 0, 0, 0, 0, 0, 0.05, 0.20, 0.10, 0, 0, 0, 0.10, 0.05, 0, 0, 0, 0, 0.10, 0.15, 0.15, 0.10, 0, 0]
    weather, load = [], []
    for hour in range(HOURS):
        day = hour // 24
        solar_time = hour % 24 + 0.5
        season = math.cos(2 * math.pi * (day + 10) / 365)
        t_air = 11 - 9 * math.cos(2 * math.pi * (day - 15) / 365) + 4.5 * math.sin(2 * math.pi * (solar_time - 9) / 24)
        day_length = 12 - 4 * season
        phase = (solar_time - (12 - day_length / 2)) / day_length
        irradiance, incidence = 0.0, 90.0
        if 0 < phase < 1:
            bell = math.sin(math.pi * phase)
            clouds = 0.4 + 0.6 * (0.5 + 0.5 * math.sin(day * 2.4))  # invented day-to-day variation
            irradiance = (780 - 120 * season) * clouds * bell ** 1.3
            incidence = math.degrees(math.acos(math.cos(math.radians(30 + 15 * season)) * bell))
        weather.append((t_air, irradiance, incidence))
        load.append((180 * profile[hour % 24], 12 - 4 * math.cos(2 * math.pi * (day - 30) / 365)))
    return weather, load


def inline(rows):
    return "{" + "|".join(";".join(repr(float(x)) for x in row) for row in rows) + "}"


def core(weather, load, controls, output):
    """The core's table for these numbers, through solarith-codegen evaluate."""
    arguments = "; ".join([inline(weather), inline(load), inline([COLLECTOR]), inline([TANK]),
                           inline([controls]) if controls else "", '"%s"' % output])
    text = subprocess.run([os.environ["SOLARITH_CODEGEN"], "evaluate", "SIM_YEAR"], input=arguments,
                          capture_output=True, text=True, check=True).stdout
    table = []
    for line in text.splitlines():
        row = []
        for cell in line.split("\t"):
            try:
                row.append(float(cell))
            except ValueError:
                row.append(cell)
        table.append(row)
    return table


class SimYearInCalc(unittest.TestCase):
    @classmethod
    def setUpClass(cls):
        cls.weather, cls.load = invented_year()
        cls.office = Office(os.environ["SOLARITH_OXT"]).install().start()
        cls.doc = cls.office.new_spreadsheet()
        data = cls.doc.Sheets.getByIndex(0)
        data.Name = "data"
        data.getCellRangeByName("A1:C8760").setDataArray(tuple(tuple(r) for r in cls.weather))
        data.getCellRangeByName("D1:E8760").setDataArray(tuple(tuple(r) for r in cls.load))
        data.getCellRangeByName("G1:L1").setDataArray((COLLECTOR,))
        data.getCellRangeByName("G2:L2").setDataArray((TANK,))
        data.getCellRangeByName("G3:I3").setDataArray((CONTROLS,))
        data.getCellRangeByName("G4:I4").setDataArray(((7.0, "", 95.0),))  # a blank cell among the controls
        data.getCellRangeByName("G5:I5").setDataArray((OTHER_CONTROLS,))
        # Hostile blocks of the weather's shape (8760 x 3): one text cell, one error value, one huge value.
        cls.doc.Sheets.insertNewByName("hostile", cls.doc.Sheets.getCount())
        bad = cls.doc.Sheets.getByName("hostile")
        for column, poison in ((0, "text"), (4, "error"), (8, "huge")):
            block = bad.getCellRangeByPosition(column, 0, column + 2, HOURS - 1)
            block.setDataArray(tuple(tuple(r) for r in cls.weather))
            cell = bad.getCellByPosition(column + 1, 4000)
            if poison == "text":
                cell.setString("sunny")
            elif poison == "error":
                cell.setFormula("=1/0")
            else:
                cell.setValue(1e308)

    @classmethod
    def tearDownClass(cls):
        try:
            cls.doc.close(True)
        finally:
            cls.office.stop()

    def array_formula(self, sheet_name, formula, rows, columns):
        """Enters formula as an array formula over rows x columns and returns the cells' outcomes."""
        sheet, block = self.enter_array(sheet_name, formula, rows, columns)
        return [[outcome(sheet.getCellByPosition(c, r)) for c in range(columns)] for r in range(rows)]

    def enter_array(self, sheet_name, formula, rows, columns):
        sheets = self.doc.Sheets
        if not sheets.hasByName(sheet_name):
            sheets.insertNewByName(sheet_name, sheets.getCount())
        sheet = sheets.getByName(sheet_name)
        block = sheet.getCellRangeByPosition(0, 0, columns - 1, rows - 1)
        block.setArrayFormula(formula)
        self.doc.calculateAll()
        return sheet, block

    def assert_same_table(self, got, want, what):
        self.assertEqual(len(got), len(want), what)
        for r, (got_row, want_row) in enumerate(zip(got, want)):
            self.assertEqual(len(got_row), len(want_row), what)
            for c, (cell, expected) in enumerate(zip(got_row, want_row)):
                where = "%s row %d column %d" % (what, r + 1, c + 1)
                if isinstance(expected, str):
                    self.assertEqual(cell, ("text", expected), where)
                else:
                    self.assertEqual(cell[0], "number", "%s: got %r" % (where, cell))
                    self.assertTrue(math.isclose(cell[1], expected, rel_tol=1e-13, abs_tol=1e-9),
                                    "%s: Calc %.17g, core %.17g" % (where, cell[1], expected))

    def test_monthly_table_is_the_core_table(self):
        got = self.array_formula("monthly", "=SIM_YEAR(%s)" % RANGES, 13, 8)
        want = core(self.weather, self.load, None, "monthly")
        self.assert_same_table(got, want, "monthly")
        self.assertEqual(got[12][0], ("text", "year"))
        fraction = got[12][5][1]
        self.assertTrue(0 < fraction < 1, "annual solar fraction %r" % fraction)

    def test_hourly_table_is_the_core_table(self):
        sheet, block = self.enter_array("hourly", '=SIM_YEAR(%s; ; "hourly")' % RANGES, HOURS, 5)
        # Reading 43 800 cells one by one is slow: the values at once, the error
        # state of the corners and a sample (an error would spread to every cell).
        for row, column in ((0, 0), (HOURS - 1, 4), (4000, 2)):
            self.assertEqual(sheet.getCellByPosition(column, row).getError(), 0)
        got = [[("number", x) if isinstance(x, float) else ("text", x) for x in row] for row in block.getDataArray()]
        want = core(self.weather, self.load, None, "hourly")
        self.assert_same_table(got, want, "hourly")

    def test_controls_reach_the_core_and_a_blank_control_is_an_error(self):
        given = self.array_formula("controls", "=SIM_YEAR(%s; $data.G3:$data.I3)" % RANGES, 13, 8)
        self.assert_same_table(given, core(self.weather, self.load, CONTROLS, "monthly"), "controls = defaults")
        other = self.array_formula("other controls", "=SIM_YEAR(%s; $data.G5:$data.I5)" % RANGES, 13, 8)
        self.assert_same_table(other, core(self.weather, self.load, OTHER_CONTROLS, "monthly"), "other controls")
        self.assertNotEqual(other[12][6], given[12][6], "other controls change the pump hours")
        blank = self.array_formula("blank control", "=SIM_YEAR(%s; $data.G4:$data.I4)" % RANGES, 13, 8)
        self.assertEqual(blank[0][0], ("error", 502), "a blank cell among the controls")

    def test_hostile_arguments_are_errors_never_wrong_numbers(self):
        """Each argument in turn replaced by what engineers type by mistake: the whole block shows an error
        code (never a partial or non-finite table) and the office survives."""
        arguments = [a.strip() for a in RANGES.split(";")]
        replacements = {
            "a text": '"warm"', "a number": "25", "a blank cell": "$data.Z1", "an error value": "1/0",
            "text in the range": "$hostile.A1:$hostile.C8760", "an error cell in the range": "$hostile.E1:$hostile.G8760",
            "1e308 in the range": "$hostile.I1:$hostile.K8760", "a million rows": "$data.A1:$data.C1000000",
            "one row": "$data.A1:$data.C1", "a row of 1024 columns": "$data.A1:$data.AMJ1",
        }
        accepted = []
        for position in range(len(arguments)):
            for what, text in replacements.items():
                args = list(arguments)
                args[position] = text
                name = "hostile %d %s" % (position, what)
                got = self.array_formula(name[:31], "=SIM_YEAR(%s)" % "; ".join(args), 13, 8)
                self.doc.Sheets.removeByName(name[:31])  # else every later recalculation repeats it
                kinds = {cell[0] for row in got for cell in row}
                where = "argument %d replaced by %s" % (position + 1, what)
                if "error" in kinds:
                    self.assertEqual(kinds, {"error"}, "%s: errors mixed with values" % where)
                else:
                    numbers = [cell[1] for row in got for cell in row if cell[0] == "number"]
                    self.assertTrue(all(math.isfinite(x) for x in numbers), where)
                if "error" not in kinds:
                    accepted.append(where)
                self.assertTrue(self.office.alive(), where)
        # None of these is a valid year, collector or tank: every one is refused.
        self.assertEqual(accepted, [])

    def test_wrong_shapes_are_errors_and_diagnosed(self):
        short = self.array_formula("short", "=SIM_YEAR($data.A1:$data.C8759; $data.D1:$data.E8759; "
                                            "$data.G1:$data.L1; $data.G2:$data.L2)", 13, 8)
        self.assertEqual(short[0][0], ("error", 502), "8759 rows")
        wide = self.array_formula("wide", "=SIM_YEAR($data.A1:$data.C8760; $data.C1:$data.E8760; "
                                          "$data.G1:$data.L1; $data.G2:$data.L2)", 13, 8)
        self.assertEqual(wide[0][0], ("error", 502), "3 load columns")
        # FN_DIAGNOSE as an ordinary formula: inside an array formula Calc calls it
        # once per cell of its range arguments (its variable arguments are 'any'),
        # which with 8760-row ranges takes minutes (measured: 543 s).
        cell = self.doc.Sheets.getByName("wide").getCellByPosition(10, 0)
        cell.setFormula('=FN_DIAGNOSE("SIM_YEAR"; $data.A1:$data.C8759; $data.D1:$data.E8759; '
                        "$data.G1:$data.L1; $data.G2:$data.L2)")
        self.doc.calculateAll()
        self.assertEqual(outcome(cell)[0], "text")
        self.assertIn("weather has 8759 rows", outcome(cell)[1])
        self.assertTrue(self.office.alive())


if __name__ == "__main__":
    unittest.main(verbosity=2)
