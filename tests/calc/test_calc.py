#!/usr/bin/python3
"""Solarith in real LibreOffice Calc: the built .oxt is installed into a
throwaway profile, formulas are typed into cells of a spreadsheet,
recalculated, and their values and error codes checked; the function
wizard's texts are read back; a document is saved, reopened and recalculated.

Reference values with their outside sources are in reference_cases.tsv.
"""
import math
import os
import unittest
import zipfile

from calc_support import ERROR_CODE, SOURCE, codegen, enter_column, outcome
from office import Office


def catalogue():
    """[(display name, function help, [(argument name, unit, argument help)])]"""
    out = []
    for line in codegen("names").splitlines():
        row = line.split("\t")
        args = list(zip(row[4::3], row[5::3], row[6::3]))
        out.append((row[0], row[3], args))
    return out


def examples():
    """[(display name, arguments, core result as text)]"""
    return [tuple(line.split("\t")) for line in codegen("examples").splitlines()]


def reference_cases():
    """[(formula, expected, relative tolerance, source)] from reference_cases.tsv."""
    cases = []
    with open(os.path.join(SOURCE, "tests", "calc", "reference_cases.tsv"), encoding="utf-8") as f:
        for line in f:
            if not line.strip() or line.startswith("#"):
                continue
            formula, expected, tolerance, source = line.rstrip("\n").split("\t")
            cases.append((formula, expected, float(tolerance or 0), source))
    return cases


class Calc(unittest.TestCase):
    @classmethod
    def setUpClass(cls):
        cls.office = Office(os.environ["SOLARITH_OXT"]).install().start()
        cls.doc = cls.office.new_spreadsheet()

    @classmethod
    def tearDownClass(cls):
        try:
            cls.doc.close(True)
        finally:
            cls.office.stop()

    def sheet(self, name):
        sheets = self.doc.Sheets
        if not sheets.hasByName(name):
            sheets.insertNewByName(name, sheets.getCount())
        return sheets.getByName(name)

    def enter(self, sheet, formulas, column=0):
        return enter_column(self.doc, sheet, formulas, column)

    def check_outcome(self, formula, got, expected, tolerance, source):
        where = "%s (source: %s)" % (formula, source)
        if expected in ERROR_CODE:
            self.assertEqual(got, ("error", ERROR_CODE[expected]), where)
        elif expected.startswith('"'):
            self.assertEqual(got, ("text", expected.strip('"')), where)
        else:
            self.assertEqual(got[0], "number", where + ": got %r" % (got,))
            want = float(expected)
            self.assertTrue(math.isclose(got[1], want, rel_tol=tolerance, abs_tol=tolerance if want == 0 else 0),
                            "%s: got %.10g, expected %.10g within %g" % (where, got[1], want, tolerance))

    def test_every_function_gives_the_core_result_in_a_cell(self):
        cases = examples()
        cells = self.enter(self.sheet("examples"), ["=%s(%s)" % (name, args) for name, args, _ in cases])
        for (name, args, expected), cell in zip(cases, cells):
            got = outcome(cell)
            formula = "=%s(%s)" % (name, args)
            try:
                want = float(expected)
            except ValueError:
                self.assertEqual(got, ("text", expected), formula)
                continue
            self.assertEqual(got[0], "number", "%s gave %r" % (formula, got))
            self.assertTrue(math.isclose(got[1], want, rel_tol=1e-13, abs_tol=1e-300),
                            "%s: Calc %.17g, core %.17g" % (formula, got[1], want))

    def test_reference_values_and_error_codes(self):
        cases = reference_cases()
        cells = self.enter(self.sheet("reference"), [c[0] for c in cases])
        for (formula, expected, tolerance, source), cell in zip(cases, cells):
            with self.subTest(formula=formula):
                self.check_outcome(formula, outcome(cell), expected, tolerance, source)
        self.assertTrue(self.office.alive(), "the office must survive every bad input")

    def test_blank_and_text_cells_in_a_range_are_errors_not_zero(self):
        sheet = self.sheet("ranges")
        # thicknesses m | conductivities W/(m·K); row 2 of the first range is left blank
        sheet.getCellRangeByName("A1:B3").setDataArray(((0.003, 50.0), ("", 0.025), (0.001, 0.2)))
        sheet.getCellRangeByName("C1:D3").setDataArray(((0.003, 50.0), ("thin", 0.025), (0.001, 0.2)))
        sheet.getCellRangeByName("E1:F3").setDataArray(((0.003, 50.0), (0.08, 0.025), (0.001, 0.2)))
        formulas = ["=COND_R_LAYERS(A1:A3;B1:B3;2)", "=COND_R_LAYERS(C1:C3;D1:D3;2)",
                    "=COND_R_LAYERS(E1:E3;F1:F3;2)", "=COND_R_LAYERS(E1:E3;F1:F2;2)",
                    '=FN_DIAGNOSE("COND_R_LAYERS";A1:A3;B1:B3;2)']
        cells = self.enter(sheet, formulas, column=7)
        self.assertEqual(outcome(cells[0]), ("error", 502), "blank cell in a range")
        self.assertEqual(outcome(cells[1]), ("error", 502), "text cell in a range")
        # 0.003/50 + 0.08/0.025 + 0.001/0.2 per 2 m²: series resistances add (common practice)
        self.assertAlmostEqual(outcome(cells[2])[1], (0.003 / 50 + 0.08 / 0.025 + 0.001 / 0.2) / 2, places=12)
        self.assertEqual(outcome(cells[3]), ("error", 502), "ranges of different length")
        self.assertIn("blank", outcome(cells[4])[1])

    def test_function_wizard_shows_descriptions_with_units(self):
        descriptions = self.office.create("com.sun.star.sheet.FunctionDescriptions")
        shown = {}
        for i in range(descriptions.getCount()):
            entry = {p.Name: p.Value for p in descriptions.getByIndex(i)}
            shown[entry["Name"]] = entry
        for name, function_help, args in catalogue():
            with self.subTest(function=name):
                self.assertIn(name, shown, "not in the function wizard")
                entry = shown[name]
                self.assertEqual(entry["Description"], function_help)
                self.assertEqual([(a.Name, a.Description) for a in entry["Arguments"]],
                                 [(arg_name, arg_help) for arg_name, _, arg_help in args])
                for arg_name, unit, _ in args:
                    if unit:  # every number states its unit; texts have none
                        self.assertIn("[%s]" % unit, next(a.Description for a in entry["Arguments"]
                                                          if a.Name == arg_name))

    def test_saved_document_reopens_with_the_same_values(self):
        cases = examples()
        sheet = self.sheet("saved")
        cells = self.enter(sheet, ["=%s(%s)" % (name, args) for name, args, _ in cases])
        before = [outcome(c) for c in cells]
        path = os.path.join(self.office.own_path("documents"), "round-trip.ods")
        self.office.store(self.doc, path, "calc8")
        with zipfile.ZipFile(path) as ods:
            content = ods.read("content.xml").decode("utf-8")
        self.assertIn("ORG.SOLARITH.FUNCTIONS.RADEMISSIVE(", content, "stored programmatic names changed")
        reopened = self.office.load(path)
        try:
            reopened.calculateAll()
            again = reopened.Sheets.getByName("saved")
            after = [outcome(again.getCellByPosition(0, row)) for row in range(len(cases))]
        finally:
            reopened.close(True)
        self.assertEqual(before, after)


if __name__ == "__main__":
    unittest.main(verbosity=2)
