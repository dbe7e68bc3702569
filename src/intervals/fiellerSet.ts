import { type IntervalSet, normaliseSet } from './intervalSet.js';

/**
 * The Fieller (1954, "Some problems in interval estimation", JRSS B 16) confidence set for the
 * ratio-type parameter r in E[D] − r·E[B] = 0, from the means and the estimated covariance matrix
 * of the two means:
 *
 *   { r : (m_D − r m_B)² ≤ c² (V_DD − 2 r V_DB + r² V_BB) },
 *
 * i.e. every r at which the t test of the linear combination D − r·B with critical value c does
 * not reject (two-sided at level 1 − 2·tail when c is the (1 − tail) quantile). Written as
 * a r² − 2 b r + e ≤ 0 with a = m_B² − c² V_BB, b = m_D m_B − c² V_DB, e = m_D² − c² V_DD:
 *
 * - a > 0 (m_B significantly non-zero): the bounded interval between the roots;
 * - a < 0 and b² − a e ≥ 0: two rays (−∞, r₁] ∪ [r₂, ∞);
 * - a < 0 and b² − a e < 0: the whole line;
 * - a = 0: one ray (or the line, or nothing).
 *
 * Roots use the cancellation-free form r = (b ± √(b² − ae))/a with the product e/a for the
 * smaller root. Conventions: V is the covariance of the two MEANS (long-run covariance / n);
 * ends are reported closed.
 *
 * @example fiellerSet({ meanD: 1, meanB: 10, varDD: 0.04, varDB: 0, varBB: 0.01, critical: 2 })
 *   // a = 99.96, b = 10, e = 0.84: roots (10 ± √16.0336)/99.96 → [0.06, 0.14] approximately
 */
export function fiellerSet(input: {
  readonly meanD: number;
  readonly meanB: number;
  readonly varDD: number;
  readonly varDB: number;
  readonly varBB: number;
  readonly critical: number;
}): IntervalSet {
  const { meanD, meanB, varDD, varDB, varBB, critical } = input;
  const c2 = critical * critical;
  const a = meanB * meanB - c2 * varBB;
  const b = meanD * meanB - c2 * varDB;
  const e = meanD * meanD - c2 * varDD;
  const discriminant = b * b - a * e;
  if (a === 0) {
    // −2 b r + e ≤ 0
    if (b > 0) return [{ lower: e / (2 * b), upper: null }];
    if (b < 0) return [{ lower: null, upper: e / (2 * b) }];
    return e <= 0 ? [{ lower: null, upper: null }] : [];
  }
  if (discriminant < 0) return a > 0 ? [] : [{ lower: null, upper: null }];
  const root = Math.sqrt(discriminant);
  const q = b + (b >= 0 ? root : -root); // |q| = |b| + √disc: no cancellation
  const r1 = q / a;
  const r2 = q === 0 ? 0 : e / q; // r1 · r2 = e / a
  const small = Math.min(r1, r2);
  const large = Math.max(r1, r2);
  if (a > 0) return [{ lower: small, upper: large }];
  return normaliseSet([
    { lower: null, upper: small },
    { lower: large, upper: null },
  ]);
}
