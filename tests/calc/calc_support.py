"""What the tests through real Calc share: the catalogue as solarith-codegen
lists it, cell outcomes, and splitting Calc argument lists."""
import os
import subprocess
import sys

SOURCE = os.environ["SOLARITH_SOURCE_DIR"]
sys.path.insert(0, os.path.join(SOURCE, "packaging"))

# Calc's error codes as XCell.getError() reports them, and as cells show them.
ERROR_TEXT = {502: "Err:502", 503: "#NUM!", 504: "Err:504", 519: "#VALUE!", 523: "Err:523", 525: "#NAME?",
              532: "#DIV/0!", 32767: "#N/A"}
ERROR_CODE = {text: code for code, text in ERROR_TEXT.items()}
FORMULA_RESULT_STRING = 2  # com.sun.star.sheet.FormulaResult.STRING


def codegen(kind):
    return subprocess.run([os.environ["SOLARITH_CODEGEN"], kind], capture_output=True, text=True,
                          check=True).stdout


def rows(kind):
    return [line.split("\t") for line in codegen(kind).splitlines()]


def outcome(cell):
    """('error', code), ('number', value) or ('text', string) of a formula cell."""
    code = cell.getError()
    if code:
        return ("error", code)
    if cell.FormulaResultType2 == FORMULA_RESULT_STRING:
        return ("text", cell.getString())
    return ("number", cell.getValue())


def split_arguments(text):
    """'60; "a;b"; {1; 2}' -> ['60', '"a;b"', '{1; 2}']: top-level ';' only."""
    parts, current, depth, quoted = [], "", 0, False
    for ch in text:
        if ch == '"':
            quoted = not quoted
        elif not quoted and ch == "{":
            depth += 1
        elif not quoted and ch == "}":
            depth -= 1
        elif not quoted and depth == 0 and ch == ";":
            parts.append(current.strip())
            current = ""
            continue
        current += ch
    if current.strip() or parts:
        parts.append(current.strip())
    return parts


def enter_column(document, sheet, formulas, column=0):
    """Types the formulas into one column at once (cell-by-cell entry is slow) and recalculates."""
    cells = sheet.getCellRangeByPosition(column, 0, column, len(formulas) - 1)
    cells.setFormulaArray(tuple((f,) for f in formulas))
    document.calculateAll()
    return [sheet.getCellByPosition(column, row) for row in range(len(formulas))]
