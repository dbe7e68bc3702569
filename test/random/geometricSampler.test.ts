import { describe, expect, it } from 'vitest';
import { createGeometricSampler } from '../../src/random/geometricSampler.js';
import { createRandomSource } from '../../src/random/randomSource.js';
import { chiSquareQuantile, chiSquareStatistic } from './chiSquare.js';
import { scriptedSource } from './scriptedSource.js';

/** P(ℓ = k) = p q^{k−1}; P(ℓ ≥ k) = q^{k−1} (the published law, docs/design.md "Stationary bootstrap"). */
function geometricCell(b: number, from: number, to: number): number {
  const q = 1 - 1 / b;
  return q ** (from - 1) - (Number.isFinite(to) ? q ** to : 0);
}

/**
 * Draws `draws` lengths with mean b (fixed seed) and compares the frequencies of the cells
 * [1..w], [w+1..2w], …, [(c−1)w+1..cw], [cw+1..∞) with the geometric law.
 */
async function checkDistribution(
  b: number,
  width: number,
  cells: number,
  draws: number,
  seed: number,
) {
  const sampler = createGeometricSampler(b);
  const random = createRandomSource(seed);
  const observed = new Float64Array(cells + 1);
  let sum = 0;
  for (let i = 0; i < draws; i++) {
    const length = sampler.sample(random, Number.MAX_SAFE_INTEGER);
    sum += length;
    observed[Math.min(cells, Math.floor((length - 1) / width))]!++;
  }
  const expected = Array.from({ length: cells + 1 }, (_, j) =>
    j < cells
      ? geometricCell(b, j * width + 1, (j + 1) * width) * draws
      : geometricCell(b, cells * width + 1, Number.POSITIVE_INFINITY) * draws,
  );
  const statistic = chiSquareStatistic(observed, expected);
  // scipy.stats.chi2.ppf(0.9999, cells) via bootstrap_chi_square.json: a correct sampler
  // exceeds it for one seed in 10,000; the seed is fixed, so the test is deterministic.
  const critical = await chiSquareQuantile(cells, 0.9999);
  const details = `b ${b}, seed ${seed}, ${draws} draws; observed ${Array.from(observed)}; expected ${expected.map((e) => e.toFixed(1))}`;
  expect(statistic, `chi-square ${statistic} vs ${critical}: ${details}`).toBeLessThan(critical);
  // Mean: ℓ has variance q/p² = b(b − 1); allow 5 standard errors of the mean of `draws` draws.
  const mean = sum / draws;
  const tolerance = 5 * Math.sqrt((b * (b - 1)) / draws);
  expect(Math.abs(mean - b), `mean ${mean} vs ${b} ± ${tolerance}: ${details}`).toBeLessThanOrEqual(
    tolerance,
  );
}

describe('createGeometricSampler', () => {
  it('draws the geometric law with mean 1.7 (cells 1..9, ≥10)', async () => {
    await checkDistribution(1.7, 1, 9, 200_000, 11);
  });

  it('draws the geometric law with mean 5 (cells 1..31, ≥32)', async () => {
    await checkDistribution(5, 1, 31, 200_000, 12);
  });

  it('draws the geometric law with mean 40 (cells of width 8)', async () => {
    await checkDistribution(40, 8, 40, 200_000, 13);
  });

  it('draws the geometric law with mean 3,000, where one draw in four overflows the table', async () => {
    const sampler = createGeometricSampler(3000);
    expect(sampler.truncation).toBe(4095);
    await checkDistribution(3000, 250, 63, 100_000, 14);
  });

  it('caps at the given length without changing the law of min(ℓ, cap)', async () => {
    // b = 5, cap 3: P(1) = 0.2, P(2) = 0.16, P(3) = P(ℓ ≥ 3) = 0.64.
    const sampler = createGeometricSampler(5);
    const random = createRandomSource(15);
    const observed = new Float64Array(3);
    const draws = 100_000;
    for (let i = 0; i < draws; i++) observed[sampler.sample(random, 3) - 1]!++;
    const statistic = chiSquareStatistic(observed, [0.2 * draws, 0.16 * draws, 0.64 * draws]);
    const critical = await chiSquareQuantile(2, 0.9999); // scipy.stats.chi2.ppf(0.9999, 2)
    expect(statistic, `observed ${Array.from(observed)}`).toBeLessThan(critical);
    // A cap inside an overflow run (b = 3,000, L = 4,095) stops at the cap.
    const long = createGeometricSampler(3000);
    for (let i = 0; i < 1000; i++) expect(long.sample(random, 5000)).toBeLessThanOrEqual(5000);
  });

  it('has a table whose implied law is the truncated geometric plus overflow, to 1e-15', () => {
    for (const b of [1.01, 2, 5, 40, 700]) {
      const sampler = createGeometricSampler(b);
      const { threshold, alias } = sampler.table;
      const size = threshold.length;
      expect(size).toBe(sampler.truncation + 1);
      expect(Math.log2(size) % 1).toBe(0);
      const implied = new Float64Array(size);
      for (let i = 0; i < size; i++) {
        implied[i]! += threshold[i]! / size;
        implied[alias[i]!]! += (1 - threshold[i]!) / size;
      }
      const q = 1 - 1 / b;
      for (let k = 1; k <= sampler.truncation; k++) {
        const expected = (1 / b) * q ** (k - 1);
        expect(Math.abs(implied[k - 1]! - expected), `b ${b}, length ${k}`).toBeLessThan(1e-15);
      }
      expect(Math.abs(implied[size - 1]! - q ** sampler.truncation)).toBeLessThan(1e-15);
    }
  });

  it('decides a coin that its first 32 − j bits leave open with one extra nextDouble', () => {
    const sampler = createGeometricSampler(3); // q = 2/3: 32 columns (j = 5), 27 coin bits
    const { threshold, alias } = sampler.table;
    expect(threshold.length).toBe(32);
    const coinScale = 2 ** 27;
    const column = Array.from(threshold).findIndex(
      (t) => t > 0 && t < 1 && (t * coinScale) % 1 > 0,
    );
    expect(column).toBeGreaterThanOrEqual(0);
    const x = column * coinScale + Math.floor(threshold[column]! * coinScale); // coin bits = ⌊t·2^27⌋
    const kept = scriptedSource([x], [0]);
    expect(sampler.sample(kept.source, 1000)).toBe(column + 1);
    expect(kept.drawn).toEqual({ uint32: 1, doubles: 1 });
    const passed = scriptedSource([x], [0.999999999]);
    expect(sampler.sample(passed.source, 1000)).toBe(alias[column]! + 1);
    // One below the edge: decided without the extra draw.
    const early = scriptedSource([x - 1]);
    expect(sampler.sample(early.source, 1000)).toBe(column + 1);
    expect(early.drawn).toEqual({ uint32: 1, doubles: 0 });
  });

  it('returns 1 for b = 1 without drawing, and rejects b < 1', () => {
    const sampler = createGeometricSampler(1);
    const { source, drawn } = scriptedSource([]);
    expect(sampler.sample(source, 10)).toBe(1);
    expect(drawn.uint32 + drawn.doubles).toBe(0);
    for (const b of [0.5, Number.NaN, Number.POSITIVE_INFINITY]) {
      expect(() => createGeometricSampler(b), `b ${b}`).toThrow(RangeError);
    }
  });
});
