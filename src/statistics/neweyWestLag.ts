import { autocovariances } from './autocovariance.js';

/**
 * How the lag L of the Bartlett / uniform long-run variance is chosen (`--lag`): `auto` (the
 * Newey–West 1994 plug-in, at least h − 1), `horizon` (h − 1), or a fixed lag.
 */
export const LAG_RULE_KINDS = ['auto', 'horizon', 'fixed'] as const;
/** A lag rule: the kinds other than `fixed` take no parameter. */
export type LagRule =
  | { kind: Exclude<(typeof LAG_RULE_KINDS)[number], 'fixed'> }
  | { kind: 'fixed'; lag: number };

export interface NeweyWestBandwidth {
  /** Pilot lag m = ⌊4 (n/100)^{2/9}⌋, at most n − 1. */
  readonly pilotLag: number;
  /** s0 = σ_0 + 2 Σ_{j=1..m} σ_j. */
  readonly s0: number;
  /** s1 = 2 Σ_{j=1..m} j σ_j. */
  readonly s1: number;
  /** 1.1447 |s1/s0|^{2/3} n^{1/3}; 0 when s0 = 0. */
  readonly bandwidth: number;
}

/**
 * Newey & West (1994) plug-in bandwidth for the Bartlett kernel, without prewhitening:
 *
 *   m = ⌊4 (n/100)^{2/9}⌋,  σ_j = (1/n) Σ_t u_t u_{t+j} (u the centred series, i.e. γ̂_j),
 *   s0 = σ_0 + 2 Σ_{j=1..m} σ_j,  s1 = 2 Σ_{j=1..m} j σ_j,
 *   bandwidth = 1.1447 · ((s1/s0)²)^{1/3} · n^{1/3}.
 *
 * Conventions: |s1/s0|^{2/3} is computed as ((s1/s0)²)^{1/3}, as R's
 * `sandwich::bwNeweyWest(lm(x ~ 1), kernel = "Bartlett", prewhite = 0)` does, so a negative
 * s1/s0 gives a positive bandwidth (the paper's formula takes the ratio squared). The pilot lag
 * is capped at n − 1. When s0 = 0 the ratio is undefined and the bandwidth is reported as 0.
 *
 * @example neweyWestBandwidth(new Float64Array([1, 2, 3, 4]))
 *   // { pilotLag: 1, s0: 1.875, s1: 0.625, bandwidth: 1.1447·(1/9)^{1/3}·4^{1/3} ≈ 0.87357 }
 * @throws RangeError for a series of fewer than 2 values.
 */
export function neweyWestBandwidth(x: Float64Array): NeweyWestBandwidth {
  const n = x.length;
  if (n < 2) throw new RangeError(`neweyWestBandwidth: needs at least 2 values, got ${n}`);
  const pilotLag = Math.min(Math.floor(4 * (n / 100) ** (2 / 9)), n - 1);
  const sigma = autocovariances(x, pilotLag);
  let sum = 0;
  let weighted = 0;
  for (let j = 1; j <= pilotLag; j++) {
    sum += sigma[j]!;
    weighted += j * sigma[j]!;
  }
  const s0 = sigma[0]! + 2 * sum;
  const s1 = 2 * weighted;
  const bandwidth = s0 === 0 ? 0 : 1.1447 * ((s1 / s0) ** 2) ** (1 / 3) * n ** (1 / 3);
  return { pilotLag, s0, s1, bandwidth };
}

export interface LagChoice {
  /** The lag in force, an integer in 0..n−1. */
  readonly lag: number;
  readonly rule: LagRule['kind'];
  /** For the automatic rule: the Newey–West pilot quantities and bandwidth. */
  readonly bandwidth?: NeweyWestBandwidth;
  /** Plain-words notes on every adjustment made to the lag. */
  readonly notes: string[];
}

/**
 * Chooses the lag L for a series of n values and forecast horizon h:
 * - `auto`: ⌊bandwidth⌋ from `neweyWestBandwidth` (Newey & West 1994), raised to at least h − 1
 *   (an h-step forecast error is MA(h − 1) under optimal forecasting, Diebold & Mariano 1995);
 * - `horizon`: h − 1, the Diebold & Mariano (1995) convention;
 * - `fixed`: the given lag, kept even below h − 1 (with a note then).
 * Every rule is capped at n − 1, the largest lag with an autocovariance; every raise or cap is
 * reported in `notes`, never made silently.
 *
 * @example selectLag(new Float64Array(10).map((_, t) => t % 3), { kind: 'horizon' }, 4).lag // 3
 * @throws RangeError for fewer than 2 values, a horizon that is not an integer ≥ 1, or a fixed
 *   lag that is not an integer ≥ 0.
 */
export function selectLag(x: Float64Array, rule: LagRule, horizon: number): LagChoice {
  const n = x.length;
  if (n < 2) throw new RangeError(`selectLag: needs at least 2 values, got ${n}`);
  if (!Number.isInteger(horizon) || horizon < 1) {
    throw new RangeError(`selectLag: the horizon must be an integer ≥ 1, got ${horizon}`);
  }
  const notes: string[] = [];
  const cap = (lag: number, what: string): number => {
    if (lag <= n - 1) return lag;
    notes.push(`The ${what} ${lag} exceeds n − 1 = ${n - 1}; lag ${n - 1} was used instead.`);
    return n - 1;
  };
  switch (rule.kind) {
    case 'auto': {
      const bandwidth = neweyWestBandwidth(x);
      let lag = Math.floor(bandwidth.bandwidth);
      if (bandwidth.s0 === 0) {
        notes.push('The Newey–West pilot sum s0 is 0, so the automatic bandwidth is taken as 0.');
      }
      if (lag < horizon - 1) {
        notes.push(
          `The automatic lag ⌊${bandwidth.bandwidth.toPrecision(6)}⌋ = ${lag} is below h − 1 = ` +
            `${horizon - 1} for horizon ${horizon}; lag ${horizon - 1} was used.`,
        );
        lag = horizon - 1;
      }
      return { lag: cap(lag, 'automatic lag'), rule: 'auto', bandwidth, notes };
    }
    case 'horizon':
      return { lag: cap(horizon - 1, 'lag h − 1 ='), rule: 'horizon', notes };
    case 'fixed': {
      if (!Number.isInteger(rule.lag) || rule.lag < 0) {
        throw new RangeError(`selectLag: a fixed lag must be an integer ≥ 0, got ${rule.lag}`);
      }
      if (rule.lag < horizon - 1) {
        notes.push(
          `The fixed lag ${rule.lag} is below h − 1 = ${horizon - 1}; h-step forecast errors ` +
            'are usually correlated up to lag h − 1, so the variance may be understated.',
        );
      }
      return { lag: cap(rule.lag, 'fixed lag'), rule: 'fixed', notes };
    }
  }
}
