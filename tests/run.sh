#!/usr/bin/env bash
# Every test, from a fresh Debian 12 machine: install what is needed, build,
# and run the unit tests, the interface checks and the tests in real Calc.
set -euo pipefail
cd "$(dirname "$0")/.."
bash packaging/setup-debian.sh
bash packaging/build.sh
ctest --test-dir build --output-on-failure
