import { type Frequency, formatFrequency } from './frequency.js';
import { isWeekday } from './stepCount.js';
import type { TimePoint } from './timePoint.js';

const BUSINESS_DAILY: FrequencyInference = { frequency: { unit: 'businessDay', size: 1 } };

/** Every date a weekday, and some series steps over a weekend (Friday to Monday). */
function isBusinessDaily(series: readonly (readonly TimePoint[])[]): boolean {
  let crossesWeekend = false;
  for (const points of series) {
    for (let i = 0; i < points.length; i++) {
      if (!isWeekday(points[i]!.wallDay)) return false;
      const from = points[i - 1]?.wallDay;
      // 1970-01-02 (day 1) was a Friday.
      if (
        from !== undefined &&
        points[i]!.wallDay - from === 3 &&
        (((from - 1) % 7) + 7) % 7 === 0
      ) {
        crossesWeekend = true;
      }
    }
  }
  return crossesWeekend;
}

export type FrequencyInference =
  | { readonly frequency: Frequency }
  | { readonly frequency: null; readonly reason: string };

/** Relative slack when checking that a clock or numeric gap is a whole number of steps. */
const SLACK = 1e-6;

/**
 * Infers the grid step from each series' distinct timestamps (sorted by instant, no
 * duplicates): the smallest gap between consecutive timestamps of a series, provided every gap
 * of every series is a whole multiple of it (gaps of several steps are missing periods, which a
 * backtest may have). Which unit is tried, in order:
 *
 * 1. date-times that all share one written time of day and either one day of the month or all
 *    fall on the last day of their month: calendar months (12 → a year);
 * 2. date-times that all share one written time of day: calendar days (multiples of 7 → weeks);
 *    a one-day step whose dates are all weekdays and that steps over a weekend somewhere is
 *    business days (Monday to Friday);
 * 3. other date-times: elapsed time between instants (so an hourly series in local-offset
 *    notation stays hourly across a DST change);
 * 4. numbers: the numeric gap.
 *
 * Gaps that are not multiples of the smallest one (e.g. 1 h and 1.5 h) make the timestamps
 * irregular: no frequency, and a reason naming two such gaps. A rule of this project, not a
 * published method.
 */
export function inferFrequency(
  kind: 'number' | 'datetime',
  series: readonly (readonly TimePoint[])[],
): FrequencyInference {
  if (!series.some((points) => points.length >= 2)) {
    return { frequency: null, reason: 'no series has two different timestamps' };
  }
  if (kind === 'number') {
    return fromGaps(series, 'number', (a, b) => b.seconds - a.seconds);
  }
  const first = series.find((points) => points.length > 0)![0]!;
  const every = (test: (p: TimePoint) => boolean): boolean =>
    series.every((points) => points.every(test));
  const oneTimeOfDay = every((p) => p.wallSecond === first.wallSecond);
  if (oneTimeOfDay) {
    const oneDay = every((p) => p.dayOfMonth === first.dayOfMonth);
    const monthEnds = every((p) => p.dayOfMonth === p.monthLength);
    if (oneDay || monthEnds) return fromGaps(series, 'month', (a, b) => b.month - a.month);
    const daily = fromGaps(series, 'day', (a, b) => b.wallDay - a.wallDay);
    return daily.frequency?.size === 1 && isBusinessDaily(series) ? BUSINESS_DAILY : daily;
  }
  return fromGaps(series, 'second', (a, b) => b.seconds - a.seconds + (b.nanos - a.nanos) / 1e9);
}

function fromGaps(
  series: readonly (readonly TimePoint[])[],
  unit: Frequency['unit'],
  gap: (a: TimePoint, b: TimePoint) => number,
): FrequencyInference {
  let step = Number.POSITIVE_INFINITY;
  for (const points of series) {
    for (let i = 1; i < points.length; i++) {
      const g = gap(points[i - 1]!, points[i]!);
      if (g > 0 && g < step) step = g;
    }
  }
  if (!Number.isFinite(step)) {
    return { frequency: null, reason: 'no two timestamps of a series are a step apart' };
  }
  const frequency: Frequency = { unit, size: step };
  for (const points of series) {
    for (let i = 1; i < points.length; i++) {
      const g = gap(points[i - 1]!, points[i]!);
      const ratio = g / step;
      if (Math.abs(ratio - Math.round(ratio)) > SLACK * Math.max(1, ratio)) {
        const other: Frequency = { unit, size: g };
        return {
          frequency: null,
          reason: `irregular timestamps: gaps of ${formatFrequency(frequency)} and ${formatFrequency(other)} (not a multiple of it)`,
        };
      }
    }
  }
  return { frequency };
}
