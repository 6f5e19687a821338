#!/usr/bin/python3
"""Recalculates example workbooks in a throwaway office with Solarith installed,
writes each one's PDF, prints its key results, and fails if any formula cell
shows an error.

Key results are the workbook's named ranges: each name and its value (with
the unit from the cell to its right, where there is one) is printed. With
--expect, the key results are also compared with stored expected values, and
every chart's title must appear in the PDF (the chart was drawn).
"""
import argparse
import math
import os
import shutil
import subprocess
import sys
import time

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


def chart_titles(document):
    """[(sheet, title)] of every chart in the workbook."""
    titles = []
    for sheet in document.Sheets:
        for name in sheet.Charts.ElementNames:
            chart = sheet.Charts.getByName(name).EmbeddedObject
            titles.append((sheet.Name, chart.Title.String if chart.HasMainTitle else ""))
    return titles


def read_expected(path):
    """{workbook file: [(name, expected value, relative tolerance, note)]} from a tab-separated file; the
    name "charts" stands for the number of charts in the workbook."""
    expected = {}
    with open(path, encoding="utf-8") as f:
        for line in f:
            if not line.strip() or line.startswith("#"):
                continue
            workbook, name, value, tolerance, note = line.rstrip("\n").split("\t")
            expected.setdefault(workbook, []).append((name, float(value), float(tolerance), note))
    return expected


def regressions(document, expected):
    """Messages for each expected key result that is missing or off by more than its tolerance."""
    problems = []
    for name, want, tolerance, note in expected:
        if name == "charts":  # not a named cell: the number of charts in the workbook
            if len(chart_titles(document)) != want:
                problems.append("%d charts, expected %d" % (len(chart_titles(document)), want))
            continue
        if not document.NamedRanges.hasByName(name):
            problems.append("%s: no such named result" % name)
            continue
        cell = document.NamedRanges.getByName(name).ReferredCells.getCellByPosition(0, 0)
        got = cell.getValue()
        if cell.getError() or not math.isclose(got, want, rel_tol=tolerance, abs_tol=tolerance if want == 0 else 0):
            problems.append("%s = %r, expected %r within %g (%s)" % (name, got, want, tolerance, note))
    return problems


def missing_charts(document, pdf):
    """Messages for charts whose title does not show in the PDF's text (or that have no title)."""
    text = " ".join(subprocess.run(["pdftotext", pdf, "-"], capture_output=True, text=True, check=True).stdout.split())
    return ["chart '%s' on sheet %s is not in the PDF" % (title, sheet)
            for sheet, title in chart_titles(document) if not title or " ".join(title.split()) not in text]


def run(office, workbook, out_dir, expected=None, full=False):
    document = office.load(workbook)
    try:
        started = time.monotonic()
        document.calculateAll()
        seconds = time.monotonic() - started
        stem = os.path.splitext(os.path.basename(workbook))[0]
        pdf_in_office = os.path.join(office.own_path("pdf"), stem + ".pdf")
        office.store(document, pdf_in_office, "calc_pdf_Export")
        pdf = os.path.join(out_dir, stem + ".pdf")
        shutil.copyfile(pdf_in_office, pdf)
        print("%s -> %s (recalculated in %.2f s)" % (workbook, pdf, seconds))
        print("  %-32s %d" % ("charts", len(chart_titles(document))))
        for name, shown, unit in key_results(document):
            print("  %-32s %s %s" % (name, shown, unit))
            if full:  # the unrounded value, as example_results.tsv stores it
                cell = document.NamedRanges.getByName(name).ReferredCells.getCellByPosition(0, 0)
                print("\t".join([os.path.basename(workbook), name, repr(cell.getValue())]))
        problems = ["%s %s shows %s" % error for error in error_cells(document)]
        if expected is not None:
            problems += regressions(document, expected.get(os.path.basename(workbook), []))
            problems += missing_charts(document, pdf)
        for problem in problems:
            print("  PROBLEM %s" % problem, file=sys.stderr)
        return not problems
    finally:
        document.close(True)


def main():
    parser = argparse.ArgumentParser(description=__doc__)
    parser.add_argument("--oxt", required=True)
    parser.add_argument("--out", required=True, help="folder for the PDFs")
    parser.add_argument("--expect", help="tab-separated expected key results: workbook, name, value, "
                        "relative tolerance, note; also checks that every chart is in the PDF")
    parser.add_argument("--full", action="store_true", help="also print each key result unrounded, tab-separated")
    parser.add_argument("workbooks", nargs="+")
    args = parser.parse_args()
    os.makedirs(args.out, exist_ok=True)
    expected = read_expected(args.expect) if args.expect else None
    if expected is not None:
        unknown = set(expected) - {os.path.basename(w) for w in args.workbooks}
        if unknown:
            print("expected results for workbooks not given: %s" % ", ".join(sorted(unknown)), file=sys.stderr)
            return 1
    ok = True
    with Office(args.oxt) as office:
        for workbook in args.workbooks:
            ok = run(office, workbook, args.out, expected, args.full) and ok
    if not ok:
        print("some workbooks have problems (see above)", file=sys.stderr)
        return 1
    return 0


if __name__ == "__main__":
    sys.exit(main())
