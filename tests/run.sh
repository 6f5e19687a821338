#!/usr/bin/env bash
# Every test, from a fresh Debian 12 machine: install what is needed, build,
# and run the unit tests, the interface checks and the tests in real Calc, then
# the sanitizer build with its fuzz session.
set -euo pipefail
cd "$(dirname "$0")/.."
bash packaging/setup-debian.sh
bash packaging/build.sh
ctest --test-dir build --output-on-failure
# The core again under AddressSanitizer and UndefinedBehaviorSanitizer (clang):
# its unit tests, then a short fuzz session over every catalogue function.
cmake -S . -B build-fuzz -DCMAKE_CXX_COMPILER=clang++ -DSOLARITH_ADDIN=OFF -DSOLARITH_FUZZ=ON
cmake --build build-fuzz -j"$(nproc)"
ctest --test-dir build-fuzz --output-on-failure
