import type { TimestampKind } from '../core/panel.js';
import { type CalendarDate, calendarDateOf } from './calendarDate.js';

/** Fewest and most periods in a breakdown (the 8–60; common practice for a bar chart). */
export const MIN_PERIODS = 8;
export const MAX_PERIODS = 60;
/** Equal-count buckets aim at this many time points each (common practice), within 8–60 buckets. */
const POINTS_PER_BUCKET = 10;

export type PeriodUnit = 'day' | 'week' | 'month' | 'quarter' | 'equal-count';

/** Consecutive runs of time points: bucket j covers points [starts[j], starts[j+1]). */
export interface PeriodBuckets {
  readonly unit: PeriodUnit;
  /** Index of each bucket's first point, ascending; a final entry n closes the last bucket. */
  readonly bounds: readonly number[];
}

const CALENDAR_UNITS: readonly Exclude<PeriodUnit, 'equal-count'>[] = [
  'day',
  'week',
  'month',
  'quarter',
];

/**
 * Splits a series' time points (labels in time order) into periods for the breakdown by period.
 * Date timestamps: the finest calendar unit (UTC day, ISO week from Monday, month, quarter) that
 * gives 8 to 60 non-empty periods; when none does (a few days of hourly data, decades of daily
 * data) and for numeric or text timestamps: equal-count buckets, k = clamp(⌈n/10⌉, 8, 60) (at most
 * n), bucket j covering points ⌊j·n/k⌋ .. ⌊(j+1)·n/k⌋ − 1. Every point is in exactly one period.
 */
export function periodBuckets(labels: readonly string[], kind: TimestampKind): PeriodBuckets {
  const n = labels.length;
  if (kind === 'datetime' && n > 0) {
    const dates = labels.map(calendarDateOf);
    if (dates.every((d): d is CalendarDate => d !== null)) {
      for (const unit of CALENDAR_UNITS) {
        const bounds = calendarBounds(dates, unit);
        const count = bounds.length - 1;
        if (count > MAX_PERIODS) continue;
        if (count >= MIN_PERIODS) return { unit, bounds };
        break;
      }
    }
  }
  return { unit: 'equal-count', bounds: equalCountBounds(n) };
}

/** Bucket key of a date in a calendar unit; equal keys are the same period. */
export function calendarKey(date: CalendarDate, unit: Exclude<PeriodUnit, 'equal-count'>): number {
  switch (unit) {
    case 'day':
      return date.dayNumber;
    case 'week':
      // 1970-01-01 was a Thursday: day number + 3 counts from Monday 1969-12-29.
      return Math.floor((date.dayNumber + 3) / 7);
    case 'month':
      return date.year * 12 + date.month - 1;
    case 'quarter':
      return date.year * 4 + Math.floor((date.month - 1) / 3);
  }
}

function calendarBounds(
  dates: readonly CalendarDate[],
  unit: Exclude<PeriodUnit, 'equal-count'>,
): number[] {
  const bounds: number[] = [];
  let previous: number | null = null;
  dates.forEach((date, t) => {
    const key = calendarKey(date, unit);
    if (key !== previous) bounds.push(t);
    previous = key;
  });
  bounds.push(dates.length);
  return bounds;
}

/** Bounds of k equal-count buckets over n points (see periodBuckets). */
export function equalCountBounds(n: number): number[] {
  if (n === 0) return [0];
  const k = Math.min(
    n,
    Math.max(MIN_PERIODS, Math.min(MAX_PERIODS, Math.ceil(n / POINTS_PER_BUCKET))),
  );
  const bounds: number[] = [];
  for (let j = 0; j <= k; j++) bounds.push(Math.floor((j * n) / k));
  return bounds;
}
