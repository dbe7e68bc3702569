import { type LossSeries, lossDifferential } from '../aggregation/lossSeries.js';
import { decideComparison } from '../decision/decideComparison.js';
import type { Hypothesis } from '../decision/hypothesis.js';
import { type MeasuredInterval, measuredCoverage } from '../intervals/measuredCoverage.js';
import { relativeChange } from '../intervals/relativeChange.js';
import type { LossName } from '../losses/lossName.js';
import type {
  BootstrapSummary,
  Comparison,
  DieboldMarianoSummary,
  Interval,
} from '../report/reportModel.js';
import type { Settings } from '../settings/settings.js';
import type { ResampleRunner } from '../statistics/bootstrap/resampleJob.js';
import { mean } from '../statistics/mean.js';
import { runBootstrap } from './runBootstrap.js';
import { runDieboldMariano } from './runDieboldMariano.js';

export interface ComparisonScope {
  readonly loss: LossName;
  readonly horizon: 'all' | number;
  readonly series: 'all' | string;
  /** A backtest path, when the comparison is restricted to one. */
  readonly path?: string;
  readonly timestamps: readonly string[];
}

/**
 * One comparison: the loss series of one scope (overall, a horizon, a series) → the tested
 * differential → Diebold–Mariano and stationary bootstrap → a decision under the policy.
 */
export function compareLossSeries(
  series: LossSeries,
  scope: ComparisonScope,
  hypothesis: Hypothesis,
  settings: Settings,
  options: { readonly bootstrap?: boolean; readonly runner?: ResampleRunner } = {},
): Comparison {
  const n = series.baseline.length;
  const meanBaselineLoss = meanOrZero(series.baseline);
  const meanCandidateLoss = meanOrZero(series.candidate);
  const d = lossDifferential(series, hypothesis.baselineFactor - 1);
  const difference = hypothesis.baselineFactor === 1 ? d : lossDifferential(series, 0);
  const meanTestedDifferential = meanOrZero(d);
  const identicalLosses = series.baseline.every((b, t) => b === series.candidate[t]);

  const dieboldMariano: DieboldMarianoSummary = withMeasured(
    runDieboldMariano(d, series.maxHorizon, hypothesis, settings, difference),
    'dieboldMarianoDifference',
    n,
  );
  const withBootstrap = options.bootstrap ?? true;
  const bootstrapRun = withBootstrap
    ? runBootstrap(d, series, hypothesis, settings, options.runner, difference)
    : null;
  const bootstrap: BootstrapSummary =
    bootstrapRun === null
      ? bootstrapNotRun(settings)
      : withMeasured(bootstrapRun.summary, 'bootstrapDifference', n);
  const decision = decideComparison({
    hypothesis,
    alpha: settings.alpha,
    agreement: withBootstrap ? settings.agreement : 'dm',
    dieboldMariano: {
      label: `Diebold–Mariano (${dieboldMariano.estimator})`,
      pValue: dieboldMariano.decisionPValue,
      mean: meanTestedDifferential,
      state: dieboldMariano.state,
    },
    bootstrap: {
      label: 'Stationary bootstrap',
      pValue: bootstrap.decisionPValue,
      mean: meanTestedDifferential,
      state: bootstrap.state,
    },
    n,
    minPoints: settings.minPoints,
    shortData: settings.shortData,
    identicalLosses,
  });
  const first = series.time[0];
  const last = series.time[n - 1];
  return {
    loss: scope.loss,
    horizon: scope.horizon,
    series: scope.series,
    ...(scope.path === undefined ? {} : { path: scope.path }),
    n,
    rows: series.rowCount,
    maxHorizon: series.maxHorizon,
    firstTimestamp: first === undefined ? null : (scope.timestamps[first] ?? null),
    lastTimestamp: last === undefined ? null : (scope.timestamps[last] ?? null),
    meanBaselineLoss,
    meanCandidateLoss,
    meanDifference: meanCandidateLoss - meanBaselineLoss,
    relativeDifference: meanBaselineLoss === 0 ? null : meanCandidateLoss / meanBaselineLoss - 1,
    meanTestedDifferential,
    relativeChange: relativeChange({
      series,
      settings,
      agreement: withBootstrap ? settings.agreement : 'dm',
      dieboldMariano,
      bootstrap: {
        state: bootstrap.state,
        resampledDeviations: bootstrapRun?.resampledDeviations ?? null,
      },
    }),
    dieboldMariano,
    bootstrap,
    verdict: decision.verdict,
    reasons: decision.reasons,
    rejected: decision.rejected,
  };
}

/** Adds the study's measured coverage to a summary's interval where it falls short. */
function withMeasured<T extends { readonly interval: Interval | null }>(
  summary: T,
  kind: MeasuredInterval,
  n: number,
): T {
  const interval = summary.interval;
  if (interval === null) return summary;
  const measured = measuredCoverage(kind, n, interval.level);
  return measured === null
    ? summary
    : { ...summary, interval: { ...interval, measuredCoverage: measured } };
}

/** The project's mean (statistics/mean.ts), with 0 for a comparison that has no time points. */
function meanOrZero(x: Float64Array): number {
  return x.length === 0 ? 0 : mean(x);
}

function bootstrapNotRun(settings: Settings): BootstrapSummary {
  return {
    state: 'not-run',
    resamples: 0,
    seed: settings.seed,
    expectedBlockLength: 1,
    blockLengthRule: settings.blockLength.kind,
    blockLengthSelection: null,
    standardError: null,
    interval: null,
    relativeInterval: null,
    pValue: null,
    pValueTwoSided: null,
    decisionPValue: null,
    notes: [
      'not run for per-series comparisons (the Diebold–Mariano test with adjusted p-values locates them)',
    ],
  };
}
