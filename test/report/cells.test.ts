import { describe, expect, it } from 'vitest';
import { changeCell, evidenceOf, percent, pValue, significant } from '../../src/report/cells.js';
import { renderMarkdown } from '../../src/report/renderMarkdown.js';
import { sampleReport } from '../action/sampleReport.js';

describe('cells', () => {
  it('keeps a fixed number of significant digits, trailing zeros included', () => {
    expect(significant(1.2)).toBe('1.200');
    expect(significant(4.596681922569442)).toBe('4.597');
    expect(significant(1234.5678)).toBe('1235');
    expect(significant(2.5e-7)).toBe('2.500e-7');
    expect(percent(0.0372)).toBe('+3.72%');
    expect(percent(-0.5)).toBe('-50.0%');
    expect(percent(0.00512)).toBe('+0.512%');
  });

  it('shows the ends of p-values as < 0.0001 and > 0.9999', () => {
    expect(pValue(0.00001)).toBe('< 0.0001');
    expect(pValue(0.9999993599353291)).toBe('> 0.9999');
    expect(pValue(0.05)).toBe('0.0500');
    expect(pValue(null)).toBe('n/a');
  });

  it('prints beside the change only an interval for the change itself', () => {
    const sample = sampleReport().comparisons[0]!;
    const overall = {
      ...sample,
      relativeChange: null,
      bootstrap: {
        ...sample.bootstrap,
        relativeInterval: { level: 0.95, lower: -0.2108, upper: -0.1221, method: 'basic' },
      },
    };
    // The bootstrap's interval for E[L_c]/E[L_b] − 1 …
    expect(changeCell(overall)).toBe('-16.5% [-21.1%, -12.2%]');
    // … and an engine interval by test inversion wins over it when present.
    expect(
      changeCell({
        ...overall,
        relativeChange: {
          estimate: -0.1649,
          level: 0.9,
          lower: -0.2,
          upper: -0.1,
          method: 'test inversion',
        },
      }),
    ).toBe('-16.5% [-20.0%, -10.0%]');
    // Without either, the point alone (never the interval of the margin-shifted differential).
    expect(
      changeCell({ ...overall, bootstrap: { ...overall.bootstrap, relativeInterval: null } }),
    ).toBe('-16.5%');
  });

  it('says "better" only with evidence of a lower loss', () => {
    const report = sampleReport();
    const overall = report.comparisons[0]!;
    expect(evidenceOf(overall, report)).toBe('better');
    const straddles = {
      ...overall,
      relativeChange: { ...overall.relativeChange!, lower: -0.1, upper: 0.02 },
      bootstrap: {
        ...overall.bootstrap,
        relativeInterval: { level: 0.95, lower: -0.1, upper: 0.02, method: 'basic' },
      },
    };
    expect(evidenceOf(straddles, report)).toBe('no clear difference');
  });

  it('writes the tested differential without "1 ·" when the margin is 0', () => {
    const md = renderMarkdown(sampleReport());
    expect(md).toContain('d\\_t = L\\_candidate − L\\_baseline (');
    expect(md).not.toMatch(/− 1 · L/);
    expect(md).toContain('&gt; 0.9999');
  });
});
