import { tailOrderStatistic } from '../statistics/bootstrap/basicBootstrapInference.js';
import { type IntervalPiece, type IntervalSet, normaliseSet } from './intervalSet.js';

/**
 * Inverts the gate's stationary-bootstrap test over the relative margin: the set of r at which
 * neither one-sided basic-bootstrap test of E[D − r·B] = 0 rejects at tail probability `tail`,
 * with D = L_c − L_b, B = L_b and the resamples of both means drawn with the same blocks (so one
 * set of B resamples serves every r, exactly as the gate's test at that margin would draw them).
 *
 * For resample b, the reflected value of the tested mean is U_b(r) = A_b − r·C_b with
 * A_b = D̄ − (D̄*_b − D̄) and C_b = B̄ − (B̄*_b − B̄). The gate's test (`basicBootstrapInference`,
 * Davison & Hinkley 1997) rejects "E ≤ 0" when fewer than K = k(tail) of the U_b are ≤ 0, and
 * "E ≥ 0" when fewer than K are ≥ 0. So the set is {r : #{U_b(r) ≤ 0} ≥ K and #{U_b(r) ≥ 0} ≥ K}.
 * When every C_b > 0 (the usual case: no resampled baseline mean reaches twice its sample mean)
 * this is [ρ_(K), ρ_(B+1−K)] for ρ_b = A_b / C_b; in general each U_b changes sign once, at ρ_b,
 * and the set is found by evaluating both counts at every ρ_b and between them, O(B log B).
 *
 * Ends are closed (the bootstrap test does not reject at an end). Returns [] when the tests
 * reject at every margin.
 */
export function bootstrapMarginSet(input: {
  readonly meanD: number;
  readonly meanB: number;
  /** D̄*_b − D̄ per resample. */
  readonly deviationsD: Float64Array;
  /** B̄*_b − B̄ per resample. */
  readonly deviationsB: Float64Array;
  readonly tail: number;
}): IntervalSet {
  const { meanD, meanB, deviationsD, deviationsB, tail } = input;
  const resamples = deviationsD.length;
  const k = tailOrderStatistic(tail, resamples);
  const rising: number[] = []; // C_b > 0: U_b(r) ≤ 0 ⇔ r ≥ ρ_b
  const falling: number[] = []; // C_b < 0: U_b(r) ≤ 0 ⇔ r ≤ ρ_b
  let flatBelow = 0; // C_b = 0, A_b ≤ 0
  let flatAbove = 0; // C_b = 0, A_b ≥ 0
  for (let b = 0; b < resamples; b++) {
    const a = meanD - deviationsD[b]!;
    const c = meanB - deviationsB[b]!;
    if (c > 0) rising.push(a / c);
    else if (c < 0) falling.push(a / c);
    else {
      if (a <= 0) flatBelow++;
      if (a >= 0) flatAbove++;
    }
  }
  const up = Float64Array.from(rising).sort();
  const down = Float64Array.from(falling).sort();
  const accepted = (r: number): boolean => {
    const upAtOrBelow = countAtOrBelow(up, r);
    const upAtOrAbove = up.length - countBelow(up, r);
    const downAtOrBelow = countAtOrBelow(down, r);
    const downAtOrAbove = down.length - countBelow(down, r);
    const nonPositive = flatBelow + upAtOrBelow + downAtOrAbove; // #{U_b(r) ≤ 0}
    const nonNegative = flatAbove + upAtOrAbove + downAtOrBelow; // #{U_b(r) ≥ 0}
    return nonPositive >= k && nonNegative >= k;
  };
  if (up.length === 0 && down.length === 0) {
    return accepted(0) ? [{ lower: null, upper: null }] : [];
  }
  const points = Float64Array.from([...up, ...down]).sort();
  const unique: number[] = [];
  for (const p of points) if (unique[unique.length - 1] !== p) unique.push(p);
  const pieces: IntervalPiece[] = [];
  let open: number | null | undefined; // undefined: no piece open; null: open from −∞
  const close = (upper: number | null) => {
    if (open !== undefined) pieces.push({ lower: open, upper });
    open = undefined;
  };
  const m = unique.length;
  // Elementary parts: (−∞, p_0), p_0, (p_0, p_1), p_1, …, p_{m−1}, (p_{m−1}, ∞).
  if (accepted(unique[0]! - 1 - Math.abs(unique[0]!))) open = null;
  for (let i = 0; i < m; i++) {
    const p = unique[i]!;
    if (accepted(p)) {
      if (open === undefined) open = p;
    } else {
      close(p);
    }
    const next = unique[i + 1];
    const between = next === undefined ? p + 1 + Math.abs(p) : p + (next - p) / 2;
    if (accepted(between)) {
      if (open === undefined) open = p;
    } else {
      close(p);
    }
  }
  close(null);
  return normaliseSet(pieces);
}

/** #{x ≤ r} in an ascending array. */
function countAtOrBelow(sorted: Float64Array, r: number): number {
  let lo = 0;
  let hi = sorted.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (sorted[mid]! <= r) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** #{x < r} in an ascending array. */
function countBelow(sorted: Float64Array, r: number): number {
  let lo = 0;
  let hi = sorted.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (sorted[mid]! < r) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}
