import { readFileSync } from 'node:fs';
import path from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { dieboldMariano } from '../../src/statistics/dieboldMariano.js';
import {
  ar1PluginCosineTerms,
  ar1SpectralCurvature,
  cosineTermsForAutocorrelation,
} from '../../src/statistics/ewcCosineTermsRule.js';
import {
  ewcDegreesOfFreedom,
  ewcLongRunVariance,
} from '../../src/statistics/ewcLongRunVariance.js';

interface Case {
  name: string;
  series: number[];
  autocorrelation: number;
  terms: number;
}
// test/reference/scripts/ewc_cosine_terms.R: R's acf() and the rule evaluated in R.
const fixture = JSON.parse(
  readFileSync(
    path.join(import.meta.dirname, '../reference/fixtures/ewc_cosine_terms.json'),
    'utf8',
  ),
) as { cases: Case[] };

describe('ar1PluginCosineTerms against R (datasets package series)', () => {
  it.each(fixture.cases.map((c) => [c.name, c] as const))('%s', (_name, c) => {
    const choice = ar1PluginCosineTerms(Float64Array.from(c.series));
    // Autocorrelation: R's acf() (divide by n), tolerance 1e-12 relative (summation order).
    expect(Math.abs(choice.autocorrelation - c.autocorrelation)).toBeLessThanOrEqual(
      1e-12 * Math.max(1, Math.abs(c.autocorrelation)),
    );
    expect(choice.terms).toBe(c.terms);
  });
});

describe('cosineTermsForAutocorrelation', () => {
  it('ω^{(2)} of an AR(1): 2ρ/(1 − ρ)² (hand arithmetic: ρ = 0.7 → 15.5556, 0.81 → 44.875)', () => {
    expect(ar1SpectralCurvature(0.7)).toBeCloseTo(15.555555555555557, 12);
    expect(ar1SpectralCurvature(0.81)).toBeCloseTo(44.87534626038781, 10);
  });

  it('hand arithmetic at n = 100: ρ̃ = 0.81 → 6, ρ̃ = 0.05 → 45, ρ̃ = 0.97 → 2', () => {
    // 0.4·100^{2/3} = 8.6177; (15.556/44.875)^{1/3} = 0.7023 → 6.05;
    // (15.556/0.11080)^{1/3} = 5.197 → 44.79; (15.556/2155.6)^{1/3} = 0.1933 → 1.67 → floor 2.
    expect(cosineTermsForAutocorrelation(100, 0.81)).toBe(6);
    expect(cosineTermsForAutocorrelation(100, 0.05)).toBe(45);
    expect(cosineTermsForAutocorrelation(100, 0.97)).toBe(2);
  });

  it('equals the fixed rule 0.4 n^{2/3} at the calibration point ρ = 0.7', () => {
    fc.assert(
      fc.property(fc.integer({ min: 4, max: 200000 }), (n) => {
        expect(cosineTermsForAutocorrelation(n, 0.7)).toBe(ewcDegreesOfFreedom(n));
      }),
    );
  });

  it('never increases with ρ, stays in 2..⌊n/2⌋, and is a valid ν for ewcLongRunVariance', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 4, max: 100000 }),
        fc.double({ min: 0.05, max: 0.97, noNaN: true }),
        fc.double({ min: 0.05, max: 0.97, noNaN: true }),
        (n, a, b) => {
          const [low, high] = a <= b ? [a, b] : [b, a];
          const atLow = cosineTermsForAutocorrelation(n, low);
          const atHigh = cosineTermsForAutocorrelation(n, high);
          expect(atHigh).toBeLessThanOrEqual(atLow);
          expect(atHigh).toBeGreaterThanOrEqual(2);
          expect(atLow).toBeLessThanOrEqual(Math.max(2, Math.floor(n / 2)));
          expect(atLow).toBeLessThanOrEqual(n - 1);
        },
      ),
    );
  });
});

describe("dieboldMariano with 'ewc-ar1'", () => {
  it('uses the chosen ν for the variance and the t reference, and says so in a note', () => {
    const nile = fixture.cases.find((c) => c.name === 'nile')!;
    const d = Float64Array.from(nile.series, (x) => x / 1000 - 0.9);
    const result = dieboldMariano(d, {
      estimator: 'ewc-ar1',
      lag: { kind: 'auto' },
      horizon: 1,
      margin: 0,
    });
    expect(result.estimator).toBe('ewc-ar1');
    expect(result.degreesOfFreedom).toBe(nile.terms);
    expect(result.longRunVariance).toBe(ewcLongRunVariance(d, nile.terms).value);
    expect(result.notes.some((n) => n.includes(`${nile.terms} cosine terms`))).toBe(true);
    const fixed = dieboldMariano(d, {
      estimator: 'ewc',
      lag: { kind: 'auto' },
      horizon: 1,
      margin: 0,
    });
    expect(fixed.degreesOfFreedom).toBe(ewcDegreesOfFreedom(100));
  });
});
