import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  differenceSeries,
  mermaidChart,
  periodLabel,
  sparkline,
} from '../../src/report/differenceChart.js';
import { renderMarkdown } from '../../src/report/renderMarkdown.js';
import { renderTerminal } from '../../src/report/renderTerminal.js';
import { sampleReport } from '../action/sampleReport.js';
import { weeklyPeriods, withPeriods } from './periodsFixture.js';

describe('the difference over time', () => {
  it('draws one point per period from report.stability.periods, with zero and margin lines', () => {
    const report = sampleReport();
    const view = withPeriods({
      ...report,
      policy: { ...report.policy, margin: 0.02, baselineFactor: 1.02 },
    });
    const series = differenceSeries(view)!;
    expect(series.values).toHaveLength(34);
    expect(series.margin).toBeCloseTo(2, 12);
    const chart = mermaidChart(series);
    expect(chart[0]).toBe('```mermaid');
    expect(chart.at(-1)).toBe('```');
    expect(chart.filter((l) => l.trim().startsWith('line ['))).toHaveLength(3);
    expect(chart.join('\n')).toContain('x-axis "period, 2026-03-02 to 2026-10-25" 1 --> 34');
  });

  it('has no chart without periods, and no margin line without a relative margin', () => {
    expect(differenceSeries({ ...sampleReport(), stability: null })).toBeNull();
    const series = differenceSeries(withPeriods(sampleReport()))!;
    expect(series.margin).toBeNull();
    expect(mermaidChart(series).filter((l) => l.trim().startsWith('line ['))).toHaveLength(2);
  });

  it('keeps labels to safe characters, so input text cannot end the diagram or the block', () => {
    expect(periodLabel('2026-03-02T00:00:00Z')).toBe('2026-03-02');
    expect(periodLabel('x"]\n```\n<img>')).toBe('ximg');
    const hostile = weeklyPeriods(3).map((p) => ({ ...p, start: '"] ``` @team <b>' }));
    const text = mermaidChart(differenceSeries(withPeriods(sampleReport(), hostile))!).join('\n');
    expect(text.match(/```/g)).toHaveLength(2);
    const axis = text.split('\n').find((l) => l.includes('x-axis')) ?? '';
    expect(axis).toBe('    x-axis "period,   team b to 2026-03-22" 1 --> 3');
  });

  it('a sparkline of block characters, its midline at zero, in the comment and the terminal', () => {
    expect(sparkline([-1, 0, 1])).toBe('▁▅█');
    expect(sparkline([0, 0])).toBe('▁▁');
    const view = withPeriods(sampleReport());
    const md = renderMarkdown(view);
    expect(md).toMatch(/```mermaid\n%%\{init: .*\}%%\nxychart-beta\n/);
    expect(md).toMatch(/`change per period, 2026-03-02 → 2026-10-25: [▁▂▃▄▅▆▇█]{34} \(from /);
    expect(renderTerminal(view, { color: false })).toMatch(/change per period, .*[▁▂▃▄▅▆▇█]{34}/);
  });
});

describe('the chart, for any input text (property)', () => {
  it('labels never carry a quote, backtick, bracket or line break; the block has two fences', () => {
    fc.assert(
      fc.property(
        fc.array(fc.string({ unit: 'grapheme' }), { minLength: 2, maxLength: 8 }),
        (labels) => {
          for (const l of labels) expect(periodLabel(l)).toMatch(/^[A-Za-z0-9 .:/+-]{0,16}$/);
          const periods = weeklyPeriods(labels.length).map((p, i) => ({
            ...p,
            start: labels[i]!,
            end: labels[i]!,
          }));
          const text = mermaidChart(differenceSeries(withPeriods(sampleReport(), periods))!).join(
            '\n',
          );
          expect(text.match(/```/g)).toHaveLength(2);
          expect(sparkline(periods.map((p) => p.relativeDifference ?? 0))).toHaveLength(
            labels.length,
          );
        },
      ),
      { numRuns: 200, seed: 9 },
    );
  });
});
