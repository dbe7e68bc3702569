import { aggregateByTime, type LossSeries, lossDifferential } from '../aggregation/lossSeries.js';
import { InputError } from '../core/inputError.js';
import type { AlignedPanel } from '../core/panel.js';
import { VERSION } from '../core/version.js';
import { decideAdjusted, type SeriesDirection } from '../decision/decideAdjusted.js';
import { type Hypothesis, hypothesisFor } from '../decision/hypothesis.js';
import type { IntegrityReport } from '../integrity/checkResult.js';
import { firstOversizedLoss, MAX_LOSS } from '../losses/lossMagnitude.js';
import { computeRowLosses, LossUnavailableError, type RowLosses } from '../losses/rowLosses.js';
import { ADJUSTMENTS } from '../multiplicity/adjustmentMethod.js';
import { buildReport } from '../report/buildReport.js';
import { panelInputsSummary } from '../report/inputsSummary.js';
import type { Comparison, PathSummary, Report, SeriesSummary } from '../report/reportModel.js';
import { baselineMeanLossScale } from '../scaling/baselineMeanLossScale.js';
import { scaleLossesBySeries } from '../scaling/scaleLossesBySeries.js';
import { seasonalNaiveScale } from '../scaling/seasonalNaiveScale.js';
import type { SeriesScale } from '../scaling/seriesScale.js';
import type { Settings } from '../settings/settings.js';
import { assessStability } from '../stability/assessStability.js';
import type { ResampleRunner } from '../statistics/bootstrap/resampleJob.js';
import { smallSampleValue } from '../statistics/smallSampleValue.js';
import { type ComparisonScope, compareLossSeries } from './compareLossSeries.js';
import { runDieboldMariano } from './runDieboldMariano.js';

export interface PanelExtras {
  /** In-sample actuals per series name, for the seasonal naive scale. */
  readonly history?: ReadonlyMap<string, Float64Array>;
  /** Where bootstrap resamples are computed (default: this thread); same numbers either way. */
  readonly resampleRunner?: ResampleRunner;
  /** The backtest checks' result (checkBacktest), carried into the report. */
  readonly integrity?: IntegrityReport;
}

/**
 * The pure core from an aligned panel to the report: row losses → (optionally scaled) → per-time
 * loss series → tests → decision, for the overall comparison (which decides the gate), then one
 * comparison per horizon (both tests; the lag floor h − 1 follows from the horizon), then one per
 * series (Diebold–Mariano alone, p-values adjusted for multiplicity by Holm 1979 or Benjamini &
 * Hochberg 1995). No files, no clock; the bootstrap's randomness comes from the seed in the
 * settings. Losses that cannot be computed on this panel are InputErrors.
 */
export function evaluatePanel(
  panel: AlignedPanel,
  settings: Settings,
  extras: PanelExtras = {},
): Report {
  const { losses, pooled, weights } = panelLosses(panel, settings, extras);
  const hypothesis = hypothesisFor(settings.policy, settings.margin, settings.marginKind);
  const runner = extras.resampleRunner === undefined ? {} : { runner: extras.resampleRunner };
  const scope = (horizon: 'all' | number, series: 'all' | string): ComparisonScope => ({
    loss: settings.loss,
    horizon,
    series,
    timestamps: panel.timestamps,
  });
  const overallSeries = aggregateByTime(panel, pooled, undefined, weights);
  const comparisons: Comparison[] = [
    compareLossSeries(overallSeries, scope('all', 'all'), hypothesis, settings, runner),
  ];

  const byHorizon = groupRows(panel.horizon);
  if (byHorizon.size > 1) {
    for (const h of [...byHorizon.keys()].sort((a, b) => a - b)) {
      const series = aggregateByTime(panel, pooled, byHorizon.get(h), weights);
      comparisons.push(compareLossSeries(series, scope(h, 'all'), hypothesis, settings, runner));
    }
  }

  let pathSummary: PathSummary | null = null;
  if (panel.path !== null && panel.paths.length > 1) {
    const byPath = groupRows(panel.path);
    const perPath = panel.paths.map((name, id) =>
      compareLossSeries(
        aggregateByTime(panel, pooled, byPath.get(id) ?? [], weights),
        { ...scope('all', 'all'), path: name },
        hypothesis,
        settings,
        { bootstrap: false },
      ),
    );
    for (const c of perPath) comparisons.push(c);
    const worse = perPath.filter((c) => c.meanDifference > 0).length;
    pathSummary = {
      paths: perPath.length,
      worse,
      shareWorse: worse / perPath.length,
      significantlyWorse: perPath.filter((c) => {
        const p = smallSampleValue(c.dieboldMariano);
        return p !== null && p <= settings.alpha;
      }).length,
    };
  }

  let seriesSummary: SeriesSummary | null = null;
  if (panel.seriesNames.length > 1) {
    const perSeries = seriesComparisons(panel, losses, weights, hypothesis, settings, scope);
    for (const c of perSeries.comparisons) comparisons.push(c);
    seriesSummary = perSeries.summary;
  }

  return buildReport({
    version: VERSION,
    settings,
    hypothesis,
    inputs: panelInputsSummary(panel, losses),
    comparisons,
    seriesSummary,
    pathSummary,
    ...(extras.integrity === undefined ? {} : { integrity: extras.integrity }),
    stability: assessStability({
      series: overallSeries,
      timestamps: panel.timestamps,
      kind: panel.timestampKind,
      hypothesis,
      settings,
      ...runner,
    }),
  });
}

/**
 * The overall loss series of a panel exactly as `evaluatePanel` tests it (row losses, pooling,
 * weights, one value per time point): for procedures that combine several panels.
 */
export function overallLossSeries(
  panel: AlignedPanel,
  settings: Settings,
  extras: PanelExtras = {},
): LossSeries {
  const { pooled, weights } = panelLosses(panel, settings, extras);
  return aggregateByTime(panel, pooled, undefined, weights);
}

function panelLosses(
  panel: AlignedPanel,
  settings: Settings,
  extras: PanelExtras,
): { losses: RowLosses; pooled: RowLosses; weights: Float64Array | null } {
  const losses = rowLossesOrInputError(panel, settings);
  const pooled =
    settings.pooling === 'scaled' ? scaledLosses(panel, losses, settings, extras) : losses;
  const weights = settings.weights ? weightsOrInputError(panel, settings) : null;
  return { losses, pooled, weights };
}

/**
 * Per-series comparisons on raw losses (a series' own scale does not change its test), the
 * Diebold–Mariano test with the chosen variance, adjusted across series in both directions
 * (worse / better), and the summary the report shows: counts and the top regressions.
 */
function seriesComparisons(
  panel: AlignedPanel,
  losses: RowLosses,
  weights: Float64Array | null,
  hypothesis: Hypothesis,
  settings: Settings,
  scope: (h: 'all', s: string) => ComparisonScope,
): { comparisons: Comparison[]; summary: SeriesSummary } {
  const k = panel.seriesNames.length;
  const rowsOf = groupRows(panel.series);
  // The direction of each series (worse / better / no evidence) comes from the plain loss
  // difference d_t = L_c,t − L_b,t, whatever the policy and margin: "worse" means evidence the
  // candidate's loss is higher, "better" evidence it is lower. The policy's own (margin-shifted)
  // p-value still gives each series' verdict.
  const plain = hypothesisFor('no-regression', 0, 'absolute');
  const upper: (number | null)[] = [];
  // When the policy's own test is the plain one (no margin: baseline factor 1, boundary +0), its
  // summary is exactly the plain test's, so the test is not run a second time.
  const policyIsPlain = hypothesis.baselineFactor === 1 && Object.is(hypothesis.boundary, 0);
  const raw = panel.seriesNames.map((name, id) => {
    const series = aggregateByTime(panel, losses, rowsOf.get(id) ?? [], weights);
    const comparison = compareLossSeries(series, scope('all', name), hypothesis, settings, {
      bootstrap: false,
    });
    const dm = policyIsPlain
      ? comparison.dieboldMariano
      : runDieboldMariano(lossDifferential(series, 0), series.maxHorizon, plain, settings);
    upper.push(smallSampleValue(dm));
    return comparison;
  });
  const adjust = ADJUSTMENTS[settings.adjust].adjust;
  // One-sided p-values of the plain difference in each direction (HLN-corrected for
  // bartlett/uniform), adjusted across the series family.
  const worseP = adjust(upper);
  const betterP = adjust(upper.map((p) => (p === null ? null : 1 - p)));
  // The policy's direction, on the tested (margin-shifted) differential, for the verdicts.
  const tested = raw.map((c) => smallSampleValue(c.dieboldMariano));
  const policyP =
    hypothesis.rejectWhen === 'above'
      ? adjust(tested)
      : adjust(tested.map((p) => (p === null ? null : 1 - p)));
  let worse = 0;
  let better = 0;
  const comparisons = raw.map((c, j) => {
    const w = worseP[j] ?? null;
    const b = betterP[j] ?? null;
    const direction: SeriesDirection =
      w !== null && w <= settings.alpha
        ? 'worse'
        : b !== null && b <= settings.alpha
          ? 'better'
          : 'no evidence';
    if (direction === 'worse') worse++;
    if (direction === 'better') better++;
    const decision = decideAdjusted({
      hypothesis,
      alpha: settings.alpha,
      adjustedPValue: policyP[j] ?? null,
      method: settings.adjust,
      n: c.n,
      minPoints: settings.minPoints,
    });
    // In place: `raw` is this function's own, and a copy per series doubles the memory of a
    // panel with a million series.
    return Object.assign(c as Mutable<Comparison>, {
      verdict: decision.verdict,
      reasons: decision.reasons,
      rejected: { dieboldMariano: decision.rejected, bootstrap: null },
      adjustedPValue: policyP[j] ?? null,
      direction,
      directionPValue: direction === 'better' ? b : w,
    }) as Comparison;
  });
  const top = comparisons
    .filter((c) => c.direction === 'worse')
    .sort(
      (a, b) =>
        (b.relativeDifference ?? b.meanDifference) - (a.relativeDifference ?? a.meanDifference),
    )
    .slice(0, settings.top)
    .map((c) => c.series as string);
  return {
    comparisons,
    summary: {
      method: settings.adjust,
      alpha: settings.alpha,
      series: k,
      worse,
      better,
      noEvidence: k - worse - better,
      topRegressions: top,
    },
  };
}

type Mutable<T> = { -readonly [K in keyof T]: T[K] };

/**
 * Row indices by value (a horizon, a series id), in row order: a counting sort into one typed
 * array, each value's rows a view of it (no per-row growth of lists).
 */
function groupRows(values: Int32Array): Map<number, Int32Array> {
  const n = values.length;
  // Values are ids or horizons: non-negative integers, dense in practice; else ranked first.
  let max = 0;
  for (let i = 0; i < n; i++) if (values[i]! > max) max = values[i]!;
  let slotOf = values;
  let slotValue: ArrayLike<number> | null = null;
  let slots = max + 1;
  if (max > 4 * n + 16) {
    const distinct = [...new Set(values)].sort((a, b) => a - b);
    const rank = new Map(distinct.map((v, r) => [v, r]));
    slotOf = Int32Array.from(values, (v) => rank.get(v)!);
    slotValue = distinct;
    slots = distinct.length;
  }
  const starts = new Int32Array(slots + 1);
  for (let i = 0; i < n; i++) starts[slotOf[i]! + 1]!++;
  for (let v = 0; v < slots; v++) starts[v + 1]! += starts[v]!;
  const rows = new Int32Array(n);
  const next = starts.slice(0, slots);
  for (let i = 0; i < n; i++) rows[next[slotOf[i]!]!++] = i;
  const groups = new Map<number, Int32Array>();
  for (let v = 0; v < slots; v++) {
    if (starts[v + 1]! > starts[v]!) {
      groups.set(slotValue === null ? v : slotValue[v]!, rows.subarray(starts[v]!, starts[v + 1]!));
    }
  }
  return groups;
}

function scaledLosses(
  panel: AlignedPanel,
  losses: RowLosses,
  settings: Settings,
  extras: PanelExtras,
): RowLosses {
  let scales: Map<string, SeriesScale>;
  if (settings.scale === 'baseline') {
    scales = baselineMeanLossScale(
      panel.seriesNames,
      panel.series,
      losses.baseline,
      losses.included,
    );
  } else {
    if (extras.history === undefined) {
      throw new InputError(
        'the seasonal-naive scale needs a history file (series, timestamp, actual)',
        {
          file: 'history',
        },
      );
    }
    const lossKind = settings.loss === 'squared' ? 'squared' : 'absolute';
    scales = seasonalNaiveScale(extras.history, settings.season, lossKind);
  }
  const scaled = scaleLossesBySeries(
    panel.seriesNames,
    panel.series,
    losses.baseline,
    losses.candidate,
    scales,
  );
  if (scaled.state === 'unavailable') {
    const first = scaled.missing[0]!;
    throw new InputError(
      `pooling scaled losses needs a positive scale for every series; ${scaled.missing.length} series lack one, first ${JSON.stringify(first.series)}: ${first.note}`,
      { file: settings.history ?? settings.baseline, value: first.series },
    );
  }
  return { ...losses, baseline: scaled.baseline, candidate: scaled.candidate };
}

function weightsOrInputError(panel: AlignedPanel, settings: Settings): Float64Array {
  if (panel.weight === null) {
    throw new InputError('weights were asked for, but the files have no weight column', {
      file: settings.actuals ?? settings.baseline,
      column: settings.columns.weight ?? 'weight',
    });
  }
  return panel.weight;
}

function rowLossesOrInputError(panel: AlignedPanel, settings: Settings): RowLosses {
  let losses: RowLosses;
  try {
    losses = computeRowLosses(panel, settings.loss, settings.zeroActuals, settings.interval);
  } catch (error) {
    if (error instanceof LossUnavailableError) {
      throw new InputError(`loss ${settings.loss}: ${error.message}`, {
        file: `${settings.baseline}, ${settings.candidate}`,
      });
    }
    throw error;
  }
  for (const [model, values] of [
    ['baseline', losses.baseline],
    ['candidate', losses.candidate],
  ] as const) {
    const row = firstOversizedLoss(values, losses.included);
    if (row >= 0) {
      const series = panel.seriesNames[panel.series[row]!];
      throw new InputError(
        `the ${model}'s ${settings.loss} loss for series ${JSON.stringify(series)}, timestamp ${JSON.stringify(
          panel.timestamps[panel.time[row]!],
        )} is ${values[row]}: beyond ${MAX_LOSS}, means and variances would overflow double precision; rescale the data (e.g. to thousands) or check this row`,
        {
          file: panel.actualSource.file,
          line: panel.actualSource.lines[row]!,
          value: String(values[row]),
        },
      );
    }
  }
  if (settings.zeroActuals === 'error' && losses.zeroActualRows.length > 0) {
    const row = losses.zeroActualRows[0]!;
    throw new InputError(
      `the absolute percentage error is undefined where the actual is 0 (${losses.zeroActualRows.length} rows, this the first; series ${JSON.stringify(
        panel.seriesNames[panel.series[row]!],
      )}, timestamp ${JSON.stringify(panel.timestamps[panel.time[row]!])}); use zero-actuals skip to leave them out and count them, or another loss`,
      {
        file: panel.actualSource.file,
        line: panel.actualSource.lines[row]!,
        column: settings.columns.actual ?? 'actual',
        value: '0',
      },
    );
  }
  return losses;
}
