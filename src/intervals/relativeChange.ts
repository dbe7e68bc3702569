import type { LossSeries } from '../aggregation/lossSeries.js';
import type { Agreement } from '../decision/policy.js';
import type { Settings } from '../settings/settings.js';
import { tailProbability } from '../statistics/bootstrap/basicBootstrapInference.js';
import { mean } from '../statistics/mean.js';
import { bootstrapMarginSet } from './bootstrapMarginSet.js';
import { dieboldMarianoMarginSet } from './dieboldMarianoMarginSet.js';
import {
  hullOfSet,
  type IntervalPiece,
  type IntervalSet,
  intersectionOfSets,
  unionOfSets,
} from './intervalSet.js';
import { type MeasuredCoverage, measuredCoverage } from './measuredCoverage.js';

/**
 * The relative change E[L_c]/E[L_b] − 1 with the set of relative margins at which the gate would
 * not reject (docs/decisions/0011-intervals-from-the-tests.md): each test inverted over the margin
 * (`dieboldMarianoMarginSet`, `bootstrapMarginSet`), then combined the way the policy combines
 * the tests: the union with agreement `both` (the gate acts only when both reject), the
 * intersection with `either`, one test's set with `dm` / `bootstrap` or when only one was
 * computed. At the default level 1 − 2α each end is a one-sided α bound, so under
 * `no-regression` the gate fails exactly when `lower` is above the margin, and under
 * `superiority` passes exactly when `upper` is below minus the margin.
 *
 * Reporting: `lower` / `upper` are the ends of the set's hull, null meaning unbounded (the
 * baseline's mean loss is not distinguishable from 0, so no ratio bound exists on that side);
 * `pieces` is present only when the set is not one interval (two rays, or empty when the tests
 * reject at every margin), and then lists its disjoint pieces.
 */
export interface RelativeChange {
  readonly estimate: number;
  readonly level: number;
  readonly lower: number | null;
  readonly upper: number | null;
  readonly method: string;
  readonly pieces?: readonly IntervalPiece[];
  /** Present when the coverage study measured this interval > 2 points under its level. */
  readonly measuredCoverage?: MeasuredCoverage;
}

export function relativeChange(input: {
  readonly series: LossSeries;
  readonly settings: Settings;
  /** The agreement in force (per-series comparisons without a bootstrap use `dm`). */
  readonly agreement: Agreement;
  readonly dieboldMariano: {
    readonly state: string;
    readonly degreesOfFreedom: number | null;
  };
  readonly bootstrap: {
    readonly state: string;
    readonly resampledDeviations: { candidate: Float64Array; baseline: Float64Array } | null;
  };
}): RelativeChange | null {
  const { series, settings } = input;
  const n = series.baseline.length;
  if (n === 0) return null;
  const meanB = mean(series.baseline);
  if (!(meanB > 0)) return null;
  const estimate = mean(series.candidate) / meanB - 1;
  const level = settings.confidence;
  const tail = tailProbability(level) / 2;

  let dm: { set: IntervalSet; method: string } | null = null;
  if (input.dieboldMariano.state === 'ok') {
    const found = dieboldMarianoMarginSet({
      candidate: series.candidate,
      baseline: series.baseline,
      estimator: settings.variance,
      lag: settings.lag,
      degreesOfFreedom: input.dieboldMariano.degreesOfFreedom,
      horizon: series.maxHorizon,
      tail,
    });
    if (found !== null) dm = { set: found.set, method: `Fieller (${found.estimator})` };
  }
  let bs: { set: IntervalSet; method: string } | null = null;
  const deviations = input.bootstrap.resampledDeviations;
  if (input.bootstrap.state === 'ok' && deviations !== null) {
    const deviationsD = new Float64Array(deviations.candidate.length);
    for (let b = 0; b < deviationsD.length; b++) {
      deviationsD[b] = deviations.candidate[b]! - deviations.baseline[b]!;
    }
    const d = new Float64Array(n);
    for (let t = 0; t < n; t++) d[t] = series.candidate[t]! - series.baseline[t]!;
    bs = {
      set: bootstrapMarginSet({
        meanD: mean(d),
        meanB,
        deviationsD,
        deviationsB: deviations.baseline,
        tail,
      }),
      method: 'inverted bootstrap',
    };
  }
  const chosen = combine(input.agreement, dm, bs);
  if (chosen === null) return null;
  const hull = hullOfSet(chosen.set);
  const measured = measuredCoverage('relativeChange', n, level);
  return {
    estimate,
    level,
    lower: hull?.lower ?? null,
    upper: hull?.upper ?? null,
    method: chosen.method,
    ...(chosen.set.length === 1 ? {} : { pieces: chosen.set }),
    ...(measured === null ? {} : { measuredCoverage: measured }),
  };
}

function combine(
  agreement: Agreement,
  dm: { set: IntervalSet; method: string } | null,
  bs: { set: IntervalSet; method: string } | null,
): { set: IntervalSet; method: string } | null {
  if (agreement === 'dm') return dm;
  if (agreement === 'bootstrap') return bs;
  if (dm === null || bs === null) return dm ?? bs;
  return agreement === 'both'
    ? { set: unionOfSets(dm.set, bs.set), method: `${dm.method} ∪ ${bs.method}` }
    : { set: intersectionOfSets(dm.set, bs.set), method: `${dm.method} ∩ ${bs.method}` };
}
