import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { createGeometricSampler } from '../../../src/random/geometricSampler.js';
import { createRandomSource, Xoroshiro128PlusSource } from '../../../src/random/randomSource.js';
import { centredPrefixSums } from '../../../src/statistics/bootstrap/centredPrefixSums.js';
import { resampleDeviationsInline } from '../../../src/statistics/bootstrap/resampleDeviationsInline.js';
import { resampleDeviationsGeneric } from '../../../src/statistics/bootstrap/resampleJob.js';
import { mean } from '../../../src/statistics/mean.js';

const sourceOf = (seed: number, stream: number) =>
  createRandomSource(seed, stream) as Xoroshiro128PlusSource;

describe('resampleDeviationsInline', () => {
  it('is the project source', () => {
    expect(createRandomSource(1)).toBeInstanceOf(Xoroshiro128PlusSource);
  });

  // The oracle is the generic path on the same generator: drawStationaryBlocks (uniformIndex, then
  // the geometric sampler through the RandomSource interface) and resampleMeanDeviation.
  it('gives the generic path’s numbers bit for bit, and leaves the generator where it would', () => {
    fc.assert(
      fc.property(
        fc.array(fc.integer({ min: -6400, max: 6400 }), { minLength: 2, maxLength: 300 }),
        fc.constantFrom(1, 1.5, 2, 3.7, 5, 20, 68, 400),
        fc.nat(1e6),
        fc.nat(5),
        fc.integer({ min: 1, max: 40 }),
        (values, b, seed, stream, count) => {
          const d = Float64Array.from(values, (x) => x / 64);
          const prefix = centredPrefixSums(d, mean(d));
          const sampler = createGeometricSampler(b);
          const inlineSource = sourceOf(seed, stream);
          const genericSource = sourceOf(seed, stream);
          const fast = resampleDeviationsInline(prefix, d.length, sampler, inlineSource, count);
          const slow = resampleDeviationsGeneric(prefix, d.length, sampler, genericSource, count);
          expect(Array.from(fast)).toEqual(Array.from(slow));
          // Same generator position afterwards (odd word counts included).
          expect([inlineSource.nextUint32(), inlineSource.nextUint32()]).toEqual([
            genericSource.nextUint32(),
            genericSource.nextUint32(),
          ]);
        },
      ),
      { numRuns: 300 },
    );
  });

  it('takes the rare branches the same way: Lemire rejections, bitmask starts (n > 2^21) and length overflows', () => {
    // Lemire rejects a word with probability (2^32 mod n)/2^32: at n = 2,096,640 that is
    // 2^20/2^32 = 2.4 · 10^-4, so 3 resamples of b = 1 (6.3 · 10^6 words) reject about 1,500.
    // n = 2^21 + 1 takes the bitmask path (about half the words rejected). b = 2,000 overflows
    // its 4,096-column table with probability (1 − 1/2000)^4095 ≈ 0.13 per length. (An alias
    // coin exactly on a column's edge has probability ≤ 2^-20 per length: not reached here.)
    for (const [n, b, count] of [
      [2096640, 1, 3],
      [2 ** 21 + 1, 1, 1],
      [2 ** 21 + 1, 50, 2],
      [5000, 2000, 200],
      [3000, 1.001, 30],
    ] as const) {
      const d = Float64Array.from({ length: n }, (_, t) => Math.sin(t * 0.37) + (t % 11) / 8);
      const prefix = centredPrefixSums(d, mean(d));
      const sampler = createGeometricSampler(b);
      const fast = resampleDeviationsInline(prefix, n, sampler, sourceOf(77, 2), count);
      const slow = resampleDeviationsGeneric(prefix, n, sampler, sourceOf(77, 2), count);
      expect(Array.from(fast), `n = ${n}, b = ${b}`).toEqual(Array.from(slow));
    }
  });
});
