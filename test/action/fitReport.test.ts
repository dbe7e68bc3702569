import { describe, expect, it } from 'vitest';
import { cutAtLines, fitReport, measureBytes, measureChars } from '../../src/action/fitReport.js';
import { renderMarkdown } from '../../src/report/renderMarkdown.js';
import { sampleReport } from './sampleReport.js';

const render = (r: Parameters<typeof renderMarkdown>[0]) =>
  renderMarkdown(r, { runUrl: 'https://run' });

// Many rows of the main table: per-horizon comparisons (per-series ones render only as the
// top-regressions table).
function bigReport(count: number) {
  const report = sampleReport();
  const overall = report.comparisons[0]!;
  const more = Array.from({ length: count }, (_, i) => ({ ...overall, horizon: i + 1 }));
  return sampleReport({ comparisons: [overall, ...more] });
}

describe('fitReport', () => {
  it('leaves a report that fits untouched', () => {
    const report = sampleReport();
    const fitted = fitReport(report, {
      render,
      measure: measureChars,
      limit: 65_536,
      prefix: 'M\n',
    });
    expect(fitted).toEqual({ text: `M\n${render(report)}`, shortened: false });
  });

  it('keeps as many comparison rows as fit, and says so', () => {
    const report = bigReport(3000);
    expect(render(report).length).toBeGreaterThan(65_536);
    const fitted = fitReport(report, {
      render,
      measure: measureChars,
      limit: 65_536,
      prefix: 'M\n',
      fullReportUrl: 'https://run',
    });
    expect(fitted.shortened).toBe(true);
    expect(fitted.text.length).toBeLessThanOrEqual(65_536);
    const shown = Number(/It shows (\d+) of 3001 comparisons/.exec(fitted.text)?.[1]);
    // One more row would not have fitted.
    const oneMore = render({ ...report, comparisons: report.comparisons.slice(0, shown + 1) });
    expect(oneMore.length + 2).toBeGreaterThan(65_536 - 200);
    expect(fitted.text).toContain('[this run](https://run)');
  });

  it('cuts at a line boundary and closes <details> when even one comparison is too long', () => {
    const report = sampleReport({
      reasons: Array.from({ length: 2000 }, (_, i) => `reason ${i} ${'z'.repeat(60)}`),
    });
    const fitted = fitReport(report, { render, measure: measureBytes, limit: 20_000 });
    expect(fitted.shortened).toBe(true);
    expect(measureBytes(fitted.text)).toBeLessThanOrEqual(20_000);
    expect(fitted.text).toContain('It was cut short.');
  });
});

describe('cutAtLines', () => {
  it('closes every open details section', () => {
    const text = [
      '<details><summary>a</summary>',
      '',
      'x'.repeat(50),
      'y'.repeat(50),
      '</details>',
    ].join('\n');
    const cut = cutAtLines(text, 100, measureChars);
    expect(cut.length).toBeLessThanOrEqual(100);
    expect(cut.match(/<details>/g)?.length).toBe(cut.match(/<\/details>/g)?.length);
  });
  it('slices a single overlong line by whole characters', () => {
    const cut = cutAtLines('😀'.repeat(100), 41, measureChars);
    expect(cut.length).toBeLessThanOrEqual(41);
    expect(cut).toMatch(/^(😀)+\n$/u);
  });
});
