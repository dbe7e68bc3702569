import { lossDifferential } from '../src/aggregation/lossSeries.js';
import { runBootstrap } from '../src/comparison/runBootstrap.js';
import { runDieboldMariano } from '../src/comparison/runDieboldMariano.js';
import { hypothesisFor } from '../src/decision/hypothesis.js';
import { setContains } from '../src/intervals/intervalSet.js';
import { relativeChange } from '../src/intervals/relativeChange.js';
import { createRandomSource } from '../src/random/randomSource.js';
import { resolveSettings } from '../src/settings/resolveSettings.js';
import { type CoverageDesign, coverageTruth, simulateCoverageSeries } from './coverageDesigns.js';

/** The intervals the report shows, and the two tests' inverted sets the combined one is made of. */
export const COVERAGE_INTERVALS = [
  'relative change (shown: both tests inverted, union)',
  'relative change, Fieller alone',
  'relative change, inverted bootstrap alone',
  'difference, Diebold–Mariano (t_ν)',
  'difference, bootstrap (basic)',
] as const;
export type CoverageInterval = (typeof COVERAGE_INTERVALS)[number];

export interface CoverageResult {
  readonly design: CoverageDesign;
  readonly replications: number;
  readonly resamples: number;
  readonly level: number;
  /** Share of replications whose interval held the truth. */
  readonly covered: Readonly<Record<CoverageInterval, number>>;
  /** Share whose interval lay wholly above / below the truth (each end's one-sided miss rate). */
  readonly missAbove: Readonly<Record<CoverageInterval, number>>;
  readonly missBelow: Readonly<Record<CoverageInterval, number>>;
}

/**
 * Coverage of each interval over `replications` simulated backtests of one design, through the
 * gate's own code with the default settings (level 1 − 2α = 90%, ewc, automatic block length).
 * Replication r draws its errors from random stream r of `seed`; the bootstrap uses the gate's
 * seed, as in the gate. An interval "misses above" when its lower end exceeds the truth (for the
 * relative change under no-regression: a false "worse by more than the truth").
 */
export function runCoverage(
  design: CoverageDesign,
  options: { replications: number; firstReplication?: number; resamples: number; seed: number },
): CoverageResult {
  const settings = resolveSettings(
    {
      baseline: 'simulated',
      candidate: 'simulated',
      resamples: String(options.resamples),
      'min-points': '1',
    },
    (name) => name,
  );
  const hypothesis = hypothesisFor('no-regression', 0, 'relative');
  const zero = () =>
    Object.fromEntries(COVERAGE_INTERVALS.map((k) => [k, 0])) as Record<CoverageInterval, number>;
  const covered = zero();
  const above = zero();
  const below = zero();
  const truth = coverageTruth(design);
  const first = options.firstReplication ?? 0;
  const tally = (
    key: CoverageInterval,
    contains: boolean,
    lower: number | null,
    upper: number | null,
    value: number,
  ) => {
    if (contains) covered[key]++;
    else if (lower !== null && lower > value) above[key]++;
    else if (upper !== null && upper < value) below[key]++;
  };
  for (let r = first; r < first + options.replications; r++) {
    const series = simulateCoverageSeries(design, createRandomSource(options.seed, r));
    const d = lossDifferential(series, 0);
    const dm = runDieboldMariano(d, 1, hypothesis, settings, d);
    const bs = runBootstrap(d, series, hypothesis, settings, undefined, d);
    for (const [key, agreement] of [
      [COVERAGE_INTERVALS[0], 'both'],
      [COVERAGE_INTERVALS[1], 'dm'],
      [COVERAGE_INTERVALS[2], 'bootstrap'],
    ] as const) {
      const rc = relativeChange({
        series,
        settings,
        agreement,
        dieboldMariano: dm,
        bootstrap: { state: bs.summary.state, resampledDeviations: bs.resampledDeviations },
      });
      const set = rc === null ? [] : (rc.pieces ?? [{ lower: rc.lower, upper: rc.upper }]);
      tally(
        key,
        setContains(set, truth.relative),
        rc?.lower ?? null,
        rc?.upper ?? null,
        truth.relative,
      );
    }
    for (const [key, interval] of [
      [COVERAGE_INTERVALS[3], dm.interval],
      [COVERAGE_INTERVALS[4], bs.summary.interval],
    ] as const) {
      const inside =
        interval !== null &&
        interval.lower <= truth.difference &&
        truth.difference <= interval.upper;
      tally(key, inside, interval?.lower ?? null, interval?.upper ?? null, truth.difference);
    }
  }
  const reps = options.replications;
  const share = (x: Record<CoverageInterval, number>) =>
    Object.fromEntries(COVERAGE_INTERVALS.map((k) => [k, x[k] / reps])) as Record<
      CoverageInterval,
      number
    >;
  return {
    design,
    replications: reps,
    resamples: options.resamples,
    level: settings.confidence,
    covered: share(covered),
    missAbove: share(above),
    missBelow: share(below),
  };
}
