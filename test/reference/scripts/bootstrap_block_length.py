"""Reference values for skillgate's automatic stationary-bootstrap block length: an independent
numpy implementation of Politis & White (2004, Econometric Reviews 23(1)) with the correction of
Patton, Politis & White (2009, Econometric Reviews 28(4)), following the rule as stated in
docs/design.md "Automatic b":

  gamma_k = (1/n) sum_{t=k+1..n} (d_t - mean)(d_{t-k} - mean), rho_k = gamma_k / gamma_0
  K_N = max(5, ceil(log10 n)), m_max = ceil(sqrt n) + K_N, b_max = ceil(min(3 sqrt n, n / 3)),
  c = 2 sqrt(log10 n / n);
  m_hat = first lag j >= 1 with |rho_j|, ..., |rho_{j+K_N-1}| all < c (lags up to min(m_max, n-1));
  M = min(2 m_hat, m_max), or m_max without such a run;
  flat-top window lambda(s) = 1 (|s| <= 1/2), 2(1 - |s|) (1/2 < |s| <= 1), 0 otherwise;
  G = sum_{|k|<=M} lambda(k/M) |k| gamma_k, g = sum_{|k|<=M} lambda(k/M) gamma_k, D = 2 g^2,
  b = (2 G^2 / D)^(1/3) n^(1/3), clamped to [1, b_max].

The autocovariances come from numpy.correlate (full cross-correlation), and the sums run over
k = -M..M explicitly, so the code shares no structure with the TypeScript under test.
Series: OUTDIR/bootstrap_series.json, written by bootstrap_series.R (generate.sh runs R first).
Also writes the chi-square critical values that the sampler distribution tests use (scipy).

Usage: python3 bootstrap_block_length.py OUTDIR
  -> OUTDIR/bootstrap_block_length.json, OUTDIR/bootstrap_chi_square.json
"""
import json
import math
import os
import sys

import numpy as np
from scipy import stats


def block_length(d):
    d = np.asarray(d, dtype=float)
    n = d.size
    u = d - d.mean()
    full = np.correlate(u, u, mode="full") / n  # index n-1+k holds sum_t u_{t+k} u_t / n
    gamma = full[n - 1:]
    kn = max(5, math.ceil(math.log10(n)))
    m_max = math.ceil(math.sqrt(n)) + kn
    b_max = math.ceil(min(3 * math.sqrt(n), n / 3))
    crit = 2 * math.sqrt(math.log10(n) / n)
    lags = min(m_max, n - 1)
    rho = gamma[1:lags + 1] / gamma[0]
    small = np.abs(rho) < crit
    m_hat = None
    for j in range(1, lags - kn + 2):
        if small[j - 1:j - 1 + kn].all():
            m_hat = j
            break
    big_m = min(m_max if m_hat is None else 2 * m_hat, m_max, n - 1)
    ks = np.arange(-big_m, big_m + 1)
    s = np.abs(ks) / big_m
    lam = np.where(s <= 0.5, 1.0, np.where(s <= 1, 2 * (1 - s), 0.0))
    g_k = gamma[np.abs(ks)]
    big_g = float(np.sum(lam * np.abs(ks) * g_k))
    small_g = float(np.sum(lam * g_k))
    dd = 2 * small_g ** 2
    b = (2 * big_g ** 2 / dd) ** (1 / 3) * n ** (1 / 3)
    return {
        "n": n, "runLength": kn, "maxLag": m_max, "maxBlockLength": b_max,
        "criticalValue": crit, "runFound": m_hat is not None, "firstSmallLag": m_hat,
        "bandwidth": big_m, "gHat": big_g, "spectralSum": small_g, "d": dd,
        "unclamped": b, "blockLength": min(max(b, 1.0), b_max),
    }


def main():
    outdir = sys.argv[1]
    with open(os.path.join(outdir, "bootstrap_series.json")) as f:
        series = json.load(f)["series"]
    cases = []
    for s in series:
        result = block_length(s["values"])
        result["series"] = s["name"]
        cases.append(result)
    doc = {"generator": "test/reference/scripts/bootstrap_block_length.py (numpy)", "cases": cases}
    with open(os.path.join(outdir, "bootstrap_block_length.json"), "w") as f:
        json.dump(doc, f, indent=1, sort_keys=True)
        f.write("\n")

    crit = [{"df": df, "probability": p, "quantile": float(stats.chi2.ppf(p, df))}
            for df in (2, 6, 9, 15, 31, 40, 63) for p in (0.999, 0.9999)]
    doc = {"generator": "test/reference/scripts/bootstrap_block_length.py: scipy.stats.chi2.ppf",
           "cases": crit}
    with open(os.path.join(outdir, "bootstrap_chi_square.json"), "w") as f:
        json.dump(doc, f, indent=1, sort_keys=True)
        f.write("\n")


if __name__ == "__main__":
    main()
