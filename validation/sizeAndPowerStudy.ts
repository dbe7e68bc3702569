import { lossDifferential } from '../src/aggregation/lossSeries.js';
import { compareLossSeries } from '../src/comparison/compareLossSeries.js';
import { hypothesisFor } from '../src/decision/hypothesis.js';
import { createRandomSource } from '../src/random/randomSource.js';
import { resolveSettings } from '../src/settings/resolveSettings.js';
import { dieboldMariano } from '../src/statistics/dieboldMariano.js';
import {
  type SimulationDesign,
  simulateLossSeries,
  trueMeanDifferential,
} from './simulateLossSeries.js';

/** Rejection counts of each test, and interval coverage, over the replications of one design. */
export interface StudyResult {
  readonly design: SimulationDesign;
  readonly replications: number;
  readonly resamples: number;
  readonly alpha: number;
  /** Share of replications in which each procedure found "candidate worse". */
  readonly rejectionRate: Readonly<Record<StudyProcedure, number>>;
  /** Share of replications in which each 95% interval covered the true E[d]. */
  readonly coverage: { readonly bootstrap: number; readonly dieboldMarianoEwc: number };
  /** Share of replications whose default-policy verdict was fail / warn. */
  readonly verdicts: { readonly fail: number; readonly warn: number };
}

export const STUDY_PROCEDURES = [
  'bartlett, lag 0',
  'bartlett, automatic lag',
  'bartlett, automatic lag + HLN',
  'ewc-ar1 (default)',
  'stationary bootstrap',
  'default policy (ewc-ar1 and bootstrap agree)',
] as const;
export type StudyProcedure = (typeof STUDY_PROCEDURES)[number];

/**
 * Runs `replications` simulated backtests of one design through the same code the gate uses
 * (compareLossSeries with the default settings, plus Diebold–Mariano variants for comparison).
 * Replication r draws its errors from random stream r of `seed` (bootstrap resamples use the
 * settings' seed, as the gate does), so any subset of replications can run on any thread and give
 * the same numbers.
 */
export function runStudy(
  design: SimulationDesign,
  options: {
    replications: number;
    firstReplication?: number;
    resamples: number;
    seed: number;
    alpha?: number;
  },
): StudyResult {
  const alpha = options.alpha ?? 0.05;
  const settings = resolveSettings(
    {
      baseline: 'simulated',
      candidate: 'simulated',
      resamples: String(options.resamples),
      alpha: String(alpha),
      'min-points': '1',
      // The coverage columns are for two-sided 95% intervals, whatever the report's default level.
      confidence: '0.95',
    },
    (name) => name,
  );
  const hypothesis = hypothesisFor('no-regression', 0, 'relative');
  const counts = Object.fromEntries(STUDY_PROCEDURES.map((p) => [p, 0])) as Record<
    StudyProcedure,
    number
  >;
  let coveredBootstrap = 0;
  let coveredEwc = 0;
  let fails = 0;
  let warns = 0;
  const truth = trueMeanDifferential(design);
  const first = options.firstReplication ?? 0;
  for (let r = first; r < first + options.replications; r++) {
    const series = simulateLossSeries(design, createRandomSource(options.seed, r));
    const d = lossDifferential(series, 0);
    const dm = (
      estimator: 'bartlett' | 'ewc',
      lag: { kind: 'auto' } | { kind: 'fixed'; lag: number },
    ) => dieboldMariano(d, { estimator, lag, horizon: 1, margin: 0 });
    const lag0 = dm('bartlett', { kind: 'fixed', lag: 0 });
    const auto = dm('bartlett', { kind: 'auto' });
    const reject = (p: number | null | undefined) => p !== null && p !== undefined && p <= alpha;
    if (reject(lag0.pValue)) counts['bartlett, lag 0']++;
    if (reject(auto.pValue)) counts['bartlett, automatic lag']++;
    if (reject(auto.smallSample?.pValue)) counts['bartlett, automatic lag + HLN']++;
    const comparison = compareLossSeries(
      series,
      { loss: 'squared', horizon: 'all', series: 'all', timestamps: [] },
      hypothesis,
      settings,
    );
    if (comparison.rejected.dieboldMariano) counts['ewc-ar1 (default)']++;
    if (comparison.rejected.bootstrap) counts['stationary bootstrap']++;
    if (comparison.verdict === 'fail') {
      counts['default policy (ewc-ar1 and bootstrap agree)']++;
      fails++;
    }
    if (comparison.verdict === 'warn') warns++;
    const bi = comparison.bootstrap.interval;
    if (bi !== null && bi.lower <= truth && truth <= bi.upper) coveredBootstrap++;
    const di = comparison.dieboldMariano.interval;
    if (di !== null && di.lower <= truth && truth <= di.upper) coveredEwc++;
  }
  const reps = options.replications;
  const rate = Object.fromEntries(STUDY_PROCEDURES.map((p) => [p, counts[p] / reps])) as Record<
    StudyProcedure,
    number
  >;
  return {
    design,
    replications: reps,
    resamples: options.resamples,
    alpha,
    rejectionRate: rate,
    coverage: { bootstrap: coveredBootstrap / reps, dieboldMarianoEwc: coveredEwc / reps },
    verdicts: { fail: fails / reps, warn: warns / reps },
  };
}
