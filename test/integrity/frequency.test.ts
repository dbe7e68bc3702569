import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatFrequency, parseFrequency } from '../../src/integrity/frequency.js';
import { inferFrequency } from '../../src/integrity/inferFrequency.js';
import { stepsAhead } from '../../src/integrity/stepCount.js';
import { type TimePoint, toTimePoint } from '../../src/integrity/timePoint.js';

const at = (label: string): TimePoint => {
  const p = toTimePoint(label, 'datetime');
  if (p === null) throw new Error(`not a date-time: ${label}`);
  return p;
};
const infer = (...series: string[][]) =>
  inferFrequency(
    'datetime',
    series.map((labels) => labels.map(at)),
  );
const inferred = (...series: string[][]): string | null => {
  const r = infer(...series);
  return r.frequency === null ? null : formatFrequency(r.frequency);
};
/** Labels start, start + step, … from a JavaScript date arithmetic (UTC). */
const utcSeries = (start: string, stepMs: number, n: number): string[] =>
  Array.from({ length: n }, (_, i) =>
    new Date(Date.parse(start) + i * stepMs).toISOString().replace('.000Z', 'Z'),
  );

describe('frequency inference', () => {
  it('hourly, with and without minutes and seconds written', () => {
    expect(inferred(utcSeries('2024-01-01T00:00:00Z', 3_600_000, 48))).toBe('1h');
    expect(inferred(['2024-01-01T00:00', '2024-01-01T01:00', '2024-01-01T02:00'])).toBe('1h');
  });

  it('every 15 minutes, and every 30 seconds', () => {
    expect(inferred(utcSeries('2024-01-01T00:00:00Z', 900_000, 20))).toBe('15min');
    expect(inferred(utcSeries('2024-01-01T00:00:00Z', 30_000, 20))).toBe('30s');
  });

  it('daily, as dates and as midnight date-times, across a leap day', () => {
    const dates = utcSeries('2024-02-25T00:00:00Z', 86_400_000, 10).map((s) => s.slice(0, 10));
    expect(dates).toContain('2024-02-29');
    expect(inferred(dates)).toBe('1d');
    expect(inferred(utcSeries('2024-02-25T00:00:00Z', 86_400_000, 10))).toBe('1d');
  });

  it('weekly, and daily with missing days (gaps of whole steps)', () => {
    const weeks = utcSeries('2024-01-01T00:00:00Z', 7 * 86_400_000, 30).map((s) => s.slice(0, 10));
    expect(inferred(weeks)).toBe('1w');
    expect(inferred(['2024-01-01', '2024-01-02', '2024-01-05', '2024-01-06'])).toBe('1d');
  });

  it('business days: weekdays only, stepping over weekends', () => {
    // 2024-01-05 is a Friday, 2024-01-08 the Monday after.
    const weekdays = [
      '2024-01-03',
      '2024-01-04',
      '2024-01-05',
      '2024-01-08',
      '2024-01-09',
      '2024-01-12',
      '2024-01-15',
    ];
    expect(inferred(weekdays)).toBe('1bd');
    // Weekdays that never reach a weekend are plain days; a weekend date makes it calendar days.
    expect(inferred(['2024-01-08', '2024-01-09', '2024-01-10'])).toBe('1d');
    expect(inferred([...weekdays, '2024-01-13'].sort())).toBe('1d');
    // A Tuesday-to-Friday gap of 3 days is not a weekend.
    expect(inferred(['2024-01-08', '2024-01-09', '2024-01-12'])).toBe('1d');
  });

  it('monthly steps are calendar months (28 to 31 days), at the start or the end of the month', () => {
    const starts = ['2023-11-01', '2023-12-01', '2024-01-01', '2024-02-01', '2024-03-01'];
    expect(inferred(starts)).toBe('1mo');
    const ends = ['2023-11-30', '2023-12-31', '2024-01-31', '2024-02-29', '2024-03-31'];
    expect(inferred(ends)).toBe('1mo');
    expect(inferred(['2024-01-15', '2024-02-15', '2024-03-15', '2024-04-15'])).toBe('1mo');
  });

  it('quarterly and yearly', () => {
    expect(inferred(['2023-01-01', '2023-04-01', '2023-07-01', '2023-10-01'])).toBe('3mo');
    expect(inferred(['2020-06-30', '2021-06-30', '2022-06-30'])).toBe('1y');
  });

  it('an hourly series in local-offset notation across DST stays hourly (instants)', () => {
    // Central European time: 2024-03-31 02:00 CET → 03:00 CEST (spring), 2024-10-27 03:00 CEST →
    // 02:00 CET (autumn); the wall clock skips an hour and repeats one, the instants do not.
    const spring = [
      '2024-03-31T00:00+01:00',
      '2024-03-31T01:00+01:00',
      '2024-03-31T03:00+02:00',
      '2024-03-31T04:00+02:00',
    ];
    const autumn = [
      '2024-10-27T01:00+02:00',
      '2024-10-27T02:00+02:00',
      '2024-10-27T02:00+01:00',
      '2024-10-27T03:00+01:00',
    ];
    expect(inferred(spring)).toBe('1h');
    expect(inferred(autumn)).toBe('1h');
    // US Eastern, spring 2024-03-10: 01:00 EST → 03:00 EDT.
    expect(
      inferred(['2024-03-10T00:00-05:00', '2024-03-10T01:00-05:00', '2024-03-10T03:00-04:00']),
    ).toBe('1h');
  });

  it('a daily series in local-offset notation across DST stays daily (a 23-hour day is a day)', () => {
    expect(
      inferred([
        '2024-03-30T00:00+01:00',
        '2024-03-31T00:00+01:00',
        '2024-04-01T00:00+02:00',
        '2024-04-02T00:00+02:00',
      ]),
    ).toBe('1d');
  });

  it('offsets denoting other instants than UTC: hourly with a mixed offset notation', () => {
    expect(inferred(['2024-01-01T00:00Z', '2024-01-01T02:00+01:00', '2024-01-01T02:00Z'])).toBe(
      '1h',
    );
  });

  it('several series: gaps are taken within each series, series may be out of phase', () => {
    expect(
      inferred(
        ['2024-01-01T00:00Z', '2024-01-01T01:00Z', '2024-01-01T02:00Z'],
        ['2024-01-01T00:30Z', '2024-01-01T01:30Z'],
      ),
    ).toBe('1h');
  });

  it('irregular timestamps give no frequency and say why', () => {
    const r = infer(['2024-01-01T00:00Z', '2024-01-01T01:00Z', '2024-01-01T02:30Z']);
    expect(r.frequency).toBeNull();
    expect(r.frequency === null && r.reason).toMatch(/irregular timestamps: gaps of 1h and 90min/);
    expect(inferred(['2024-01-01', '2024-01-03', '2024-01-06'])).toBeNull();
    expect(inferred(['2024-01-31', '2024-02-14', '2024-03-31'])).toBeNull();
  });

  it('a single timestamp per series gives no frequency', () => {
    const r = infer(['2024-01-01'], ['2024-01-02']);
    expect(r.frequency).toBeNull();
  });

  it('numeric timestamps step by the smallest gap', () => {
    const n = (xs: number[]) => xs.map((x) => toTimePoint(String(x), 'number')!);
    const r = inferFrequency('number', [n([1, 2, 3, 5]), n([10, 11])]);
    expect(r.frequency).toEqual({ unit: 'number', size: 1 });
    const q = inferFrequency('number', [n([1990.25, 1990.5, 1990.75, 1991])]);
    expect(q.frequency).toEqual({ unit: 'number', size: 0.25 });
    expect(inferFrequency('number', [n([1, 2, 3.5])]).frequency).toBeNull();
  });
});

describe('stepsAhead', () => {
  const f = (text: string) => parseFrequency(text)!;
  it('counts clock steps between instants, whatever the offsets', () => {
    expect(stepsAhead(at('2024-03-31T01:00+01:00'), at('2024-03-31T03:00+02:00'), f('1h'))).toBe(1);
    expect(stepsAhead(at('2024-01-01T00:00Z'), at('2024-01-01T06:00Z'), f('1h'))).toBe(6);
    // An origin between grid points: the first grid point after it is step 1.
    expect(stepsAhead(at('2024-01-01T10:30Z'), at('2024-01-01T11:00Z'), f('1h'))).toBe(1);
    expect(stepsAhead(at('2024-01-01T10:30Z'), at('2024-01-01T12:00Z'), f('1h'))).toBe(2);
  });

  it('counts calendar days by the written date (DST days, origins during the day)', () => {
    expect(stepsAhead(at('2024-03-30T00:00+01:00'), at('2024-04-01T00:00+02:00'), f('1d'))).toBe(2);
    expect(stepsAhead(at('2024-01-01T18:00Z'), at('2024-01-02'), f('1d'))).toBe(1);
    expect(stepsAhead(at('2024-01-01'), at('2024-01-15'), f('1w'))).toBe(2);
    expect(stepsAhead(at('2024-01-03'), at('2024-01-08'), f('1w'))).toBe(1);
  });

  it('counts business days: Friday to Monday is one step, weekends are skipped', () => {
    expect(stepsAhead(at('2024-01-05'), at('2024-01-08'), f('1bd'))).toBe(1);
    expect(stepsAhead(at('2024-01-05'), at('2024-01-12'), f('1bd'))).toBe(5);
    expect(stepsAhead(at('2024-01-06'), at('2024-01-08'), f('1bd'))).toBe(1); // from a Saturday
    expect(stepsAhead(at('2024-01-04'), at('2024-01-05'), f('1bd'))).toBe(1);
    expect(stepsAhead(at('2024-01-04T18:00Z'), at('2024-01-05T09:00Z'), f('1bd'))).toBe(1);
    expect(stepsAhead(at('2024-01-04T08:00Z'), at('2024-01-05T09:00Z'), f('1bd'))).toBe(2);
    expect(stepsAhead(at('2023-12-29'), at('2024-01-31'), f('1bd'))).toBe(23);
  });

  it('business-day steps between dates agree with counting weekdays one by one (property)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 20_000 }),
        fc.integer({ min: 1, max: 60 }),
        (a, span) => {
          const iso = (d: number) =>
            new Date(Date.UTC(1990, 0, 1) + d * 86_400_000).toISOString().slice(0, 10);
          let weekdays = 0;
          for (let d = a + 1; d <= a + span; d++) {
            const w = new Date(Date.UTC(1990, 0, 1) + d * 86_400_000).getUTCDay();
            if (w !== 0 && w !== 6) weekdays++;
          }
          return stepsAhead(at(iso(a)), at(iso(a + span)), f('1bd')) === weekdays;
        },
      ),
    );
  });

  it('counts calendar months, clamping the day to the shorter month', () => {
    expect(stepsAhead(at('2024-01-31'), at('2024-02-29'), f('1mo'))).toBe(1);
    expect(stepsAhead(at('2024-01-31'), at('2024-04-30'), f('1mo'))).toBe(3);
    expect(stepsAhead(at('2024-02-29'), at('2024-03-31'), f('1mo'))).toBe(1);
    expect(stepsAhead(at('2024-01-01'), at('2024-02-01'), f('1mo'))).toBe(1);
    expect(stepsAhead(at('2024-01-01'), at('2024-01-31'), f('1mo'))).toBe(1);
    expect(stepsAhead(at('2023-12-01'), at('2024-12-01'), f('1mo'))).toBe(12);
    expect(stepsAhead(at('2023-12-01'), at('2024-12-01'), f('1y'))).toBe(1);
    expect(stepsAhead(at('2024-01-01'), at('2024-07-01'), f('1q'))).toBe(2);
  });

  it('is 0 when the target is not after the origin', () => {
    expect(stepsAhead(at('2024-01-02'), at('2024-01-02T00:00Z'), f('1d'))).toBe(0);
    expect(stepsAhead(at('2024-01-03'), at('2024-01-02'), f('1d'))).toBe(0);
  });

  it('k steps of a frequency after a grid origin are k steps ahead (property, daily and hourly)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 20_000 }),
        fc.integer({ min: 1, max: 500 }),
        fc.constantFrom(['1h', 3_600_000], ['1d', 86_400_000], ['1w', 7 * 86_400_000]),
        (day, k, [text, ms]) => {
          const start = Date.UTC(1990, 0, 1) + day * 86_400_000;
          const iso = (t: number) => new Date(t).toISOString().replace('.000Z', 'Z');
          return (
            stepsAhead(at(iso(start)), at(iso(start + k * (ms as number))), f(text as string)) === k
          );
        },
      ),
    );
  });
});

describe('parseFrequency', () => {
  it('reads counts with units and plain numbers, and refuses the rest', () => {
    expect(parseFrequency('1h')).toEqual({ unit: 'second', size: 3600 });
    expect(parseFrequency('15min')).toEqual({ unit: 'second', size: 900 });
    expect(parseFrequency('1w')).toEqual({ unit: 'day', size: 7 });
    expect(parseFrequency('1bd')).toEqual({ unit: 'businessDay', size: 1 });
    expect(parseFrequency('1mo')).toEqual({ unit: 'month', size: 1 });
    expect(parseFrequency('1y')).toEqual({ unit: 'month', size: 12 });
    expect(parseFrequency('0.25')).toEqual({ unit: 'number', size: 0.25 });
    for (const bad of ['0h', 'h', '1 h', '1m', '-1', '1H', 'monthly', '', 'NaN', 'Infinity']) {
      expect(parseFrequency(bad), bad).toBeNull();
    }
  });

  it('formatFrequency reads back to the same frequency (property)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 999 }),
        fc.constantFrom('s', 'min', 'h', 'd', 'bd', 'w', 'mo', 'q', 'y'),
        (n, unit) => {
          const f = parseFrequency(`${n}${unit}`)!;
          expect(parseFrequency(formatFrequency(f))).toEqual(f);
        },
      ),
    );
  });
});
