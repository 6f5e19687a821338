#!/usr/bin/python3
"""Recalculates example workbooks in a throwaway office with Solarith installed,
writes each one's PDF, prints its key results, and fails if any formula cell
shows an error.

Key results are the workbook's named ranges: each name and its value (with
the unit from the cell to its right, where there is one) is printed.
"""
import argparse
import os
import shutil
import sys

sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
from office import Office  # noqa: E402

FORMULA_RESULT_ERROR = 4  # com.sun.star.sheet.FormulaResult.ERROR


def error_cells(document):
    """[(sheet, cell address, cell text)] of every formula cell whose result is an error."""
    found = []
    for sheet in document.Sheets:
        ranges = sheet.queryFormulaCells(FORMULA_RESULT_ERROR)
        for address in ranges.getRangeAddresses():
            for row in range(address.StartRow, address.EndRow + 1):
                for column in range(address.StartColumn, address.EndColumn + 1):
                    cell = sheet.getCellByPosition(column, row)
                    found.append((sheet.Name, cell.AbsoluteName, cell.getString()))
    return found


def key_results(document):
    """[(name, shown text, unit)] of the workbook's named cells."""
    results = []
    for name in document.NamedRanges.ElementNames:
        cell_range = document.NamedRanges.getByName(name).ReferredCells
        if cell_range is None:
            continue
        cell = cell_range.getCellByPosition(0, 0)
        address = cell.CellAddress
        sheet = document.Sheets.getByIndex(address.Sheet)
        unit = sheet.getCellByPosition(address.Column + 1, address.Row).getString()
        results.append((name, cell.getString(), unit))
    return results


def run(office, workbook, out_dir):
    document = office.load(workbook)
    try:
        document.calculateAll()
        stem = os.path.splitext(os.path.basename(workbook))[0]
        pdf_in_office = os.path.join(office.own_path("pdf"), stem + ".pdf")
        office.store(document, pdf_in_office, "calc_pdf_Export")
        shutil.copyfile(pdf_in_office, os.path.join(out_dir, stem + ".pdf"))
        print("%s -> %s" % (workbook, os.path.join(out_dir, stem + ".pdf")))
        for name, shown, unit in key_results(document):
            print("  %-32s %s %s" % (name, shown, unit))
        errors = error_cells(document)
        for sheet, address, text in errors:
            print("  ERROR %s %s shows %s" % (sheet, address, text), file=sys.stderr)
        return not errors
    finally:
        document.close(True)


def main():
    parser = argparse.ArgumentParser(description=__doc__)
    parser.add_argument("--oxt", required=True)
    parser.add_argument("--out", required=True, help="folder for the PDFs")
    parser.add_argument("workbooks", nargs="+")
    args = parser.parse_args()
    os.makedirs(args.out, exist_ok=True)
    ok = True
    with Office(args.oxt) as office:
        for workbook in args.workbooks:
            ok = run(office, workbook, args.out) and ok
    if not ok:
        print("some cells show errors", file=sys.stderr)
        return 1
    return 0


if __name__ == "__main__":
    sys.exit(main())
