import { describe, expect, it } from 'vitest';
import { coverageDesigns } from '../../validation/coverageDesigns.js';
import { COVERAGE_INTERVALS, runCoverage } from '../../validation/coverageStudy.js';

// The coverage study of docs/validation.md at reduced cost for every test run: the validation
// design (AR(1) errors, φ = 0.6, innovations correlated 0.5, squared loss) with the candidate's
// error scaled by 1.2 (true relative change +44%), n = 100, 600 replications (stream r of seed
// 20261201 for replication r), B = 199 resamples, default level 1 − 2α = 90%. Monte Carlo
// standard error of a 90% coverage over 600 replications: 1.2 points, of a 5% miss rate 0.9;
// the tolerances are about 3 standard errors. The full study is `npm run validate`.
const design = coverageDesigns(100).find((d) => d.label === 'φ 0.6, ρ 0.5, scale 1.2')!;
const result = runCoverage(design, { replications: 600, resamples: 199, seed: 20261201 });
const shown = COVERAGE_INTERVALS[0];

describe('coverage of the intervals the report shows (simulation, fixed seeds)', () => {
  it('the relative-change interval covers the true relative change within 4 points of 90%', () => {
    console.info('coverage', result.covered, 'lower end above truth', result.missAbove);
    expect(result.level).toBe(0.9);
    expect(Math.abs(result.covered[shown] - 0.9)).toBeLessThanOrEqual(0.04);
  });
  it('each end misses on its side at most α + 3 points', () => {
    expect(result.missAbove[shown]).toBeLessThanOrEqual(0.08);
    expect(result.missBelow[shown]).toBeLessThanOrEqual(0.08);
  });
  it('the union covers at least as often as each test inverted alone', () => {
    expect(result.covered[shown]).toBeGreaterThanOrEqual(result.covered[COVERAGE_INTERVALS[1]]);
    expect(result.covered[shown]).toBeGreaterThanOrEqual(result.covered[COVERAGE_INTERVALS[2]]);
  });
});
