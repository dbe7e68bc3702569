import { describe, expect, it } from 'vitest';
import { renderMarkdown } from '../../src/report/renderMarkdown.js';
import { renderStabilitySection } from '../../src/report/renderStabilitySection.js';
import { renderTerminal } from '../../src/report/renderTerminal.js';
import { sampleReport } from '../action/sampleReport.js';

describe('renderStabilitySection', () => {
  it('shows the fluctuation test and the periods, once, in the comment', () => {
    const md = renderMarkdown(sampleReport());
    expect(md.match(/\*\*Over time\*\*/g)).toHaveLength(1);
    expect(md).toMatch(/rolling windows of 48 time points \(μ = 0\.2\)/);
    expect(md).toMatch(/\| 2026-03-04 to 2026-03-08 \| 5 \| 4\.61 \| 3\.9 \| -15\.4% \|/);
  });

  it('puts the recent window beside the whole backtest', () => {
    const report = sampleReport();
    const recent = { ...report.comparisons[0]!, n: 36, firstTimestamp: '2026-09-24' };
    const lines = renderStabilitySection({
      ...report,
      stability: { ...report.stability!, recent },
    });
    expect(
      lines.some((l) => l.startsWith('| whole backtest | 2026-03-04 to 2026-10-29 | 240 |')),
    ).toBe(true);
    expect(lines.some((l) => l.startsWith('| most recent | 2026-09-24 to 2026-10-29 | 36 |'))).toBe(
      true,
    );
  });

  it('says at which level each check ran when both shared α (comment and terminal)', () => {
    const report = sampleReport();
    const recent = { ...report.comparisons[0]!, n: 36, firstTimestamp: '2026-09-24' };
    const shared = {
      ...report,
      stability: {
        ...report.stability!,
        recent,
        levels: {
          adjustment: 'bonferroni' as const,
          alpha: 0.05,
          fluctuation: 0.025,
          recent: 0.025,
        },
      },
    };
    const md = renderStabilitySection(shared).join('\n');
    expect(md).toMatch(/critical value 2\.938 at α = 0\.025\./);
    expect(md).toMatch(
      /each ran at half the level \(Bonferroni\): the recent window at α = 0\.025 and the fluctuation test at α = 0\.025/,
    );
    const alone = renderStabilitySection(report).join('\n');
    expect(alone).toMatch(/at α = 0\.05\./);
    expect(alone).not.toMatch(/Bonferroni/);
    const term = renderTerminal(shared, { color: false });
    expect(term).toMatch(/p \(boot\) [0-9.]+, α = 0\.025, α\/2 each by Bonferroni: pass/);
    expect(term).toMatch(/μ = 0\.2, α = 0\.025, α\/2 each by Bonferroni\)/);
  });

  it('escapes hostile timestamp labels in the comment and strips control characters in the terminal', () => {
    const report = sampleReport();
    const hostile = '<img src=x onerror=alert(1)>|[x](http://e)';
    const stability = {
      ...report.stability!,
      periods: [{ ...report.stability!.periods[0]!, start: hostile, end: '\u001b[2Jx' }],
      fluctuation: {
        ...report.stability!.fluctuation!,
        worsePeriods: [{ start: hostile, end: '\u001b[31mred' }],
      },
    };
    const md = renderStabilitySection({ ...report, stability }).join('\n');
    expect(md).not.toContain('<img');
    const text = renderTerminal({ ...report, stability }, { color: false });
    expect(text).not.toContain('\u001b');
  });

  it('is empty for a report without a stability part', () => {
    expect(renderStabilitySection(sampleReport({ stability: null }))).toEqual([]);
  });
});
