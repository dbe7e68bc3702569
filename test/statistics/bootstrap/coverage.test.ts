import { describe, expect, it } from 'vitest';
import { createRandomSource, type RandomSource } from '../../../src/random/randomSource.js';
import { stationaryBootstrap } from '../../../src/statistics/bootstrap/stationaryBootstrap.js';

/** Standard normal by Box & Muller (1958): √(−2 ln u₁) cos(2π u₂), u₁ in (0, 1]. */
function normal(random: RandomSource): number {
  const u1 = 1 - random.nextDouble();
  const u2 = random.nextDouble();
  return Math.sqrt(-2 * Math.log(u1)) * Math.cos(2 * Math.PI * u2);
}

describe('stationaryBootstrap coverage (simulation, fixed seeds)', () => {
  it('covers the true mean of iid data about 90% of the time with b = 1 (n = 100, 400 replications)', () => {
    // Data: iid N(0, 1) from seed 31 (Box–Muller); true E[d] = 0. Each replication: B = 199,
    // b = 1, level 0.9, margin = 0 (so H0 holds with equality and the one-sided test should
    // reject about 10% of the time). With 400 replications a binomial proportion near 0.9 has
    // standard error 0.015; the tolerance ±0.05 is 3.3 standard errors. (The bootstrap variance
    // divides by n, so intervals are √(99/100) too narrow: well under a point of coverage.)
    const replications = 400;
    const n = 100;
    const data = createRandomSource(31);
    let covered = 0;
    let rejected = 0;
    for (let r = 0; r < replications; r++) {
      const d = Float64Array.from({ length: n }, () => normal(data));
      const result = stationaryBootstrap(d, {
        resamples: 199,
        expectedBlockLength: 1,
        seed: 1000 + r,
        confidence: 0.9,
        margin: 0,
      });
      if (result.interval!.lower <= 0 && 0 <= result.interval!.upper) covered++;
      if (result.pValue! <= result.oneSidedLower!.alpha) rejected++;
    }
    const coverage = covered / replications;
    const rejection = rejected / replications;
    expect(
      Math.abs(coverage - 0.9),
      `coverage ${coverage} (nominal 0.9 ± 0.05)`,
    ).toBeLessThanOrEqual(0.05);
    expect(
      Math.abs(rejection - 0.1),
      `one-sided rejection ${rejection} (nominal 0.1 ± 0.05)`,
    ).toBeLessThanOrEqual(0.05);
  });
});
