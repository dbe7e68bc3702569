import { daysInMonth } from '../alignment/civilDays.js';
import { daysFromCivil, readLabel } from '../alignment/timeOrder.js';
import type { TimestampKind } from '../core/panel.js';

/**
 * A timestamp or origin as the backtest checks use it: the instant (for ordering and clock
 * steps) and, for ISO 8601 date-times, the calendar date and time of day as written (for
 * calendar steps: days, weeks, months). Built on the labels alignment has already read
 * (`readLabel` in src/alignment/timeOrder.ts); this file does not parse time itself beyond
 * picking the written date fields of a label readLabel accepted.
 *
 * Conventions: an instant is whole seconds since 1970-01-01T00:00Z plus nanoseconds, so two
 * labels with different offsets that denote the same moment are equal. The wall clock is the
 * local date and time in the label's own offset ("2024-03-31T03:00+02:00" is day 2024-03-31,
 * 03:00), which is what a calendar step counts.
 */
export interface TimePoint {
  /** Numbers: the value itself; date-times: whole seconds since 1970-01-01T00:00Z. */
  readonly seconds: number;
  /** Nanoseconds past `seconds` (0 for numbers). */
  readonly nanos: number;
  /** Days since 1970-01-01 of the date as written (0 for numbers). */
  readonly wallDay: number;
  /** Seconds into the written day, fraction included (0 for numbers). */
  readonly wallSecond: number;
  /** year · 12 + month − 1 of the date as written (0 for numbers). */
  readonly month: number;
  /** Day of the month as written, 1..31 (0 for numbers). */
  readonly dayOfMonth: number;
  /** Length of the written month in days (0 for numbers). */
  readonly monthLength: number;
}

/** readLabel's key of a date-time: seconds since 0000-01-01 shifted by 1e12, and nanoseconds. */
const INSTANT_KEY = /^(\d{13})\.(\d{9})$/;
/** The date and time of day as written in a label readLabel accepted as ISO 8601. */
const WRITTEN_FIELDS = /^(\d{4})-(\d{2})-(\d{2})(?:[T ](\d{2}):(\d{2})(?::(\d{2}))?)?/;

/**
 * The time point of a label of the given kind, or null when the label is not of that kind
 * (text order, or a number among dates). Labels reach here after alignment accepted them.
 */
export function toTimePoint(label: string, kind: TimestampKind): TimePoint | null {
  const reading = readLabel(label);
  if (typeof reading === 'string' || reading.kind !== kind) return null;
  if (reading.kind === 'number') {
    return {
      seconds: reading.key,
      nanos: 0,
      wallDay: 0,
      wallSecond: 0,
      month: 0,
      dayOfMonth: 0,
      monthLength: 0,
    };
  }
  if (reading.kind !== 'datetime') return null;
  const instant = INSTANT_KEY.exec(reading.key);
  const written = WRITTEN_FIELDS.exec(label);
  if (instant === null || written === null) {
    // readLabel's key or accepted spelling changed: a bug to fix here, never a guess.
    throw new Error(`cannot take the instant and written date of ${JSON.stringify(label)}`);
  }
  const seconds = Number(instant[1]) - 1e12;
  const nanos = Number(instant[2]);
  const year = Number(written[1]);
  const month = Number(written[2]);
  const day = Number(written[3]);
  const wallSecond =
    written[4] === undefined
      ? 0
      : Number(written[4]) * 3600 +
        Number(written[5]) * 60 +
        (written[6] === undefined ? 0 : Number(written[6])) +
        nanos / 1e9;
  return {
    seconds,
    nanos,
    wallDay: daysFromCivil(year, month, day),
    wallSecond,
    month: year * 12 + month - 1,
    dayOfMonth: day,
    monthLength: daysInMonth(year, month),
  };
}

/** Orders two time points by instant: negative, zero or positive. */
export function compareTimePoints(a: TimePoint, b: TimePoint): number {
  return a.seconds - b.seconds || a.nanos - b.nanos;
}

/** Time points per label id of a column's label list, null where a label is not of `kind`. */
export function timePointsOf(labels: readonly string[], kind: TimestampKind): (TimePoint | null)[] {
  return labels.map((label) => toTimePoint(label, kind));
}
