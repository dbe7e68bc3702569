import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import {
  type MeasuredInterval,
  measuredCoverage,
  WORST_COVERAGE,
} from '../../src/intervals/measuredCoverage.js';
import { COVERAGE_HEADING } from '../../validation/coverageSection.js';
import { COVERAGE_INTERVALS } from '../../validation/coverageStudy.js';
import { ROOT } from '../action/runBundle.js';

// The measured coverage the report prints must be the study's: the worst coverage over the
// designs at each n in docs/validation.md (written by `npm run validate`).
const text = readFileSync(join(ROOT, 'docs', 'validation.md'), 'utf8');
const section = text.slice(text.indexOf(COVERAGE_HEADING));
const columns: Record<MeasuredInterval, number> = {
  relativeChange: 0,
  dieboldMarianoDifference: 3,
  bootstrapDifference: 4,
};

describe('measured coverage', () => {
  it('matches the worst coverage per n in docs/validation.md', () => {
    expect(section.startsWith(COVERAGE_HEADING)).toBe(true);
    const header = `| design | n | ${COVERAGE_INTERVALS.join(' | ')} |`;
    const start = section.indexOf(header);
    expect(start).toBeGreaterThan(0);
    const table = section.slice(start).split('\n\n')[0]!;
    const rows = table
      .split('\n')
      .slice(2)
      .map((line) =>
        line
          .split('|')
          .slice(1, -1)
          .map((cell) => cell.trim()),
      );
    for (const [kind, column] of Object.entries(columns) as [MeasuredInterval, number][]) {
      const worst = new Map<number, number>();
      for (const cells of rows) {
        const n = Number(cells[1]);
        const value = Number(cells[2 + column]!.replace('%', '')) / 100;
        worst.set(n, Math.min(worst.get(n) ?? 1, value));
      }
      const expected = [...worst.entries()].sort((a, b) => a[0] - b[0]);
      const got = WORST_COVERAGE[kind].map(([n, c]) => [n, Number(c.toFixed(3))]);
      expect({ kind, got }).toEqual({
        kind,
        got: expected.map(([n, c]) => [n, Number(c.toFixed(3))]),
      });
    }
  });

  it('is shown only more than 2 points under the studied level, from the largest studied n ≤ n', () => {
    for (const kind of Object.keys(columns) as MeasuredInterval[]) {
      for (const [n, c] of WORST_COVERAGE[kind]) {
        const m = measuredCoverage(kind, n + 1, 0.9);
        expect(m === null).toBe(c >= 0.88);
        if (m !== null) expect(m).toEqual({ coverage: c, level: 0.9, studiedN: n });
      }
      expect(measuredCoverage(kind, 10, 0.8)).toBeNull();
    }
  });
});
