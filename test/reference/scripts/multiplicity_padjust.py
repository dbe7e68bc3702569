"""Cross-check of the multiplicity adjustments (src/multiplicity/) with statsmodels.

Reads multiplicity_padjust.json, which multiplicity_padjust.R wrote into the same folder (R runs
first), and writes multiplicity_padjust_statsmodels.json: for every case, the adjusted p-values
from statsmodels.stats.multitest.multipletests(p, method='holm') (Holm 1979) and
multipletests(p, method='fdr_bh') (Benjamini & Hochberg 1995). multipletests does not accept
missing values, so the null entries are taken out before the call (the family is the computed
p-values only) and put back as null afterwards.

Floats are written with Python's repr (shortest round-trip), so the file is byte-reproducible.

Usage: /usr/bin/python3 multiplicity_padjust.py OUTDIR
"""

import json
import os
import sys

import numpy as np
import statsmodels
from statsmodels.stats.multitest import multipletests

GENERATOR = "test/reference/scripts/multiplicity_padjust.py"


def adjust(p, method):
    present = [i for i, v in enumerate(p) if v is not None]
    result = [None] * len(p)
    if not present:
        return result
    values = np.array([p[i] for i in present], dtype=float)
    corrected = multipletests(values, method=method)[1]
    for i, v in zip(present, corrected):
        result[i] = float(v)
    return result


def main():
    if len(sys.argv) < 2:
        sys.exit("usage: /usr/bin/python3 multiplicity_padjust.py OUTDIR")
    out = sys.argv[1]
    with open(os.path.join(out, "multiplicity_padjust.json"), encoding="utf-8") as f:
        reference = json.load(f)
    cases = [
        {
            "name": case["name"],
            "p": case["p"],
            "holm": adjust(case["p"], "holm"),
            "bh": adjust(case["p"], "fdr_bh"),
        }
        for case in reference["cases"]
    ]
    document = {
        "generator": GENERATOR,
        "source": (
            "statsmodels {}: statsmodels.stats.multitest.multipletests(p, method='holm') and "
            "multipletests(p, method='fdr_bh'), on the non-null p-values of "
            "multiplicity_padjust.json; null passed through"
        ).format(statsmodels.__version__),
        "cases": cases,
    }
    with open(os.path.join(out, "multiplicity_padjust_statsmodels.json"), "w", encoding="utf-8") as f:
        json.dump(document, f, indent=2)
        f.write("\n")


if __name__ == "__main__":
    main()
