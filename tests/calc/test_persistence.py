#!/usr/bin/python3
"""Nothing lost: a workbook using every Solarith function keeps its formulas
when opened and saved in an office without the extension, and shows the same
values again once the extension is back."""
import os
import unittest

from calc_support import enter_column, outcome, rows
from office import Office


class NothingLost(unittest.TestCase):
    def test_formulas_survive_an_office_without_the_extension(self):
        calls = rows("examples")
        stored_names = {name: "ORG.SOLARITH.FUNCTIONS." + method.upper() for name, method, *_ in rows("names")}
        office = Office(os.environ["SOLARITH_OXT"]).install().start()
        try:
            folder = office.own_path("documents")
            original = os.path.join(folder, "with-extension.ods")
            document = office.new_spreadsheet()
            sheet = document.Sheets.getByIndex(0)
            before = [outcome(c) for c in enter_column(document, sheet,
                                                       ["=%s(%s)" % (name, args) for name, args, _ in calls])]
            office.store(document, original, "calc8")
            document.close(True)

            # Without the extension: the cells cannot compute, but every formula text stays.
            office.shutdown()
            office.uninstall().start()
            document = office.load(original)
            document.calculateAll()
            sheet = document.Sheets.getByIndex(0)
            for row, (name, _, _) in enumerate(calls):
                cell = sheet.getCellByPosition(0, row)
                self.assertIn(stored_names[name], cell.getFormula().upper(), "formula text of %s lost" % name)
                self.assertEqual(outcome(cell)[0], "error", "%s computed without the extension" % name)
            resaved = os.path.join(folder, "saved-without-extension.ods")
            office.store(document, resaved, "calc8")
            document.close(True)

            # The extension back: the same values as at first.
            office.shutdown()
            office.install().start()
            document = office.load(resaved)
            document.calculateAll()
            sheet = document.Sheets.getByIndex(0)
            after = [outcome(sheet.getCellByPosition(0, row)) for row in range(len(calls))]
            document.close(True)
            self.assertEqual(before, after)
        finally:
            office.stop()


if __name__ == "__main__":
    unittest.main(verbosity=2)
