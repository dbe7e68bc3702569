import { InputError } from '../core/inputError.js';
import type { AlignedPanel, TimestampKind } from '../core/panel.js';
import type { ForecastTable } from '../reading/forecastTable.js';
import { applyCheckPolicy } from './checkPolicy.js';
import type {
  CheckFinding,
  CheckMode,
  CheckNotRun,
  FrequencySource,
  IntegrityReport,
} from './checkResult.js';
import { CHECK_IDS } from './checkResult.js';
import { checkExactPredictions } from './exactPredictions.js';
import { checkFolds } from './foldChecks.js';
import type { FoldLayout } from './foldLayout.js';
import { type Frequency, formatFrequency, parseFrequency } from './frequency.js';
import { inferFrequency } from './inferFrequency.js';
import { checkLikeForLike } from './likeForLike.js';
import { checkRows } from './rowChecks.js';
import { compareTimePoints, type TimePoint, toTimePoint } from './timePoint.js';

export interface BacktestInput {
  readonly panel: AlignedPanel;
  /** The files as read, every row (the panel keeps matched rows only). */
  readonly baseline: ForecastTable;
  readonly candidate: ForecastTable;
  readonly actuals?: ForecastTable;
  readonly folds?: FoldLayout;
}

export interface BacktestCheckSettings {
  /** 'auto' (infer from the timestamps) or a frequency such as "1h" (see parseFrequency). */
  readonly frequency: string;
  readonly embargo: number;
  readonly mode: CheckMode;
}

/**
 * Runs every backtest check that the inputs allow and applies the policy: row checks (origin
 * against timestamp and horizon), like-for-like checks (the two files' origins, paths, horizons,
 * spans and series), the fold layout (when given) and suspicious exactness. Pure: tables and
 * panel in, report part out; an InputError for a frequency that does not fit the timestamps.
 */
export function checkBacktest(
  input: BacktestInput,
  settings: BacktestCheckSettings,
): IntegrityReport {
  // The checks read time as alignment's readLabel does (numbers, ISO 8601); labels read some
  // other way are treated like text order: the time-based checks do not run.
  const timestampKind = readableKind(input.panel.timestampKind, [
    input.panel.timestamps,
    input.baseline.timestamp.labels,
    input.candidate.timestamp.labels,
    ...(input.actuals === undefined ? [] : [input.actuals.timestamp.labels]),
  ]);
  const originKind = readableKind(input.panel.originKind, [
    input.baseline.origin?.labels ?? [],
    input.candidate.origin?.labels ?? [],
  ]);
  const panel: AlignedPanel = { ...input.panel, timestampKind, originKind };
  const frequency = chooseFrequency(panel, settings.frequency);
  const findings: CheckFinding[] = [];
  const notRun: CheckNotRun[] = [];
  const add = (part: { findings: CheckFinding[]; notRun: CheckNotRun[] }): void => {
    findings.push(...part.findings);
    notRun.push(...part.notRun);
  };
  const actualTables =
    input.actuals === undefined ? [input.baseline, input.candidate] : [input.actuals];
  const last = lastTime(actualTables, panel.timestampKind);
  add(
    checkRows({
      tables: [input.baseline, input.candidate],
      timestampKind: panel.timestampKind,
      originKind: panel.originKind,
      lastActual: last?.point ?? null,
      lastActualLabel: last?.label ?? '',
      frequency: frequency.frequency,
      frequencyReason: frequency.reason,
    }),
  );
  add(
    checkLikeForLike({
      baseline: input.baseline,
      candidate: input.candidate,
      timestampKind: panel.timestampKind,
      originKind: panel.originKind,
    }),
  );
  if (input.folds === undefined) {
    const reason = 'no fold layout given (--folds FILE)';
    notRun.push({ id: 'fold-purge', reason }, { id: 'outside-test-window', reason });
  } else {
    add(
      checkFolds({
        panel,
        layout: input.folds,
        embargo: settings.embargo,
        frequency: frequency.frequency,
        frequencyReason: frequency.reason,
      }),
    );
  }
  add(checkExactPredictions(panel));
  const rank = (id: string) => CHECK_IDS.indexOf(id as (typeof CHECK_IDS)[number]);
  findings.sort((a, b) => rank(a.id) - rank(b.id));
  notRun.sort((a, b) => rank(a.id) - rank(b.id));
  return applyCheckPolicy(
    findings,
    notRun,
    settings.mode,
    frequency.frequency === null
      ? null
      : { text: formatFrequency(frequency.frequency), source: frequency.source },
  );
}

function chooseFrequency(
  panel: AlignedPanel,
  text: string,
): { frequency: Frequency | null; reason: string; source: FrequencySource } {
  const kind = panel.timestampKind;
  if (text !== 'auto') {
    const f = parseFrequency(text);
    if (f === null) throw new InputError('frequency is not a frequency', { value: text });
    if (kind === 'text') {
      return { frequency: null, reason: 'timestamps are in text order', source: 'given' };
    }
    if ((f.unit === 'number') !== (kind === 'number')) {
      throw new InputError(
        kind === 'number'
          ? `the frequency ${text} has a unit, but the timestamps are numbers: give a plain step such as 1`
          : `the frequency ${text} is a plain number, but the timestamps are ISO 8601 date-times: give a unit such as 1h, 1d or 1mo`,
        { value: text },
      );
    }
    return { frequency: f, reason: '', source: 'given' };
  }
  if (kind === 'text') {
    return {
      frequency: null,
      reason: 'timestamps are in text order, so steps cannot be counted',
      source: 'inferred',
    };
  }
  const inferred = inferFrequency(kind, pointsBySeries(panel, kind));
  return inferred.frequency === null
    ? {
        frequency: null,
        reason: `no frequency: ${inferred.reason}; give --frequency`,
        source: 'inferred',
      }
    : { frequency: inferred.frequency, reason: '', source: 'inferred' };
}

/**
 * Each series' distinct timestamps in time order: one pass, since alignment sorts the panel's
 * rows by (series, timestamp, …).
 */
function pointsBySeries(panel: AlignedPanel, kind: 'number' | 'datetime'): TimePoint[][] {
  const points = panel.timestamps.map((label) => toTimePoint(label, kind)!);
  const out: TimePoint[][] = panel.seriesNames.map(() => []);
  let lastSeries = -1;
  let lastTime = -1;
  for (let p = 0; p < panel.size; p++) {
    const series = panel.series[p]!;
    const time = panel.time[p]!;
    if (series === lastSeries && time === lastTime) continue;
    if (series === lastSeries && time < lastTime) {
      throw new Error('the aligned panel is not sorted by series and timestamp');
    }
    out[series]!.push(points[time]!);
    lastSeries = series;
    lastTime = time;
  }
  return out;
}

/** `kind`, or 'text' when some label cannot be read as a time point of that kind. */
function readableKind(kind: TimestampKind, lists: readonly (readonly string[])[]): TimestampKind {
  if (kind === 'text') return kind;
  for (const labels of lists) {
    for (const label of labels) if (toTimePoint(label, kind) === null) return 'text';
  }
  return kind;
}

/** The latest timestamp over the files that carry actuals. */
function lastTime(
  tables: readonly ForecastTable[],
  kind: TimestampKind,
): { point: TimePoint; label: string } | null {
  if (kind === 'text') return null;
  let best: { point: TimePoint; label: string } | null = null;
  for (const table of tables) {
    for (const label of table.timestamp.labels) {
      const point = toTimePoint(label, kind);
      if (point !== null && (best === null || compareTimePoints(point, best.point) > 0)) {
        best = { point, label };
      }
    }
  }
  return best;
}
