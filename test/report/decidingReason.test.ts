import { describe, expect, it } from 'vitest';
import { decidingReasons } from '../../src/report/decidingReason.js';
import { renderMarkdown } from '../../src/report/renderMarkdown.js';
import type { Comparison, Report } from '../../src/report/reportModel.js';
import type { ReportView } from '../../src/report/reportView.js';
import { sampleReport } from '../action/sampleReport.js';

// Hand-built reports (the demo's passing run, changed one field at a time): the deciding reason
// is the finding whose verdict is the gate's, preferring one that made it worse than the tests.

function withOverall(report: Report, change: Partial<Comparison>): Report {
  const [overall, ...rest] = report.comparisons;
  return { ...report, comparisons: [{ ...overall!, ...change }, ...rest] };
}

/** The recent-window comparison as the stability part reports it (a full comparison). */
function recentWarn(): Comparison {
  return {
    ...sampleReport().comparisons[0]!,
    verdict: 'fail',
    n: 29,
    firstTimestamp: '2026-10-01',
    lastTimestamp: '2026-10-29',
    meanCandidateLoss: 4.597 * 1.04,
    relativeDifference: 0.04,
    relativeChange: null,
  };
}

/** Levels with only the recent window run (at α) or with both checks (α/2 each). */
const RECENT_ONLY = { adjustment: 'none', alpha: 0.05, fluctuation: null, recent: 0.05 } as const;
const BOTH = { adjustment: 'bonferroni', alpha: 0.05, fluctuation: 0.025, recent: 0.025 } as const;

const kinds = (r: ReportView) => decidingReasons(r).map((x) => x.kind);

describe('the deciding reason', () => {
  it('both tests agree (no evidence): the demo pass', () => {
    const reasons = decidingReasons(sampleReport());
    expect(reasons[0]).toMatchObject({ kind: 'both-tests-agree', verdict: 'pass' });
    expect(reasons[0]?.text).toMatch(/^neither test finds evidence that/);
  });

  it('both tests agree (evidence): a fail', () => {
    const r = withOverall(sampleReport({ verdict: 'fail' }), {
      verdict: 'fail',
      rejected: { dieboldMariano: true, bootstrap: true },
    });
    expect(decidingReasons(r)[0]?.text).toMatch(/^both tests find evidence that/);
  });

  it('the tests split', () => {
    const r = withOverall(sampleReport({ verdict: 'warn' }), {
      verdict: 'warn',
      rejected: { dieboldMariano: true, bootstrap: false },
    });
    expect(kinds(r)[0]).toBe('tests-split');
    expect(decidingReasons(r)[0]?.text).toMatch(
      /Diebold–Mariano finds evidence .* the bootstrap does not/,
    );
  });

  it('too little data', () => {
    const r = withOverall(sampleReport({ verdict: 'warn' }), { verdict: 'warn', n: 12 });
    expect(kinds(r)[0]).toBe('too-little-data');
  });

  it('rows the candidate lacks decide a fail the tests alone would pass', () => {
    const base = sampleReport();
    const r: Report = {
      ...base,
      verdict: 'fail',
      inputs: { ...base.inputs, rowsDropped: { ...base.inputs.rowsDropped, baseline: 40 } },
    };
    expect(kinds(r)).toEqual(['missing-rows', 'both-tests-agree']);
    const md = renderMarkdown(r);
    // The verdict and the reason come first, before any table.
    const lead = md.split('\n')[2] ?? '';
    expect(lead).toMatch(
      /^\*\*The gate fails: the candidate lacks 40 rows that the baseline scored/,
    );
    expect(md).toContain('| FAIL (tests alone: pass) |');
  });

  it('a failed backtest check and a recent regression plug in', () => {
    const r: ReportView = {
      ...sampleReport({ verdict: 'fail' }),
      integrity: {
        mode: 'enforce',
        outcome: 'fail',
        affectsVerdict: true,
        frequency: null,
        checks: [
          {
            id: 'look-ahead',
            status: 'fail',
            count: 3,
            examples: ['north 2026-03-04'],
            summary: 'Three rows were issued on or after the day they forecast.',
          },
          { id: 'time-spans', status: 'ok', count: 0, examples: [], summary: 'Spans agree.' },
        ],
        notRun: [],
      },
      stability: { fluctuation: null, periods: [], recent: recentWarn(), levels: RECENT_ONLY },
    };
    expect(kinds(r)).toEqual(['backtest-check-failed', 'both-tests-agree', 'worse-lately']);
    const md = renderMarkdown(r);
    expect(md.split('\n')[2]).toMatch(
      /^\*\*The gate fails: the backtest check look-ahead failed: three rows were issued on or after the day they forecast\.\*\*/,
    );
    expect(md).toContain('<details><summary>Backtest checks: fail</summary>');
    // Shown only (--backtest-checks report): the check no longer decides.
    const shownOnly = {
      ...r,
      verdict: 'pass' as const,
      integrity: { ...r.integrity, mode: 'report' as const, affectsVerdict: false },
    };
    expect(kinds(shownOnly)[0]).toBe('both-tests-agree');
    const warn: ReportView = {
      ...sampleReport({ verdict: 'warn' }),
      stability: { fluctuation: null, periods: [], recent: recentWarn(), levels: RECENT_ONLY },
    };
    expect(kinds(warn)[0]).toBe('worse-lately');
    expect(decidingReasons(warn)[0]?.text).toBe(
      'the candidate is worse in the most recent 29 time points (2026-10-01 to 2026-10-29): mean loss +4.00%',
    );
  });

  it('the recent stretch gets its own row, and a changing accuracy a note', () => {
    const base = sampleReport({ verdict: 'warn' });
    const r: ReportView = {
      ...base,
      stability: {
        periods: base.stability?.periods ?? [],
        recent: recentWarn(),
        fluctuation: {
          statistic: 3.1,
          criticalValue: 2.4,
          mu: 0.3,
          windowSize: 72,
          rejected: true,
          peak: { start: '2026-09-01', end: '2026-10-29' },
          worsePeriods: [{ start: '2026-09-10', end: '2026-10-29' }],
        },
        levels: BOTH,
      },
    };
    const md = renderMarkdown(r);
    const main = md.slice(0, md.indexOf('<details>'));
    expect(main).toMatch(
      /^\| recent: 2026-10-01 to 2026-10-29 \| 4\.597 \| 4\.781 \| \+4\.00% \| /m,
    );
    // Under --stability-gate warn (the default) both findings warn; the recent window comes first.
    expect(kinds(r).slice(0, 2)).toEqual(['worse-lately', 'worse-in-a-stretch']);
    expect(main).toContain(
      '- Also: the candidate is significantly worse over 2026-09-10 to 2026-10-29 (fluctuation test, Giacomini &amp; Rossi 2010).',
    );
    // The engine's own section is folded below.
    expect(md).toContain(
      '<details><summary>Over time: worse recently and in some stretches</summary>',
    );
  });
});
