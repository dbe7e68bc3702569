"""Reference values for the Diebold–Mariano statistics core (src/statistics/), from statsmodels.

Two kinds of output, both in the folder given as the first argument:

1. dm_<case>_statsmodels.json for every case that dm_reference.R wrote there (R runs first):
   the same series d, checked with statsmodels instead of R.
2. dm_<case>.json (+ _baseline.csv / _candidate.csv) for cases built here from open series that
   ship with statsmodels (sunspots, macrodata, elnino).

Library calls:
  - HAC variance: sm.OLS(d, ones).fit(cov_type="HAC",
        cov_kwds={"maxlags": L, "kernel": "bartlett" | "uniform", "use_correction": False})
  - autocovariances: statsmodels.tsa.stattools.acovf(d, adjusted=False, demean=True, fft=False)
  - p-values: scipy.stats.norm.sf and scipy.stats.t.sf
The Newey & West (1994) automatic bandwidth, the Harvey–Leybourne–Newbold factor and the
equal-weighted cosine estimator are the published formulas evaluated here with numpy (statsmodels
0.13 has no Newey–West plug-in bandwidth for OLS HAC).

Floats are written with Python's repr (shortest round-trip), so files are byte-reproducible.

Usage: /usr/bin/python3 dm_reference.py OUTDIR
"""

import glob
import json
import math
import os
import sys

import numpy as np
import scipy
import scipy.stats
import statsmodels
import statsmodels.api as sm
from statsmodels.tsa.stattools import acovf

GENERATOR = "test/reference/scripts/dm_reference.py"
HAC_CALL = (
    "statsmodels {v}: sm.OLS(d, ones).fit(cov_type='HAC', cov_kwds={{'maxlags': {lag}, "
    "'kernel': '{kernel}', 'use_correction': False}}).cov_params(); "
    "scipy {s}: norm.sf, t.sf"
)


def hac_variance(d, lag, kernel):
    fit = sm.OLS(d, np.ones_like(d)).fit(
        cov_type="HAC", cov_kwds={"maxlags": lag, "kernel": kernel, "use_correction": False}
    )
    return float(fit.cov_params()[0, 0])


def hln_factor(n, h):
    return math.sqrt((n + 1 - 2 * h + h * (h - 1) / n) / n)


def hac_entry(estimator, used, rule, lag, variance, d, margin, h, source, extra=None):
    n = len(d)
    mean = float(np.mean(d))
    statistic = (mean - margin) / math.sqrt(variance)
    hln = statistic * hln_factor(n, h)
    entry = {
        "estimator": estimator,
        "usedEstimator": used,
        "lagRule": rule,
        "lag": lag,
        "longRunVariance": variance * n,
        "variance": variance,
        "statistic": statistic,
        "pValue": float(scipy.stats.norm.sf(statistic)),
        "pValueTwoSided": float(2 * scipy.stats.norm.sf(abs(statistic))),
        "smallSample": {
            "statistic": hln,
            "pValue": float(scipy.stats.t.sf(hln, n - 1)),
            "pValueTwoSided": float(2 * scipy.stats.t.sf(abs(hln), n - 1)),
            "degreesOfFreedom": n - 1,
        },
        "source": source,
    }
    if extra:
        entry.update(extra)
    return entry


def hac_entries(d, margin, h, lags):
    entries = []
    for rule, lag in lags:
        bartlett_source = HAC_CALL.format(
            v=statsmodels.__version__, s=scipy.__version__, lag=lag, kernel="bartlett"
        )
        vb = hac_variance(d, lag, "bartlett")
        entries.append(hac_entry("bartlett", "bartlett", rule, lag, vb, d, margin, h,
                                 bartlett_source))
        uniform_source = HAC_CALL.format(
            v=statsmodels.__version__, s=scipy.__version__, lag=lag, kernel="uniform"
        )
        vu = hac_variance(d, lag, "uniform")
        if vu > 0:
            entries.append(hac_entry("uniform", "uniform", rule, lag, vu, d, margin, h,
                                     uniform_source))
        else:
            entries.append(hac_entry(
                "uniform", "bartlett", rule, lag, vb, d, margin, h,
                "uniform (" + uniform_source + ") is not positive, so the values are "
                + bartlett_source,
                {"uniformLongRunVariance": vu * len(d)},
            ))
    return entries


def ewc_entry(d, margin):
    """Lazarus, Lewis, Stock & Watson (2018), evaluated with numpy."""
    n = len(d)
    nu = max(2, round(0.4 * n ** (2 / 3)))
    u = d - np.mean(d)
    t = np.arange(1, n + 1)
    lam = np.array([math.sqrt(2 / n) * np.sum(np.cos(math.pi * j * (t - 0.5) / n) * u)
                    for j in range(1, nu + 1)])
    omega2 = float(np.sum(lam ** 2) / nu)
    statistic = (float(np.mean(d)) - margin) / math.sqrt(omega2 / n)
    return {
        "degreesOfFreedom": nu,
        "longRunVariance": omega2,
        "variance": omega2 / n,
        "statistic": statistic,
        "pValue": float(scipy.stats.t.sf(statistic, nu)),
        "pValueTwoSided": float(2 * scipy.stats.t.sf(abs(statistic), nu)),
        "source": "equal-weighted cosine formula (Lazarus, Lewis, Stock & Watson 2018) evaluated "
                  "with numpy " + np.__version__ + "; p-values scipy " + scipy.__version__
                  + " t.sf(statistic, nu)",
    }


def autocovariances(d):
    return {
        "values": [float(v) for v in acovf(d, adjusted=False, demean=True, fft=False, nlag=5)],
        "source": "statsmodels " + statsmodels.__version__
                  + ": acovf(d, adjusted=False, demean=True, fft=False, nlag=5)",
    }


def auto_lag(d, h):
    """Newey & West (1994) without prewhitening, as in docs/design.md, with numpy."""
    n = len(d)
    pilot = math.floor(4 * (n / 100) ** (2 / 9))
    u = d - np.mean(d)
    sigma = [float(np.sum(u[: n - j] * u[j:]) / n) for j in range(pilot + 1)]
    s0 = sigma[0] + 2 * sum(sigma[1:])
    s1 = 2 * sum(j * sigma[j] for j in range(1, pilot + 1))
    bandwidth = 1.1447 * abs(s1 / s0) ** (2 / 3) * n ** (1 / 3)
    lag = min(max(math.floor(bandwidth), h - 1), n - 1)
    return {
        "pilotLag": pilot,
        "s0": s0,
        "s1": s1,
        "bandwidth": bandwidth,
        "lag": lag,
        "source": "Newey & West (1994) plug-in formulas evaluated with numpy " + np.__version__
                  + "; lag = min(max(floor(bandwidth), h - 1), n - 1)",
    }


def write_json(path, value):
    with open(path, "w", encoding="utf-8", newline="\n") as f:
        f.write(json.dumps(value, indent=2, allow_nan=False, ensure_ascii=False))
        f.write("\n")


def write_forecasts(path, h, actual, prediction):
    with open(path, "w", encoding="utf-8", newline="\n") as f:
        f.write("timestamp,horizon,actual,prediction\n")
        for i, (a, p) in enumerate(zip(actual, prediction), start=1):
            f.write(f"{i},{h},{float(a)!r},{float(p)!r}\n")


def read_forecasts(path, h):
    with open(path, encoding="utf-8") as f:
        lines = f.read().splitlines()
    assert lines[0] == "timestamp,horizon,actual,prediction", path
    rows = [line.split(",") for line in lines[1:]]
    assert [int(r[0]) for r in rows] == list(range(1, len(rows) + 1)), path
    assert all(int(r[1]) == h for r in rows), path
    return (np.array([float(r[2]) for r in rows]), np.array([float(r[3]) for r in rows]))


def check_forecasts_reproduce(out, name, kind, h, d):
    """The forecast CSVs must give back d exactly, so they can run end to end through the CLI."""
    actual, base = read_forecasts(os.path.join(out, "dm_" + name + "_baseline.csv"), h)
    actual2, cand = read_forecasts(os.path.join(out, "dm_" + name + "_candidate.csv"), h)
    assert np.array_equal(actual, actual2), name
    again = loss(kind, actual, cand) - loss(kind, actual, base)
    if not np.array_equal(again, d):
        sys.exit(name + ": the forecast CSVs do not reproduce d exactly")


def check_r_cases(out):
    for path in sorted(glob.glob(os.path.join(out, "dm_*.json"))):
        with open(path, encoding="utf-8") as f:
            case = json.load(f)
        if case.get("generator") != "test/reference/scripts/dm_reference.R" or "d" not in case:
            continue
        d = np.array(case["d"], dtype=float)
        h = case["horizon"]
        check_forecasts_reproduce(out, case["name"], case["loss"], h, d)
        lags = [(e["lagRule"], e["lag"]) for e in case["hac"] if e["estimator"] == "bartlett"]
        result = {
            "generator": GENERATOR,
            "name": case["name"] + "_statsmodels",
            "dataset": case["dataset"] + ", d as written by dm_reference.R",
            "baseline": case["baseline"],
            "candidate": case["candidate"],
            "loss": case["loss"],
            "horizon": h,
            "margin": case["margin"],
            "n": len(d),
            "d": case["d"],
            "mean": float(np.mean(d)),
            "autocovariances": autocovariances(d),
            "autoLag": auto_lag(d, h),
            "hac": hac_entries(d, case["margin"], h, lags),
            "ewc": ewc_entry(d, case["margin"]),
        }
        write_json(os.path.join(out, "dm_" + case["name"] + "_statsmodels.json"), result)


def loss(kind, actual, prediction):
    if kind == "squared":
        return (prediction - actual) ** 2
    return np.abs(prediction - actual)


def write_case(out, name, dataset, y, h, kind, margin, first, baseline_rule, baseline,
               candidate_rule, candidate):
    # first is 1-based like t in the R script: forecasts of y[t] for t = first..len(y)
    ts = range(first, len(y) + 1)
    actual = np.array([y[t - 1] for t in ts])
    base = np.array([baseline(y, t, h) for t in ts])
    cand = np.array([candidate(y, t, h) for t in ts])
    d = loss(kind, actual, cand) - loss(kind, actual, base)
    lag = auto_lag(d, h)
    lags = [("auto", lag["lag"]), ("horizon", h - 1), ("fixed", 4)]
    result = {
        "generator": GENERATOR,
        "name": name,
        "dataset": dataset,
        "baseline": baseline_rule,
        "candidate": candidate_rule,
        "loss": kind,
        "horizon": h,
        "margin": margin,
        "n": len(d),
        "d": [float(v) for v in d],
        "mean": float(np.mean(d)),
        "autocovariances": autocovariances(d),
        "autoLag": lag,
        "hac": hac_entries(d, margin, h, lags),
        "ewc": ewc_entry(d, margin),
    }
    write_json(os.path.join(out, "dm_" + name + ".json"), result)
    write_forecasts(os.path.join(out, "dm_" + name + "_baseline.csv"), h, actual, base)
    write_forecasts(os.path.join(out, "dm_" + name + "_candidate.csv"), h, actual, cand)
    check_forecasts_reproduce(out, name, kind, h, d)


# Forecasts of y[t] (1-based t) issued h steps earlier, using only y[1..t-h].
def naive(y, t, h):
    return y[t - h - 1]


def lagged(period):
    def forecast(y, t, h):
        return y[t - period * math.ceil(h / period) - 1]
    return forecast


def moving_average(k):
    def forecast(y, t, h):
        return float(np.mean(y[t - h - k: t - h]))
    return forecast


def main():
    if len(sys.argv) < 2:
        sys.exit("usage: /usr/bin/python3 dm_reference.py OUTDIR")
    out = sys.argv[1]
    check_r_cases(out)

    y = sm.datasets.sunspots.load_pandas().data["SUNACTIVITY"].to_numpy(dtype=float)
    write_case(out, "sunspots_h1_squared",
               "statsmodels datasets.sunspots SUNACTIVITY (annual, 1700-2008)", y, 1,
               "squared", 0, 12, "naive: y[t-1]", naive,
               "eleven-year naive: y[t-11]", lagged(11))

    y = sm.datasets.macrodata.load_pandas().data["infl"].to_numpy(dtype=float)
    write_case(out, "macrodata_infl_h2_absolute",
               "statsmodels datasets.macrodata infl (quarterly, 1959-2009)", y, 2,
               "absolute", 0, 6, "naive: y[t-2]", naive,
               "moving average of y[t-5..t-2]", moving_average(4))

    table = sm.datasets.elnino.load_pandas().data
    y = table.drop(columns="YEAR").to_numpy(dtype=float).reshape(-1)
    write_case(out, "elnino_h3_absolute",
               "statsmodels datasets.elnino (monthly sea surface temperature, 1950-2010)", y, 3,
               "absolute", 0, 13, "naive: y[t-3]", naive,
               "seasonal naive: y[t-12]", lagged(12))


if __name__ == "__main__":
    main()
