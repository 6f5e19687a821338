"""Verification: one row per function and reference case, for a client's reviewer.

Each row holds the formula as typed, its live result in this workbook, the
reference value, its tolerance, the difference and a pass/fail cell, and the
source of the reference value. The rows are produced from the same data the
test suite checks against:
  tests/calc/reference_cases.tsv   formulas typed into Calc cells, each with its
                                   outside source (handbook tables, standards,
                                   worked examples, refusals of impossible input);
  tests/reference/*.txt            tables generated from reference libraries
                                   (python3-iapws, SciPy, astropy) by the
                                   committed tests/reference/gen_*.py scripts;
                                   a few evenly spaced rows of each, with the
                                   tolerance the unit tests hold them to.
"""
import math
import os
import re

from workbook import FAIL_COLOUR, INPUT_COLOUR, RESULT_COLOUR, Sheet, cell_range

FILE = "verification.fods"
ROOT = os.path.join(os.path.dirname(os.path.abspath(__file__)), "..")
ROWS_PER_TABLE = 5

# Columns of the check table.
FUNCTION, FORMULA, RESULT, REFERENCE, TOLERANCE, KIND, DIFFERENCE, CHECK, SOURCE = range(9)
WIDTHS = (5400, 7800, 3300, 3300, 1900, 2000, 2300, 1500, 9000)


def _number(x):
    """A number as Calc reads it in a formula, exactly (shortest round-trip form)."""
    if x == int(x) and abs(x) < 1e15:
        return str(int(x))
    return repr(float(x)).replace("e", "E")


def _call(function, *arguments):
    parts = [a if isinstance(a, str) else _number(a) for a in arguments]
    return "%s(%s)" % (function, "; ".join(parts))


def _rows(file_name):
    with open(os.path.join(ROOT, "tests", "reference", file_name), encoding="utf-8") as f:
        lines = [line.split() for line in f if line.strip() and not line.startswith("#")]
    return [[float(x) for x in line] for line in lines]


def _spread(rows, count=ROWS_PER_TABLE):
    """`count` rows evenly spread over the table, first and last included."""
    if len(rows) <= count:
        return rows
    return [rows[round(i * (len(rows) - 1) / (count - 1))] for i in range(count)]


def _table_cases():
    """[(function, call, expected, tolerance, kind, source)] sampled from tests/reference/*.txt."""
    iapws = "python3-iapws: "
    found = []

    def add(function, file_name, make, tolerance, kind, source, keep=lambda r: True):
        for row in _spread([r for r in _rows(file_name) if keep(r)]):
            arguments, expected = make(row)
            row_tolerance = tolerance(row) if callable(tolerance) else tolerance
            found.append((function, _call(function, *arguments), expected, row_tolerance, kind,
                          "%s (tests/reference/%s)" % (source, file_name)))

    water = iapws + "IAPWS-IF97 region 1 (IAPWS R7-97(2012))"
    add("WATER_DENSITY", "water_liquid.txt", lambda r: ((r[0], r[1]), r[2]), 1e-12, "relative", water)
    add("WATER_CP", "water_liquid.txt", lambda r: ((r[0], r[1]), r[3]), 1e-12, "relative", water)
    add("WATER_VISCOSITY", "water_liquid.txt", lambda r: ((r[0], r[1]), r[5]), 1e-12, "relative",
        iapws + "IAPWS R12-08 viscosity at the IF97 density")
    add("WATER_CONDUCTIVITY", "water_liquid.txt", lambda r: ((r[0], r[1]), r[6]), 1e-12, "relative",
        iapws + "IAPWS R15-11 conductivity without the critical enhancement, at the IF97 density")
    add("WATER_SAT_PRESSURE", "water_saturation.txt", lambda r: ((r[0],), r[1]), 1e-13, "relative",
        iapws + "IAPWS-IF97 region 4, eq. 30")
    add("WATER_LATENT_HEAT", "water_saturation.txt", lambda r: ((r[0],), r[2]), 1e-12, "relative",
        iapws + "IAPWS-IF97 regions 1 and 2 on the saturation line")
    add("WATER_SAT_TEMP", "water_saturation_temperature.txt", lambda r: ((r[0],), r[1]), 1e-10, "absolute",
        iapws + "IAPWS-IF97 region 4, eq. 31")
    air = iapws + "Lemmon et al. (2000) ideal-gas air, Lemmon & Jacobsen (2004) transport"
    add("AIR_DENSITY", "air_properties.txt", lambda r: ((r[0],), r[1]), 1e-12, "relative",
        "ideal gas with CODATA constants (scipy.constants), M = 28.9586 g/mol")
    add("AIR_CP", "air_properties.txt", lambda r: ((r[0],), r[2]), 1e-12, "relative", air)
    add("AIR_VISCOSITY", "air_properties.txt", lambda r: ((r[0],), r[3]), 1e-12, "relative", air)
    add("AIR_CONDUCTIVITY", "air_properties.txt", lambda r: ((r[0],), r[4]), 1e-12, "relative", air)
    add("STORE_WATER", "store_water.txt", lambda r: ((r[0], r[1], r[2]), r[3]), 1e-11, "relative",
        iapws + "IF97 region 1 enthalpy difference times the mass at T1", keep=lambda r: r[3] != 0)
    add("STORE_COOLDOWN", "store_cooldown.txt", lambda r: ((r[0], r[1], r[2], r[3], r[4]), r[5]), 1e-8,
        "absolute", "SciPy DOP853 integration of the mixed-tank balance with IF97 cp (python3-iapws)")
    add("LOSS_PIPE", "loss_pipe.txt", lambda r: ((r[0], r[1], r[2], r[3], r[4], r[5], r[6]), r[8]), 1e-2,
        "relative", "SciPy root of the same balance with python3-iapws real-gas air (Lemmon et al.)")
    add("RAD_VF_PARALLEL_RECT", "radiation_vf_parallel.txt", lambda r: ((r[0], r[1], r[2]), r[3]), 1e-11,
        "relative", "SciPy dblquad of the defining double integral")
    add("RAD_VF_PERPENDICULAR_RECT", "radiation_vf_perpendicular.txt", lambda r: ((r[0], r[1], r[2]), r[3]),
        1e-11, "relative", "SciPy dblquad of the defining double integral")
    add("RAD_VF_COAXIAL_DISKS", "radiation_vf_disks.txt", lambda r: ((r[0], r[1], r[2]), r[3]), 1e-12,
        "relative", "SciPy quad of the point-to-disk factor over disk 1")
    add("COND_SEMI_INF_TEMP", "semi_infinite_temperature.txt",
        lambda r: ((r[0], r[1], r[2], r[3], r[4]), r[5]), lambda r: 1e-14 * abs(r[0] - r[1]), "absolute",
        "Incropera et al., 6th ed., eq. 5.57 with scipy.special.erf")
    add("HX_EFFECTIVENESS", "hx_closed_forms.txt", lambda r: ((r[0], r[1], '"counterflow"'), r[2]), 1e-12,
        "relative", "linear boundary-value problem of the exchanger solved with scipy.linalg.expm")
    add("HX_EFFECTIVENESS", "hx_crossflow_series.txt", lambda r: ((r[0], r[1], '"crossflow"'), r[2]), 1e-13,
        "relative", "Mason (1954) series in decimal arithmetic (Python decimal)")
    add("COLL_TAU_ALPHA", "collector_tau_alpha.txt", lambda r: ((r[0], r[1], r[2], r[3], r[4]), r[5]), 1e-13,
        "relative", "Duffie & Beckman ch. 5 Fresnel and absorption, written out independently in Python")
    add("SUN_DAILY_EXTRATERRESTRIAL", "sun_daily_h0.txt", lambda r: ((r[0], r[1]), r[2]), 0.8e6, "absolute",
        "astropy 5.2 sun, 2021, integrated over the day (tolerance: Spencer's declination, see FN_METHOD)")
    add("SUN_ZENITH", "sun_position.txt", lambda r: ((r[0], r[1], r[2], r[3]), r[4]), 0.01, "absolute",
        "astropy 5.2 apparent sun position, clock read as UTC")
    add("SUN_AZIMUTH", "sun_position.txt", lambda r: ((r[0], r[1], r[2], r[3]), r[5]),
        lambda r: 0.01 / math.sin(math.radians(r[4])), "absolute",
        "astropy 5.2 apparent sun position, clock read as UTC (tolerance 0.01° / sin(zenith))",
        keep=lambda r: 10 < r[4] < 170)
    add("WATER_PRANDTL", "water_liquid.txt", lambda r: ((r[0], r[1]), r[5] * r[3] / r[6]), 1e-12, "relative",
        water + "; μ·cp/λ of the IAPWS 2008 and 2011 formulations")
    add("STORE_TANK_VOLUME", "store_water.txt", lambda r: ((-r[3], r[1], r[2]), r[0]), 1e-11, "relative",
        iapws + "the volume whose cooling from T_hot to T_cold releases the energy (IF97 region 1)",
        keep=lambda r: r[1] > r[2])
    c2_rounding = 4e-10  # CODATA's printed c1, c2 against h·c/k (tests/unit/test_radiation.cpp)
    add("RAD_SPECTRAL", "radiation_planck.txt", lambda r: ((r[0], r[1]), r[2]),
        lambda r: 1e-10 + c2_rounding * (1 + 14387.768775039337 / (r[0] * (r[1] + 273.15))), "relative",
        "astropy 5.2 BlackBody (CODATA 2018) times π; tolerance 1e-10 + 4e-10·(1 + c2/(λT)) for the printed "
        "digits of c2")
    add("COND_ANNULAR_FIN_EFF", "annular_fin_efficiency.txt", lambda r: ((r[0], r[1], r[2], r[3], r[4]), r[5]),
        1e-9, "relative", "Gardner (1945) as in Incropera et al., 6th ed., Table 3.5, with modified Bessel "
        "functions in 120-digit decimal arithmetic")
    add("DIM_RAYLEIGH", "dim_rayleigh.txt",
        lambda r: ((r[1], r[2], r[3], '"air"' if r[0] == 1 else '"water"'), r[4]),
        lambda r: 1e-2 if r[0] == 1 else 1e-4, "relative",
        iapws + "IF97 water, Lemmon et al. real-gas air (Solarith's air is ideal: tolerance 1 %)")
    add("CONV_PIPE_COEFF", "conv_pipe_coeff.txt",
        lambda r: (('"air"' if r[0] == 1 else '"water"', r[1], r[2], r[3]) + ((r[4],) if r[4] > 0 else ()), r[7]),
        lambda r: 1e-2 if r[0] == 1 else 1e-5, "relative",
        iapws + "properties with the pipe correlations written out independently in Python (air: 1 %)")
    add("SUN_DECLINATION", "sun_daily.txt", lambda r: ((r[1],), r[2]), 0.6, "absolute",
        "astropy 5.2 apparent declination at 12:00 UT1, 2018–2021 (tolerance: Spencer's series, see FN_METHOD)")
    add("SUN_EQ_OF_TIME", "sun_daily.txt", lambda r: ((r[1],), r[3]), 1.0, "absolute",
        "astropy 5.2 apparent hour angle of the sun at 12:00 UT1, in minutes (tolerance: Spencer's series)")

    def incidence(r, tilt=35, azimuth=180):
        z, a = math.radians(r[4]), math.radians(r[5])
        c = (math.cos(z) * math.cos(math.radians(tilt))
             + math.sin(z) * math.sin(math.radians(tilt)) * math.cos(a - math.radians(azimuth)))
        return (r[0], r[1], r[2], r[3], tilt, azimuth), math.degrees(math.acos(max(-1.0, min(1.0, c))))
    add("SUN_INCIDENCE", "sun_position.txt", incidence, 0.01, "absolute",
        "angle between astropy 5.2's sun direction (clock as UTC) and the normal of a plane tilted 35° facing "
        "south")
    return found


def _suite_cases():
    """[(function, call, expected, tolerance, kind, source)] from tests/calc/reference_cases.tsv."""
    found = []
    with open(os.path.join(ROOT, "tests", "calc", "reference_cases.tsv"), encoding="utf-8") as f:
        for line in f:
            if not line.strip() or line.startswith("#"):
                continue
            formula, expected, tolerance, source = line.rstrip("\n").split("\t")
            call = formula[1:]
            function = re.search(r"([A-Z][A-Z0-9_]*)\(", call).group(1)  # the first function the formula calls
            if expected.startswith('"'):
                found.append((function, call, expected[1:-1], 0, "same text", source))
            elif expected == "#VALUE!":
                found.append((function, call, "Err:519", 0, "same error", source + " (#VALUE! is Err:519)"))
            elif expected.startswith("Err:"):
                found.append((function, call, expected, 0, "same error", source))
            else:
                found.append((function, call, float(expected), float(tolerance), "relative", source))
    return found


# The order of the families in the function reference (docs/functions.md).
FAMILIES = ["RAD_", "COND_", "CONV_", "DIM_", "NU_", "WATER_", "AIR_", "GLYCOL_", "STORE_", "LOSS_", "SUN_", "COLL_",
            "HX_", "FCHART_", "SIM_", "FN_"]


def _family(function):
    return next(i for i, prefix in enumerate(FAMILIES) if function.startswith(prefix))


def cases():
    """Every row of the workbook: the suite's Calc cases and the sampled reference tables, grouped by family,
    the functions of a family in alphabetical order, each function's rows in the order of the test data."""
    return sorted(_suite_cases() + _table_cases(), key=lambda case: (_family(case[0]), case[0]))


def _check_row(s, row, case):
    function, call, expected, tolerance, kind, source = case
    cell = lambda column: s.sheet.getCellByPosition(column, row)  # noqa: E731
    address = lambda column: "%s%d" % ("ABCDEFGHI"[column], row + 1)  # noqa: E731
    cell(FUNCTION).setString(function)
    cell(FORMULA).setString("=" + call)
    # The call itself, or the code of the error it gives (so that an expected refusal is a value, not an error cell).
    cell(RESULT).setFormula('=IFERROR(%s;"Err:"&ERRORTYPE(%s))' % (call, call))
    if isinstance(expected, str):
        cell(REFERENCE).setString(expected)
        cell(TOLERANCE).setString("–")
        cell(DIFFERENCE).setFormula('=IF(EXACT(%s;%s);"none";"differs")' % (address(RESULT), address(REFERENCE)))
        cell(CHECK).setFormula('=IF(EXACT(%s;%s);"pass";"FAIL")' % (address(RESULT), address(REFERENCE)))
    else:
        cell(REFERENCE).setValue(expected)
        cell(TOLERANCE).setValue(tolerance)
        got, want = address(RESULT), address(REFERENCE)
        if kind == "relative" and expected != 0:
            difference = "ABS(%s-%s)/ABS(%s)" % (got, want, want)
        else:
            kind = "absolute"
            difference = "ABS(%s-%s)" % (got, want)
        cell(DIFFERENCE).setFormula('=IF(ISNUMBER(%s);%s;"not a number")' % (got, difference))
        cell(CHECK).setFormula('=IF(AND(ISNUMBER(%s);%s<=%s);"pass";"FAIL")' % (
            address(DIFFERENCE), address(DIFFERENCE), address(TOLERANCE)))
    cell(KIND).setString(kind)
    cell(SOURCE).setString(source)


def _formats(s, first, last):
    column = lambda index: s.sheet.getCellRangeByPosition(index, first, index, last)  # noqa: E731
    column(RESULT).NumberFormat = s.number_format("0.000000000E+00")
    column(REFERENCE).NumberFormat = s.number_format("0.000000000E+00")
    column(TOLERANCE).NumberFormat = s.number_format("0.0E+00")
    column(DIFFERENCE).NumberFormat = s.number_format("0.0E+00")
    for index in (FORMULA, RESULT, REFERENCE, SOURCE):
        column(index).IsTextWrapped = True
    s.sheet.getCellRangeByPosition(FUNCTION, first, FORMULA, last).CellBackColor = INPUT_COLOUR
    s.sheet.getCellRangeByPosition(REFERENCE, first, KIND, last).CellBackColor = INPUT_COLOUR
    s.sheet.getCellRangeByPosition(RESULT, first, RESULT, last).CellBackColor = RESULT_COLOUR
    s.sheet.getCellRangeByPosition(DIFFERENCE, first, CHECK, last).CellBackColor = RESULT_COLOUR
    s.sheet.getCellRangeByPosition(SOURCE, first, SOURCE, last).CellBackColor = 0xF2F2F2
    _mark_failures(s, column(CHECK))


def _mark_failures(s, cells):
    """Cells showing FAIL turn red (a conditional format: no macro)."""
    from com.sun.star.beans import PropertyValue
    from com.sun.star.sheet.ConditionOperator import EQUAL
    styles = s.document.StyleFamilies.getByName("CellStyles")
    if not styles.hasByName("Check failed"):
        style = s.document.createInstance("com.sun.star.style.CellStyle")
        styles.insertByName("Check failed", style)
        style.CellBackColor = FAIL_COLOUR
        style.CharWeight = 150
    conditions = cells.ConditionalFormat
    entry = []
    for name, value in (("Operator", EQUAL), ("Formula1", '"FAIL"'), ("StyleName", "Check failed")):
        p = PropertyValue()
        p.Name, p.Value = name, value
        entry.append(p)
    conditions.addNew(tuple(entry))
    cells.ConditionalFormat = conditions


def build(document):
    sheet = document.Sheets.getByIndex(0)
    sheet.Name = "Verification"
    s = Sheet(document, sheet, widths=WIDTHS)
    page = document.StyleFamilies.getByName("PageStyles").getByName(sheet.PageStyle)
    width, height = page.Width, page.Height
    page.IsLandscape, page.Width, page.Height = True, max(width, height), min(width, height)
    page.PrintGrid = True
    page.CenterHorizontally = True
    s.title("Solarith verification – each function against its published reference",
            "For a reviewer of a calculation package: every row below evaluates a Solarith function in this "
            "workbook and compares it with a value from outside the project. The same cases are checked by the "
            "test suite. 'relative' rows pass when |result − reference| ≤ tolerance·|reference|, 'absolute' rows "
            "when |result − reference| ≤ tolerance, in the unit of the result; 'same error' rows check that "
            "impossible or out-of-range input is refused with the stated Calc error instead of a number.")

    rows = cases()
    header_row = s.row + 5
    first, last = header_row + 1, header_row + len(rows)
    checks = "%s%d:%s%d" % ("H", first + 1, "H", last + 1)
    s.heading("Summary")
    s.result("verification_checks", "Reference checks", "ROWS(%s)" % checks, "rows",
             number_format="0", named=True)
    s.result("verification_passed", "Passing", 'COUNTIF(%s;"pass")' % checks, "rows",
             number_format="0", named=True)
    s.result("verification_failures", "Failing (must be 0)", 'COUNTIF(%s;"FAIL")' % checks, "rows",
             number_format="0", named=True)
    s.row += 1
    assert s.row == header_row
    headers = ["Function", "Formula", "Result here", "Reference value", "Tolerance", "Tolerance is",
               "Difference", "Check", "Source of the reference value"]
    for column, header in enumerate(headers):
        cell = sheet.getCellByPosition(column, header_row)
        cell.setString(header)
        cell.CharWeight = 150
        cell.CellBackColor = 0xD9E1F2
    for offset, case in enumerate(rows):
        _check_row(s, first + offset, case)
    _formats(s, first, last)
    document.calculateAll()
    sheet.setPrintTitleRows(True)  # the header row repeats on every printed page
    sheet.setTitleRows(cell_range(sheet, 0, header_row, 0, header_row))
    s.row = last + 1
    s.notes([
        "Sources marked 'from memory' are values recalled from the handbooks named; a reviewer with the books "
        "should confirm them. Library references were generated by the scripts in tests/reference/ of the "
        "Solarith source, with the library versions named in each data file's header.",
        "A passing check shows that the function computes its published method correctly at that point; it does "
        "not make the method fit for a particular design. See FN_METHOD for each method's validity range.",
    ])
