import { describe, expect, it } from 'vitest';
import { candidatesChartSvg } from '../../src/report/candidatesChartSvg.js';
import { sampleCandidatesReport, sampleReport } from '../action/sampleReport.js';

const circles = (svg: string) =>
  [...svg.matchAll(/<circle cx="([-\d.]+)" cy="([-\d.]+)"[^>]*fill="(#[0-9a-f]+)"/g)].map((m) => ({
    cx: Number(m[1]),
    cy: Number(m[2]),
    fill: m[3],
  }));

describe('chart of the candidates’ changes', () => {
  it('is empty for a two-model report', () => {
    expect(candidatesChartSvg(sampleReport())).toBe('');
  });

  it('draws one dot per candidate, lowest loss on top, filled when in the set, placed by change', () => {
    const svg = candidatesChartSvg(sampleCandidatesReport());
    expect(svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
    expect(svg.endsWith('</svg>')).toBe(true);
    const dots = circles(svg);
    expect(dots).toHaveLength(3);
    // rank order top to bottom
    expect(dots.map((d) => d.cy)).toEqual([...dots.map((d) => d.cy)].sort((a, b) => a - b));
    // relative differences -0.1649 (sample), 0.02, 0.31: left to right
    expect(dots[0]!.cx).toBeLessThan(dots[1]!.cx);
    expect(dots[1]!.cx).toBeLessThan(dots[2]!.cx);
    expect(dots.map((d) => d.fill)).toEqual(['#1f4e79', '#1f4e79', '#ffffff']);
    expect(svg).toContain('>ensemble_1</text>');
  });

  it('escapes names and draws an unbounded end to the edge with an arrow', () => {
    const report = sampleCandidatesReport();
    const first = report.candidates![0]!;
    const c = {
      ...first,
      name: 'a<b>&"x"',
      comparison: {
        ...first.comparison,
        relativeChange: { estimate: -0.1, level: 0.9, lower: null, upper: 0.05, method: 'x' },
      },
    };
    const svg = candidatesChartSvg({ ...report, candidates: [c, ...report.candidates!.slice(1)] });
    expect(svg).toContain('a&lt;b&gt;&amp;&quot;x&quot;');
    expect(svg).not.toContain('a<b>');
    expect(svg).toContain('<polygon');
  });
});
