import { InputError } from '../core/inputError.js';
import type { TimestampKind } from '../core/panel.js';
import type { LabelColumn } from '../reading/forecastTable.js';
import { parseDecimal } from '../reading/numbers.js';
import { daysFromCivil, daysInMonth } from './civilDays.js';
import {
  type CivilTime,
  instantOf,
  looksLikeDayMonthDate,
  readDayMonthDate,
  type TimeFormatName,
} from './timeFormat.js';

export { daysFromCivil };

/**
 * How a timestamp (or origin) label reads: a decimal number, a date/date-time, or neither. `key`
 * is what the label denotes: equal keys are the same time. A date-time also carries its instant in
 * epoch milliseconds (fractions of a millisecond kept as a fraction).
 */
export type LabelReading =
  | { readonly kind: 'number'; readonly key: number }
  | { readonly kind: 'datetime'; readonly key: string; readonly epochMillis: number }
  | { readonly kind: 'text' };

const DATE_PREFIX = /^\d{4}-\d{2}-\d{2}/;
const ISO =
  /^(\d{4})-(\d{2})-(\d{2})(?:[T ](\d{2}):(\d{2})(?::(\d{2})(?:\.(\d{1,9}))?)?(Z|[+-]\d{2}:\d{2})?)?$/;

/**
 * Reads one label. ISO 8601 here means YYYY-MM-DD, optionally followed by "T" (or a space) and
 * HH:MM, HH:MM:SS or HH:MM:SS.f (1–9 fraction digits), optionally followed by "Z" or ±HH:MM. No
 * offset means UTC (never the machine's local time). The key of a date-time is the instant in a
 * fixed-width text that sorts chronologically: seconds since 0000-01-01T00:00Z (shifted to stay
 * positive) and nanoseconds, so "2024-01-01", "2024-01-01T00:00Z" and "2024-01-01T01:00+01:00"
 * share a key.
 *
 * A label that starts like a date (YYYY-MM-DD) but is not a valid one (month 13, 30 February,
 * hour 24, a trailing word) returns a string describing the problem, rather than quietly turning
 * the whole comparison to text order.
 */
export function readLabel(label: string): LabelReading | string {
  const number = parseDecimal(label);
  if (!Number.isNaN(number)) return { kind: 'number', key: number === 0 ? 0 : number };
  if (!DATE_PREFIX.test(label)) return { kind: 'text' };
  return readIsoLabel(label);
}

function readIsoLabel(label: string): LabelReading | string {
  const m = ISO.exec(label);
  if (m === null) {
    return 'starts like a date but is not YYYY-MM-DD[THH:MM[:SS[.fff]]][Z|±HH:MM]';
  }
  const month = Number(m[2]);
  const day = Number(m[3]);
  const year = Number(m[1]);
  if (month < 1 || month > 12) return `month ${m[2]} is not 01–12`;
  if (day < 1 || day > daysInMonth(year, month))
    return `day ${m[3]} does not exist in ${m[1]}-${m[2]}`;
  const hour = m[4] === undefined ? 0 : Number(m[4]);
  const minute = m[5] === undefined ? 0 : Number(m[5]);
  const second = m[6] === undefined ? 0 : Number(m[6]);
  if (hour > 23) return `hour ${m[4]} is not 00–23`;
  if (minute > 59) return `minute ${m[5]} is not 00–59`;
  if (second > 59) return `second ${m[6]} is not 00–59`;
  let offsetSeconds = 0;
  const zone = m[8];
  if (zone !== undefined && zone !== 'Z') {
    const oh = Number(zone.slice(1, 3));
    const om = Number(zone.slice(4, 6));
    if (oh > 23 || om > 59) return `offset ${zone} is not a valid ±HH:MM`;
    offsetSeconds = (zone[0] === '-' ? -1 : 1) * (oh * 3600 + om * 60);
  }
  const civil: CivilTime = {
    year,
    month,
    day,
    hour,
    minute,
    second,
    nanos: m[7] === undefined ? 0 : Number(m[7].padEnd(9, '0')),
    offsetSeconds,
  };
  const { key, epochMillis } = instantOf(civil);
  return { kind: 'datetime', key, epochMillis };
}

/** Reads a label as the time format says; a string is what is wrong with it. */
function readAs(label: string, format: TimeFormatName): LabelReading | string {
  switch (format) {
    case 'auto':
      return readLabel(label);
    case 'text-order':
      return { kind: 'text' };
    case 'number': {
      const x = parseDecimal(label);
      return Number.isNaN(x) ? 'not a decimal number' : { kind: 'number', key: x === 0 ? 0 : x };
    }
    case 'iso-8601':
      return DATE_PREFIX.test(label)
        ? readIsoLabel(label)
        : 'not an ISO 8601 date (YYYY-MM-DD[THH:MM[:SS]][Z|±HH:MM])';
    case 'day-month-year':
    case 'month-day-year': {
      const civil = readDayMonthDate(label, format === 'day-month-year');
      if (typeof civil === 'string') return civil;
      const { key, epochMillis } = instantOf(civil);
      return { kind: 'datetime', key, epochMillis };
    }
  }
}

/** One file's timestamp or origin column, with the file it came from (for messages). */
export interface LabelSource {
  readonly file: string;
  readonly column: LabelColumn;
}

export interface LabelOrder {
  readonly kind: TimestampKind;
  /** The time format the labels were read with. */
  readonly format: TimeFormatName;
  readonly reason: string;
  /** Per source: local label id → global rank (0.. in time order; equal times share a rank). */
  readonly ranks: readonly Int32Array[];
  /** Rank → the label shown for it: the smallest (code-unit order) of the labels with that key. */
  readonly labels: readonly string[];
  /**
   * Rank → the parsed time: epoch milliseconds for date-times, the number itself for numbers;
   * null in text order.
   */
  readonly instants: Float64Array | null;
}

/**
 * Decides, once for all files of a comparison, how labels are ordered, and ranks them. With the
 * `auto` format: all decimal numbers → numeric order; all ISO 8601 → chronological; anything else
 * (a text label among numbers, numbers mixed with dates, a US-style date) is an InputError naming
 * the file, line and label, with a hint at the `time-format` that reads it — text order is never
 * chosen silently, because it sorts 1, 10, 100, 2 and turns a verdict. Other formats read every
 * label one way (see TIME_FORMAT_NAMES); `text-order` orders by UTF-16 code units on request. In
 * numeric and chronological order labels that denote the same time ("1" and "1.0";
 * "2024-01-01T00:00Z" and "2024-01-01T00:00:00Z") are the same key; in text order only identical
 * labels are.
 */
export function orderLabels(
  sources: readonly LabelSource[],
  what: string,
  format: TimeFormatName = 'auto',
  option = '--time-format',
): LabelOrder {
  const readings = new Map<string, LabelReading>();
  type Example = { file: string; line: number; column: string; label: string };
  const first: Record<'number' | 'datetime' | 'text', Example | null> = {
    number: null,
    datetime: null,
    text: null,
  };
  const counts = { number: 0, datetime: 0, text: 0 };
  for (const { file, column } of sources) {
    const labels = column.labels;
    for (let id = 0; id < labels.length; id++) {
      const label = labels[id]!;
      if (readings.has(label)) continue;
      const reading = readAs(label, format);
      if (typeof reading === 'string') {
        throw new InputError(
          format === 'auto'
            ? `not a valid ISO 8601 ${what}: ${reading}`
            : `not a ${what} in the ${format} format of ${option}: ${reading}`,
          { file, line: column.firstLines[id]!, column: column.column, value: label },
        );
      }
      readings.set(label, reading);
      counts[reading.kind]++;
      first[reading.kind] ??= { file, line: column.firstLines[id]!, column: column.column, label };
    }
  }
  const total = readings.size;
  let kind: TimestampKind;
  let reason: string;
  if (format === 'text-order') {
    kind = 'text';
    reason = `text order (UTF-16 code units, so "10" comes before "9"), as ${option} text-order asks`;
  } else if (counts.number === total) {
    kind = 'number';
    reason = `every ${what} is a decimal number: numeric order`;
  } else if (counts.datetime === total) {
    kind = 'datetime';
    reason =
      format === 'day-month-year' || format === 'month-day-year'
        ? `every ${what} is a ${format} date: chronological order (times are UTC)`
        : `every ${what} is an ISO 8601 date or date-time: chronological order (no offset means UTC)`;
  } else {
    throw mixedKinds(first, counts, what, option);
  }

  // Group labels by key, then rank the keys.
  const keyOf = (label: string): string | number => {
    const reading = readings.get(label)!;
    if (kind === 'text' || reading.kind === 'text') return label;
    return reading.key;
  };
  const representative = new Map<string | number, string>();
  for (const label of readings.keys()) {
    const key = keyOf(label);
    const current = representative.get(key);
    if (current === undefined || label < current) representative.set(key, label);
  }
  const keys = [...representative.keys()];
  if (kind === 'number') (keys as number[]).sort((a, b) => a - b);
  else (keys as string[]).sort(compareCodeUnits);
  const rankOfKey = new Map<string | number, number>();
  keys.forEach((key, rank) => {
    rankOfKey.set(key, rank);
  });
  const ranks = sources.map(({ column }) =>
    Int32Array.from(column.labels, (label) => rankOfKey.get(keyOf(label))!),
  );
  const labels = keys.map((key) => representative.get(key)!);
  let instants: Float64Array | null = null;
  if (kind === 'number') instants = Float64Array.from(keys as number[]);
  else if (kind === 'datetime') {
    instants = Float64Array.from(labels, (label) => {
      const reading = readings.get(label)!;
      return reading.kind === 'datetime' ? reading.epochMillis : Number.NaN;
    });
  }
  return { kind, format, reason, ranks, labels, instants };
}

/** The refusal of labels of different kinds under `auto`, naming the odd one out. */
function mixedKinds(
  first: Record<
    'number' | 'datetime' | 'text',
    { file: string; line: number; column: string; label: string } | null
  >,
  counts: { number: number; datetime: number; text: number },
  what: string,
  option: string,
): InputError {
  const odd =
    first.text ??
    (counts.number <= counts.datetime ? first.number : first.datetime) ??
    first.number!;
  const others =
    odd === first.text
      ? counts.number >= counts.datetime
        ? first.number
        : first.datetime
      : odd === first.number
        ? first.datetime
        : first.number;
  const context =
    others === null
      ? ''
      : ` while ${JSON.stringify(others.label)} (${others.file}:${others.line}) is ${
          others === first.number ? 'a number' : 'an ISO 8601 date'
        }`;
  let hint: string;
  if (looksLikeDayMonthDate(odd.label)) {
    hint = `it looks like a date with day and month first: say how to read it with ${option} day-month-year (31/12/2026) or ${option} month-day-year (12/31/2026)`;
  } else if (odd === first.text) {
    hint = `a ${what} must be a number or an ISO 8601 date (YYYY-MM-DD[THH:MM[:SS]]); if the labels are names with no time order, ${option} text-order compares them as text (then "10" sorts before "9")`;
  } else {
    hint = `one file (or column) must use one kind of ${what} throughout; convert them, or use ${option} text-order to compare them as text`;
  }
  return new InputError(
    `the ${what}s cannot be put in a reliable time order: this one is ${
      odd === first.text
        ? 'neither a number nor an ISO 8601 date'
        : odd === first.number
          ? 'a number'
          : 'an ISO 8601 date'
    }${context}; ${hint}`,
    { file: odd.file, line: odd.line, column: odd.column, value: odd.label },
  );
}

export function compareCodeUnits(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}
