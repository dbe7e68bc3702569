import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { baselineMeanLossScale } from '../../src/scaling/baselineMeanLossScale.js';
import { scaleLossesBySeries } from '../../src/scaling/scaleLossesBySeries.js';
import type { SeriesScale } from '../../src/scaling/seriesScale.js';
import { expectClose } from '../helpers/tolerance.js';

const ok = (value: number, terms = 1): SeriesScale => ({ state: 'ok', value, terms, note: null });

describe('baselineMeanLossScale, worked examples (by hand)', () => {
  it('means each series over its rows: a (1 + 3)/2 = 2, b 10', () => {
    const scales = baselineMeanLossScale(
      ['a', 'b'],
      Int32Array.of(0, 1, 0),
      Float64Array.of(1, 10, 3),
    );
    expect(scales.get('a')).toEqual(ok(2, 2));
    expect(scales.get('b')).toEqual(ok(10, 1));
  });
  it('skips rows that are not included; a series without rows is too short, an exact one zero', () => {
    const scales = baselineMeanLossScale(
      ['a', 'b', 'c'],
      Int32Array.of(0, 0, 1, 1),
      Float64Array.of(4, 100, 0, 0),
      Uint8Array.of(1, 0, 1, 1),
    );
    expect(scales.get('a')).toEqual(ok(4, 1));
    expect(scales.get('b')).toMatchObject({ state: 'zero', value: null, terms: 2 });
    expect(scales.get('c')).toMatchObject({ state: 'too-short', value: null, terms: 0 });
    expect(scales.get('c')!.note).toMatch(/mean baseline loss has no terms/);
  });
  it('refuses mismatched lengths, bad series indices, and negative or non-finite losses', () => {
    expect(() => baselineMeanLossScale(['a'], Int32Array.of(0), Float64Array.of(1, 2))).toThrow(
      /1 series indices, 2 losses/,
    );
    expect(() => baselineMeanLossScale(['a'], Int32Array.of(1), Float64Array.of(1))).toThrow(
      /series index 1/,
    );
    expect(() => baselineMeanLossScale(['a'], Int32Array.of(0), Float64Array.of(-1))).toThrow(
      /baseline loss -1/,
    );
    expect(() =>
      baselineMeanLossScale(['a'], Int32Array.of(0), Float64Array.of(Number.NaN)),
    ).toThrow(RangeError);
  });
});

describe('scaleLossesBySeries, worked examples (by hand)', () => {
  it('divides each row by its series scale', () => {
    const got = scaleLossesBySeries(
      ['a', 'b'],
      Int32Array.of(0, 1, 0),
      Float64Array.of(2, 30, 4),
      Float64Array.of(1, 15, 1),
      new Map([
        ['a', ok(2)],
        ['b', ok(10)],
      ]),
    );
    expect(got).toEqual({
      state: 'ok',
      baseline: Float64Array.of(1, 3, 2),
      candidate: Float64Array.of(0.5, 1.5, 0.5),
    });
  });
  it('scales nothing and lists every series without a usable scale, in series order', () => {
    const got = scaleLossesBySeries(
      ['a', 'b', 'c', 'unused'],
      Int32Array.of(2, 1, 0),
      Float64Array.of(1, 1, 1),
      Float64Array.of(1, 1, 1),
      new Map<string, SeriesScale>([
        ['a', { state: 'zero', value: null, terms: 3, note: 'the mean is 0' }],
        ['b', ok(1)],
      ]),
    );
    expect(got).toEqual({
      state: 'unavailable',
      missing: [
        { series: 'a', state: 'zero', note: 'the mean is 0' },
        { series: 'c', state: 'absent', note: 'no scale was given for this series' },
      ],
    });
  });
});

describe('properties', () => {
  const panel = fc
    .integer({ min: 1, max: 5 })
    .chain((k) =>
      fc.tuple(
        fc.constant(k),
        fc.array(
          fc.tuple(
            fc.integer({ min: 0, max: k - 1 }),
            fc.double({ min: 0.001, max: 1e6, noNaN: true }),
            fc.double({ min: 0, max: 1e6, noNaN: true }),
          ),
          { minLength: 1, maxLength: 50 },
        ),
      ),
    );
  it('after scaling by the baseline mean loss, each series has mean baseline loss 1', () => {
    fc.assert(
      fc.property(panel, ([k, rows]) => {
        const names = Array.from({ length: k }, (_, s) => `s${s}`);
        const series = Int32Array.from(rows.map((r) => r[0]));
        const base = Float64Array.from(rows.map((r) => r[1]));
        const cand = Float64Array.from(rows.map((r) => r[2]));
        const scales = baselineMeanLossScale(names, series, base);
        const scaled = scaleLossesBySeries(names, series, base, cand, scales);
        if (scaled.state !== 'ok') return expect.fail(JSON.stringify(scaled));
        const again = baselineMeanLossScale(names, series, scaled.baseline);
        for (const [name, scale] of again) {
          if (scale.state === 'too-short') continue;
          expectClose(
            scale.value!,
            1,
            { relative: 1e-12, absolute: 1e-12 },
            `${name} in ${JSON.stringify(rows)}`,
          );
        }
      }),
    );
  });
  it('is invariant to multiplying one series’ losses by a constant', () => {
    fc.assert(
      fc.property(panel, fc.double({ min: 0.01, max: 100, noNaN: true }), ([k, rows], c) => {
        const names = Array.from({ length: k }, (_, s) => `s${s}`);
        const series = Int32Array.from(rows.map((r) => r[0]));
        const base = Float64Array.from(rows.map((r) => r[1]));
        const cand = Float64Array.from(rows.map((r) => r[2]));
        const stretch = (xs: Float64Array) => xs.map((x, i) => (series[i] === 0 ? c * x : x));
        const plain = scaleLossesBySeries(
          names,
          series,
          base,
          cand,
          baselineMeanLossScale(names, series, base),
        );
        const stretched = scaleLossesBySeries(
          names,
          series,
          stretch(base),
          stretch(cand),
          baselineMeanLossScale(names, series, stretch(base)),
        );
        if (plain.state !== 'ok' || stretched.state !== 'ok') return expect.fail('unscaled');
        plain.candidate.forEach((v, i) => {
          expectClose(
            stretched.candidate[i]!,
            v,
            { relative: 1e-12, absolute: 1e-12 },
            `row ${i}, c ${c}`,
          );
        });
      }),
    );
  });
});
