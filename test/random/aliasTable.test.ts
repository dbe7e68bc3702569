import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { buildAliasTable } from '../../src/random/aliasTable.js';

/** P(outcome = j) = (1/K)(threshold[j] + Σ_{i: alias[i] = j} (1 − threshold[i])). */
function impliedProbabilities(threshold: Float64Array, alias: Int32Array): Float64Array {
  const size = threshold.length;
  const out = new Float64Array(size);
  for (let i = 0; i < size; i++) {
    out[i]! += threshold[i]! / size;
    out[alias[i]!]! += (1 - threshold[i]!) / size;
  }
  return out;
}

describe('buildAliasTable', () => {
  it('matches the worked example in its doc comment', () => {
    const { threshold, alias } = buildAliasTable(Float64Array.of(0.5, 0.25, 0.25));
    expect(Array.from(threshold)).toEqual([1, 0.75, 0.75]);
    expect(Array.from(alias)).toEqual([0, 0, 0]);
  });

  it('reproduces any distribution to 1e-12 (Walker 1977 identity), zeros included', () => {
    fc.assert(
      fc.property(
        fc.array(fc.oneof(fc.constant(0), fc.double({ min: 1e-6, max: 1e3, noNaN: true })), {
          minLength: 1,
          maxLength: 300,
        }),
        (weights) => {
          fc.pre(weights.some((w) => w > 0));
          const p = Float64Array.from(weights);
          const total = weights.reduce((a, b) => a + b, 0);
          const { threshold, alias } = buildAliasTable(p);
          const implied = impliedProbabilities(threshold, alias);
          for (let j = 0; j < p.length; j++) {
            const expected = p[j]! / total;
            if (Math.abs(implied[j]! - expected) > 1e-12) {
              throw new Error(`outcome ${j}: expected ${expected}, implied ${implied[j]}`);
            }
            if (!(threshold[j]! >= 0 && threshold[j]! <= 1)) return false;
            if (p[j] === 0 && threshold[j]! > 1e-12) return false;
          }
          return true;
        },
      ),
    );
  });
});
