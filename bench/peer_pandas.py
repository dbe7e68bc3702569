"""Peer for the reading benchmark: what a practitioner would write in pandas instead of skillgate.

Reads both forecast files, joins them on the key (series, timestamp, horizon), takes the
absolute-error loss differential (candidate minus baseline, against the baseline's actual) and
averages it per timestamp. Prints one JSON line: the time inside Python (ms, from before the
first read to the last result), the joined rows, the timestamps and the mean of the
per-timestamp means (a checksum the other peers must match).

Usage: /usr/bin/python3 bench/peer_pandas.py BASELINE.csv CANDIDATE.csv  (Debian's python3-pandas)
"""

import json
import sys
import time

import pandas as pd

start = time.perf_counter()
baseline = pd.read_csv(sys.argv[1])
candidate = pd.read_csv(sys.argv[2])
both = baseline.merge(
    candidate, on=["series", "timestamp", "horizon"], suffixes=("_baseline", "_candidate")
)
both["differential"] = (both["prediction_candidate"] - both["actual_baseline"]).abs() - (
    both["prediction_baseline"] - both["actual_baseline"]
).abs()
per_timestamp = both.groupby("timestamp")["differential"].mean()
ms = (time.perf_counter() - start) * 1000
print(
    json.dumps(
        {
            "ms": ms,
            "rows": int(len(both)),
            "timestamps": int(len(per_timestamp)),
            "mean": float(per_timestamp.mean()),
        }
    )
)
