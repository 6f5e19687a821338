#!/usr/bin/env bash
# Configures and builds everything (core, add-in, solarith.oxt, unit tests) in build/.
set -euo pipefail
cd "$(dirname "$0")/.."
cmake -S . -B build -DCMAKE_BUILD_TYPE=RelWithDebInfo
cmake --build build -j"$(nproc)"
