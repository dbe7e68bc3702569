import { InputError } from '../core/inputError.js';
import type { TimestampKind } from '../core/panel.js';
import type { LabelColumn } from '../reading/forecastTable.js';
import { parseDecimal } from '../reading/numbers.js';

/**
 * How a timestamp (or origin) label reads: a decimal number, an ISO 8601 date/date-time, or
 * neither. `key` is what the label denotes: equal keys are the same time.
 */
export type LabelReading =
  | { readonly kind: 'number'; readonly key: number }
  | { readonly kind: 'datetime'; readonly key: string }
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
  const m = ISO.exec(label);
  if (m === null) {
    return 'starts like a date but is not YYYY-MM-DD[THH:MM[:SS[.fff]]][Z|±HH:MM]';
  }
  const year = Number(m[1]);
  const month = Number(m[2]);
  const day = Number(m[3]);
  const hour = m[4] === undefined ? 0 : Number(m[4]);
  const minute = m[5] === undefined ? 0 : Number(m[5]);
  const second = m[6] === undefined ? 0 : Number(m[6]);
  const nanos = m[7] === undefined ? 0 : Number(m[7].padEnd(9, '0'));
  if (month < 1 || month > 12) return `month ${m[2]} is not 01–12`;
  if (day < 1 || day > daysInMonth(year, month))
    return `day ${m[3]} does not exist in ${m[1]}-${m[2]}`;
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
  const seconds =
    daysFromCivil(year, month, day) * 86400 + hour * 3600 + minute * 60 + second - offsetSeconds;
  // Years 0000..9999 with offsets stay within ±4e11 s; shift by 1e12 to keep 13 digits.
  const key = `${String(seconds + 1e12).padStart(13, '0')}.${String(nanos).padStart(9, '0')}`;
  return { kind: 'datetime', key };
}

function daysInMonth(year: number, month: number): number {
  if (month === 2) return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0 ? 29 : 28;
  return month === 4 || month === 6 || month === 9 || month === 11 ? 30 : 31;
}

/** Days since 1970-01-01 of a proleptic Gregorian date (exact integer arithmetic). */
export function daysFromCivil(year: number, month: number, day: number): number {
  const y = month <= 2 ? year - 1 : year;
  const era = Math.floor(y / 400);
  const yoe = y - era * 400;
  const mp = (month + 9) % 12;
  const doy = Math.floor((153 * mp + 2) / 5) + day - 1;
  const doe = yoe * 365 + Math.floor(yoe / 4) - Math.floor(yoe / 100) + doy;
  return era * 146097 + doe - 719468;
}

/** One file's timestamp or origin column, with the file it came from (for messages). */
export interface LabelSource {
  readonly file: string;
  readonly column: LabelColumn;
}

export interface LabelOrder {
  readonly kind: TimestampKind;
  readonly reason: string;
  /** Per source: local label id → global rank (0.. in time order; equal times share a rank). */
  readonly ranks: readonly Int32Array[];
  /** Rank → the label shown for it: the smallest (code-unit order) of the labels with that key. */
  readonly labels: readonly string[];
}

/**
 * Decides, once for all files of a comparison, how labels are ordered, and ranks them:
 * all decimal numbers → numeric order; all ISO 8601 → chronological; anything else → text order
 * (UTF-16 code units) for every file alike. In numeric and chronological order labels that denote
 * the same time ("1" and "1.0"; "2024-01-01T00:00Z" and "2024-01-01T00:00:00Z") are the same key;
 * in text order only identical labels are.
 */
export function orderLabels(sources: readonly LabelSource[], what: string): LabelOrder {
  const readings = new Map<string, LabelReading>();
  const example = { number: '', datetime: '', text: '' };
  const exampleFile = { number: '', datetime: '', text: '' };
  const counts = { number: 0, datetime: 0, text: 0 };
  for (const { file, column } of sources) {
    column.labels.forEach((label, id) => {
      if (readings.has(label)) return;
      const reading = readLabel(label);
      if (typeof reading === 'string') {
        throw new InputError(`not a valid ISO 8601 ${what}: ${reading}`, {
          file,
          line: column.firstLines[id]!,
          column: column.column,
          value: label,
        });
      }
      readings.set(label, reading);
      const kind = reading.kind;
      counts[kind]++;
      if (counts[kind] === 1 || label < example[kind]) {
        example[kind] = label;
        exampleFile[kind] = file;
      }
    });
  }
  const total = readings.size;
  let kind: TimestampKind;
  let reason: string;
  const eg = (k: 'number' | 'datetime' | 'text'): string =>
    `${JSON.stringify(example[k])} in ${exampleFile[k]}`;
  if (counts.number === total) {
    kind = 'number';
    reason = `every ${what} is a decimal number: numeric order`;
  } else if (counts.datetime === total) {
    kind = 'datetime';
    reason = `every ${what} is an ISO 8601 date or date-time: chronological order (no offset means UTC)`;
  } else {
    kind = 'text';
    reason =
      counts.text > 0
        ? `text order: ${eg('text')} is neither a decimal number nor an ISO 8601 date/time`
        : `text order: the ${what}s mix numbers (e.g. ${eg('number')}) and dates (e.g. ${eg('datetime')})`;
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
  return { kind, reason, ranks, labels: keys.map((key) => representative.get(key)!) };
}

export function compareCodeUnits(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}
