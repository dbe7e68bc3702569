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

  it('falls back to text order for every file when one label is neither', () => {
    const order = orderLabels(
      [
        { file: 'b.csv', column: column(['10', '9']) },
        { file: 'c.csv', column: column(['9', 'later']) },
      ],
      'timestamp',
    );
    expect(order.kind).toBe('text');
    expect(order.reason).toBe(
      'text order: "later" in c.csv is neither a decimal number nor an ISO 8601 date/time',
    );
    expect(order.labels).toEqual(['10', '9', 'later']);
  });

  it('falls back to text order when numbers and dates mix, and says so', () => {
    const order = orderLabels(
      [
        { file: 'b.csv', column: column(['2024-01-01']) },
        { file: 'c.csv', column: column(['1']) },
      ],
      'timestamp',
    );
    expect(order.kind).toBe('text');
    expect(order.reason).toContain(
      'mix numbers (e.g. "1" in c.csv) and dates (e.g. "2024-01-01" in b.csv)',
    );
    // In text order labels are keys as written: these two stay apart.
    const text = orderLabels(
      [{ file: 'b.csv', column: column(['2024-01-01', '2024-01-01T00:00Z', 'x']) }],
      'timestamp',
    );
    expect(text.labels).toEqual(['2024-01-01', '2024-01-01T00:00Z', 'x']);
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
