import { readFileSync } from 'node:fs';
import path from 'node:path';
import { Ajv } from 'ajv';
import { describe, expect, it } from 'vitest';
import { parseUntrustedReport } from '../../src/action/untrustedReport.js';
import { renderMarkdown } from '../../src/report/renderMarkdown.js';
import { sampleCandidatesReport } from './sampleReport.js';

const schema = JSON.parse(
  readFileSync(path.join(import.meta.dirname, '..', '..', 'docs', 'report.schema.json'), 'utf8'),
);
const validate = new Ajv({ allErrors: true, strict: false }).compile(schema);

describe('the several-candidates sections of an uploaded report', () => {
  it('is valid against the schema and reads back unchanged', () => {
    const report = sampleCandidatesReport();
    expect(validate(JSON.parse(JSON.stringify(report))), JSON.stringify(validate.errors)).toBe(
      true,
    );
    expect(parseUntrustedReport(JSON.stringify(report), 'report.json')).toEqual(report);
  });

  /** The parsed JSON of an uploaded report, as an attacker may change it. */
  interface Uploaded {
    candidates: { name: string }[];
    confidenceSet: { members: string[] };
    spa: Record<string, unknown>;
    selection: Record<string, unknown>;
  }
  const mutate = (change: (r: Uploaded) => void): string => {
    const r = JSON.parse(JSON.stringify(sampleCandidatesReport())) as Uploaded;
    change(r);
    return JSON.stringify(r);
  };

  it.each([
    [
      'a name with markup',
      (r: Uploaded) => (r.candidates[0]!.name = '<img src=x>'),
      'candidates[0].name',
    ],
    ['a name that mentions', (r: Uploaded) => (r.confidenceSet.members[0] = '@team'), 'members[0]'],
    ['a p-value above 1', (r: Uploaded) => (r.spa.pValueUpper = 1.5), 'spa.pValueUpper'],
    ['an unknown hypothesis', (r: Uploaded) => (r.spa.hypothesis = 'all'), 'spa.hypothesis'],
    ['an unknown rule', (r: Uploaded) => (r.selection.rule = 'best'), 'selection.rule'],
    [
      'too many candidates',
      (r: Uploaded) => (r.candidates = Array.from({ length: 51 }, () => r.candidates[0]!)),
      '$.candidates',
    ],
  ])('refuses %s, naming the field', (_, change, where) => {
    expect(() => parseUntrustedReport(mutate(change), 'report.json')).toThrow(where);
  });

  it('renders the ranking table from what it read, lowest loss first, with the set and p-values', () => {
    const text = renderMarkdown(
      parseUntrustedReport(JSON.stringify(sampleCandidatesReport()), 'r'),
    );
    const rows = text.split('\n').filter((l) => /^\| [0-9–] \| /.test(l));
    expect(rows.map((l) => l.split(' | ')[1])).toEqual([
      'gbm-v2 (preferred)',
      'gbm-v3',
      'ensemble\\_1',
      'baseline (baseline)',
    ]);
    expect(rows[0]).toContain('| yes | &gt; 0.9999 | 0.0120 | pass |');
    expect(rows[2]).toContain('| no | 0.0040 | &gt; 0.9999 | fail |');
    expect(text).toContain('consistent 0.0120');
    expect(text).toContain('ensemble\\_1 (p 0.0040), baseline (p 0.0210), gbm-v3 (p 0.3100)');
  });
});
