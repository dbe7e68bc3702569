import type { AlignedPanel, QuantileColumn } from '../core/panel.js';
import { absoluteError } from './absoluteError.js';
import { absolutePercentageError } from './absolutePercentageError.js';
import { intervalCoverage } from './intervalCoverage.js';
import { intervalScore } from './intervalScore.js';
import type { LossName } from './lossName.js';
import { pinballLoss } from './pinballLoss.js';
import type { PointLossFunction } from './pointLoss.js';
import { squaredError } from './squaredError.js';
import { symmetricAbsolutePercentageError } from './symmetricAbsolutePercentageError.js';

/** Per-row losses of both models over an aligned panel. */
export interface RowLosses {
  readonly loss: LossName;
  readonly baseline: Float64Array;
  readonly candidate: Float64Array;
  /**
   * 1 where the row takes part, 0 where it was skipped (absolute percentage error with a zero
   * actual and `zeroActuals: 'skip'`); null when every row takes part.
   */
  readonly included: Uint8Array | null;
  /** Rows whose actual is 0 under the absolute percentage error (skipped or refused). */
  readonly zeroActualRows: readonly number[];
  /** Quantile levels the pinball loss averaged over, or the interval's two (else empty). */
  readonly levels: readonly number[];
  /** Empirical coverage of the central interval by each model (interval loss only). */
  readonly coverage: IntervalCoverage | null;
}

export interface IntervalCoverage {
  /** Nominal coverage upper − lower, e.g. 0.8 for [q0.1, q0.9]. */
  readonly nominal: number;
  readonly baseline: number | null;
  readonly candidate: number | null;
}

/** Why losses cannot be computed for this panel, in plain words; the edge names the files. */
export class LossUnavailableError extends Error {}

export const POINT_LOSSES: Record<Exclude<LossName, 'pinball' | 'interval'>, PointLossFunction> = {
  squared: squaredError,
  absolute: absoluteError,
  ape: absolutePercentageError,
  sape: symmetricAbsolutePercentageError,
};

/** What a relative loss does with rows whose actual is 0 (`--zero-actuals`): refuse or skip them. */
export const ZERO_ACTUALS_RULES = ['error', 'skip'] as const;
export type ZeroActualsRule = (typeof ZERO_ACTUALS_RULES)[number];

/**
 * Computes the loss of every matched row for baseline and candidate. Absolute percentage error
 * rows with y = 0 are listed in `zeroActualRows` and, when `zeroActuals` is 'skip', excluded via
 * `included`; with 'error' the caller must refuse them (nothing is dropped silently).
 */
export function computeRowLosses(
  panel: AlignedPanel,
  loss: LossName,
  zeroActuals: ZeroActualsRule,
  interval: readonly [number, number] | null = null,
): RowLosses {
  const n = panel.size;
  const baseline = new Float64Array(n);
  const candidate = new Float64Array(n);
  if (loss === 'interval') return intervalLosses(panel, interval);
  if (loss === 'pinball') {
    const pairs = commonQuantiles(panel.baseline.quantiles, panel.candidate.quantiles);
    if (pairs.length === 0) {
      throw new LossUnavailableError(
        'the pinball loss needs quantile columns (such as q0.1, q0.5, q0.9) with the same levels in baseline and candidate',
      );
    }
    const y = panel.actual;
    for (const { level, base, cand } of pairs) {
      for (let i = 0; i < n; i++) {
        const yi = y[i]!;
        baseline[i]! += pinballLoss(yi, base[i]!, level);
        candidate[i]! += pinballLoss(yi, cand[i]!, level);
      }
    }
    const k = pairs.length;
    for (let i = 0; i < n; i++) {
      baseline[i]! /= k;
      candidate[i]! /= k;
    }
    return {
      loss,
      baseline,
      candidate,
      included: null,
      zeroActualRows: [],
      levels: pairs.map((p) => p.level),
      coverage: null,
    };
  }
  const base = panel.baseline.prediction;
  const cand = panel.candidate.prediction;
  if (base === null || cand === null) {
    throw new LossUnavailableError(
      `the ${loss} loss needs a prediction column in both baseline and candidate`,
    );
  }
  const f = POINT_LOSSES[loss];
  const y = panel.actual;
  const zeroActualRows: number[] = [];
  let included: Uint8Array | null = null;
  for (let i = 0; i < n; i++) {
    const yi = y[i]!;
    if (loss === 'ape' && yi === 0) {
      zeroActualRows.push(i);
      if (zeroActuals === 'skip') {
        included ??= new Uint8Array(n).fill(1);
        included[i] = 0;
      }
      continue;
    }
    baseline[i] = f(yi, base[i]!);
    candidate[i] = f(yi, cand[i]!);
  }
  return { loss, baseline, candidate, included, zeroActualRows, levels: [], coverage: null };
}

/**
 * Interval score of the central interval [q_lower, q_upper] (Gneiting & Raftery 2007, eq. 43),
 * α = 1 − (upper − lower), and each model's empirical coverage of it.
 */
function intervalLosses(
  panel: AlignedPanel,
  interval: readonly [number, number] | null,
): RowLosses {
  if (interval === null) {
    throw new LossUnavailableError(
      'the interval loss needs the two quantile levels of the interval',
    );
  }
  const [lowLevel, highLevel] = interval;
  const find = (columns: readonly QuantileColumn[], level: number) =>
    columns.find((q) => Math.abs(q.level - level) < 1e-12)?.values;
  const bl = find(panel.baseline.quantiles, lowLevel);
  const bu = find(panel.baseline.quantiles, highLevel);
  const cl = find(panel.candidate.quantiles, lowLevel);
  const cu = find(panel.candidate.quantiles, highLevel);
  if (bl === undefined || bu === undefined || cl === undefined || cu === undefined) {
    throw new LossUnavailableError(
      `the interval loss needs quantile columns at levels ${lowLevel} and ${highLevel} in baseline and candidate`,
    );
  }
  const alpha = 1 - (highLevel - lowLevel);
  const n = panel.size;
  const baseline = new Float64Array(n);
  const candidate = new Float64Array(n);
  const y = panel.actual;
  for (let i = 0; i < n; i++) {
    baseline[i] = intervalScore(y[i]!, bl[i]!, bu[i]!, alpha);
    candidate[i] = intervalScore(y[i]!, cl[i]!, cu[i]!, alpha);
  }
  return {
    loss: 'interval',
    baseline,
    candidate,
    included: null,
    zeroActualRows: [],
    levels: [lowLevel, highLevel],
    coverage: {
      nominal: highLevel - lowLevel,
      baseline: intervalCoverage(y, bl, bu),
      candidate: intervalCoverage(y, cl, cu),
    },
  };
}

function commonQuantiles(
  baseline: readonly QuantileColumn[],
  candidate: readonly QuantileColumn[],
): { level: number; base: Float64Array; cand: Float64Array }[] {
  const byLevel = new Map(candidate.map((q) => [q.level, q.values]));
  const pairs: { level: number; base: Float64Array; cand: Float64Array }[] = [];
  for (const q of baseline) {
    const cand = byLevel.get(q.level);
    if (cand !== undefined) pairs.push({ level: q.level, base: q.values, cand });
  }
  return pairs;
}
