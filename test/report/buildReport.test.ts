import { describe, expect, it } from 'vitest';
import { hypothesisFor } from '../../src/decision/hypothesis.js';
import { buildReport, type ReportParts } from '../../src/report/buildReport.js';
import type { Comparison } from '../../src/report/reportModel.js';
import { sampleReport } from '../action/sampleReport.js';

// The sample's overall comparison: 240 time points, mean loss 4.5967 → 3.8387, relative
// difference −0.164899…, verdict pass.
const sample = sampleReport();
const hypothesis = hypothesisFor('no-regression', 0, 'relative');
const parts = (over: Partial<ReportParts> = {}): ReportParts => ({
  version: '9.9.9',
  settings: sample.settings,
  hypothesis,
  inputs: sample.inputs,
  comparisons: sample.comparisons,
  ...over,
});
const withMissing = (baseline: number) => ({
  ...sample.inputs,
  rowsDropped: { ...sample.inputs.rowsDropped, baseline },
});
const overall = (over: Partial<Comparison>): Comparison[] => [
  { ...sample.comparisons[0]!, ...over },
];

describe('buildReport: the gate verdict', () => {
  it("takes the overall comparison's verdict when nothing else counts", () => {
    const report = buildReport(parts());
    expect(report.verdict).toBe('pass');
    expect(report.reasons).toEqual([]);
    expect(report.tool).toEqual({ name: 'skillgate', version: '9.9.9' });
    expect(buildReport(parts({ comparisons: overall({ verdict: 'warn' }) })).verdict).toBe('warn');
    expect(buildReport(parts({ comparisons: overall({ verdict: 'fail' }) })).verdict).toBe('fail');
  });

  it('fails when the candidate lacks baseline rows, and names how many', () => {
    const report = buildReport(parts({ inputs: withMissing(7) }));
    expect(report.verdict).toBe('fail');
    expect(report.reasons).toEqual([
      'The candidate lacks 7 rows that the baseline has. A candidate must not pass by skipping hard cases; set allow-missing to compare on the common rows only.',
    ]);
    expect(report.headline).toMatch(/The gate fails\.$/);
  });

  it('lets missing rows through when allowed, saying so', () => {
    const settings = { ...sample.settings, allowMissing: true };
    const report = buildReport(parts({ settings, inputs: withMissing(7) }));
    expect(report.verdict).toBe('pass');
    expect(report.reasons).toEqual([
      'The candidate lacks 7 rows that the baseline has; allowed by allow-missing, they are left out of the comparison.',
    ]);
  });

  it('does not count candidate-only rows as missing', () => {
    const inputs = {
      ...sample.inputs,
      rowsDropped: { ...sample.inputs.rowsDropped, candidate: 5 },
    };
    expect(buildReport(parts({ inputs })).verdict).toBe('pass');
  });

  it('refuses a report without the overall comparison', () => {
    expect(() => buildReport(parts({ comparisons: [] }))).toThrow(/overall comparison/);
  });

  it('reads a pre-aggregated run (no integrity given) as checks not run, not as a failure', () => {
    const report = buildReport(parts());
    expect(report.integrity.outcome).toBe('ok');
    expect(report.integrity.checks).toEqual([]);
    expect(report.integrity.notRun.length).toBeGreaterThan(0);
  });
});

describe('buildReport: the headline', () => {
  it('states what was tested, over how many points, the change in percent and the verdict', () => {
    // |−0.164899…| × 100 to 2 decimals = 16.49.
    expect(buildReport(parts()).headline).toBe(
      "Tested whether the candidate's expected loss is higher than the baseline's, over 240 time points (mean loss down 16.49% against the baseline). The gate passes.",
    );
  });

  it('says "up" for a worse candidate and gives each verdict its sentence', () => {
    const worse = buildReport(
      parts({ comparisons: overall({ relativeDifference: 0.031, verdict: 'fail' }) }),
    );
    expect(worse.headline).toBe(
      "Tested whether the candidate's expected loss is higher than the baseline's, over 240 time points (mean loss up 3.10% against the baseline). The gate fails.",
    );
    const mixed = buildReport(parts({ comparisons: overall({ verdict: 'warn' }) }));
    expect(mixed.headline).toMatch(
      /\. The evidence is mixed or thin: the gate passes with a warning\.$/,
    );
  });

  it('shows both mean losses when there is no relative difference (baseline loss 0)', () => {
    const report = buildReport(
      parts({
        comparisons: overall({
          relativeDifference: null,
          meanBaselineLoss: 0,
          meanCandidateLoss: 0.5,
        }),
      }),
    );
    expect(report.headline).toContain('(mean loss 0.5 vs 0)');
  });

  it('words the alternative of the policy in force', () => {
    const superiority = hypothesisFor('superiority', 0.05, 'relative');
    expect(buildReport(parts({ hypothesis: superiority })).headline).toMatch(
      /^Tested whether the candidate's expected loss is lower than the baseline's by more than 5%, over 240/,
    );
  });
});
