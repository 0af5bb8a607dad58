"""Ebb bench reference: statsmodels ExponentialSmoothing on the bench's series, timed per fit here.

Usage: python3 statsmodels_bench.py INPUT OUTPUT
INPUT: one series a line, "id,period,horizon,v1 v2 ... vn" (the training part only).
OUTPUT: a "#version,..." line, then per series and seasonality one line
  id,seasonality,seconds,sse,alpha,beta,gamma,warning,forecast,,,,
(the interval fields stay empty: ExponentialSmoothing gives no prediction intervals).
Model: additive (linear) trend with multiplicative or additive seasonality, initial state
estimated with the constants (initialization_method="estimated"), statsmodels' default
optimiser. `seconds` is the CPU time of building the model and fit(). Needs numpy and
statsmodels (Debian: python3-statsmodels).
"""

import sys
import time
import warnings

import numpy as np
import scipy
import statsmodels
from statsmodels.tsa.holtwinters import ExponentialSmoothing

SEASONALITIES = (("multiplicative", "mul"), ("additive", "add"))


def parse(line):
    sid, period, horizon, values = line.rstrip("\n").split(",")
    return sid, int(period), int(horizon), np.array([float(v) for v in values.split(" ")])


def fit_timed(x, period, seasonal):
    with warnings.catch_warnings(record=True) as caught:
        warnings.simplefilter("always")
        t0 = time.process_time()  # CPU time: other work sharing the machine is not counted
        model = ExponentialSmoothing(x, trend="add", seasonal=seasonal, seasonal_periods=period,
                                     initialization_method="estimated")
        res = model.fit()
        seconds = time.process_time() - t0
    text = str(caught[-1].message) if caught else ""
    return res, seconds, text.replace(",", " ").replace("\n", " ")


def num(values):
    return " ".join(repr(float(v)) for v in values)


def main():
    if len(sys.argv) != 3:
        sys.exit("usage: python3 statsmodels_bench.py INPUT OUTPUT")
    with open(sys.argv[1]) as f:
        lines = [l for l in f if l.strip()]
    with open(sys.argv[2], "w") as out:
        out.write(f"#version,statsmodels {statsmodels.__version__} (numpy {np.__version__}, scipy {scipy.__version__}, Python {sys.version.split()[0]})\n")
        for line in lines[:5]:  # warm-up, untimed
            sid, period, horizon, x = parse(line)
            for _, code in SEASONALITIES:
                try:
                    fit_timed(x, period, code)
                except Exception:
                    pass
        for i, line in enumerate(lines, 1):
            sid, period, horizon, x = parse(line)
            for name, code in SEASONALITIES:
                t0 = time.process_time()
                try:
                    res, seconds, text = fit_timed(x, period, code)
                except Exception as e:  # a failed fit is reported, not fatal
                    seconds = time.process_time() - t0
                    msg = str(e).replace(",", " ").replace("\n", " ")
                    out.write(f"{sid},{name},{seconds:.9g},NA,NA,NA,NA,{msg},,,,,\n")
                    continue
                fc = res.forecast(horizon)
                p = res.params
                out.write(",".join([sid, name, f"{seconds:.9g}", repr(float(res.sse)),
                                    repr(float(p["smoothing_level"])), repr(float(p["smoothing_trend"])),
                                    repr(float(p["smoothing_seasonal"])), text, num(fc), "", "", "", ""]) + "\n")
            if i % 100 == 0 or i == len(lines):
                print(f"[bench] statsmodels ExponentialSmoothing: {i}/{len(lines)}", file=sys.stderr, flush=True)


if __name__ == "__main__":
    main()
