#!/usr/bin/env bash
# Rebuild Ebb's reference fixtures in test/reference/fixtures/.
# R first (it also exports the series data), then Python (reads that data).
# Needs: Rscript (base R; the seasonality, Theta and public-series fixtures also R's forecast package,
# Debian r-cran-forecast, and the public series the AER package, Debian r-cran-aer) and a python3
# with statsmodels; on Debian:
#   apt-get install r-base-core r-cran-forecast r-cran-aer python3-statsmodels
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
"$RSCRIPT" --vanilla "$here/r/public_seasonal.R" "$fixtures/r-public-seasonal.json"
"$PYTHON" "$here/python/statsmodels_es.py" "$fixtures/r-holtwinters.json" "$fixtures/statsmodels-es.json"
