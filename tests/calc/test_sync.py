#!/usr/bin/python3
"""The places a function appears agree: the catalogue (core/catalog), the
checked-in IDL, the compiled type library, the function reference and the
list of released names. Saved documents store the service name and method
names, so a released name may never disappear or change."""
import os
import re
import subprocess
import unittest

SOURCE = os.environ["SOLARITH_SOURCE_DIR"]
GENERATED = os.environ["SOLARITH_GENERATED"]
HINT = "the catalogue changed: run 'cmake --build build --target regenerate' and commit the result"


def codegen(kind):
    return subprocess.run([os.environ["SOLARITH_CODEGEN"], kind], capture_output=True, text=True,
                          check=True).stdout


def read(path):
    with open(path, encoding="utf-8") as f:
        return f.read()


def catalogue():
    """{display name: (programmatic name, argument count)}"""
    rows = [line.split("\t") for line in codegen("names").splitlines()]
    return {row[0]: (row[1], int(row[2])) for row in rows}


def type_library_methods():
    """{method name: parameter count} of org.solarith.XSolarith in the built .rdb."""
    text = subprocess.run([os.environ["UNOIDL_READ"], os.environ["SOLARITH_RDB"]], capture_output=True,
                          text=True, check=True).stdout
    methods = {}
    for name, params in re.findall(r"^\s*(?:double|string|sequence< sequence< any > >) (\w+)\((.*?)\)", text, re.M):
        methods[name] = params.count("[in]")
    return methods


def released_names():
    rows = []
    for line in read(os.path.join(SOURCE, "tests", "released_names.txt")).splitlines():
        line = line.split("#")[0].strip()
        if line:
            rows.append(tuple(line.split()))
    return rows


class InterfaceInSync(unittest.TestCase):
    def test_checked_in_idl_is_the_one_the_catalogue_generates(self):
        self.assertEqual(read(os.path.join(SOURCE, "idl", "XSolarith.idl")), codegen("idl"), HINT)

    def test_function_reference_is_the_one_the_catalogue_generates(self):
        self.assertEqual(read(os.path.join(SOURCE, "docs", "functions.md")), codegen("docs"), HINT)

    def test_type_library_holds_every_catalogue_function(self):
        methods = type_library_methods()
        functions = catalogue()
        self.assertEqual(sorted(methods), sorted(m for m, _ in functions.values()), HINT)
        for name, (method, count) in functions.items():
            self.assertEqual(methods[method], count, "%s: argument count differs from the IDL" % name)

    def test_released_names_are_kept(self):
        functions = catalogue()
        methods = type_library_methods()
        released = released_names()
        self.assertIn(("service", "org.solarith.Functions"), released)
        addin_source = read(os.path.join(SOURCE, "addin", "addin.cpp"))
        self.assertIn('service_name[] = "org.solarith.Functions"', addin_source,
                      "the service name is stored in every saved document; never change it")
        for name, method in released:
            if name == "service":
                continue
            self.assertIn(name, functions, "released function %s has gone from the catalogue" % name)
            self.assertEqual(functions[name][0], method, "released function %s changed its stored name" % name)
            self.assertIn(method, methods, "released method %s has gone from the type library" % method)
        listed = {name for name, _ in released}
        for name in functions:
            self.assertIn(name, listed, "new function %s: add '%s %s' to tests/released_names.txt once its "
                          "name is final" % (name, name, functions[name][0]))


class VerificationWorkbookInSync(unittest.TestCase):
    def test_verification_workbook_holds_every_reference_case(self):
        """examples/verification.fods is generated from the test data: a case added to the tests must reach
        it (rerun examples/build_examples.py ... verification.fods)."""
        import html
        import sys
        sys.path.insert(0, os.path.join(SOURCE, "examples"))
        import verification
        cases = verification.cases()
        workbook = read(os.path.join(SOURCE, "examples", verification.FILE))
        shown = re.findall(r"<text:p>(=[^<]*)</text:p>", workbook)
        formulas = [html.unescape(text) for text in shown]
        self.assertEqual(len(formulas), len(cases), "rerun: /usr/bin/python3 examples/build_examples.py "
                         "build/solarith.oxt verification.fods")
        for case, formula in zip(cases, formulas):
            self.assertEqual("=" + case[1], formula)


if __name__ == "__main__":
    unittest.main(verbosity=2)
