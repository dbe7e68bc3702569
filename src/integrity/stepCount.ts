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
 * written: days by the written date (a 23-hour DST day is one day), months by calendar month,
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
