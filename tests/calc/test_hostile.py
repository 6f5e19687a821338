#!/usr/bin/python3
"""Hostile sheets: every Solarith function called with what engineers really
type — text, blank cells, error values, booleans, ±1e308, 1e-320, ranges where
one value belongs, wrong-shaped ranges, and a range of a million cells where
ranges are accepted — recalculated headless in real Calc.

The office must survive, every cell must show an error code or a finite value,
and the office's peak memory is reported and must stay bounded.
"""
import math
import os
import unittest

from calc_support import enter_column, outcome, rows, split_arguments
from office import Office

# What stands in a cell position of a call. The cells they refer to are laid
# out on the 'data' sheet by setUpClass.
HOSTILE_SCALARS = {
    "text": '"warm"',
    "number as text": '"25"',
    "blank cell": "$data.A1",
    "text cell": "$data.B1",
    "error value": "$data.C1",
    "not available": "NA()",
    "boolean": "TRUE()",
    "huge": "1E+308",
    "minus huge": "-1E+308",
    "subnormal": "1E-320",
    "range for one value": "$data.E1:$data.F2",
    "inline array for one value": "{1;2}",
}
HOSTILE_RANGES = {
    "one blank cell": "$data.A1",
    "wrong shape": "$data.E1:$data.F3",
    "row instead of column": "$data.E1:$data.F1",
    "text range": "$data.B1:$data.B3",
    "error in range": "$data.C1:$data.C2",
    "a million blank cells": "$data.H1:$data.H1000000",
    "a million numbers": "$data.I1:$data.I1000000",
}
PEAK_MEMORY_LIMIT_MB = 6144
MILLION = 1000000


def hostile_calls():
    """[(description, formula)]: each function's example with one argument replaced at a time."""
    kinds = {name: kind for name, kind in rows("kinds")}
    calls = []
    for name, example, _ in rows("examples"):
        arguments = split_arguments(example)
        for position, kind in enumerate(kinds[name]):
            if kind == "*" or position >= len(arguments):
                continue
            replacements = HOSTILE_RANGES if kind in "Rr" else HOSTILE_SCALARS
            for what, text in replacements.items():
                args = list(arguments)
                args[position] = text
                calls.append(("%s argument %d: %s" % (name, position + 1, what), "=%s(%s)" % (name, "; ".join(args))))
        calls.append(("%s with one argument too many" % name, "=%s(%s; 1)" % (name, example)))
    return calls


def peak_memory_mb(pid):
    with open("/proc/%d/status" % pid) as status:
        for line in status:
            if line.startswith("VmHWM:"):
                return int(line.split()[1]) / 1024
    return float("nan")


class HostileSheet(unittest.TestCase):
    def test_office_survives_every_hostile_call(self):
        calls = hostile_calls()
        self.assertGreaterEqual(len(calls), 500)
        with Office(os.environ["SOLARITH_OXT"]) as office:
            document = office.new_spreadsheet()
            try:
                data = document.Sheets.getByIndex(0)
                data.Name = "data"
                data.getCellRangeByName("B1:B3").setDataArray((("warm",), ("cold",), ("",)))
                data.getCellRangeByName("C1").setFormula("=1/0")
                data.getCellRangeByName("E1:F3").setDataArray(((1.0, 2.0), (3.0, 4.0), (5.0, 6.0)))
                data.getCellRangeByName("I1:I%d" % MILLION).setDataArray(tuple((0.001,) for _ in range(MILLION)))
                document.Sheets.insertNewByName("calls", 1)
                sheet = document.Sheets.getByName("calls")
                cells = enter_column(document, sheet, [formula for _, formula in calls])
                self.assertTrue(office.alive(), "the office went down")
                bad = []
                errors = 0
                for (what, formula), cell in zip(calls, cells):
                    kind, value = outcome(cell)
                    if kind == "error":
                        errors += 1
                    elif kind == "number" and not math.isfinite(value):
                        bad.append("%s: %s gave %r" % (what, formula, value))
                self.assertEqual(bad, [])
                peak = peak_memory_mb(office.process.pid)
                print("\n%d hostile calls: %d errors, %d values; office peak memory %.0f MB"
                      % (len(calls), errors, len(calls) - errors, peak))
                self.assertLess(peak, PEAK_MEMORY_LIMIT_MB)
                # Still working after all that: a plain call gives its value.
                check = enter_column(document, sheet, ['=RAD_EMISSIVE(26.85)'], column=1)[0]
                self.assertAlmostEqual(outcome(check)[1], 459.300327939, places=6)
            finally:
                document.close(True)


if __name__ == "__main__":
    unittest.main(verbosity=2)
