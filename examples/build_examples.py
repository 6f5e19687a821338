#!/usr/bin/python3
"""Builds the example workbooks (flat ODF, .fods) in a throwaway office with
Solarith installed. The workbooks stay reviewable in git: the Python modules
beside this script are their source (one module per workbook, sharing
workbook.py for the layout and scenario.py for the invented inputs), the
.fods files their output.

    /usr/bin/python3 examples/build_examples.py build/solarith.oxt [workbook.fods ...]

Without names, every workbook is rebuilt. Every scenario here is invented:
the client, the site, the climate and all figures.
"""
import importlib
import os
import sys

HERE = os.path.dirname(os.path.abspath(__file__))
sys.path.insert(0, os.path.join(HERE, "..", "packaging"))
sys.path.insert(0, HERE)
from office import Office  # noqa: E402

MODULES = ["quick_check", "collector_sizing", "tank_sizing", "hourly_year", "verification"]


def workbooks():
    """{file name: module} of every workbook."""
    modules = [importlib.import_module(name) for name in MODULES]
    return {module.FILE: module for module in modules}


def main():
    if len(sys.argv) < 2:
        print(__doc__, file=sys.stderr)
        return 2
    available = workbooks()
    wanted = sys.argv[2:] or list(available)
    unknown = [name for name in wanted if name not in available]
    if unknown:
        print("unknown workbook(s): %s; known: %s" % (", ".join(unknown), ", ".join(available)), file=sys.stderr)
        return 2
    with Office(sys.argv[1]) as office:
        out = office.own_path("examples")
        for file_name in wanted:
            document = office.new_spreadsheet()
            try:
                available[file_name].build(document)
                document.calculateAll()
                path = os.path.join(out, file_name)
                office.store(document, path, "OpenDocument Spreadsheet Flat XML")
                with open(path, "rb") as src, open(os.path.join(HERE, file_name), "wb") as dst:
                    dst.write(src.read())
                print("wrote", os.path.join(HERE, file_name))
            finally:
                document.close(True)
    return 0


if __name__ == "__main__":
    sys.exit(main())
