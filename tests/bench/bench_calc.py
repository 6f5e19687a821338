#!/usr/bin/python3
"""Recalculation speed in real Calc: 100 000 cells of one formula each, timed
over a hard recalculation (document.calculateAll), best of three. Each add-in
function is reported as a ratio to a trivial add-in call (COND_R_WALL), which
measures Calc's own dispatch of an add-in call; the built-in =A1*2 shows what a
formula costs without any add-in. Prints figures; asserts nothing.

    /usr/bin/python3 tests/bench/bench_calc.py build/solarith.oxt
(with SOLARITH_SOURCE_DIR and SOLARITH_CODEGEN set; `cmake --build build --target benchmark` does it)
"""
import os
import subprocess
import sys
import time

import uno

sys.path.insert(0, os.path.join(os.environ["SOLARITH_SOURCE_DIR"], "packaging"))
from office import Office  # noqa: E402

CELLS = 100000
FILL_TO_BOTTOM = uno.Enum("com.sun.star.sheet.FillDirection", "TO_BOTTOM")
ROUNDS = 3
CASES = [  # (label, formula for row r (1-based), function it needs or None)
    ("COND_R_WALL (trivial add-in call)", "=COND_R_WALL(A{r};1;1)", "COND_R_WALL"),
    ("RAD_EMISSIVE", "=RAD_EMISSIVE(A{r};0.9)", "RAD_EMISSIVE"),
    ("WATER_DENSITY", "=WATER_DENSITY(A{r})", "WATER_DENSITY"),
    ("CONV_PIPE_COEFF", '=CONV_PIPE_COEFF("water";A{r};0.1;0.02)', "CONV_PIPE_COEFF"),
    ("built-in =A1*2", "=A{r}*2", None),
]


def catalogue_names():
    out = subprocess.run([os.environ["SOLARITH_CODEGEN"], "names"], capture_output=True, text=True,
                         check=True).stdout
    return {line.split("\t")[0] for line in out.splitlines()}


def time_case(office, formula):
    document = office.new_spreadsheet()
    try:
        sheet = document.Sheets.getByIndex(0)
        sheet.getCellRangeByPosition(0, 0, 0, CELLS - 1).setDataArray(
            tuple((20.0 + r % 60,) for r in range(CELLS)))
        # One formula filled down: entering 100 000 add-in formulas through
        # setFormulaArray takes minutes (it grows with the square of the count).
        sheet.getCellByPosition(1, 0).setFormula(formula.format(r=1))
        sheet.getCellRangeByPosition(1, 0, 1, CELLS - 1).fillAuto(FILL_TO_BOTTOM, 1)
        best = float("inf")
        for _ in range(ROUNDS):
            start = time.perf_counter()
            document.calculateAll()
            best = min(best, time.perf_counter() - start)
        errors = sheet.getCellByPosition(1, 0).getError()
        return best, errors
    finally:
        document.close(True)


def time_sim_year(office):
    """Best of ROUNDS hard recalculations of one monthly SIM_YEAR array formula, in seconds."""
    sys.path.insert(0, os.path.join(os.environ["SOLARITH_SOURCE_DIR"], "tests", "calc"))
    import test_sim_year as sim  # the invented year and system of the SIM_YEAR Calc test
    weather, load = sim.invented_year()
    document = office.new_spreadsheet()
    try:
        data = document.Sheets.getByIndex(0)
        data.Name = "data"
        data.getCellRangeByName("A1:C8760").setDataArray(tuple(tuple(r) for r in weather))
        data.getCellRangeByName("D1:E8760").setDataArray(tuple(tuple(r) for r in load))
        data.getCellRangeByName("G1:L1").setDataArray((sim.COLLECTOR,))
        data.getCellRangeByName("G2:L2").setDataArray((sim.TANK,))
        data.getCellRangeByName("N1:U13").setArrayFormula("=SIM_YEAR(%s)" % sim.RANGES)
        best = float("inf")
        for _ in range(ROUNDS):
            start = time.perf_counter()
            document.calculateAll()
            best = min(best, time.perf_counter() - start)
        return best
    finally:
        document.close(True)


def main():
    available = catalogue_names()
    print("Recalculation of %d cells, best of %d (CPU: %s)" % (CELLS, ROUNDS, os.uname().machine))
    print("%-36s %10s %12s %8s" % ("formula", "seconds", "µs per cell", "ratio"))
    floor = None
    with Office(sys.argv[1]) as office:
        for label, formula, needs in CASES:
            if needs and needs not in available:
                print("%-36s %s" % (label, "not in the catalogue yet"))
                continue
            seconds, error = time_case(office, formula)
            per_cell = seconds / CELLS * 1e6
            if floor is None:
                floor = per_cell
            note = "" if not error else "  (cells show error %d!)" % error
            print("%-36s %10.3f %12.2f %8.2f%s" % (label, seconds, per_cell, per_cell / floor, note))
        if "SIM_YEAR" in available:
            print("%-36s %10.1f ms per recalculation (13 x 8 array formula, invented year, 10 nodes)"
                  % ("SIM_YEAR", time_sim_year(office) * 1e3))


if __name__ == "__main__":
    main()
