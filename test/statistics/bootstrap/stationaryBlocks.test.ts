import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { createGeometricSampler } from '../../../src/random/geometricSampler.js';
import { createRandomSource } from '../../../src/random/randomSource.js';
import { drawStationaryBlocks } from '../../../src/statistics/bootstrap/stationaryBlocks.js';
import { scriptedSource } from '../../random/scriptedSource.js';

describe('drawStationaryBlocks (random step)', () => {
  it('gives blocks with starts on 0..n−1 and lengths ≥ 1 that sum to n', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 400 }),
        fc.double({ min: 1, max: 600, noNaN: true }),
        fc.nat(10_000),
        (n, b, seed) => {
          const blocks = drawStationaryBlocks(
            n,
            createGeometricSampler(b),
            createRandomSource(seed),
          );
          let total = 0;
          for (let i = 0; i < blocks.count; i++) {
            const s = blocks.starts[i]!;
            const l = blocks.lengths[i]!;
            if (!(s >= 0 && s < n && l >= 1)) return false;
            total += l;
          }
          return total === n && blocks.count >= 1 && blocks.count <= n;
        },
      ),
    );
  });

  it('draws per block the start, then the length (b = 1 draws no length)', () => {
    // n = 4 < 2^21: start = ⌊x · 4 / 2^32⌋ (Lemire), so x = k · 2^30 gives start k.
    const { source, drawn } = scriptedSource([3 * 2 ** 30, 0, 2 ** 30, 2 * 2 ** 30]);
    const blocks = drawStationaryBlocks(4, createGeometricSampler(1), source);
    expect(Array.from(blocks.starts.subarray(0, blocks.count))).toEqual([3, 0, 1, 2]);
    expect(Array.from(blocks.lengths.subarray(0, blocks.count))).toEqual([1, 1, 1, 1]);
    expect(drawn.uint32).toBe(4);
  });

  it('has 1 + Binomial(n − 1, 1/b) blocks: mean count within 1% of 1 + (n − 1)/b', () => {
    // Geometric lengths are memoryless, so after the first position each position starts a new
    // block with probability p independently (Politis & Romano 1994): count − 1 ~
    // Binomial(n − 1, p). n = 10,000, b = 8: mean 1,250.875, sd 33.1, so the mean of 200
    // resamples has standard error 2.3; 1% (12.5) is 5 standard errors.
    const n = 10_000;
    const sampler = createGeometricSampler(8);
    const random = createRandomSource(3);
    let total = 0;
    for (let r = 0; r < 200; r++) total += drawStationaryBlocks(n, sampler, random).count;
    const meanCount = total / 200;
    expect(Math.abs(meanCount / (1 + (n - 1) / 8) - 1), `mean count ${meanCount}`).toBeLessThan(
      0.01,
    );
  });
});
