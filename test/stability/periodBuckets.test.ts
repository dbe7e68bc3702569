import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { daysFromCivil } from '../../src/alignment/timeOrder.js';
import { calendarDateOf, civilFromDays } from '../../src/stability/calendarDate.js';
import { periodBuckets } from '../../src/stability/periodBuckets.js';

const isoDay = (dayNumber: number): string => {
  const { year, month, day } = civilFromDays(dayNumber);
  return `${String(year).padStart(4, '0')}-${String(month).padStart(2, '0')}-${String(day).padStart(2, '0')}`;
};
const days = (from: string, count: number, step = 1): string[] => {
  const start = calendarDateOf(from)!.dayNumber;
  return Array.from({ length: count }, (_, i) => isoDay(start + i * step));
};

describe('civilFromDays', () => {
  it('inverts daysFromCivil over years 0000–9999 (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: -719528, max: 2932896 }), (d) => {
        const { year, month, day } = civilFromDays(d);
        expect(daysFromCivil(year, month, day)).toBe(d);
      }),
    );
  });
  it('knows known dates (1970-01-01 is day 0, 2000-02-29 is day 11016)', () => {
    expect(civilFromDays(0)).toEqual({ year: 1970, month: 1, day: 1 });
    expect(civilFromDays(11016)).toEqual({ year: 2000, month: 2, day: 29 });
    expect(calendarDateOf('2026-10-29T23:30-02:00')).toMatchObject({ month: 10, day: 30 });
    expect(calendarDateOf('12.5')).toBeNull();
  });
});

describe('periodBuckets', () => {
  it('uses ISO weeks (Monday first) for 240 daily points, as in the demo', () => {
    const labels = days('2026-03-04', 240);
    const { unit, bounds } = periodBuckets(labels, 'datetime');
    expect(unit).toBe('week');
    // 2026-03-04 is a Wednesday: the first week holds Wed–Sun (5 days), the next starts Monday.
    expect(bounds.slice(0, 3)).toEqual([0, 5, 12]);
    expect(bounds.length - 1).toBe(35);
    expect(labels[5]).toBe('2026-03-09');
  });

  it('picks the finest calendar unit that gives 8–60 periods', () => {
    expect(periodBuckets(days('2026-01-01', 30), 'datetime').unit).toBe('day');
    expect(periodBuckets(days('2020-01-01', 700), 'datetime').unit).toBe('month');
    expect(periodBuckets(days('2000-01-01', 600, 7), 'datetime').unit).toBe('quarter');
    // 23 years of weekly data: 92 quarters > 60, so equal-count buckets.
    expect(periodBuckets(days('2000-01-01', 1200, 7), 'datetime').unit).toBe('equal-count');
    // 5 days of hourly data: 5 days < 8, so equal-count buckets.
    const hourly = Array.from(
      { length: 120 },
      (_, h) => `2026-01-0${1 + Math.floor(h / 24)}T${String(h % 24).padStart(2, '0')}:00Z`,
    );
    expect(periodBuckets(hourly, 'datetime')).toMatchObject({ unit: 'equal-count' });
  });

  it('splits numeric timestamps into clamp(⌈n/10⌉, 8, 60) equal-count buckets', () => {
    const labels = (n: number) => Array.from({ length: n }, (_, i) => String(i + 1));
    expect(periodBuckets(labels(200), 'number').bounds.length - 1).toBe(20);
    expect(periodBuckets(labels(1000), 'number').bounds.length - 1).toBe(60);
    expect(periodBuckets(labels(30), 'number').bounds.length - 1).toBe(8);
    expect(periodBuckets(labels(5), 'number').bounds).toEqual([0, 1, 2, 3, 4, 5]);
    expect(periodBuckets([], 'number').bounds).toEqual([0]);
  });

  it('covers every point exactly once, in order, with at most 60 periods (property)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 3000 }),
        fc.integer({ min: 1, max: 40 }),
        fc.boolean(),
        (n, step, dated) => {
          const labels = dated
            ? days('1999-12-25', n, step)
            : Array.from({ length: n }, (_, i) => String(i * step));
          const { bounds } = periodBuckets(labels, dated ? 'datetime' : 'number');
          expect(bounds[0]).toBe(0);
          expect(bounds.at(-1)).toBe(n);
          for (let j = 1; j < bounds.length; j++)
            expect(bounds[j]!).toBeGreaterThan(bounds[j - 1]!);
          expect(bounds.length - 1).toBeLessThanOrEqual(60);
          if (n >= 8) expect(bounds.length - 1).toBeGreaterThanOrEqual(8);
        },
      ),
    );
  });
});
