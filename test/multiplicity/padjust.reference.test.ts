/**
 * Holm and Benjamini–Hochberg adjusted p-values against R's stats::p.adjust and statsmodels'
 * multipletests on the families in test/reference/fixtures/multiplicity_padjust*.json (written by
 * test/reference/scripts/multiplicity_padjust.{R,py}; each fixture names its source).
 *
 * Tolerance: 1e-15 relative to max(1e-300, |expected|) — R forms (m / j)·p and (m − j + 1)·p as
 * this code does, and statsmodels divides p by j / m, which differs by at most a few ulps.
 */
import { describe, expect, it } from 'vitest';
import { benjaminiHochbergAdjust } from '../../src/multiplicity/benjaminiHochbergAdjust.js';
import { holmAdjust } from '../../src/multiplicity/holmAdjust.js';
import { loadAdjustmentFixture } from './fixtures.js';

const RELATIVE = 1e-15;

const fixtures = [
  loadAdjustmentFixture('multiplicity_padjust.json'),
  loadAdjustmentFixture('multiplicity_padjust_statsmodels.json'),
];

function expectAdjusted(
  actual: (number | null)[],
  expected: (number | null)[],
  input: (number | null)[],
  where: string,
): void {
  expect(actual.length, where).toBe(expected.length);
  expected.forEach((e, i) => {
    const a = actual[i];
    const context = `${where}, position ${i + 1}: input ${JSON.stringify(input)}, expected ${e}, got ${a}`;
    if (e === null) {
      expect(a, context).toBeNull();
      return;
    }
    if (a === null || a === undefined) expect.fail(context);
    const diff = Math.abs(a - e);
    if (!(diff <= RELATIVE * Math.max(1e-300, Math.abs(e)))) {
      expect.fail(`${context}, difference ${diff} > ${RELATIVE} relative`);
    }
  });
}

describe('the fixtures are present', () => {
  it('has the R and the statsmodels families, with ties, nulls, p = 1 and tiny p', () => {
    expect(fixtures.map((f) => f.generator)).toEqual([
      'test/reference/scripts/multiplicity_padjust.R',
      'test/reference/scripts/multiplicity_padjust.py',
    ]);
    const all = fixtures[0]!.cases.flatMap((c) => c.p);
    expect(all).toContain(null);
    expect(all).toContain(1);
    expect(all.some((p) => p !== null && p > 0 && p < 1e-100)).toBe(true);
    expect(fixtures[0]!.cases.length).toBeGreaterThanOrEqual(8);
    expect(fixtures[1]!.cases.map((c) => c.name)).toEqual(fixtures[0]!.cases.map((c) => c.name));
  });
});

describe.each(fixtures)('$generator', (fixture) => {
  describe.each(fixture.cases)('$name', (c) => {
    it('Holm (1979)', () => {
      expectAdjusted(holmAdjust(c.p), c.holm, c.p, `${c.name} holm vs ${fixture.source}`);
    });
    it('Benjamini & Hochberg (1995)', () => {
      expectAdjusted(benjaminiHochbergAdjust(c.p), c.bh, c.p, `${c.name} BH vs ${fixture.source}`);
    });
  });
});
