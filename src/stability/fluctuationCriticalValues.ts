/**
 * Critical values of the fluctuation test (Giacomini & Rossi 2010, Table I): the 1 − α quantiles
 * of sup_s (B(s + μ) − B(s))/√μ (one-sided) and of sup_s |B(s + μ) − B(s)|/√μ (two-sided) over
 * s ∈ [0, 1 − μ], B a standard Brownian motion, for μ = 0.1, …, 0.9.
 *
 * Sources: α = 0.05 and 0.10 are the published Table I (the two-sided 5% values for μ = 0.1–0.4
 * as quoted in the project's issue; the rest from memory, each reproduced within Monte Carlo error
 * by validation/fluctuation_table.py, see docs/fluctuation-table.md). α = 0.01 is not in the
 * paper: it is the project's own simulation (same script, 100,000 paths, the 500-step grid of
 * validation/fluctuationTable.json).
 */
export const TABLE_MU: readonly number[] = [0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9];

/** One-sided (a candidate worse in some stretch) or two-sided (`--fluctuation-sides`). */
export const FLUCTUATION_SIDES = ['one', 'two'] as const;
export type FluctuationSides = (typeof FLUCTUATION_SIDES)[number];

interface Column {
  readonly alpha: number;
  readonly values: readonly number[];
}

const TABLE: Readonly<Record<FluctuationSides, readonly Column[]>> = {
  two: [
    { alpha: 0.01, values: [3.8733, 3.6919, 3.5621, 3.4441, 3.347, 3.231, 3.133, 3.0092, 2.8685] },
    { alpha: 0.05, values: [3.393, 3.179, 3.012, 2.89, 2.779, 2.634, 2.56, 2.433, 2.248] },
    { alpha: 0.1, values: [3.17, 2.948, 2.766, 2.626, 2.5, 2.356, 2.252, 2.13, 1.95] },
  ],
  one: [
    { alpha: 0.01, values: [3.69, 3.4981, 3.3616, 3.2245, 3.0992, 3.0005, 2.8805, 2.76, 2.6099] },
    { alpha: 0.05, values: [3.176, 2.938, 2.77, 2.624, 2.475, 2.352, 2.248, 2.08, 1.975] },
    { alpha: 0.1, values: [2.928, 2.676, 2.482, 2.334, 2.168, 2.03, 1.904, 1.74, 1.6] },
  ],
};

/**
 * The critical value for window fraction μ ∈ [0.1, 0.9] and level α ∈ [0.01, 0.10]: linear
 * interpolation in μ between the table's columns, then (for α between table levels) linear
 * interpolation in log α. Returns null outside those ranges (no table value to stand on).
 */
export function fluctuationCriticalValue(
  mu: number,
  alpha: number,
  sides: FluctuationSides,
): number | null {
  if (!(mu >= 0.1 - 1e-12 && mu <= 0.9 + 1e-12)) return null;
  const columns = TABLE[sides];
  const atAlpha = columns.find((c) => Math.abs(c.alpha - alpha) < 1e-12);
  if (atAlpha !== undefined) return interpolateInMu(atAlpha.values, mu);
  for (let i = 0; i + 1 < columns.length; i++) {
    const lo = columns[i]!;
    const hi = columns[i + 1]!;
    if (alpha > lo.alpha && alpha < hi.alpha) {
      const w = Math.log(alpha / lo.alpha) / Math.log(hi.alpha / lo.alpha);
      return (1 - w) * interpolateInMu(lo.values, mu) + w * interpolateInMu(hi.values, mu);
    }
  }
  return null;
}

function interpolateInMu(values: readonly number[], mu: number): number {
  const position = Math.min(Math.max((mu - 0.1) / 0.1, 0), TABLE_MU.length - 1);
  const i = Math.min(Math.floor(position + 1e-9), TABLE_MU.length - 2);
  const w = Math.min(Math.max(position - i, 0), 1);
  return (1 - w) * values[i]! + w * values[i + 1]!;
}
