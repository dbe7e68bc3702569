import type { TimestampKind } from '../core/panel.js';
import { calendarDateOf } from './calendarDate.js';

/**
 * A stretch of time in plain words for headlines: for dates, its calendar length ("6 weeks",
 * "10 days", "3 months": days from first to last inclusive; weeks from 14 days, months from
 * 90 days, rounded), otherwise its count ("36 time points").
 */
export function describeSpan(
  first: string,
  last: string,
  points: number,
  kind: TimestampKind,
): string {
  const a = kind === 'datetime' ? calendarDateOf(first) : null;
  const b = kind === 'datetime' ? calendarDateOf(last) : null;
  if (a !== null && b !== null) {
    const days = b.dayNumber - a.dayNumber + 1;
    if (days >= 90) return plural(Math.round(days / 30.44), 'month');
    if (days >= 14) return plural(Math.round(days / 7), 'week');
    if (days >= 2) return plural(days, 'day');
  }
  return plural(points, 'time point');
}

function plural(count: number, unit: string): string {
  return `${count} ${unit}${count === 1 ? '' : 's'}`;
}
