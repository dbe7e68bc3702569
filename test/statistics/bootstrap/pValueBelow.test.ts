import { describe, expect, it } from 'vitest';
import { stationaryBootstrap } from '../../../src/statistics/bootstrap/stationaryBootstrap.js';

// The lower-tail p-value (used by the non-inferiority and superiority policies) counts the same
// resamples from the other side: (1 + #{U ≥ δ}) + (1 + #{U ≤ δ}) = B + 2 + #{U = δ}.
describe('stationaryBootstrap pValueBelow', () => {
  const d = Float64Array.from({ length: 80 }, (_, t) => Math.sin(t / 3) + 0.2 * Math.cos(t));
  for (const margin of [-0.5, 0, 0.05, 0.5]) {
    it(`complements pValue at δ = ${margin}`, () => {
      const r = stationaryBootstrap(d, {
        resamples: 999,
        expectedBlockLength: 4,
        seed: 5,
        confidence: 0.95,
        margin,
      });
      const sum = (r.pValue! + r.pValueBelow!) * 1000;
      // No ties with these continuous values, so the sum is exactly (B + 2)/(B + 1).
      expect(sum).toBeCloseTo(1001, 9);
      if (margin < -0.4) expect(r.pValueBelow!).toBeGreaterThan(0.9);
      if (margin > 0.4) expect(r.pValueBelow!).toBeLessThan(0.05);
    });
  }
});
