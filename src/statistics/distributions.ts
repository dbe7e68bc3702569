/**
 * Thin typed wrappers over the stdlib-js normal and Student t distribution functions, with the
 * tail conventions the tests use.
 *
 * Upper tails are computed by symmetry as the lower tail at −x (1 − F(x) = F(−x)), which keeps
 * full relative accuracy far in the tail, like R's `pnorm(x, lower.tail = FALSE)` and scipy's
 * `norm.sf`. Two-sided p-values are 2 F(−|x|), at most 1.
 */
import normalCdf from '@stdlib/stats-base-dists-normal-cdf';
import normalQuantile from '@stdlib/stats-base-dists-normal-quantile';
import tCdf from '@stdlib/stats-base-dists-t-cdf';
import tQuantile from '@stdlib/stats-base-dists-t-quantile';

/** Φ(x), the standard normal CDF. @example standardNormalCdf(0) // 0.5 */
export function standardNormalCdf(x: number): number {
  return normalCdf(x, 0, 1);
}

/** 1 − Φ(x), as Φ(−x). @example standardNormalUpperTail(1.6448536269514722) // ≈ 0.05 */
export function standardNormalUpperTail(x: number): number {
  return normalCdf(-x, 0, 1);
}

/** 2 Φ(−|x|), the two-sided p-value of a N(0, 1) statistic. @example standardNormalTwoSided(1.959964) // ≈ 0.05 */
export function standardNormalTwoSided(x: number): number {
  return Math.min(1, 2 * normalCdf(-Math.abs(x), 0, 1));
}

/** Φ⁻¹(p), 0 < p < 1. @example standardNormalQuantile(0.975) // ≈ 1.959964 */
export function standardNormalQuantile(p: number): number {
  return normalQuantile(p, 0, 1);
}

/** F_ν(x), the Student t CDF with ν > 0 degrees of freedom. @example studentTCdf(0, 5) // 0.5 */
export function studentTCdf(x: number, degreesOfFreedom: number): number {
  return tCdf(x, degreesOfFreedom);
}

/** 1 − F_ν(x), as F_ν(−x). @example studentTUpperTail(2.015048, 5) // ≈ 0.05 */
export function studentTUpperTail(x: number, degreesOfFreedom: number): number {
  return tCdf(-x, degreesOfFreedom);
}

/** 2 F_ν(−|x|), the two-sided p-value of a t_ν statistic. @example studentTTwoSided(2.570582, 5) // ≈ 0.05 */
export function studentTTwoSided(x: number, degreesOfFreedom: number): number {
  return Math.min(1, 2 * tCdf(-Math.abs(x), degreesOfFreedom));
}

/** F_ν⁻¹(p), 0 < p < 1. @example studentTQuantile(0.975, 5) // ≈ 2.570582 */
export function studentTQuantile(p: number, degreesOfFreedom: number): number {
  return tQuantile(p, degreesOfFreedom);
}
