/**
 * The step of a backtest's time grid: what "one step ahead" means. Clock steps (seconds,
 * minutes, hours) are fixed durations between instants; calendar steps (days, weeks, months,
 * years) count dates as written, so a daily series in local-offset notation stays daily across a
 * DST change (a 23-hour day is still one day) and a monthly step is a calendar month (28 to 31
 * days), not a fixed duration. Business days count Monday to Friday only (a Friday-to-Monday
 * step is one step; holidays are not known). Numeric timestamps step by a number.
 */
export interface Frequency {
  readonly unit: 'number' | 'second' | 'day' | 'businessDay' | 'month';
  /** Step size in the unit: seconds, days, weekdays, months, or the numeric step. Always > 0. */
  readonly size: number;
}

const UNITS: Readonly<Record<string, { unit: Frequency['unit']; factor: number }>> = {
  s: { unit: 'second', factor: 1 },
  min: { unit: 'second', factor: 60 },
  h: { unit: 'second', factor: 3600 },
  d: { unit: 'day', factor: 1 },
  bd: { unit: 'businessDay', factor: 1 },
  w: { unit: 'day', factor: 7 },
  mo: { unit: 'month', factor: 1 },
  q: { unit: 'month', factor: 3 },
  y: { unit: 'month', factor: 12 },
};

/** The spellings `--frequency` accepts, for messages. */
export const FREQUENCY_SYNTAX =
  'auto, a count and unit (s, min, h, d, bd, w, mo, q, y), e.g. 1h, 15min, 1d, 1bd, 1w, 1mo, or a number > 0 for numeric timestamps';

/**
 * Reads a frequency such as "1h", "15min", "1d", "1bd" (business days: Monday to Friday), "1w",
 * "1mo", "3mo", "1q", "1y", or a plain
 * positive number (for numeric timestamps); null when the text is none of these.
 */
export function parseFrequency(text: string): Frequency | null {
  const m = /^(\d{1,6})(s|min|h|d|bd|w|mo|q|y)$/.exec(text);
  if (m !== null) {
    const count = Number(m[1]);
    const { unit, factor } = UNITS[m[2]!]!;
    return count > 0 ? { unit, size: count * factor } : null;
  }
  if (!/^\d*\.?\d+(?:[eE][-+]?\d+)?$/.test(text)) return null;
  const size = Number(text);
  return Number.isFinite(size) && size > 0 ? { unit: 'number', size } : null;
}

/** The shortest spelling parseFrequency reads back to the same frequency. */
export function formatFrequency(f: Frequency): string {
  switch (f.unit) {
    case 'number':
      return String(f.size);
    case 'second':
      if (f.size % 3600 === 0) return `${f.size / 3600}h`;
      if (f.size % 60 === 0) return `${f.size / 60}min`;
      return `${f.size}s`;
    case 'day':
      return f.size % 7 === 0 ? `${f.size / 7}w` : `${f.size}d`;
    case 'businessDay':
      return `${f.size}bd`;
    case 'month':
      return f.size % 12 === 0 ? `${f.size / 12}y` : `${f.size}mo`;
  }
}
