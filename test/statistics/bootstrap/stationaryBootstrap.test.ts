import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { createGeometricSampler } from '../../../src/random/geometricSampler.js';
import { createRandomSource, type RandomSourceFactory } from '../../../src/random/randomSource.js';
import { centredPrefixSums } from '../../../src/statistics/bootstrap/centredPrefixSums.js';
import {
  RESAMPLES_PER_STREAM,
  resampleDeviationsOfStream,
  type StationaryBootstrapOptions,
  stationaryBootstrap,
  stationaryResampleDeviations,
} from '../../../src/statistics/bootstrap/stationaryBootstrap.js';
import { stationaryBootstrapVariance } from '../../../src/statistics/bootstrap/stationaryBootstrapVariance.js';
import { mean } from '../../../src/statistics/mean.js';
import { expectClose } from '../../helpers/tolerance.js';
import { readSeries } from './bootstrapFixtures.js';

const defaults: StationaryBootstrapOptions = {
  resamples: 999,
  expectedBlockLength: 4,
  seed: 1,
  confidence: 0.95,
  margin: 0,
};

// Multiples of 1/64 in [−100, 100]: varied data without subnormal values, whose sums vanish.
const seriesArbitrary = fc
  .array(fc.integer({ min: -6400, max: 6400 }), { minLength: 2, maxLength: 80 })
  .map((values) => Float64Array.from(values, (x) => x / 64));

describe('stationaryBootstrap', () => {
  // Exact oracle: the Monte Carlo standard error must estimate √Var*(d̄*) of Lemma 1. With
  // B = 20,000 the relative standard error of a standard deviation is about 1/√(2B) = 0.5% for
  // near-normal resample means, so 4% leaves 8 standard errors of room.
  for (const name of ['nile_diff', 'sunspot_year', 'co2_diff', 'ar1_phi06']) {
    it(`has a standard error within 4% of the exact Lemma 1 value on ${name} (b = 7.5, B = 20,000)`, async () => {
      const d = await readSeries(name);
      const b = 7.5;
      const result = stationaryBootstrap(d, {
        ...defaults,
        resamples: 20_000,
        expectedBlockLength: b,
        seed: 20240601,
      });
      const exact = Math.sqrt(stationaryBootstrapVariance(d, b));
      const ratio = result.standardError! / exact;
      expect(
        Math.abs(ratio - 1) <= 0.04,
        `${name} (bootstrap_series.R): exact √Var* ${exact} (Politis & Romano 1994, Lemma 1; checked against R in stationaryBootstrapVariance.test.ts), bootstrap SE ${result.standardError}, ratio ${ratio}`,
      ).toBe(true);
    });
  }

  it('gives identical results for the same seed and different intervals for different seeds', () => {
    fc.assert(
      fc.property(seriesArbitrary, fc.nat(1e6), fc.nat(1e6), (d, seedA, seedB) => {
        fc.pre(seedA !== seedB && new Set(d).size > 3);
        const a = stationaryBootstrap(d, { ...defaults, seed: seedA });
        const again = stationaryBootstrap(d, { ...defaults, seed: seedA });
        const b = stationaryBootstrap(d, { ...defaults, seed: seedB });
        expect(again).toEqual(a);
        return (
          a.standardError !== b.standardError ||
          a.interval!.lower !== b.interval!.lower ||
          a.interval!.upper !== b.interval!.upper
        );
      }),
      { numRuns: 40 },
    );
  });

  it('computes each stream independently: the same numbers however the streams are shared out', () => {
    const d = Float64Array.from({ length: 300 }, (_, t) => Math.sin(t) * (1 + (t % 7)));
    const centre = mean(d);
    const all = stationaryResampleDeviations(d, centre, 6, 700, 9);
    // Three streams computed separately, as three threads would.
    const prefix = centredPrefixSums(d, centre);
    const sampler = createGeometricSampler(6);
    const pieces = [0, 1, 2].map((k) =>
      resampleDeviationsOfStream(
        prefix,
        d.length,
        sampler,
        createRandomSource(9, k),
        Math.min(RESAMPLES_PER_STREAM, 700 - k * RESAMPLES_PER_STREAM),
      ),
    );
    expect(Array.from(all)).toEqual(pieces.flatMap((p) => Array.from(p)));
    // And a smaller B is a prefix of a larger one.
    expect(Array.from(stationaryResampleDeviations(d, centre, 6, 300, 9))).toEqual(
      Array.from(all.subarray(0, 300)),
    );
  });

  it('asks the injected factory for streams 0..⌈B/256⌉−1 of its seed', () => {
    const asked: [number, number][] = [];
    const factory: RandomSourceFactory = (seed, stream) => {
      asked.push([seed, stream]);
      return createRandomSource(seed, stream);
    };
    stationaryBootstrap(
      Float64Array.of(1, 5, 2, 8, 3),
      { ...defaults, resamples: 600, seed: 77 },
      factory,
    );
    expect(asked).toEqual([
      [77, 0],
      [77, 1],
      [77, 2],
    ]);
  });

  it('moves the interval and bound with a shift of the data (to 1e-9) and keeps the standard error', () => {
    fc.assert(
      fc.property(seriesArbitrary, fc.double({ min: -1e3, max: 1e3, noNaN: true }), (d, shift) => {
        const a = stationaryBootstrap(d, defaults);
        const b = stationaryBootstrap(
          d.map((x) => x + shift),
          defaults,
        );
        const scale = 1e-9 * (1 + Math.abs(shift) + 100);
        const close = (x: number, y: number) => Math.abs(x - y) <= scale;
        return (
          close(b.interval!.lower, a.interval!.lower + shift) &&
          close(b.interval!.upper, a.interval!.upper + shift) &&
          close(b.oneSidedLower!.lower, a.oneSidedLower!.lower + shift) &&
          close(b.standardError!, a.standardError!)
        );
      }),
      { numRuns: 40 },
    );
  });

  it('gives a zero standard error and a point interval for a constant series', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -1e6, max: 1e6, noNaN: true }),
        fc.integer({ min: 2, max: 50 }),
        (c, n) => {
          fc.pre(c !== 0);
          const r = stationaryBootstrap(new Float64Array(n).fill(c), { ...defaults, margin: 0 });
          return (
            r.state === 'ok' &&
            r.standardError === 0 &&
            r.interval!.lower === c &&
            r.interval!.upper === c &&
            r.pValue === (c > 0 ? 1 / 1000 : 1)
          );
        },
      ),
    );
  });

  it('keeps p-value, one-sided bound and interval consistent on real data, also with a margin', async () => {
    const d = await readSeries('sunspot_year');
    const base = stationaryBootstrap(d, { ...defaults, confidence: 0.9 });
    for (const margin of [
      base.oneSidedLower!.lower,
      base.interval!.lower,
      base.interval!.upper,
      50,
    ]) {
      const r = stationaryBootstrap(d, { ...defaults, confidence: 0.9, margin });
      const alpha = r.oneSidedLower!.alpha;
      expect(r.pValue! <= alpha, `margin ${margin}, p ${r.pValue}`).toBe(
        margin < r.oneSidedLower!.lower,
      );
      expect(r.pValueTwoSided! <= alpha).toBe(
        margin < r.interval!.lower || margin > r.interval!.upper,
      );
    }
    // Same data and seed: margin does not move the interval.
    expect(stationaryBootstrap(d, { ...defaults, confidence: 0.9, margin: 50 }).interval).toEqual(
      base.interval,
    );
  });

  it('reports identical forecasts, too-short series and its choices as states and notes', () => {
    const identical = stationaryBootstrap(new Float64Array(20), defaults);
    expect(identical).toMatchObject({
      state: 'identical',
      mean: 0,
      standardError: 0,
      interval: { level: 0.95, lower: 0, upper: 0, method: 'basic' },
      pValue: 1,
      resamples: 999,
      seed: 1,
      expectedBlockLength: 4,
    });
    const short = stationaryBootstrap(Float64Array.of(3), defaults);
    expect(short).toMatchObject({
      state: 'too-short',
      mean: 3,
      standardError: null,
      interval: null,
      pValue: null,
    });
    expect(stationaryBootstrap(new Float64Array(0), defaults).mean).toBeNull();
    const long = stationaryBootstrap(Float64Array.of(1, 4, 2), {
      ...defaults,
      expectedBlockLength: 10,
    });
    expect(long.notes.join(' ')).toMatch(/exceeds the series length/);
  });

  it('refuses options it cannot honour and non-finite data', () => {
    const d = Float64Array.of(1, 2, 3, 4);
    expect(() => stationaryBootstrap(d, { ...defaults, resamples: 38 })).toThrow(/at least 39/);
    expect(() => stationaryBootstrap(d, { ...defaults, expectedBlockLength: 0.5 })).toThrow(
      RangeError,
    );
    expect(() => stationaryBootstrap(d, { ...defaults, confidence: 1 })).toThrow(RangeError);
    expect(() => stationaryBootstrap(d, { ...defaults, seed: -3 })).toThrow(RangeError);
    expect(() => stationaryBootstrap(d, { ...defaults, margin: Number.NaN })).toThrow(RangeError);
    expect(() => stationaryBootstrap(Float64Array.of(1, Number.NaN), defaults)).toThrow(
      /position 1/,
    );
  });

  it('agrees with the exact variance when each resample draws one block (b huge): circular shifts', () => {
    // b = 10^9: nearly every resample is one block, a circular shift of the data, whose mean is
    // d̄ exactly up to rounding — the standard error must be ~0 (Lemma 1 gives ≈ 0 too).
    const d = Float64Array.from({ length: 50 }, (_, t) => t % 5);
    const r = stationaryBootstrap(d, { ...defaults, expectedBlockLength: 1e9 });
    expectClose(
      r.standardError!,
      Math.sqrt(stationaryBootstrapVariance(d, 1e9)),
      { relative: 1e-3, absolute: 1e-3 },
      {
        what: 'standard error with b = 1e9',
        source: 'Politis & Romano 1994, Lemma 1',
      },
    );
  });
});
