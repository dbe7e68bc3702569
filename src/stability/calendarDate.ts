import { readLabel } from '../alignment/timeOrder.js';

/** A UTC calendar date: year, month 1–12, day 1–31, and days since 1970-01-01. */
export interface CalendarDate {
  readonly year: number;
  readonly month: number;
  readonly day: number;
  readonly dayNumber: number;
}

/**
 * The UTC calendar date of an ISO 8601 timestamp label, read by the same rule that ordered the
 * timestamps (alignment/timeOrder.ts: no offset means UTC, an offset is applied), or null for a
 * label that is not an ISO 8601 date/date-time.
 */
export function calendarDateOf(label: string): CalendarDate | null {
  const reading = readLabel(label);
  if (typeof reading === 'string' || reading.kind !== 'datetime') return null;
  // The key is seconds since 1970-01-01T00:00Z plus 1e12, as 13 digits, then the nanoseconds.
  const seconds = Number(reading.key.slice(0, 13)) - 1e12;
  const dayNumber = Math.floor(seconds / 86400);
  return { ...civilFromDays(dayNumber), dayNumber };
}

/**
 * Proleptic Gregorian date of a day number (days since 1970-01-01), exact integer arithmetic;
 * the inverse of `daysFromCivil` (H. Hinnant's "chrono-compatible low-level date algorithms").
 */
export function civilFromDays(days: number): { year: number; month: number; day: number } {
  const z = days + 719468;
  const era = Math.floor(z / 146097);
  const doe = z - era * 146097;
  const yoe = Math.floor(
    (doe - Math.floor(doe / 1460) + Math.floor(doe / 36524) - Math.floor(doe / 146096)) / 365,
  );
  const doy = doe - (365 * yoe + Math.floor(yoe / 4) - Math.floor(yoe / 100));
  const mp = Math.floor((5 * doy + 2) / 153);
  const day = doy - Math.floor((153 * mp + 2) / 5) + 1;
  const month = mp < 10 ? mp + 3 : mp - 9;
  return { year: yoe + era * 400 + (month <= 2 ? 1 : 0), month, day };
}
