/**
 * Measured coverage of the report's intervals where it falls short of nominal: the worst
 * coverage over the designs of the coverage study (docs/validation.md, "Coverage of every
 * interval the report shows"; validation/coverageStudy.ts) at each studied n, at the default
 * level 0.9. Issue 15 asks that an interval more than 2 points under nominal, for which no
 * measured improvement met the bound within the time budget (the studentised bootstrap did not),
 * carry its measured coverage in the report. test/intervals/measuredCoverage.test.ts checks these
 * numbers against the table in docs/validation.md.
 */
export type MeasuredInterval =
  | 'relativeChange'
  | 'dieboldMarianoDifference'
  | 'bootstrapDifference';

export interface MeasuredCoverage {
  /** Worst measured coverage over the study's designs at `studiedN`. */
  readonly coverage: number;
  /** The level the study used. */
  readonly level: number;
  /** The studied n whose numbers apply: the largest studied n ≤ the data's n (50 below 50). */
  readonly studiedN: number;
}

const STUDIED_LEVEL = 0.9;

/**
 * [n, worst coverage] per interval, from docs/validation.md (1,000 replications per cell, B = 999,
 * default variance ewc-ar1; the worst design is φ = 0.9 almost everywhere).
 */
export const WORST_COVERAGE: Readonly<
  Record<MeasuredInterval, readonly (readonly [number, number])[]>
> = {
  relativeChange: [
    [50, 0.865],
    [100, 0.887],
    [200, 0.878],
    [500, 0.878],
  ],
  dieboldMarianoDifference: [
    [50, 0.826],
    [100, 0.842],
    [200, 0.851],
    [500, 0.866],
  ],
  bootstrapDifference: [
    [50, 0.618],
    [100, 0.718],
    [200, 0.748],
    [500, 0.802],
  ],
};

/**
 * The measured coverage to show beside an interval of `kind` at `n` time points and `level`, or
 * null when the study says it keeps its level within 2 points (or the level was not studied).
 */
export function measuredCoverage(
  kind: MeasuredInterval,
  n: number,
  level: number,
): MeasuredCoverage | null {
  if (level !== STUDIED_LEVEL) return null;
  const rows = WORST_COVERAGE[kind];
  let chosen = rows[0]!;
  for (const row of rows) if (row[0] <= n) chosen = row;
  const [studiedN, coverage] = chosen;
  return coverage < level - 0.02 ? { coverage, level, studiedN } : null;
}
