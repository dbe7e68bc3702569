/**
 * The seasonal naive scale: worked examples by hand, states, properties, and a reference check
 * against base R's diff() on open multi-series data (test/reference/fixtures/panel_scaling.json,
 * written by test/reference/scripts/panel_scaling.R; the fixture names its source).
 */
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { seasonalNaiveScale, seasonalNaiveScaleOf } from '../../src/scaling/seasonalNaiveScale.js';
import { expectClose } from '../helpers/tolerance.js';

describe('worked examples (by hand)', () => {
  it('naive, m = 1: |3 − 1|, |2 − 3|, |6 − 2| → 7/3; squared (4 + 1 + 16)/3 = 7', () => {
    const abs = seasonalNaiveScaleOf([1, 3, 2, 6], 1, 'absolute');
    expect(abs.state).toBe('ok');
    expect(abs.terms).toBe(3);
    expectClose(abs.value!, 7 / 3, { relative: 1e-15, absolute: 1e-15 }, 'absolute, m = 1');
    expect(seasonalNaiveScaleOf([1, 3, 2, 6], 1, 'squared').value).toBe(7);
  });
  it('seasonal, m = 2: 2 − 1 and 6 − 3 → absolute 2, squared 5', () => {
    expect(seasonalNaiveScaleOf([1, 3, 2, 6], 2, 'absolute').value).toBe(2);
    expect(seasonalNaiveScaleOf(Float64Array.of(1, 3, 2, 6), 2, 'squared').value).toBe(5);
  });
  it('states: too short (T ≤ m) and zero (a constant or exactly periodic history)', () => {
    const short = seasonalNaiveScaleOf([4, 5], 2, 'absolute');
    expect(short).toMatchObject({ state: 'too-short', value: null, terms: 0 });
    expect(short.note).toMatch(/no terms/);
    expect(seasonalNaiveScaleOf([], 1, 'squared').state).toBe('too-short');
    const flat = seasonalNaiveScaleOf([7, 7, 7], 1, 'absolute');
    expect(flat).toMatchObject({ state: 'zero', value: null, terms: 2 });
    expect(flat.note).toMatch(/is 0 over 2 terms/);
    expect(seasonalNaiveScaleOf([1, 2, 1, 2, 1], 2, 'squared').state).toBe('zero');
  });
  it('refuses a bad period or a non-finite value, naming the series', () => {
    expect(() => seasonalNaiveScaleOf([1, 2], 0, 'absolute')).toThrow(/integer ≥ 1, got 0/);
    expect(() => seasonalNaiveScaleOf([1, 2], 1.5, 'absolute')).toThrow(RangeError);
    expect(() => seasonalNaiveScaleOf([1, Number.NaN], 1, 'absolute')).toThrow(/value 2 is NaN/);
    expect(() => seasonalNaiveScale(new Map([['x', [1, Infinity]]]), 1, 'squared')).toThrow(
      /series "x": .*value 2 is Infinity/,
    );
  });
  it('keys the result by series id, in the input order', () => {
    const scales = seasonalNaiveScale(
      new Map([
        ['b', [1, 3, 2, 6]],
        ['a', [5]],
      ]),
      1,
      'absolute',
    );
    expect([...scales.keys()]).toEqual(['b', 'a']);
    expect(scales.get('a')!.state).toBe('too-short');
  });
});

// Multiples of 1/16: no subnormal differences whose square underflows to 0 (that case is the
// `zero` state of the squared scale and is not what these properties are about).
const history = fc.array(
  fc.integer({ min: -16e6, max: 16e6 }).map((v) => v / 16),
  { maxLength: 60 },
);
const period = fc.integer({ min: 1, max: 13 });

describe('properties', () => {
  it('shift invariant, and scales as |c| (absolute) and c² (squared)', () => {
    fc.assert(
      fc.property(history, period, fc.double({ min: 0.01, max: 100, noNaN: true }), (y, m, c) => {
        const base = seasonalNaiveScaleOf(y, m, 'absolute');
        const sq = seasonalNaiveScaleOf(y, m, 'squared');
        if (base.state !== 'ok' || sq.state !== 'ok') return;
        const size = Math.max(...y.map(Math.abs)) + 1;
        const shifted = seasonalNaiveScaleOf(
          y.map((v) => v + 1000),
          m,
          'absolute',
        );
        if (shifted.value !== null) {
          expect(Math.abs(shifted.value - base.value!), `y ${y}, m ${m}`).toBeLessThanOrEqual(
            1e-9 * size,
          );
        }
        const scaled = seasonalNaiveScaleOf(
          y.map((v) => -c * v),
          m,
          'absolute',
        );
        expect(Math.abs(scaled.value! - c * base.value!)).toBeLessThanOrEqual(1e-12 * c * size);
        const scaledSq = seasonalNaiveScaleOf(
          y.map((v) => c * v),
          m,
          'squared',
        );
        expect(Math.abs(scaledSq.value! - c * c * sq.value!)).toBeLessThanOrEqual(
          1e-12 * c * c * size * size,
        );
      }),
    );
  });
  it('the squared scale is at least the squared absolute scale (Jensen), terms = T − m', () => {
    fc.assert(
      fc.property(history, period, (y, m) => {
        const abs = seasonalNaiveScaleOf(y, m, 'absolute');
        const sq = seasonalNaiveScaleOf(y, m, 'squared');
        expect(abs.terms).toBe(Math.max(0, y.length - m));
        expect(sq.state).toBe(abs.state);
        if (abs.state === 'ok') {
          expect(sq.value!, `y ${y}, m ${m}`).toBeGreaterThanOrEqual(
            abs.value! * abs.value! * (1 - 1e-12),
          );
        }
      }),
    );
  });
});

interface ScalingFixture {
  generator: string;
  source: string;
  datasets: {
    name: string;
    dataset: string;
    series: {
      id: string;
      history: number[];
      scales: { period: number; absolute: number; squared: number }[];
    }[];
  }[];
}
const fixture = JSON.parse(
  readFileSync(
    join(
      dirname(fileURLToPath(import.meta.url)),
      '..',
      'reference',
      'fixtures',
      'panel_scaling.json',
    ),
    'utf8',
  ),
) as ScalingFixture;

// Means of up to 400 terms; R sums in long double, this code in double: 1e-13 relative.
const RELATIVE = 1e-13;

describe.each(fixture.datasets)('against R: $dataset', (ds) => {
  it('every series, every period, both losses', () => {
    expect(ds.series.length).toBeGreaterThanOrEqual(1);
    const histories = new Map(ds.series.map((s) => [s.id, s.history]));
    for (const m of ds.series[0]!.scales.map((s) => s.period)) {
      for (const loss of ['absolute', 'squared'] as const) {
        const scales = seasonalNaiveScale(histories, m, loss);
        for (const s of ds.series) {
          const expected = s.scales.find((x) => x.period === m)![loss];
          const got = scales.get(s.id)!;
          const where = `${ds.dataset}, ${s.id}, m = ${m}, ${loss} (${fixture.source})`;
          expect(got.state, where).toBe('ok');
          expect(got.terms, where).toBe(s.history.length - m);
          expectClose(got.value! / expected, 1, { relative: RELATIVE, absolute: RELATIVE }, where);
        }
      }
    }
  });
});
