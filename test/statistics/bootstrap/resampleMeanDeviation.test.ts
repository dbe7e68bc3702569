import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { createGeometricSampler } from '../../../src/random/geometricSampler.js';
import { createRandomSource } from '../../../src/random/randomSource.js';
import { centredPrefixSums } from '../../../src/statistics/bootstrap/centredPrefixSums.js';
import { resampleMeanDeviation } from '../../../src/statistics/bootstrap/resampleMeanDeviation.js';
import { drawStationaryBlocks } from '../../../src/statistics/bootstrap/stationaryBlocks.js';
import { mean } from '../../../src/statistics/mean.js';
import { expectClose } from '../../helpers/tolerance.js';
import { blocksOf, naiveResampleMean } from './naiveResample.js';

describe('resampleMeanDeviation (deterministic step)', () => {
  it('matches the worked examples in its doc comment', () => {
    const d = Float64Array.of(1, 2, 3);
    const prefix = centredPrefixSums(d, 2);
    expect(Array.from(prefix)).toEqual([0, -1, -1, 0, -1, -1, 0]);
    expect(resampleMeanDeviation(prefix, 3, blocksOf([[2, 3]]))).toBe(0);
    const shifted = resampleMeanDeviation(
      prefix,
      3,
      blocksOf([
        [2, 1],
        [2, 1],
        [0, 1],
      ]),
    );
    expectClose(
      shifted,
      1 / 3,
      { relative: 1e-15, absolute: 1e-15 },
      { what: 'mean(3, 3, 1) − 2', source: 'hand computation' },
    );
  });

  it('equals the naive per-observation resample mean for any fixed blocks (to 1e-12)', () => {
    const series = fc
      .array(fc.double({ min: -1e3, max: 1e3, noNaN: true }), { minLength: 1, maxLength: 60 })
      .map((values) => Float64Array.from(values));
    const case_ = series.chain((d) =>
      fc
        .array(fc.tuple(fc.nat(d.length - 1), fc.integer({ min: 1, max: 2 * d.length })), {
          minLength: 1,
          maxLength: 3 * d.length,
        })
        .map((raw) => {
          // Cut the drawn lengths so they sum to n, as the stationary bootstrap does.
          const pairs: [number, number][] = [];
          let filled = 0;
          for (const [s, l] of raw) {
            if (filled >= d.length) break;
            const length = Math.min(l, d.length - filled);
            pairs.push([s, length]);
            filled += length;
          }
          if (filled < d.length) pairs.push([0, d.length - filled]);
          return { d, pairs };
        }),
    );
    fc.assert(
      fc.property(case_, ({ d, pairs }) => {
        const centre = mean(d);
        const blocks = blocksOf(pairs);
        const fast = centre + resampleMeanDeviation(centredPrefixSums(d, centre), d.length, blocks);
        const naive = naiveResampleMean(d, blocks);
        expectClose(
          fast,
          naive,
          { relative: 1e-12, absolute: 1e-12 },
          {
            what: 'prefix-sum resample mean vs naive',
            source: 'naive per-observation sum (test/statistics/bootstrap/naiveResample.ts)',
            inputs: { d: Array.from(d), pairs },
          },
        );
      }),
    );
  });

  it('equals the naive resample mean on blocks drawn by the random step (n = 500, 200 resamples)', () => {
    const n = 500;
    const d = Float64Array.from({ length: n }, (_, t) => Math.sin(0.3 * t) + 0.01 * t);
    const centre = mean(d);
    const prefix = centredPrefixSums(d, centre);
    for (const b of [1, 3.5, 40, 1000]) {
      const sampler = createGeometricSampler(b);
      const random = createRandomSource(5);
      for (let r = 0; r < 200; r++) {
        const blocks = drawStationaryBlocks(n, sampler, random);
        const fast = centre + resampleMeanDeviation(prefix, n, blocks);
        expectClose(
          fast,
          naiveResampleMean(d, blocks),
          { relative: 1e-12, absolute: 1e-12 },
          {
            what: `resample ${r}`,
            source: 'naive per-observation sum',
            inputs: { b, seed: 5 },
          },
        );
      }
    }
  });
});
