import { describe, expect, it } from 'vitest';
import { hypothesisFor } from '../../src/decision/hypothesis.js';
import { stabilityFinding } from '../../src/stability/stabilityFinding.js';
import type { Stability } from '../../src/stability/stabilityModel.js';
import { sampleReport } from '../action/sampleReport.js';

const report = sampleReport();
const overall = report.comparisons[0]!;
const hypothesis = hypothesisFor('no-regression', 0, 'relative');
const recentFail = {
  ...overall,
  n: 42,
  firstTimestamp: '2026-09-14',
  lastTimestamp: '2026-10-25',
  relativeDifference: 0.18,
  verdict: 'fail' as const,
  relativeChange: { estimate: 0.18, level: 0.9, lower: 0.09, upper: 0.27, method: 'Fieller' },
};
const stable: Stability = { ...report.stability!, recent: null };
const settings = (gate: 'off' | 'warn' | 'fail') => ({ ...report.settings, stabilityGate: gate });

describe('stabilityFinding', () => {
  it('says where and by how much in plain words, and that it warns without failing', () => {
    const f = stabilityFinding(
      { ...stable, recent: recentFail },
      hypothesis,
      settings('warn'),
      'datetime',
    );
    expect(f.effect).toBe('warn');
    expect(f.headline).toBe(
      'The candidate is worse in the most recent 6 weeks (2026-09-14 to 2026-10-25): +18% mean loss (90% interval +9% to +27%). This makes the gate warn; it does not fail it (stability-gate warn).',
    );
  });

  it('does not say "does not fail it" when the whole backtest already fails the gate', () => {
    const s = { ...stable, recent: recentFail };
    const f = stabilityFinding(s, hypothesis, settings('warn'), 'datetime', 'fail');
    expect(f.headline).toMatch(
      /On its own this would make the gate warn \(stability-gate warn\)\.$/,
    );
    expect(f.headline).not.toMatch(/does not fail it/);
  });

  it('names the level of each check in the reasons when both shared α (Bonferroni)', () => {
    const s: Stability = {
      ...stable,
      recent: recentFail,
      fluctuation: {
        ...stable.fluctuation!,
        statistic: 3.4,
        rejected: true,
        worsePeriods: [{ start: '2026-09-01', end: '2026-10-29' }],
      },
      levels: { adjustment: 'bonferroni', alpha: 0.05, fluctuation: 0.025, recent: 0.025 },
    };
    const f = stabilityFinding(s, hypothesis, settings('warn'), 'datetime');
    expect(f.reasons[0]).toMatch(/at α = 0\.025, half of α = 0\.05 \(Bonferroni/);
    expect(f.reasons[1]).toMatch(/one-sided, α = 0\.025, half of α = 0\.05 \(Bonferroni/);
    expect(f.headline).toMatch(/The candidate is also significantly worse over 2026-09-01/);
  });

  it('fails the gate or stays silent as stability-gate says', () => {
    const s = { ...stable, recent: recentFail };
    expect(stabilityFinding(s, hypothesis, settings('fail'), 'datetime').effect).toBe('fail');
    const off = stabilityFinding(s, hypothesis, settings('off'), 'datetime');
    expect(off.effect).toBeNull();
    expect(off.headline).toMatch(/does not change the verdict/);
  });

  it('names the stretches the fluctuation test finds, and nothing when all is stable', () => {
    const f = stabilityFinding(
      {
        ...stable,
        fluctuation: {
          ...stable.fluctuation!,
          statistic: 3.4,
          rejected: true,
          worsePeriods: [{ start: '2026-09-01', end: '2026-10-29' }],
        },
      },
      hypothesis,
      settings('warn'),
      'datetime',
    );
    expect(f.headline).toMatch(
      /Over time, the candidate is significantly worse over 2026-09-01 to 2026-10-29/,
    );
    expect(stabilityFinding(stable, hypothesis, settings('warn'), 'datetime')).toEqual({
      effect: null,
      headline: '',
      reasons: [],
    });
  });
});
