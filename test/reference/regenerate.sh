#!/usr/bin/env bash
# Rebuild Ebb's reference fixtures in test/reference/fixtures/.
# R first (it also exports the series data), then Python (reads that data).
# Needs: Rscript (base R; the seasonality fixture also R's forecast package, Debian r-cran-forecast) and a python3 with statsmodels; on Debian:
#   apt-get install r-base-core python3-statsmodels
# Override the programs with RSCRIPT=... PYTHON=... if they live elsewhere.
set -euo pipefail

here="$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)"
root="$(cd "$here/../.." && pwd)"
RSCRIPT="${RSCRIPT:-/usr/bin/Rscript}"
PYTHON="${PYTHON:-/usr/bin/python3}"
fixtures="$here/fixtures"

cd "$root"
mkdir -p "$fixtures"
"$RSCRIPT" --vanilla "$here/r/holtwinters.R" "$fixtures/r-holtwinters.json"
"$RSCRIPT" --vanilla "$here/r/seasonality_test.R" "$fixtures/r-seasonality-test.json"
"$RSCRIPT" --vanilla "$here/r/theta.R" "$fixtures/r-theta.json"
"$PYTHON" "$here/python/statsmodels_es.py" "$fixtures/r-holtwinters.json" "$fixtures/statsmodels-es.json"
