import { describe, expect, it } from 'vitest';
import { orderLabels, readLabel } from '../../src/alignment/timeOrder.js';
import { InputError } from '../../src/core/inputError.js';
import type { LabelColumn } from '../../src/reading/forecastTable.js';

function column(labels: string[]): LabelColumn {
  return {
    column: 'timestamp',
    ids: Int32Array.from(labels, (_, i) => i),
    labels,
    firstLines: Int32Array.from(labels, (_, i) => i + 2),
  };
}

function keyOf(label: string): string | number {
  const reading = readLabel(label);
  if (typeof reading === 'string' || reading.kind === 'text') throw new Error(`no key: ${label}`);
  return reading.key;
}

describe('readLabel', () => {
  it('gives equal keys to labels that denote the same instant', () => {
    const midnight = keyOf('2024-01-01');
    for (const same of [
      '2024-01-01T00:00',
      '2024-01-01T00:00Z',
      '2024-01-01T00:00:00Z',
      '2024-01-01 00:00:00.000',
      '2024-01-01T01:00+01:00',
      '2023-12-31T19:30-04:30',
    ]) {
      expect(keyOf(same), same).toBe(midnight);
    }
    expect(keyOf('2024-01-01T00:00:00.5Z')).toBe(keyOf('2024-01-01T00:00:00.500Z'));
    expect(keyOf('1.0')).toBe(keyOf('1'));
  });

  it('orders instants chronologically across offsets, fractions and leap days', () => {
    const labels = [
      '2024-03-01',
      '2024-02-29T23:59:59.999999999Z',
      '2024-02-29',
      '1999-12-31T23:00-02:00',
      '2000-01-01T00:30Z',
      '0001-01-01',
      '9999-12-31T23:59:59Z',
    ];
    const sorted = [...labels].sort((a, b) => {
      const ka = keyOf(a) as string;
      const kb = keyOf(b) as string;
      return ka < kb ? -1 : ka > kb ? 1 : 0;
    });
    expect(sorted).toEqual([
      '0001-01-01',
      '2000-01-01T00:30Z',
      '1999-12-31T23:00-02:00',
      '2024-02-29',
      '2024-02-29T23:59:59.999999999Z',
      '2024-03-01',
      '9999-12-31T23:59:59Z',
    ]);
  });

  it('describes date-like labels that are not valid dates', () => {
    expect(readLabel('2024-13-01')).toBe('month 13 is not 01–12');
    expect(readLabel('2023-02-29')).toBe('day 29 does not exist in 2023-02');
    expect(readLabel('2024-01-01T24:00')).toBe('hour 24 is not 00–23');
    expect(readLabel('2024-01-01T10:00+0100')).toMatch(/starts like a date/);
    expect(readLabel('2024-01-01 run 2')).toMatch(/starts like a date/);
  });

  it('reads other labels as numbers or text', () => {
    expect(readLabel('20240101')).toEqual({ kind: 'number', key: 20240101 });
    expect(readLabel('-0')).toEqual({ kind: 'number', key: 0 });
    expect(readLabel('week 3')).toEqual({ kind: 'text' });
    expect(readLabel('2024-W03')).toEqual({ kind: 'text' });
  });
});

describe('orderLabels', () => {
  it('orders all-numeric labels numerically, sharing ranks for equal values', () => {
    const order = orderLabels(
      [
        { file: 'b.csv', column: column(['10', '9', '1.0']) },
        { file: 'c.csv', column: column(['1', '100']) },
      ],
      'timestamp',
    );
    expect(order.kind).toBe('number');
    expect(order.labels).toEqual(['1', '9', '10', '100']);
    expect(order.ranks.map((r) => Array.from(r))).toEqual([
      [2, 1, 0],
      [0, 3],
    ]);
  });

  it('orders ISO dates chronologically and shows the smallest label of an instant', () => {
    const order = orderLabels(
      [
        { file: 'b.csv', column: column(['2024-01-02T00:00:00Z', '2024-01-01T12:00Z']) },
        { file: 'c.csv', column: column(['2024-01-02', '2024-01-01T13:00+01:00']) },
      ],
      'timestamp',
    );
    expect(order.kind).toBe('datetime');
    expect(order.labels).toEqual(['2024-01-01T12:00Z', '2024-01-02']);
    expect(order.ranks.map((r) => Array.from(r))).toEqual([
      [1, 0],
      [1, 0],
    ]);
  });

  it('refuses a text label among numbers, naming its file and line, with a hint', () => {
    const error = errorOf(() =>
      orderLabels(
        [
          { file: 'b.csv', column: column(['10', '9']) },
          { file: 'c.csv', column: column(['9', 'zz-extra']) },
        ],
        'timestamp',
      ),
    );
    expect(error.describe()).toMatch(
      /^c\.csv:3: the timestamps cannot be put in a reliable time order: this one is neither a number nor an ISO 8601 date while "10" \(b\.csv:2\) is a number; .*--time-format text-order.*\(column "timestamp", value "zz-extra"\)$/,
    );
  });

  it('refuses numbers mixed with dates, naming the odd one out', () => {
    const error = errorOf(() =>
      orderLabels(
        [
          { file: 'b.csv', column: column(['2024-01-01', '2024-01-02']) },
          { file: 'c.csv', column: column(['1']) },
        ],
        'timestamp',
      ),
    );
    expect(error.location).toEqual({
      file: 'c.csv',
      line: 2,
      column: 'timestamp',
      value: '1',
    });
    expect(error.message).toContain('this one is a number while "2024-01-01" (b.csv:2)');
  });

  it('refuses US-style dates with a hint at the day/month formats', () => {
    const error = errorOf(() =>
      orderLabels(
        [{ file: 'b.csv', column: column(['1/6/2026 0:00', '1/7/2026 0:00']) }],
        'timestamp',
      ),
    );
    expect(error.describe()).toContain('b.csv:2:');
    expect(error.message).toContain('--time-format day-month-year');
    expect(error.message).toContain('--time-format month-day-year');
  });

  it('orders text labels as text only when asked, and says so', () => {
    const order = orderLabels(
      [
        { file: 'b.csv', column: column(['10', '9']) },
        { file: 'c.csv', column: column(['9', 'later']) },
      ],
      'timestamp',
      'text-order',
    );
    expect(order.kind).toBe('text');
    expect(order.format).toBe('text-order');
    expect(order.reason).toContain('text order');
    expect(order.labels).toEqual(['10', '9', 'later']);
    expect(order.instants).toBeNull();
  });

  it('reads day-first and month-first dates chronologically, with epoch milliseconds', () => {
    const labels = ['2/1/2026', '1/2/2026 12:30', '31/12/2025 23:59:59'];
    const dmy = orderLabels(
      [{ file: 'b.csv', column: column(labels) }],
      'timestamp',
      'day-month-year',
    );
    expect(dmy.kind).toBe('datetime');
    expect(dmy.labels).toEqual(['31/12/2025 23:59:59', '2/1/2026', '1/2/2026 12:30']);
    // Date.UTC is the reference (months 0-based there).
    expect(Array.from(dmy.instants!)).toEqual([
      Date.UTC(2025, 11, 31, 23, 59, 59),
      Date.UTC(2026, 0, 2),
      Date.UTC(2026, 1, 1, 12, 30),
    ]);
    const mdy = orderLabels(
      [{ file: 'b.csv', column: column(['2/1/2026', '1/2/2026 12:30']) }],
      'timestamp',
      'month-day-year',
    );
    expect(mdy.labels).toEqual(['1/2/2026 12:30', '2/1/2026']);
    expect(() =>
      orderLabels(
        [{ file: 'b.csv', column: column(['31/12/2025']) }],
        'timestamp',
        'month-day-year',
      ),
    ).toThrow(/month 31 is not 1–12/);
    expect(() =>
      orderLabels([{ file: 'b.csv', column: column(['1/2/26']) }], 'timestamp', 'day-month-year'),
    ).toThrow(/four digits/);
  });

  it('keeps epoch milliseconds of ISO instants and the numbers of numeric labels', () => {
    const iso = orderLabels(
      [
        {
          file: 'b.csv',
          column: column(['2024-01-01T01:00+01:00', '2024-01-02', '2024-01-01T00:00:00.5Z']),
        },
      ],
      'timestamp',
    );
    expect(Array.from(iso.instants!)).toEqual([
      Date.UTC(2024, 0, 1),
      Date.UTC(2024, 0, 1) + 500,
      Date.UTC(2024, 0, 2),
    ]);
    const numbers = orderLabels([{ file: 'b.csv', column: column(['10', '2.5']) }], 'timestamp');
    expect(Array.from(numbers.instants!)).toEqual([2.5, 10]);
  });

  it('refuses a label that does not fit an explicit format', () => {
    expect(() =>
      orderLabels([{ file: 'b.csv', column: column(['1', '2024-01-01']) }], 'timestamp', 'number'),
    ).toThrow(/not a timestamp in the number format of --time-format: not a decimal number/);
    expect(() =>
      orderLabels(
        [{ file: 'b.csv', column: column(['2024-01-01', '7']) }],
        'timestamp',
        'iso-8601',
      ),
    ).toThrow(/not an ISO 8601 date/);
  });

  it('rejects an invalid date with file, line and value', () => {
    let error: unknown;
    try {
      orderLabels([{ file: 'b.csv', column: column(['2024-01-31', '2024-02-30']) }], 'timestamp');
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(InputError);
    expect((error as InputError).describe()).toBe(
      'b.csv:3: not a valid ISO 8601 timestamp: day 30 does not exist in 2024-02 (column "timestamp", value "2024-02-30")',
    );
  });
});

function errorOf(f: () => unknown): InputError {
  try {
    f();
  } catch (error) {
    if (error instanceof InputError) return error;
    throw error;
  }
  throw new Error('expected an InputError');
}
