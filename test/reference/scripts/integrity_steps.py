"""Reference values for the backtest checks' time grid, from pandas and numpy:

- hourly and daily series in Europe/Berlin and America/New_York local time across DST changes
  (pandas.date_range with tz, written with isoformat(), i.e. with their UTC offsets), with the
  steps between pairs of them: elapsed hours (pandas Timedelta) for hourly series, calendar days
  of the local dates for daily ones;
- month-end and month-start series (pandas.date_range freq "M" / "MS", pandas 1.5) with the month steps
  between pairs (pandas Period differences);
- weekday dates with the business days between pairs (numpy.busday_count over (origin, target]).

Fixed seed (numpy default_rng(20261202)). Usage: python3 integrity_steps.py OUTDIR ->
OUTDIR/integrity_steps.json
"""
import json
import os
import sys

import numpy as np
import pandas as pd

rng = np.random.default_rng(20261202)


def iso(ts):
    text = ts.isoformat()
    return text


def pairs(labels, count):
    out = []
    n = len(labels)
    for _ in range(count):
        i, j = sorted(rng.choice(n, size=2, replace=False))
        out.append((int(i), int(j)))
    return out


cases = []

for tz, start in [("Europe/Berlin", "2024-03-30 20:00"), ("Europe/Berlin", "2024-10-26 20:00"),
                  ("America/New_York", "2024-03-09 20:00"), ("America/New_York", "2024-11-02 20:00")]:
    stamps = pd.date_range(start, periods=48, freq="h", tz=tz)
    labels = [iso(t) for t in stamps]
    cases.append({
        "name": f"hourly {tz} from {start}",
        "timestamps": labels,
        "frequency": "1h",
        "steps": [{"from": labels[i], "to": labels[j],
                   "steps": int((stamps[j] - stamps[i]) / pd.Timedelta(hours=1))}
                  for i, j in pairs(labels, 20)],
    })

for tz, start in [("Europe/Berlin", "2024-03-20"), ("America/New_York", "2024-10-25")]:
    stamps = pd.date_range(start, periods=30, freq="D", tz=tz)
    labels = [iso(t) for t in stamps]
    cases.append({
        "name": f"daily {tz} from {start}",
        "timestamps": labels,
        "frequency": "1d",
        "steps": [{"from": labels[i], "to": labels[j],
                   "steps": int((stamps[j].tz_localize(None).normalize()
                                 - stamps[i].tz_localize(None).normalize()).days)}
                  for i, j in pairs(labels, 20)],
    })

for freq, name in [("M", "month ends"), ("MS", "month starts")]:
    stamps = pd.date_range("2019-11-01", periods=40, freq=freq)
    labels = [t.strftime("%Y-%m-%d") for t in stamps]
    cases.append({
        "name": name,
        "timestamps": labels,
        "frequency": "1mo",
        "steps": [{"from": labels[i], "to": labels[j],
                   "steps": int((stamps[j].to_period("M") - stamps[i].to_period("M")).n)}
                  for i, j in pairs(labels, 20)],
    })

days = pd.bdate_range("2023-12-01", periods=60)
labels = [t.strftime("%Y-%m-%d") for t in days]
cases.append({
    "name": "business days",
    "timestamps": labels,
    "frequency": "1bd",
    "steps": [{"from": labels[i], "to": labels[j],
               # busday_count counts [begin, end): shift both ends by a day for (from, to].
               "steps": int(np.busday_count((days[i] + pd.Timedelta(days=1)).date(),
                                            (days[j] + pd.Timedelta(days=1)).date()))}
              for i, j in pairs(labels, 20)],
})

out = sys.argv[1]
with open(os.path.join(out, "integrity_steps.json"), "w") as f:
    json.dump({"source": f"pandas {pd.__version__}, numpy {np.__version__}", "cases": cases}, f, indent=1)
    f.write("\n")
