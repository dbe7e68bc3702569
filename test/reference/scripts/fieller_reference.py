"""Reference values for skillgate's Fieller interval over the relative margin: the set of r at
which the one-sided Diebold-Mariano tests of E[L_c - (1 + r) L_b] = 0, each at tail 0.05, do not
reject, i.e. { r : (mD - r mB)^2 <= c^2 (V_DD - 2 r V_DB + r^2 V_BB) } (Fieller 1954, JRSS B 16),
with D = L_c - L_b, B = L_b and V the long-run covariance MATRIX of (D, B) divided by n.

Independent of the TypeScript under test: the 2x2 matrix is built directly from vector-valued
cosine projections (ewc, Lazarus, Lewis, Stock & Watson 2018: Omega = (1/nu) sum_j L_j L_j',
L_j = sqrt(2/n) sum_t cos(pi j (t - 1/2) / n) (x_t - xbar), nu = max(2, round(0.4 n^(2/3)))) or
from 2x2 autocovariance matrices (Bartlett, Newey & West 1987: Gamma_0 + sum_k (1 - k/(L+1))
(Gamma_k + Gamma_k')), the critical value from scipy.stats.t.ppf (for Bartlett: Student t with
n - 1 df divided by the Harvey, Leybourne & Newbold 1997 factor sqrt((n + 1 - 2h + h(h-1)/n)/n)),
and the quadratic is solved by numpy.roots.

Data: the forecasts of open datasets written by dm_reference.R (R datasets::AirPassengers,
Nile, co2) in OUTDIR/dm_*_{baseline,candidate}.csv; losses from their actual and prediction.

Usage: python3 fieller_reference.py OUTDIR  -> OUTDIR/fieller_reference.json
"""
import csv
import json
import math
import os
import sys

import numpy as np
from scipy import stats

CASES = [
    ("airpassengers_h1_squared", "squared", "ewc", None, 1),
    ("nile_h1_absolute", "absolute", "ewc", None, 1),
    ("nile_h1_absolute", "absolute", "bartlett", 4, 1),
    ("co2_h6_squared", "squared", "bartlett", 5, 6),
]
TAIL = 0.05


def read(path):
    with open(path, newline="") as f:
        rows = list(csv.DictReader(f))
    return np.array([float(r["actual"]) for r in rows]), np.array([float(r["prediction"]) for r in rows])


def loss(kind, actual, prediction):
    e = actual - prediction
    return e * e if kind == "squared" else np.abs(e)


def ewc_matrix(x):
    n = x.shape[0]
    nu = max(2, round(0.4 * n ** (2 / 3)))
    u = x - x.mean(axis=0)
    t = np.arange(1, n + 1) - 0.5
    omega = np.zeros((2, 2))
    for j in range(1, nu + 1):
        lam = math.sqrt(2 / n) * (np.cos(math.pi * j * t / n) @ u)
        omega += np.outer(lam, lam)
    return omega / nu, nu


def bartlett_matrix(x, lag):
    n = x.shape[0]
    u = x - x.mean(axis=0)
    omega = u.T @ u / n
    for k in range(1, lag + 1):
        g = u[k:].T @ u[:-k] / n
        omega += (1 - k / (lag + 1)) * (g + g.T)
    return omega


def main(out):
    results = []
    for name, kind, estimator, lag, h in CASES:
        ya, pb = read(os.path.join(out, f"dm_{name}_baseline.csv"))
        _, pc = read(os.path.join(out, f"dm_{name}_candidate.csv"))
        lb = loss(kind, ya, pb)
        lc = loss(kind, ya, pc)
        n = lb.size
        x = np.column_stack([lc - lb, lb])
        if estimator == "ewc":
            omega, nu = ewc_matrix(x)
            crit = stats.t.ppf(1 - TAIL, nu)
        else:
            omega = bartlett_matrix(x, lag)
            factor = math.sqrt((n + 1 - 2 * h + h * (h - 1) / n) / n)
            crit = stats.t.ppf(1 - TAIL, n - 1) / factor
            nu = None
        v = omega / n
        m_d, m_b = x.mean(axis=0)
        # (m_d - r m_b)^2 - c^2 (v_dd - 2 r v_db + r^2 v_bb) <= 0, coefficients in r^2, r, 1.
        coeffs = [m_b ** 2 - crit ** 2 * v[1, 1], -2 * (m_d * m_b - crit ** 2 * v[0, 1]),
                  m_d ** 2 - crit ** 2 * v[0, 0]]
        roots = np.sort(np.roots(coeffs).real)
        results.append({
            "name": name, "loss": kind, "estimator": estimator, "lag": lag, "horizon": h,
            "degreesOfFreedom": nu, "n": int(n), "tail": TAIL, "critical": float(crit),
            "leadingCoefficient": float(coeffs[0]),
            "baselineLoss": lb.tolist(), "candidateLoss": lc.tolist(),
            "lower": float(roots[0]), "upper": float(roots[1]),
        })
    doc = {
        "generator": "test/reference/scripts/fieller_reference.py",
        "source": "numpy " + np.__version__ + " (numpy.roots) and scipy " + __import__("scipy").__version__ +
                  " (scipy.stats.t.ppf); data: R datasets via dm_reference.R",
        "cases": results,
    }
    with open(os.path.join(out, "fieller_reference.json"), "w") as f:
        json.dump(doc, f, indent=1)
        f.write("\n")


if __name__ == "__main__":
    main(sys.argv[1])
