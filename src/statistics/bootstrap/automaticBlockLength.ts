import { autocovariances } from '../autocovariance.js';
import { flatTop } from './flatTopWindow.js';

/** Every quantity the automatic choice went through, for the report and for audits. */
export interface AutomaticBlockLength {
  /** n, the series length. */
  n: number;
  /** K_N = max(5, ⌈log10 n⌉): how many consecutive small autocorrelations make a run. */
  runLength: number;
  /** m_max = ⌈√n⌉ + K_N (autocorrelations are examined at lags 1..min(m_max, n − 1)). */
  maxLag: number;
  /** b_max = ⌈min(3√n, n/3)⌉. */
  maxBlockLength: number;
  /** 2·√(log10 n / n): |ρ̂_k| below this counts as small. */
  criticalValue: number;
  /** Whether a run of K_N small autocorrelations was found. */
  runFound: boolean;
  /** m̂: the first lag that starts such a run (null when none was found). */
  firstSmallLag: number | null;
  /** M = min(2 m̂, m_max), or m_max when no run exists: the flat-top window's bandwidth. */
  bandwidth: number;
  /** Ĝ = Σ_{|k|≤M} λ(k/M) |k| γ̂_k. */
  gHat: number;
  /** ĝ = Σ_{|k|≤M} λ(k/M) γ̂_k (2π times the flat-top spectral density estimate at 0). */
  spectralSum: number;
  /** D = 2ĝ² (stationary bootstrap, Patton, Politis & White 2009). */
  d: number;
  /** (2Ĝ²/D)^{1/3} n^{1/3} before clamping (null when D = 0). */
  unclamped: number | null;
  /** The expected block length b: `unclamped` clamped to [1, b_max]. */
  blockLength: number;
  notes: string[];
}

/**
 * Automatic expected block length for the stationary bootstrap: the plug-in rule of Politis &
 * White (2004), "Automatic block-length selection for the dependent bootstrap", Econometric
 * Reviews 23(1), with the correction of Patton, Politis & White (2009), Econometric Reviews 28(4),
 * exactly as docs/design.md ("Stationary bootstrap", automatic b) states it:
 *
 * - γ̂_k = (1/n) Σ_{t=k+1..n} (d_t − d̄)(d_{t−k} − d̄) (divide by n), ρ̂_k = γ̂_k / γ̂_0;
 * - K_N = max(5, ⌈log10 n⌉), m_max = ⌈√n⌉ + K_N, b_max = ⌈min(3√n, n/3)⌉,
 *   critical value c = 2√(log10 n / n);
 * - m̂ = the first lag j ≥ 1 with |ρ̂_j|, …, |ρ̂_{j+K_N−1}| all < c ("below" in absolute value,
 *   strictly, as Politis & White's rule for insignificant correlations), searching only runs
 *   that end at or before lag min(m_max, n − 1); M = min(2m̂, m_max), or m_max without a run
 *   (M is also kept ≤ n − 1);
 * - flat-top window λ(s) = 1 for |s| ≤ ½, 2(1 − |s|) for ½ < |s| ≤ 1, 0 beyond (Politis & Romano
 *   1995); Ĝ = Σ_{|k|≤M} λ(k/M)|k|γ̂_k, ĝ = Σ_{|k|≤M} λ(k/M)γ̂_k, both sums over k = −M..M with
 *   γ̂_{−k} = γ̂_k;
 * - D = 2ĝ², b = (2Ĝ²/D)^{1/3} n^{1/3}, clamped to [1, b_max].
 *
 * Degenerate cases: a constant series (γ̂_0 = 0) gives b = 1 (nothing to preserve); D = 0 with
 * Ĝ ≠ 0 gives b = b_max; n < 2 gives b = 1. Each says so in `notes`.
 *
 * Example: for an AR(1) series with φ = 0.6 the population values give Ĝ/ĝ → 2φ/(1 − φ²) = 1.875,
 * so b ≈ 1.875^{2/3} n^{1/3} ≈ 1.52 n^{1/3}, about 70 for n = 100,000.
 */
export function automaticBlockLength(d: Float64Array): AutomaticBlockLength {
  const n = d.length;
  const notes: string[] = [];
  const runLength = Math.max(5, Math.ceil(Math.log10(Math.max(n, 1))));
  const maxLag = Math.ceil(Math.sqrt(n)) + runLength;
  const maxBlockLength = Math.max(1, Math.ceil(Math.min(3 * Math.sqrt(n), n / 3)));
  const criticalValue = n > 0 ? 2 * Math.sqrt(Math.log10(n) / n) : Number.NaN;
  const base = { n, runLength, maxLag, maxBlockLength, criticalValue };

  if (n < 2) {
    notes.push(`series has ${n} observation(s); block length 1`);
    return degenerate(base, 1, notes);
  }
  const lags = Math.min(maxLag, n - 1);
  const gamma = autocovariances(d, lags);
  const variance = gamma[0]!;
  if (!(variance > 0)) {
    notes.push('constant series: no dependence to preserve; block length 1');
    return degenerate(base, 1, notes);
  }

  let firstSmallLag: number | null = null;
  let run = 0;
  for (let k = 1; k <= lags; k++) {
    if (Math.abs(gamma[k]! / variance) < criticalValue) {
      run++;
      if (run === runLength) {
        firstSmallLag = k - runLength + 1;
        break;
      }
    } else {
      run = 0;
    }
  }
  const runFound = firstSmallLag !== null;
  if (!runFound) notes.push(`no run of ${runLength} small autocorrelations up to lag ${lags}`);
  const bandwidth = Math.min(firstSmallLag === null ? maxLag : 2 * firstSmallLag, maxLag, n - 1);

  let gHat = 0;
  let spectralSum = gamma[0]!;
  for (let k = 1; k <= bandwidth; k++) {
    const weight = flatTop(k / bandwidth);
    if (weight === 0) continue;
    gHat += 2 * weight * k * gamma[k]!;
    spectralSum += 2 * weight * gamma[k]!;
  }
  const dValue = 2 * spectralSum * spectralSum;
  let unclamped: number | null = null;
  let blockLength: number;
  if (dValue > 0) {
    unclamped = Math.cbrt((2 * gHat * gHat) / dValue) * Math.cbrt(n);
    blockLength = Math.min(Math.max(unclamped, 1), maxBlockLength);
    if (unclamped < 1) notes.push(`estimate ${unclamped} raised to 1`);
    if (unclamped > maxBlockLength) notes.push(`estimate ${unclamped} capped at ${maxBlockLength}`);
  } else {
    blockLength = gHat === 0 ? 1 : maxBlockLength;
    notes.push(`spectral estimate at zero is 0; block length ${blockLength}`);
  }
  return {
    ...base,
    runFound,
    firstSmallLag,
    bandwidth,
    gHat,
    spectralSum,
    d: dValue,
    unclamped,
    blockLength,
    notes,
  };
}

function degenerate(
  base: Pick<
    AutomaticBlockLength,
    'n' | 'runLength' | 'maxLag' | 'maxBlockLength' | 'criticalValue'
  >,
  blockLength: number,
  notes: string[],
): AutomaticBlockLength {
  return {
    ...base,
    runFound: false,
    firstSmallLag: null,
    bandwidth: 0,
    gHat: 0,
    spectralSum: 0,
    d: 0,
    unclamped: null,
    blockLength,
    notes,
  };
}
