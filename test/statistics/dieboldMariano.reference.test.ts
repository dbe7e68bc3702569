/**
 * The Diebold–Mariano statistic, long-run variances, p-values, the Harvey–Leybourne–Newbold
 * statistic and the automatic lag against R `sandwich` and Python `statsmodels`, on loss
 * differentials of simple forecasts of open series (R's datasets package; statsmodels.datasets).
 * Each expected value carries its source (library and call) in the fixture, printed on failure;
 * fixtures: test/reference/fixtures/dm_*.json, written by test/reference/scripts/dm_reference.{R,py}.
 *
 * Tolerance: 1e-6 relative throughout (the two libraries agree with each other to ~1e-12).
 */
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { dieboldMariano } from '../../src/statistics/dieboldMariano.js';
import { type LagRule, neweyWestBandwidth, selectLag } from '../../src/statistics/neweyWestLag.js';
import { expectClose } from '../helpers/tolerance.js';
import { FIXTURES, loadDieboldMarianoReferences } from './referenceFixtures.js';

const RELATIVE = 1e-6;
const cases = loadDieboldMarianoReferences();

describe('reference fixtures are present', () => {
  it('has the R and the statsmodels cases', () => {
    const generators = new Set(cases.map((c) => c.ref.generator));
    expect(cases.length).toBeGreaterThanOrEqual(19);
    expect([...generators].sort()).toEqual([
      'test/reference/scripts/dm_reference.R',
      'test/reference/scripts/dm_reference.py',
    ]);
    expect(new Set(cases.map((c) => c.ref.horizon)).size).toBeGreaterThan(2); // h = 1 and h > 1
    expect(new Set(cases.map((c) => c.ref.loss))).toEqual(new Set(['squared', 'absolute']));
  });
});

describe.each(cases)('$file', ({ file, ref }) => {
  const d = Float64Array.from(ref.d);
  const h = ref.horizon;
  const where = `${file} (${ref.dataset}; ${ref.loss} loss, h = ${h}, n = ${ref.n}, margin ${ref.margin})`;

  const forecasts = (side: 'baseline' | 'candidate') =>
    join(FIXTURES, `dm_${ref.name.replace(/_statsmodels$/, '')}_${side}.csv`);
  it('the forecast CSVs reproduce d exactly (for end-to-end runs)', () => {
    const read = (side: 'baseline' | 'candidate') => {
      expect(existsSync(forecasts(side)), forecasts(side)).toBe(true);
      const lines = readFileSync(forecasts(side), 'utf8').trim().split('\n');
      expect(lines[0]).toBe('timestamp,horizon,actual,prediction');
      return lines.slice(1).map((line) => line.split(',').map(Number));
    };
    const base = read('baseline');
    const cand = read('candidate');
    const loss = (actual: number, prediction: number) =>
      ref.loss === 'squared'
        ? (prediction - actual) * (prediction - actual)
        : Math.abs(prediction - actual);
    const again = base.map((row, i) => {
      const [timestamp, horizon, actual, prediction] = row as [number, number, number, number];
      const other = cand[i]!;
      expect([timestamp, horizon, other[2]]).toEqual([i + 1, h, actual]);
      return loss(actual, other[3]!) - loss(actual, prediction);
    });
    expect(again).toEqual(ref.d);
  });

  it('automatic lag: pilot lag, s0, s1, bandwidth and lag', () => {
    const bw = neweyWestBandwidth(d);
    const source = `${where}\n  source: ${ref.autoLag.source}`;
    expect(bw.pilotLag, `pilot lag, ${source}`).toBe(ref.autoLag.pilotLag);
    expectClose(bw.s0, ref.autoLag.s0, { relative: RELATIVE }, `s0, ${source}`);
    expectClose(bw.s1, ref.autoLag.s1, { relative: RELATIVE }, `s1, ${source}`);
    expectClose(
      bw.bandwidth,
      ref.autoLag.bandwidth,
      { relative: RELATIVE },
      `bandwidth, ${source}`,
    );
    expect(selectLag(d, { kind: 'auto' }, h).lag, `lag, ${source}`).toBe(ref.autoLag.lag);
  });

  describe.each(ref.hac)('$estimator, lag rule $lagRule (lag $lag)', (entry) => {
    const source = `${where}, ${entry.estimator} lag ${entry.lag}\n  source: ${entry.source}`;
    const rules: LagRule[] = [{ kind: 'fixed', lag: entry.lag }];
    if (entry.lagRule !== 'fixed') rules.push({ kind: entry.lagRule });
    it.each(rules)('via lag rule %o', (lag) => {
      const result = dieboldMariano(d, {
        estimator: entry.estimator,
        lag,
        horizon: h,
        margin: ref.margin,
      });
      expect(result.state, source).toBe('ok');
      expect(result.lag, source).toBe(entry.lag);
      expect(result.estimator, source).toBe(entry.usedEstimator);
      expect(result.requestedEstimator).toBe(entry.estimator);
      expect(result.degreesOfFreedom).toBeNull();
      expectClose(result.mean, ref.mean, { relative: RELATIVE }, `mean, ${source}`);
      expectClose(
        result.longRunVariance,
        entry.longRunVariance,
        { relative: RELATIVE },
        `ω̂², ${source}`,
      );
      expectClose(result.variance, entry.variance, { relative: RELATIVE }, `ω̂²/n, ${source}`);
      expectClose(
        result.statistic,
        entry.statistic,
        { relative: RELATIVE },
        `DM statistic, ${source}`,
      );
      expectClose(
        result.pValue,
        entry.pValue,
        { relative: RELATIVE },
        `one-sided p-value, ${source}`,
      );
      expectClose(
        result.pValueTwoSided,
        entry.pValueTwoSided,
        { relative: RELATIVE },
        `two-sided p, ${source}`,
      );
      const small = result.smallSample;
      expect(small, source).not.toBeNull();
      expectClose(
        small?.statistic,
        entry.smallSample.statistic,
        { relative: RELATIVE },
        `HLN stat, ${source}`,
      );
      expectClose(
        small?.pValue,
        entry.smallSample.pValue,
        { relative: RELATIVE },
        `HLN p, ${source}`,
      );
      expectClose(
        small?.pValueTwoSided,
        entry.smallSample.pValueTwoSided,
        { relative: RELATIVE },
        `HLN two-sided p, ${source}`,
      );
      expect(small?.degreesOfFreedom).toBe(entry.smallSample.degreesOfFreedom);
      if (entry.usedEstimator !== entry.estimator) {
        expect(result.notes.join(' '), source).toMatch(/not positive.*same lag/);
      }
    });
  });

  it('ewc: ν, long-run variance, statistic and p-values', () => {
    const source = `${where}\n  source: ${ref.ewc.source}`;
    const result = dieboldMariano(d, {
      estimator: 'ewc',
      lag: { kind: 'auto' },
      horizon: h,
      margin: ref.margin,
    });
    expect(result.state).toBe('ok');
    expect(result.degreesOfFreedom, source).toBe(ref.ewc.degreesOfFreedom);
    expect(result.lag).toBeNull();
    expect(result.smallSample).toBeNull();
    expectClose(
      result.longRunVariance,
      ref.ewc.longRunVariance,
      { relative: RELATIVE },
      `ω̂², ${source}`,
    );
    expectClose(result.variance, ref.ewc.variance, { relative: RELATIVE }, `ω̂²/n, ${source}`);
    expectClose(
      result.statistic,
      ref.ewc.statistic,
      { relative: RELATIVE },
      `statistic, ${source}`,
    );
    expectClose(result.pValue, ref.ewc.pValue, { relative: RELATIVE }, `one-sided p, ${source}`);
    expectClose(
      result.pValueTwoSided,
      ref.ewc.pValueTwoSided,
      { relative: RELATIVE },
      `two-sided p, ${source}`,
    );
  });
});
