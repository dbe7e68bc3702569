import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { sharedResampleDeviations } from '../../src/candidates/sharedResampleDeviations.js';
import { superiorAbilityTest } from '../../src/candidates/superiorAbilityTest.js';
import { mean } from '../../src/statistics/mean.js';
import { modelConfidenceSet } from '../../src/statistics/modelConfidenceSet.js';

// Invariants of the k-model procedures on shared resamples (Hansen 2005; Hansen, Lunde & Nason
// 2011): they hold exactly, for every data set and draw, so any counterexample is a bug.

/** m loss series of length n: a common AR-like part plus model-specific noise and offsets. */
const lossPanel = fc
  .record({
    m: fc.integer({ min: 2, max: 6 }),
    n: fc.integer({ min: 12, max: 60 }),
    seed: fc.integer({ min: 0, max: 2 ** 31 - 1 }),
    block: fc.double({ min: 1, max: 8, noNaN: true }),
  })
  .chain(({ m, n, seed, block }) =>
    fc.record({
      seed: fc.constant(seed),
      block: fc.constant(block),
      losses: fc.array(
        fc
          .tuple(
            fc.double({ min: -1, max: 1, noNaN: true }),
            fc.array(fc.double({ min: 0, max: 10, noNaN: true }), { minLength: n, maxLength: n }),
          )
          .map(([offset, xs]) => Float64Array.from(xs, (x) => Math.max(0, x + offset))),
        { minLength: m, maxLength: m },
      ),
    }),
  );

const resamplesOf = (losses: Float64Array[], block: number, seed: number) =>
  sharedResampleDeviations(losses, { expectedBlockLength: block, resamples: 199, seed });

describe('superior predictive ability', () => {
  it('p_lower ≤ p_consistent ≤ p_upper on shared draws, both hypotheses', () => {
    fc.assert(
      fc.property(lossPanel, ({ losses, block, seed }) => {
        const dev = resamplesOf(losses, block, seed);
        for (const h of ['none-better', 'none-worse'] as const) {
          const { spa } = superiorAbilityTest(losses[0]!, losses.slice(1), dev, block, h);
          expect(spa.pValueLower).toBeLessThanOrEqual(spa.pValueConsistent);
          expect(spa.pValueConsistent).toBeLessThanOrEqual(spa.pValueUpper);
          expect(spa.pValueUpper).toBeLessThanOrEqual(1);
          expect(spa.pValueLower).toBeGreaterThanOrEqual(1 / 200);
        }
      }),
      { numRuns: 150 },
    );
  });

  it('relabelling the candidates changes nothing (p-values; per-candidate values follow)', () => {
    fc.assert(
      fc.property(
        lossPanel.chain((p) =>
          fc.record({
            panel: fc.constant(p),
            order: fc.shuffledSubarray(
              p.losses.slice(1).map((_, i) => i),
              { minLength: p.losses.length - 1, maxLength: p.losses.length - 1 },
            ),
          }),
        ),
        ({ panel: { losses, block, seed }, order }) => {
          const dev = resamplesOf(losses, block, seed);
          const a = superiorAbilityTest(losses[0]!, losses.slice(1), dev, block, 'none-better');
          const permuted = order.map((i) => losses[i + 1]!);
          const permutedDev = [dev[0]!, ...order.map((i) => dev[i + 1]!)];
          const b = superiorAbilityTest(losses[0]!, permuted, permutedDev, block, 'none-better');
          expect(b.spa.statistic).toBe(a.spa.statistic);
          expect(b.spa.pValueLower).toBe(a.spa.pValueLower);
          expect(b.spa.pValueConsistent).toBe(a.spa.pValueConsistent);
          expect(b.spa.pValueUpper).toBe(a.spa.pValueUpper);
          expect(b.realityCheck.pValue).toBe(a.realityCheck.pValue);
          order.forEach((i, j) => {
            expect(b.spa.adjustedPValues[j]).toBe(a.spa.adjustedPValues[i]);
          });
        },
      ),
      { numRuns: 100 },
    );
  });
});

describe('model confidence set', () => {
  it('MCS p-values never decrease along the elimination order and the last is 1', () => {
    fc.assert(
      fc.property(lossPanel, fc.constantFrom('range', 'max' as const), (p, statistic) => {
        const dev = resamplesOf(p.losses, p.block, p.seed);
        const mcs = modelConfidenceSet({
          means: p.losses.map(mean),
          deviations: dev,
          statistic: statistic as 'range' | 'max',
          alpha: 0.1,
        });
        const along = mcs.eliminationOrder.map((i) => mcs.pValues[i]!);
        for (let j = 1; j < along.length; j++) {
          expect(along[j]!).toBeGreaterThanOrEqual(along[j - 1]!);
        }
        expect(along.at(-1)).toBe(1);
        expect([...mcs.eliminationOrder].sort((x, y) => x - y)).toEqual(p.losses.map((_, i) => i));
        expect(mcs.members.length).toBeGreaterThanOrEqual(1);
      }),
      { numRuns: 150 },
    );
  });

  it('relabelling the models changes nothing: same order of models, same p-values', () => {
    fc.assert(
      fc.property(
        lossPanel.chain((p) =>
          fc.record({
            panel: fc.constant(p),
            order: fc.shuffledSubarray(
              p.losses.map((_, i) => i),
              { minLength: p.losses.length, maxLength: p.losses.length },
            ),
            statistic: fc.constantFrom('range' as const, 'max' as const),
          }),
        ),
        ({ panel: { losses, block, seed }, order, statistic }) => {
          const dev = resamplesOf(losses, block, seed);
          const means = losses.map(mean);
          const a = modelConfidenceSet({ means, deviations: dev, statistic, alpha: 0.1 });
          const b = modelConfidenceSet({
            means: order.map((i) => means[i]!),
            deviations: order.map((i) => dev[i]!),
            statistic,
            alpha: 0.1,
          });
          // Ties in the argmax (probability 0 for continuous losses) are broken by position; mean
          // losses within 1e-6 of each other (relative) are treated as ties too, since sums in
          // another order may then order them differently.
          fc.pre(!hasTies(means));
          expect(b.eliminationOrder.map((j) => order[j])).toEqual(a.eliminationOrder);
          order.forEach((i, j) => {
            expect(b.pValues[j]).toBe(a.pValues[i]);
          });
        },
      ),
      { numRuns: 100 },
    );
  });
});

function hasTies(means: readonly number[]): boolean {
  const sorted = [...means].sort((a, b) => a - b);
  const scale = Math.max(...means.map(Math.abs));
  return sorted.some((m, i) => i > 0 && m - sorted[i - 1]! <= 1e-6 * scale);
}
