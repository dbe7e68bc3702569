import { describe, expect, it } from 'vitest';
import { candidatesSection } from '../../src/report/candidatesSection.js';
import { renderHtml } from '../../src/report/renderHtml.js';
import { renderMarkdown } from '../../src/report/renderMarkdown.js';
import { renderTerminal } from '../../src/report/renderTerminal.js';
import { sampleCandidatesReport, sampleReport } from '../action/sampleReport.js';

describe('the several-candidates section', () => {
  it('is absent from a two-model report', () => {
    expect(candidatesSection(sampleReport())).toBeNull();
    expect(renderMarkdown(sampleReport())).not.toContain('ranked by mean loss');
    expect(renderHtml(sampleReport())).not.toContain('ranked by mean loss');
  });

  it('ranks the candidates by rank, then the baseline; one cell per column', () => {
    const s = candidatesSection(sampleCandidatesReport())!;
    expect(s.ranking.rows.map((r) => r[1])).toEqual([
      'gbm-v2 (preferred)',
      'gbm-v3',
      'ensemble_1',
      'baseline (baseline)',
    ]);
    for (const row of s.ranking.rows) expect(row).toHaveLength(s.ranking.header.length);
    expect(s.shortHeader).toHaveLength(s.ranking.header.length);
    expect(s.ranking.align).toHaveLength(s.ranking.header.length);
    // set membership and own verdicts as in the sample
    expect(s.ranking.rows.map((r) => r[4])).toEqual(['yes', 'yes', 'no', 'no']);
    expect(s.ranking.rows.map((r) => r[7])).toEqual(['pass', 'warn', 'fail', '–']);
    expect(s.ranking.header[4]).toBe('in the 90% set');
    expect(s.setSentence).toMatch(
      /Eliminated in order: ensemble_1 \(p 0\.004\d*\), baseline \(p 0\.021\d*\), gbm-v3 \(p 0\.31\d*\)\.$/,
    );
  });

  it('shows the same ranking in the comment, the terminal and the HTML report', () => {
    const report = sampleCandidatesReport();
    const md = renderMarkdown(report);
    const term = renderTerminal(report, { color: false });
    const html = renderHtml(report);
    for (const text of [md, term, html]) {
      expect(text).toContain('ranked by mean loss');
      expect(text).toContain('SPA test (Hansen 2005)');
    }
    expect(md).toContain('| 3 | ensemble\\_1 |');
    expect(html).toMatch(/<td class="r">3<\/td><td>ensemble_1<\/td>/);
    expect(term).toMatch(/^ *3 {2}ensemble_1 /m);
  });

  it('escapes a hostile candidate name in every medium', () => {
    const report = sampleCandidatesReport();
    const hostile = '<img src=x>|@team\u001b[2J';
    const candidates = report.candidates!.map((c, i) => (i === 2 ? { ...c, name: hostile } : c));
    const r = { ...report, candidates };
    expect(renderMarkdown(r)).not.toContain('<img');
    expect(renderHtml(r)).not.toContain('<img');
    expect(renderTerminal(r, { color: false })).not.toContain('\u001b');
  });
});
