# Peer for `npm run bench -- peers` (test/bench/peersBench.ts) only; `npm test` never runs it.
# statsmodels' ARIMA (statsmodels.tsa.arima.model.ARIMA, fitted by its default exact maximum
# likelihood) doing the order search of `trendbrief fit` on an annual series: 16 regressions on
# [1, t] with ARMA(p, q) errors (trend "c" and time as exog) and 16 ARIMA(p, 1, q) with a drift
# (trend "t", a linear trend in levels, the drift of the differences), p, q in 0..3, the lowest
# AICc of each model kept (statsmodels' own `aicc`).
# Mode `fit`: the search on the whole series. Mode `backtest`: the search at each of 20 expanding
# origins (training lengths n - 5 - 19, ..., n - 5) and 5-step forecasts from both chosen models.
# A candidate that raises or whose optimiser reports no convergence is skipped and counted.
# Prints one JSON line.
# Usage: python3 arimaGrid.py FILE.csv fit|backtest
import csv
import json
import sys
import warnings

import numpy as np
import statsmodels
from statsmodels.tsa.arima.model import ARIMA

HORIZON = 5
ORIGINS = 20
counts = {"fits": 0, "failed": 0}


def search(y, d):
    """The lowest-AICc fit of one model over p, q in 0..3; d = 0 regresses on [1, t], d = 1 has a drift."""
    t = np.arange(1, len(y) + 1, dtype=float)
    best = None
    for p in range(4):
        for q in range(4):
            counts["fits"] += 1
            try:
                with warnings.catch_warnings():
                    # Warnings are silenced; whether the optimiser converged is read from mle_retvals.
                    warnings.simplefilter("ignore")
                    if d == 0:
                        fit = ARIMA(y, exog=t, order=(p, 0, q), trend="c").fit()
                    else:
                        fit = ARIMA(y, order=(p, 1, q), trend="t").fit()
            except (ValueError, np.linalg.LinAlgError):
                counts["failed"] += 1
                continue
            if not fit.mle_retvals.get("converged", False):
                counts["failed"] += 1
                continue
            if best is None or fit.aicc < best[0].aicc:
                best = (fit, p, q)
    return best


def forecast(best, n, d):
    future = np.arange(n + 1, n + HORIZON + 1, dtype=float)
    return best[0].get_forecast(HORIZON, exog=future if d == 0 else None).summary_frame()


def main():
    if len(sys.argv) != 3 or sys.argv[2] not in ("fit", "backtest"):
        sys.exit("usage: python3 arimaGrid.py FILE.csv fit|backtest")
    with open(sys.argv[1], newline="") as f:
        series = np.array([float(row[1]) for row in list(csv.reader(f))[1:]])
    n = len(series)
    if sys.argv[2] == "fit":
        chosen = [search(series, d) for d in (0, 1)]
    else:
        for end in range(n - HORIZON - ORIGINS + 1, n - HORIZON + 1):
            chosen = [search(series[:end], d) for d in (0, 1)]
            for d in (0, 1):
                if chosen[d] is not None:
                    forecast(chosen[d], end, d)
    orders = ["none" if b is None else f"({b[1]},{b[2]})" for b in chosen]
    print(json.dumps({"library": f"statsmodels {statsmodels.__version__} ARIMA", **counts,
                      "trendOrder": orders[0], "driftOrder": orders[1]}))


main()
