#!/usr/bin/env bash
# Regenerates every reference fixture from the committed scripts beside this file, using R
# (sandwich, boot, tseries) and Python (statsmodels, scipy) from Debian's packages.
# Usage: bash test/reference/generate.sh [--check]
#   --check: regenerate into a temporary folder and fail if anything differs from the committed
#            fixtures (CI runs this).
set -euo pipefail
here="$(cd "$(dirname "$0")" && pwd)"
out="$here/fixtures"
check=0
if [[ "${1:-}" == "--check" ]]; then
  check=1
  out="$(mktemp -d)"
  trap 'rm -rf "$out"' EXIT
fi
mkdir -p "$out"
shopt -s nullglob
for script in "$here"/scripts/*.R; do
  echo "R      $(basename "$script")"
  Rscript --vanilla "$script" "$out"
done
for script in "$here"/scripts/*.py; do
  echo "python $(basename "$script")"
  /usr/bin/python3 "$script" "$out"
done
if [[ $check == 1 ]]; then
  # Numbers are compared to a relative 1e-10: last-place differences between processors are
  # not drift (see compareFixtures.py).
  if ! /usr/bin/python3 "$here/compareFixtures.py" "$here/fixtures" "$out"; then
    echo "Reference fixtures drifted from their generator scripts (see diff above)." >&2
    exit 1
  fi
  echo "Reference fixtures match their generator scripts."
fi
