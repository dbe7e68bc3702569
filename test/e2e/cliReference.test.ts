import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { expectClose } from '../helpers/tolerance.js';
import { root, runCli } from './cliHelpers.js';

// End to end through the bundled CLI: the forecast CSVs that test/reference/scripts/
// dm_reference.R and dm_reference.py write from open datasets (R datasets, statsmodels datasets)
// are compared, and the report's Diebold–Mariano numbers must agree with R sandwich /
// statsmodels (as recorded in each fixture's "source" fields) to 1e-6 relative.
const fixtures = path.join(root, 'test', 'reference', 'fixtures');
const cases = readdirSync(fixtures)
  .filter((f) => /^dm_.*_baseline\.csv$/.test(f))
  .map((f) => f.replace(/_baseline\.csv$/, ''));
const work = mkdtempSync(path.join(tmpdir(), 'skillgate-ref-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));

interface HacEntry {
  estimator: string;
  lagRule: string;
  lag: number;
  longRunVariance: number;
  statistic: number;
  pValue: number;
  pValueTwoSided: number;
  smallSample: { statistic: number; pValue: number };
  source: string;
}

function run(name: string, fixture: { loss: string; margin: number }, extra: string[]) {
  const out = path.join(work, `${name}.json`);
  const r = runCli([
    'compare',
    '--baseline',
    path.join(fixtures, `${name}_baseline.csv`),
    '--candidate',
    path.join(fixtures, `${name}_candidate.csv`),
    '--loss',
    fixture.loss,
    '--margin',
    String(fixture.margin),
    '--margin-kind',
    'absolute',
    '--resamples',
    '199',
    '--min-points',
    '1',
    '--json',
    out,
    ...extra,
  ]);
  expect(r.status === 0 || r.status === 1, r.stderr).toBe(true);
  return JSON.parse(readFileSync(out, 'utf8')).comparisons[0];
}

/** 1e-6 of the reference value, or 1e-6 absolute near 0 (the rule of test/helpers/tolerance.ts). */
const WITHIN_1E6 = { relative: 1e-6, absolute: 1e-6 };

describe('CLI against R sandwich and statsmodels on open datasets', () => {
  expect(cases.length).toBeGreaterThanOrEqual(8);
  for (const name of cases) {
    const fixture = JSON.parse(readFileSync(path.join(fixtures, `${name}.json`), 'utf8'));
    it(`${name}: bartlett with the automatic lag (${fixture.dataset})`, () => {
      const hac = (fixture.hac as HacEntry[]).find(
        (h) => h.estimator === 'bartlett' && h.lagRule === 'auto',
      );
      expect(hac, 'fixture has a bartlett/auto entry').toBeDefined();
      const c = run(name, fixture, ['--variance', 'bartlett', '--lag', 'auto']);
      const dm = c.dieboldMariano;
      const what = `${name} vs ${hac!.source}`;
      expect(dm.lag).toBe(hac!.lag);
      expectClose(c.meanTestedDifferential, fixture.mean, WITHIN_1E6, `${what}: mean of d`);
      expectClose(
        dm.longRunVariance,
        hac!.longRunVariance,
        WITHIN_1E6,
        `${what}: long-run variance`,
      );
      expectClose(dm.statistic, hac!.statistic, WITHIN_1E6, `${what}: statistic`);
      expectClose(dm.pValue, hac!.pValue, WITHIN_1E6, `${what}: one-sided p`);
      expectClose(dm.pValueTwoSided, hac!.pValueTwoSided, WITHIN_1E6, `${what}: two-sided p`);
      expectClose(
        dm.smallSample.statistic,
        hac!.smallSample.statistic,
        WITHIN_1E6,
        `${what}: HLN statistic`,
      );
      expectClose(dm.smallSample.pValue, hac!.smallSample.pValue, WITHIN_1E6, `${what}: HLN p`);
    });
    it(`${name}: the default is ewc-ar1`, () => {
      expect(run(name, fixture, []).dieboldMariano.estimator).toBe('ewc-ar1');
    });
    it(`${name}: ewc against the published formula evaluated in R/Python`, () => {
      const c = run(name, fixture, ['--variance', 'ewc']);
      const dm = c.dieboldMariano;
      const what = `${name} vs ${fixture.ewc.source}`;
      expect(dm.estimator).toBe('ewc');
      expect(dm.degreesOfFreedom).toBe(fixture.ewc.degreesOfFreedom);
      expectClose(
        dm.longRunVariance,
        fixture.ewc.longRunVariance,
        WITHIN_1E6,
        `${what}: long-run variance`,
      );
      expectClose(dm.statistic, fixture.ewc.statistic, WITHIN_1E6, `${what}: statistic`);
      expectClose(dm.pValue, fixture.ewc.pValue, WITHIN_1E6, `${what}: p`);
    });
  }
});
