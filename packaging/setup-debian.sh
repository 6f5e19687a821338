#!/usr/bin/env bash
# Installs everything Solarith needs to build, package, run and test on
# Debian 12, from Debian's own packages. Skips what is already installed.
# Needs root (or sudo).
set -euo pipefail

packages=(g++ make cmake libboost-dev doctest-dev libreoffice-dev python3-uno util-linux
          fonts-liberation2 poppler-utils binutils
          clang libclang-rt-14-dev)  # clang: the sanitizer and fuzzing build of the tests
# A headless Calc. Keep an installed desktop LibreOffice rather than replace it.
if dpkg-query -W -f='${Status}' libreoffice-calc 2>/dev/null | grep -q 'install ok installed'; then
  packages+=(libreoffice-calc)
else
  packages+=(libreoffice-calc-nogui)
fi

missing=()
for p in "${packages[@]}"; do
  dpkg-query -W -f='${Status}' "$p" 2>/dev/null | grep -q 'install ok installed' || missing+=("$p")
done
[ ${#missing[@]} -eq 0 ] && exit 0

as_root=()
if [ "$(id -u)" -ne 0 ]; then
  command -v sudo >/dev/null || { echo "setup-debian.sh: run as root or install sudo" >&2; exit 1; }
  as_root=(sudo)
fi
echo "Installing: ${missing[*]}"
"${as_root[@]}" apt-get update -q
"${as_root[@]}" env DEBIAN_FRONTEND=noninteractive apt-get install -y -q --no-install-recommends "${missing[@]}"
