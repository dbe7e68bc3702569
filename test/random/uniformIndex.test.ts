import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { createRandomSource } from '../../src/random/randomSource.js';
import { uniformIndex } from '../../src/random/uniformIndex.js';
import { chiSquareQuantile, chiSquareStatistic } from './chiSquare.js';
import { scriptedSource } from './scriptedSource.js';

describe('uniformIndex', () => {
  it('is uniform on 0..9 (Lemire path): chi-square below the 0.9999 quantile, fixed seed', async () => {
    const draws = 100_000;
    const counts = new Float64Array(10);
    const random = createRandomSource(2024);
    for (let i = 0; i < draws; i++) counts[uniformIndex(random, 10)]!++;
    const statistic = chiSquareStatistic(counts, new Float64Array(10).fill(draws / 10));
    // Critical value: scipy.stats.chi2.ppf(0.9999, 9) via bootstrap_chi_square.json.
    const critical = await chiSquareQuantile(9, 0.9999);
    expect(statistic, `counts ${Array.from(counts)}; critical ${critical}`).toBeLessThan(critical);
  });

  it('is uniform for n above 2^21 (bitmask path), checked on 16 bins of exact size', async () => {
    const n = 3 * 2 ** 21 + 5;
    const draws = 100_000;
    const counts = new Float64Array(16);
    const random = createRandomSource(99);
    let outOfRange = 0;
    for (let i = 0; i < draws; i++) {
      const index = uniformIndex(random, n);
      if (!(index >= 0 && index < n && Number.isInteger(index))) outOfRange++;
      counts[Math.floor((index * 16) / n)]!++;
    }
    expect(outOfRange).toBe(0);
    // Bin j holds the integers i with ⌊16 i / n⌋ = j: exactly ⌈(j+1)n/16⌉ − ⌈jn/16⌉ of them.
    const expected = Array.from(
      { length: 16 },
      (_, j) => ((Math.ceil(((j + 1) * n) / 16) - Math.ceil((j * n) / 16)) / n) * draws,
    );
    const critical = await chiSquareQuantile(15, 0.9999); // scipy.stats.chi2.ppf(0.9999, 15)
    expect(chiSquareStatistic(counts, expected), `counts ${Array.from(counts)}`).toBeLessThan(
      critical,
    );
  });

  it('stays in range for every n up to 2^32', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 2 ** 32 }), fc.nat(1000), (n, seed) => {
        const random = createRandomSource(seed);
        for (let i = 0; i < 20; i++) {
          const index = uniformIndex(random, n);
          if (!(Number.isInteger(index) && index >= 0 && index < n)) return false;
        }
        return true;
      }),
    );
  });

  it('rejects the biased low products of the Lemire method and draws again', () => {
    // n = 3: 2^32 mod 3 = 1, so x = 0 (product 0, low part 0 < 1) must be rejected.
    const { source, drawn } = scriptedSource([0, 2 ** 31]);
    expect(uniformIndex(source, 3)).toBe(1); // ⌊2^31 · 3 / 2^32⌋ = 1
    expect(drawn.uint32).toBe(2);
  });

  it('returns 0 for n = 1 without drawing', () => {
    const { source, drawn } = scriptedSource([]);
    expect(uniformIndex(source, 1)).toBe(0);
    expect(drawn.uint32).toBe(0);
  });
});
