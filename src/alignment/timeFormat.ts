import { daysFromCivil, daysInMonth } from './civilDays.js';

/**
 * How timestamp (and origin) labels are read, as the `time-format` option names it:
 *
 * | name | labels | order |
 * |---|---|---|
 * | `auto` | all decimal numbers, or all ISO 8601 dates/date-times; anything else is refused | numeric or chronological |
 * | `number` | decimal numbers only | numeric |
 * | `iso-8601` | ISO 8601 only (YYYY-MM-DD[THH:MM[:SS[.f]]][Z\|±HH:MM], no offset = UTC) | chronological |
 * | `day-month-year` | D/M/YYYY, optionally followed by H:MM or H:MM:SS[.f] | chronological (UTC) |
 * | `month-day-year` | M/D/YYYY, optionally followed by H:MM or H:MM:SS[.f] | chronological (UTC) |
 * | `text-order` | anything | text (UTF-16 code units: "10" before "9") |
 *
 * In the two day/month patterns the separator is "/", "." or "-" (the same one twice), day and
 * month have one or two digits, the year four (two-digit years are refused: which century is a
 * guess), and the time follows after a space or "T".
 */
export const TIME_FORMAT_NAMES = [
  'auto',
  'number',
  'iso-8601',
  'day-month-year',
  'month-day-year',
  'text-order',
] as const;
export type TimeFormatName = (typeof TIME_FORMAT_NAMES)[number];

/** A calendar date and time of day, as read from a label (no offset: UTC). */
export interface CivilTime {
  readonly year: number;
  readonly month: number;
  readonly day: number;
  readonly hour: number;
  readonly minute: number;
  readonly second: number;
  readonly nanos: number;
  /** Offset east of UTC in seconds. */
  readonly offsetSeconds: number;
}

const DAY_MONTH =
  /^(\d{1,2})([/.-])(\d{1,2})\2(\d{2,4})(?:[ T](\d{1,2}):(\d{2})(?::(\d{2})(?:\.(\d{1,9}))?)?)?$/;

/** Does the label look like a date written with day and month first (e.g. 1/6/2026 0:00)? */
export function looksLikeDayMonthDate(label: string): boolean {
  return DAY_MONTH.test(label);
}

/**
 * Reads a day-first or month-first date (see TIME_FORMAT_NAMES); returns the civil time or a
 * string saying what is wrong with the label.
 */
export function readDayMonthDate(label: string, dayFirst: boolean): CivilTime | string {
  const m = DAY_MONTH.exec(label);
  const pattern = dayFirst ? 'D/M/YYYY [H:MM[:SS]]' : 'M/D/YYYY [H:MM[:SS]]';
  if (m === null) return `not a date of the form ${pattern}`;
  if (m[4]!.length !== 4) return `the year ${m[4]} is not written with four digits`;
  const day = Number(dayFirst ? m[1] : m[3]);
  const month = Number(dayFirst ? m[3] : m[1]);
  const year = Number(m[4]);
  const civil: CivilTime = {
    year,
    month,
    day,
    hour: m[5] === undefined ? 0 : Number(m[5]),
    minute: m[6] === undefined ? 0 : Number(m[6]),
    second: m[7] === undefined ? 0 : Number(m[7]),
    nanos: m[8] === undefined ? 0 : Number(m[8].padEnd(9, '0')),
    offsetSeconds: 0,
  };
  return checkCivil(civil, pattern) ?? civil;
}

/** A message when the fields do not form a real date and time, else null. */
export function checkCivil(t: CivilTime, pattern: string): string | null {
  if (t.month < 1 || t.month > 12) return `month ${t.month} is not 1–12 (read as ${pattern})`;
  if (t.day < 1 || t.day > daysInMonth(t.year, t.month)) {
    return `day ${t.day} does not exist in month ${t.month} of ${t.year} (read as ${pattern})`;
  }
  if (t.hour > 23) return `hour ${t.hour} is not 0–23`;
  if (t.minute > 59) return `minute ${t.minute} is not 0–59`;
  if (t.second > 59) return `second ${t.second} is not 0–59`;
  return null;
}

/**
 * The instant of a civil time: a fixed-width text key that sorts chronologically (seconds since
 * the epoch shifted by 1e12 to stay positive, then nanoseconds), and epoch milliseconds.
 */
export function instantOf(t: CivilTime): { key: string; epochMillis: number } {
  const seconds =
    daysFromCivil(t.year, t.month, t.day) * 86400 +
    t.hour * 3600 +
    t.minute * 60 +
    t.second -
    t.offsetSeconds;
  const key = `${String(seconds + 1e12).padStart(13, '0')}.${String(t.nanos).padStart(9, '0')}`;
  return { key, epochMillis: seconds * 1000 + t.nanos / 1e6 };
}
