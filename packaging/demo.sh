#!/usr/bin/env bash
# The main job, from a fresh Debian 12 machine: install what is needed, build,
# package solarith.oxt, install it into a throwaway LibreOffice profile,
# recalculate every example workbook headless and write its PDF to
# build/examples/. Fails if any cell shows an error.
set -euo pipefail
cd "$(dirname "$0")/.."
bash packaging/setup-debian.sh
bash packaging/build.sh
/usr/bin/python3 packaging/run_examples.py --oxt build/solarith.oxt --out build/examples examples/*.fods
