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

sys.path.insert(0, os.path.join(os.environ["SOLARITH_SOURCE_DIR"], "packaging"))
from office import Office  # noqa: E402

CELLS = 100000
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
        sheet.getCellRangeByPosition(1, 0, 1, CELLS - 1).setFormulaArray(
            tuple((formula.format(r=r + 1),) for r in range(CELLS)))
        best = float("inf")
        for _ in range(ROUNDS):
            start = time.perf_counter()
            document.calculateAll()
            best = min(best, time.perf_counter() - start)
        errors = sheet.getCellByPosition(1, 0).getError()
        return best, errors
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
    if "SIM_YEAR" not in available:
        print("SIM_YEAR: not in the catalogue yet")


if __name__ == "__main__":
    main()
