import type { Frequency } from './frequency.js';
import { compareTimePoints, type TimePoint } from './timePoint.js';

/** Slack for floating-point step counts of clock and numeric steps (in steps). */
const SLACK = 1e-9;

/**
 * How many steps ahead `target` lies from `from`: the number of points of the grid through
 * `target` (target, target − 1 step, target − 2 steps, …) that fall after `from`, i.e. in
 * (from, target]. So an origin on the grid gives the plain difference in steps, and an origin
 * between grid points (a forecast issued at 18:00 for the next days) counts the first grid point
 * after it as step 1. 0 when target is not after from.
 *
 * Clock and numeric steps: ⌈(target − from) / size⌉ on instants. Calendar steps count dates as
 * written: days by the written date (a 23-hour DST day is one day), business days by the
 * weekdays between the dates (Friday to Monday is one step), months by calendar month,
 * the day of the month clamped to the shorter month (31 January → 29 February is one month).
 */
export function stepsAhead(from: TimePoint, target: TimePoint, f: Frequency): number {
  if (compareTimePoints(target, from) <= 0) return 0;
  switch (f.unit) {
    case 'number':
    case 'second': {
      const diff = target.seconds - from.seconds + (target.nanos - from.nanos) / 1e9;
      return Math.max(0, Math.ceil(diff / f.size - SLACK));
    }
    case 'day': {
      const days = target.wallDay - from.wallDay;
      const later = target.wallSecond > from.wallSecond;
      return gridCount(later ? days : days - 1, f.size);
    }
    case 'businessDay': {
      // Weekdays in (from's date, target's date], plus from's own date when it is a weekday
      // and target's time of day is later.
      const later = target.wallSecond > from.wallSecond && isWeekday(from.wallDay);
      const n = weekdaysUpTo(target.wallDay) - weekdaysUpTo(from.wallDay) + (later ? 1 : 0);
      return gridCount(n - 1, f.size);
    }
    case 'month': {
      const months = target.month - from.month;
      // target moved back `months` months lands in from's month, its day clamped to that month.
      const day = Math.min(target.dayOfMonth, from.monthLength);
      const later =
        day > from.dayOfMonth || (day === from.dayOfMonth && target.wallSecond > from.wallSecond);
      return gridCount(later ? months : months - 1, f.size);
    }
  }
}

/** Grid points j·size ≤ span for j ≥ 0 (0 when span < 0). */
function gridCount(span: number, size: number): number {
  return span < 0 ? 0 : Math.floor(span / size) + 1;
}

/** Whether a day (days since 1970-01-01, a Thursday) is Monday to Friday. */
export function isWeekday(day: number): boolean {
  const weekday = (((day + 4) % 7) + 7) % 7; // 0 = Sunday … 6 = Saturday
  return weekday !== 0 && weekday !== 6;
}

/** Weekdays from a fixed Monday (1970-01-05, day 4) up to and including `day`, as a difference. */
function weekdaysUpTo(day: number): number {
  const m = day - 4;
  const weeks = Math.floor(m / 7);
  const r = m - 7 * weeks; // 0 = Monday … 6 = Sunday
  return 5 * weeks + Math.min(r + 1, 5);
}
