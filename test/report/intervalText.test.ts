import { describe, expect, it } from 'vitest';
import { renderMarkdown } from '../../src/report/renderMarkdown.js';
import { renderTerminal } from '../../src/report/renderTerminal.js';
import { sampleReport } from '../action/sampleReport.js';

// The sample report of test/action/sampleReport.ts (the demo's numbers), edited per case.
describe('intervals in the rendered report', () => {
  it('prints the relative-change interval beside the relative change, in both renderers', () => {
    const report = sampleReport();
    const md = renderMarkdown(report);
    expect(md).toContain('-16.5% [-20.1%, -12.9%]');
    expect(md).toContain('Intervals are 90% (1 − 2α)');
    expect(md).not.toContain('may disagree');
    const term = renderTerminal(report, { color: false });
    expect(term).toContain('-16.5% [-20.1%, -12.9%]');
  });

  it('says the intervals and the tests may disagree when --confidence overrides 1 − 2α', () => {
    const report = sampleReport();
    const md = renderMarkdown({ ...report, settings: { ...report.settings, confidence: 0.95 } });
    expect(md).toContain('set by --confidence instead of the default 1 − 2α = 90%');
    expect(md).toContain('may disagree');
  });

  it('prints unbounded pieces and a measured coverage beside the interval it belongs to', () => {
    const report = sampleReport();
    const c = report.comparisons[0]!;
    const edited = {
      ...c,
      relativeChange: {
        ...c.relativeChange!,
        lower: null,
        upper: null,
        pieces: [
          { lower: null, upper: -0.5 },
          { lower: -0.1, upper: null },
        ],
      },
      bootstrap: {
        ...c.bootstrap,
        interval: {
          ...c.bootstrap.interval!,
          measuredCoverage: { coverage: 0.84, level: 0.9, studiedN: 100 },
        },
      },
    };
    const md = renderMarkdown({ ...report, comparisons: [edited] });
    expect(md).toContain('-16.5% [−∞, -50%] ∪ [-10%, +∞]');
    expect(md).toMatch(/\[-?[\d.]+, -?[\d.]+\] \(measured coverage 84%\) \|/);
    expect(md).toContain('the validation study (docs/validation.md) found at n = 100 time points');
  });
});
