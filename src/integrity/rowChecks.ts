import type { TimestampKind } from '../core/panel.js';
import type { ForecastTable } from '../reading/forecastTable.js';
import { type CheckFinding, type CheckNotRun, FindingCollector } from './checkResult.js';
import { type Frequency, formatFrequency } from './frequency.js';
import { describeTableRow } from './rowKey.js';
import { stepsAhead } from './stepCount.js';
import { compareTimePoints, type TimePoint, timePointsOf } from './timePoint.js';

export interface RowCheckInput {
  /** The two predictions files, every row (matched or not). */
  readonly tables: readonly ForecastTable[];
  /** How timestamps and origins are ordered (decided by alignment over all files). */
  readonly timestampKind: TimestampKind;
  readonly originKind: TimestampKind;
  /** The last time an actual was observed (latest timestamp of the files carrying actuals). */
  readonly lastActual: TimePoint | null;
  readonly lastActualLabel: string;
  readonly frequency: Frequency | null;
  /** Why there is no frequency, when there is none. */
  readonly frequencyReason: string;
}

/**
 * Checks each predictions row against its own origin, on every row of both files (a row that
 * matched nothing is as much a sign of a broken backtest as one that did):
 *
 * - look-ahead: the origin (when the forecast was issued) is at or after the timestamp it
 *   forecasts, so it may have used the value it predicts;
 * - horizon-steps: the horizon column disagrees with the steps from origin to timestamp at the
 *   data's frequency (see stepsAhead), so horizons are mislabelled or origins shifted;
 * - origin-after-actuals: the origin lies after the last actual in the data, a forecast
 *   issued from a future the backtest never saw.
 *
 * Rolling-origin evaluation issues each forecast from an origin before its target (Tashman
 * 2000, "Out-of-sample tests of forecasting accuracy", International Journal of Forecasting 16).
 */
export function checkRows(input: RowCheckInput): {
  findings: CheckFinding[];
  notRun: CheckNotRun[];
} {
  const { tables } = input;
  if (tables.some((t) => t.origin === null)) {
    return noneRun('the predictions files have no origin column');
  }
  if (input.timestampKind === 'text' || input.originKind !== input.timestampKind) {
    return noneRun(
      input.timestampKind === 'text'
        ? 'timestamps are in text order (neither all numbers nor all ISO 8601)'
        : `origins are ${input.originKind === 'number' ? 'numbers' : input.originKind} but timestamps are ${input.timestampKind === 'number' ? 'numbers' : input.timestampKind}, so they cannot be compared`,
    );
  }
  const kind = input.timestampKind;
  const lookAhead = new FindingCollector();
  const horizon = new FindingCollector();
  const afterActuals = new FindingCollector();
  const notRun: CheckNotRun[] = [];
  const f = input.frequency;
  const hasHorizon = tables.every((t) => t.horizon !== null);
  if (!hasHorizon) notRun.push({ id: 'horizon-steps', reason: 'the files have no horizon column' });
  else if (f === null) notRun.push({ id: 'horizon-steps', reason: input.frequencyReason });
  const countSteps = hasHorizon && f !== null;
  let rows = 0;
  for (const table of tables) {
    const times = timePointsOf(table.timestamp.labels, kind);
    const origins = timePointsOf(table.origin!.labels, kind);
    const tIds = table.timestamp.ids;
    const oIds = table.origin!.ids;
    const h = table.horizon?.values;
    rows += table.size;
    for (let i = 0; i < table.size; i++) {
      const t = times[tIds[i]!]!;
      const o = origins[oIds[i]!]!;
      if (compareTimePoints(o, t) >= 0) lookAhead.add(() => describeTableRow(table, i));
      else if (countSteps && stepsAhead(o, t, f) !== h![i]) {
        horizon.add(() => {
          const steps = stepsAhead(o, t, f);
          return `${describeTableRow(table, i)} (${steps} step${steps === 1 ? '' : 's'} of ${formatFrequency(f)})`;
        });
      }
      if (input.lastActual !== null && compareTimePoints(o, input.lastActual) > 0) {
        afterActuals.add(() => describeTableRow(table, i));
      }
    }
  }
  const findings: CheckFinding[] = [
    {
      id: 'look-ahead',
      ...lookAhead,
      summary: `${lookAhead.count} of ${rows} predictions rows have an origin at or after the timestamp they forecast`,
    },
  ];
  if (countSteps) {
    findings.push({
      id: 'horizon-steps',
      ...horizon,
      summary: `${horizon.count} of ${rows} rows have a horizon that differs from the steps of ${formatFrequency(f)} from origin to timestamp`,
    });
  }
  if (input.lastActual === null) {
    notRun.push({ id: 'origin-after-actuals', reason: 'no actual has a comparable timestamp' });
  } else {
    findings.push({
      id: 'origin-after-actuals',
      ...afterActuals,
      summary: `${afterActuals.count} of ${rows} rows were issued after the last actual (${input.lastActualLabel})`,
    });
  }
  return { findings, notRun };
}

/** None of the three row checks could run, all for the same reason. */
function noneRun(reason: string): { findings: CheckFinding[]; notRun: CheckNotRun[] } {
  return {
    findings: [],
    notRun: [
      { id: 'look-ahead', reason },
      { id: 'horizon-steps', reason },
      { id: 'origin-after-actuals', reason },
    ],
  };
}
