"""Cross-check of the pooled-panel reference with statsmodels.

Reads the forecast CSVs that panel_reference.R wrote into the folder given as the first argument
(R runs first), recomputes every loss differential series from the rows with numpy (per-timestamp
means, docs/design.md "Statistics"), and for each takes the lag L that R chose (panel_seatbelts.json) and
computes with statsmodels:
  - variance of the mean: sm.OLS(d, ones).fit(cov_type='HAC',
        cov_kwds={'maxlags': L, 'kernel': 'bartlett', 'use_correction': False}).cov_params()[0, 0]
  - statistic = mean / sqrt(variance), one-sided p = scipy.stats.norm.sf(statistic)
  - per series: multipletests(p, method='holm') and multipletests(p, method='fdr_bh').
Writes panel_seatbelts_statsmodels.json; floats with Python's repr, so the file is
byte-reproducible.

Usage: /usr/bin/python3 panel_reference.py OUTDIR
"""

import csv
import json
import os
import sys

import numpy as np
import scipy
import scipy.stats
import statsmodels
import statsmodels.api as sm
from statsmodels.stats.multitest import multipletests

GENERATOR = "test/reference/scripts/panel_reference.py"


def read(path):
    with open(path, newline="", encoding="utf-8") as f:
        return list(csv.DictReader(f))


def per_time(timestamps, d):
    times = sorted(set(timestamps.tolist()))
    return times, np.array([d[timestamps == t].mean() for t in times])


def hac(times, d, lag):
    fit = sm.OLS(d, np.ones(len(d))).fit(
        cov_type="HAC", cov_kwds={"maxlags": lag, "kernel": "bartlett", "use_correction": False}
    )
    variance = float(fit.cov_params()[0, 0])
    statistic = float(d.mean() / np.sqrt(variance))
    return {
        "n": len(d),
        "timestamps": [times[0], times[-1]],
        "mean": float(d.mean()),
        "lag": lag,
        "variance": variance,
        "longRunVariance": variance * len(d),
        "statistic": statistic,
        "pValue": float(scipy.stats.norm.sf(statistic)),
    }


def main():
    if len(sys.argv) < 2:
        sys.exit("usage: /usr/bin/python3 panel_reference.py OUTDIR")
    out = sys.argv[1]
    with open(os.path.join(out, "panel_seatbelts.json"), encoding="utf-8") as f:
        reference = json.load(f)
    base = read(os.path.join(out, reference["files"]["baseline"]))
    cand = read(os.path.join(out, reference["files"]["candidate"]))
    assert [r["series"] for r in base] == [r["series"] for r in cand]
    series = np.array([r["series"] for r in base])
    timestamp = np.array([int(r["timestamp"]) for r in base])
    horizon = np.array([int(r["horizon"]) for r in base])
    actual = np.array([float(r["actual"]) for r in base])
    pb = np.array([float(r["prediction"]) for r in base])
    pc = np.array([float(r["prediction"]) for r in cand])

    losses = []
    for block in reference["losses"]:
        kind = block["loss"]
        loss = (lambda e: e * e) if kind == "squared" else np.abs
        lb = loss(pb - actual)
        lc = loss(pc - actual)
        d = lc - lb
        overall = hac(*per_time(timestamp, d), block["overall"]["lag"])
        by_horizon = []
        for h in block["byHorizon"]:
            keep = horizon == h["horizon"]
            entry = {"horizon": h["horizon"]}
            entry.update(hac(*per_time(timestamp[keep], d[keep]), h["lag"]))
            by_horizon.append(entry)
        by_series = []
        for s in block["bySeries"]:
            keep = series == s["series"]
            entry = {"series": s["series"], "meanBaselineLoss": float(lb[keep].mean())}
            entry.update(hac(*per_time(timestamp[keep], d[keep]), s["lag"]))
            by_series.append(entry)
        raw = np.array([s["pValue"] for s in by_series])
        scale = {name: float(lb[series == name].mean()) for name in reference["series"]}
        divisor = np.array([scale[name] for name in series])
        scaled = hac(
            *per_time(timestamp, lc / divisor - lb / divisor), block["scaled"]["overall"]["lag"]
        )
        losses.append(
            {
                "loss": kind,
                "overall": overall,
                "byHorizon": by_horizon,
                "bySeries": by_series,
                "seriesAdjusted": {
                    "series": [s["series"] for s in by_series],
                    "raw": raw.tolist(),
                    "holm": multipletests(raw, method="holm")[1].tolist(),
                    "bh": multipletests(raw, method="fdr_bh")[1].tolist(),
                },
                "scaled": {"scales": scale, "overall": scaled},
            }
        )
    document = {
        "generator": GENERATOR,
        "dataset": reference["dataset"],
        "source": (
            "statsmodels {}, scipy {}, numpy {}: sm.OLS(d, ones).fit(cov_type='HAC', cov_kwds="
            "{{'maxlags': L, 'kernel': 'bartlett', 'use_correction': False}}).cov_params()[0, 0] "
            "at the lag L of panel_seatbelts.json; scipy.stats.norm.sf; "
            "multipletests(p, method='holm' | 'fdr_bh'); d recomputed from the CSVs with numpy"
        ).format(statsmodels.__version__, scipy.__version__, np.__version__),
        "losses": losses,
    }
    with open(os.path.join(out, "panel_seatbelts_statsmodels.json"), "w", encoding="utf-8") as f:
        json.dump(document, f, indent=2)
        f.write("\n")


if __name__ == "__main__":
    main()
