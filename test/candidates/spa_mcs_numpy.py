"""Independent implementation, in numpy, of the superior-predictive-ability test (Hansen 2005),
White's (2000) reality check and the model confidence set (Hansen, Lunde & Nason 2011), fed the
bootstrap index matrix that the TypeScript test writes out, so the two agree up to rounding.

Written from the papers' formulas, not from the TypeScript code: resample means are taken
directly over the indices (not from prefix sums), the standard errors of the SPA test come from
Politis & Romano's (1994) Lemma 1 evaluated as an O(n^2) sum with numpy, and the MCS loops over
all pairs with array operations.

Usage: /usr/bin/python3 spa_mcs_numpy.py INPUT.json OUTPUT.json
INPUT: {"losses": [[...model 0...], ...], "indices_file": path to a text file with B lines of n
        0-based indices, "block_length": b, "alpha": a}
OUTPUT: {"spa": {"better": {...}, "worse": {...}}, "mcs": {"range": {...}, "max": {...}}}
Conventions (the project's, stated in the TypeScript docs too): p = (1 + #{T* >= T})/(B + 1);
MCS variances divide by B; model 0 is the baseline.
"""

import json
import sys

import numpy as np


def lemma1_variance(x, b):
    """Var*(mean*) of the stationary bootstrap, Politis & Romano (1994) Lemma 1."""
    n = len(x)
    u = x - x.mean()
    q = 1.0 - 1.0 / b
    total = np.dot(u, u) / n
    for k in range(1, n):
        c = np.dot(u[k:], u[:-k]) / n
        total += 2.0 * ((1 - k / n) * q**k + (k / n) * q ** (n - k)) * c
    return total / n


def spa(perf, dev, b):
    """perf: K x n performance relative to the benchmark (positive = better); dev: K x B."""
    k_models, n = perf.shape
    means = perf.mean(axis=1)
    se = np.sqrt(np.array([lemma1_variance(perf[k], b) for k in range(k_models)]))
    t = means / se
    stat = max(0.0, t.max())
    thr = np.sqrt(2.0 * np.log(np.log(n)))
    shifts = {
        "lower": np.minimum(means, 0.0),
        "consistent": np.where(means < -se * thr, means, 0.0),
        "upper": np.zeros(k_models),
    }
    B = dev.shape[1]
    out = {"statistic": float(stat)}
    for name, mu in shifts.items():
        tstar = np.maximum(0.0, ((dev + mu[:, None]) / se[:, None]).max(axis=0))
        out["p_" + name] = float((1 + np.sum(tstar >= stat)) / (B + 1))
    tstar_c = np.maximum(0.0, ((dev + shifts["consistent"][:, None]) / se[:, None]).max(axis=0))
    out["adjusted"] = [float((1 + np.sum(tstar_c >= max(0.0, tk))) / (B + 1)) for tk in t]
    rc_stat = np.sqrt(n) * means.max()
    rc_star = np.sqrt(n) * dev.max(axis=0)
    out["rc_statistic"] = float(rc_stat)
    out["rc_p"] = float((1 + np.sum(rc_star >= rc_stat)) / (B + 1))
    return out


def mcs(means, zeta, statistic, alpha):
    """means: m; zeta: m x B deviations of the resampled mean losses."""
    m, B = zeta.shape
    alive = list(range(m))
    order, steps = [], []
    pvals = np.ones(m)
    running = 0.0
    while len(alive) > 1:
        idx = np.array(alive)
        L = means[idx]
        Z = zeta[idx]
        if statistic == "range":
            D = Z[:, None, :] - Z[None, :, :]  # a x a x B
            var = (D**2).mean(axis=2)
            diff = L[:, None] - L[None, :]
            with np.errstate(divide="ignore", invalid="ignore"):
                t = np.where(var > 0, diff / np.sqrt(var), 0.0)
                tstar = np.where(var[:, :, None] > 0, np.abs(D) / np.sqrt(var)[:, :, None], 0.0)
            np.fill_diagonal(t, -np.inf)
            observed = np.abs(np.where(np.isinf(t), 0.0, t)).max()
            stars = tstar.reshape(-1, B).max(axis=0)
            eliminate = int(np.argmax(t.max(axis=1)))
        else:
            Zc = Z - Z.mean(axis=0)[None, :]
            var = (Zc**2).mean(axis=1)
            d = L - L.mean()
            scale = np.where(var > 0, 1.0 / np.sqrt(var), 0.0)
            t = d * scale
            observed = t.max()
            stars = (Zc * scale[:, None]).max(axis=0)
            eliminate = int(np.argmax(t))
        # ties within a relative 1e-10 count as reaching the statistic (rounding, not data)
        p = (1 + np.sum(stars >= observed - abs(observed) * 1e-10)) / (B + 1)
        running = max(running, p)
        model = alive[eliminate]
        order.append(model)
        steps.append(float(p))
        pvals[model] = running
        alive.remove(model)
    order.append(alive[0])
    steps.append(1.0)
    pvals[alive[0]] = 1.0
    return {
        "order": order,
        "steps": steps,
        "pvalues": [float(v) for v in pvals],
        "members": [i for i in range(m) if pvals[i] >= alpha],
    }


def main():
    spec = json.load(open(sys.argv[1]))
    losses = np.array(spec["losses"], dtype=float)  # m x n
    idx = np.loadtxt(spec["indices_file"], dtype=np.int64, ndmin=2)  # B x n
    b = float(spec["block_length"])
    means = losses.mean(axis=1)
    zeta = np.stack([losses[i][idx].mean(axis=1) - means[i] for i in range(losses.shape[0])])
    base, cand = losses[0], losses[1:]
    better = spa(base[None, :] - cand, zeta[0][None, :] - zeta[1:], b)
    worse = spa(cand - base[None, :], zeta[1:] - zeta[0][None, :], b)
    result = {
        "spa": {"better": better, "worse": worse},
        "mcs": {s: mcs(means, zeta, s, spec["alpha"]) for s in ("range", "max")},
        "zeta_head": zeta[:, :5].tolist(),
    }
    json.dump(result, open(sys.argv[2], "w"), indent=1)


main()
