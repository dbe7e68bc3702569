import { describe, expect, it } from 'vitest';
import { bootstrapMarginSet } from '../../src/intervals/bootstrapMarginSet.js';
import { fiellerSet } from '../../src/intervals/fiellerSet.js';
import {
  complementOfSet,
  hullOfSet,
  intersectionOfSets,
  setContains,
  unionOfSets,
} from '../../src/intervals/intervalSet.js';

// Hand-worked cases (values derived in the comments; tolerance 1e-12 relative).
describe('fiellerSet', () => {
  it('is the bounded interval between the roots when the denominator is significant', () => {
    // a = 100 − 4·0.01 = 99.96, b = 10, e = 1 − 4·0.04 = 0.84, b² − ae = 16.0336.
    const set = fiellerSet({
      meanD: 1,
      meanB: 10,
      varDD: 0.04,
      varDB: 0,
      varBB: 0.01,
      critical: 2,
    });
    const root = Math.sqrt(16.0336);
    expect(set).toHaveLength(1);
    expect(set[0]!.lower).toBeCloseTo((10 - root) / 99.96, 12);
    expect(set[0]!.upper).toBeCloseTo((10 + root) / 99.96, 12);
  });

  it('solves the quadratic at its ends: (m_D − r m_B)² = c² V(r)', () => {
    const input = { meanD: 0.3, meanB: 2, varDD: 0.05, varDB: 0.02, varBB: 0.03, critical: 1.7 };
    const [p] = fiellerSet(input);
    for (const r of [p!.lower!, p!.upper!]) {
      const lhs = (input.meanD - r * input.meanB) ** 2;
      const rhs = input.critical ** 2 * (input.varDD - 2 * r * input.varDB + r * r * input.varBB);
      expect(Math.abs(lhs - rhs)).toBeLessThan(1e-12);
    }
  });

  it('is two rays, reported with null (unbounded) ends, when m_B is not significant', () => {
    // a = 1 − 4 = −3 < 0, b = 2·1 = 2, e = 4 − 4·0.25 = 3: b² − ae = 13 > 0.
    const set = fiellerSet({ meanD: 2, meanB: 1, varDD: 0.25, varDB: 0, varBB: 1, critical: 2 });
    expect(set).toHaveLength(2);
    expect(set[0]!.lower).toBeNull();
    expect(set[1]!.upper).toBeNull();
    expect(set[0]!.upper).toBeCloseTo((2 + Math.sqrt(13)) / -3, 12);
    expect(set[1]!.lower).toBeCloseTo((2 - Math.sqrt(13)) / -3, 12);
    expect(hullOfSet(set)).toEqual({ lower: null, upper: null });
  });

  it('is the whole line when nothing is significant', () => {
    // a = 0.01 − 4 < 0, b = 0.01, e = 0.01 − 4: b² − ae < 0.
    expect(
      fiellerSet({ meanD: 0.1, meanB: 0.1, varDD: 1, varDB: 0, varBB: 1, critical: 2 }),
    ).toEqual([{ lower: null, upper: null }]);
  });

  it('is one ray when a = 0', () => {
    // a = 4 − 4 = 0, b = 2·1 − 0 = 2, e = 1 − 0 = 1: −4r + 1 ≤ 0 ⇔ r ≥ 0.25.
    expect(fiellerSet({ meanD: 1, meanB: 2, varDD: 0, varDB: 0, varBB: 1, critical: 2 })).toEqual([
      { lower: 0.25, upper: null },
    ]);
  });
});

describe('bootstrapMarginSet', () => {
  it('is [ρ_(K), ρ_(B+1−K)] of the reflected ratios when every C_b > 0', () => {
    // B = 19, tail 0.05: K = 1. A_b = 1 − T_D, C_b = 10 − T_B.
    const deviationsD = Float64Array.from({ length: 19 }, (_, b) => (b - 9) / 10);
    const deviationsB = Float64Array.from({ length: 19 }, (_, b) => ((b * 7) % 19) / 19 - 0.5);
    const rho = Array.from(deviationsD, (t, b) => (1 - t) / (10 - deviationsB[b]!)).sort(
      (x, y) => x - y,
    );
    const set = bootstrapMarginSet({ meanD: 1, meanB: 10, deviationsD, deviationsB, tail: 0.05 });
    expect(set).toEqual([{ lower: rho[0], upper: rho[18] }]);
  });

  it('handles resamples whose reflected baseline mean is negative (C_b < 0)', () => {
    // One resample with C_b < 0 turns its U_b ≤ 0 region around; the set still holds r where at
    // least K = 1 of the U_b(r) is ≤ 0 and one is ≥ 0.
    const deviationsD = new Float64Array([0.1, -0.1, 0.2, 0, 0.3, -0.2, 0.1, 0, -0.1, 0.05]);
    const deviationsB = new Float64Array([0, 0.1, -0.1, 3, 0, 0.2, -0.2, 0.1, 0, 0]);
    const set = bootstrapMarginSet({ meanD: 0.5, meanB: 2, deviationsD, deviationsB, tail: 0.1 });
    const counts = (r: number) => {
      let le = 0;
      let ge = 0;
      for (let b = 0; b < 10; b++) {
        const u = 0.5 - deviationsD[b]! - r * (2 - deviationsB[b]!);
        if (u <= 0) le++;
        if (u >= 0) ge++;
      }
      return le >= 1 && ge >= 1;
    };
    for (let r = -3; r <= 3; r += 0.0137) expect(setContains(set, r)).toBe(counts(r));
  });
});

describe('interval sets', () => {
  const a = [{ lower: 0, upper: 1 }];
  const b = [{ lower: 2, upper: null }];
  it('unions, intersects and complements', () => {
    expect(unionOfSets(a, b)).toEqual([...a, ...b]);
    expect(unionOfSets(a, [{ lower: 0.5, upper: 3 }])).toEqual([{ lower: 0, upper: 3 }]);
    expect(intersectionOfSets(a, b)).toEqual([]);
    expect(intersectionOfSets(a, [{ lower: null, upper: 0.5 }])).toEqual([
      { lower: 0, upper: 0.5 },
    ]);
    expect(complementOfSet(unionOfSets(a, b))).toEqual([
      { lower: null, upper: 0 },
      { lower: 1, upper: 2 },
    ]);
    expect(hullOfSet([])).toBeNull();
  });
});
