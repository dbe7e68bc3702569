import { describe, expect, it } from 'vitest';
import type { LossSeries } from '../../src/aggregation/lossSeries.js';
import { hypothesisFor } from '../../src/decision/hypothesis.js';
import { createRandomSource } from '../../src/random/randomSource.js';
import { resolveSettings } from '../../src/settings/resolveSettings.js';
import { assessStability } from '../../src/stability/assessStability.js';
import { fluctuationCriticalValue } from '../../src/stability/fluctuationCriticalValues.js';

/** 120 time points, the candidate 60% worse in the last 18: both checks have something to see. */
function lateRegression(): LossSeries {
  const rng = createRandomSource(7, 0);
  const n = 120;
  const baseline = new Float64Array(n);
  const candidate = new Float64Array(n);
  for (let t = 0; t < n; t++) {
    baseline[t] = 1 + rng.nextDouble();
    candidate[t] = (1 + rng.nextDouble()) * (t >= 102 ? 1.6 : 1);
  }
  return {
    time: Int32Array.from({ length: n }, (_, t) => t),
    baseline,
    candidate,
    rows: new Int32Array(n).fill(1),
    rowCount: n,
    maxHorizon: 1,
  };
}

const run = (extra: Record<string, string>) => {
  const settings = resolveSettings(
    { baseline: 'b', candidate: 'c', resamples: '199', 'min-points': '1', ...extra },
    (name) => name,
  );
  const series = lateRegression();
  return assessStability({
    series,
    timestamps: Array.from({ length: 120 }, (_, t) => String(t + 1)),
    kind: 'number',
    hypothesis: hypothesisFor('no-regression', 0, 'relative'),
    settings,
  });
};

describe('assessStability: levels of the two checks', () => {
  it('runs the fluctuation test alone at α (Table I value 2.938 for μ = 0.2, one-sided, 5%)', () => {
    const s = run({});
    expect(s.levels).toEqual({ adjustment: 'none', alpha: 0.05, fluctuation: 0.05, recent: null });
    expect(s.fluctuation!.criticalValue).toBeCloseTo(2.938, 12);
  });

  it('splits α between the two checks when both run (Bonferroni, α/2 = 0.025 each)', () => {
    const s = run({ recent: '15%' });
    expect(s.levels).toEqual({
      adjustment: 'bonferroni',
      alpha: 0.05,
      fluctuation: 0.025,
      recent: 0.025,
    });
    // Critical value at 2.5%: log-α interpolation between the 1% column (3.4981, the project's
    // simulation, validation/fluctuationTable.json) and Table I's 5% column (2.938).
    const w = Math.log(2.5) / Math.log(5);
    expect(s.fluctuation!.criticalValue).toBeCloseTo((1 - w) * 3.4981 + w * 2.938, 10);
    expect(s.fluctuation!.criticalValue).toBeCloseTo(
      fluctuationCriticalValue(0.2, 0.025, 'one')!,
      12,
    );
    expect(s.recent!.reasons.join(' ')).toContain('α = 0.025');
    expect(s.recent!.reasons.join(' ')).not.toContain('α = 0.05:');
  });

  it('keeps α for the recent window when the fluctuation test cannot run (α/2 outside the table)', () => {
    const s = run({ recent: '15%', alpha: '0.3' });
    expect(s.fluctuation).toBeNull();
    expect(s.levels).toEqual({ adjustment: 'none', alpha: 0.3, fluctuation: null, recent: 0.3 });
    expect(s.recent!.reasons.join(' ')).toContain('α = 0.3');
  });
});
