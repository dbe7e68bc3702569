/**
 * The pooled-panel reference (test/reference/fixtures/panel_seatbelts*.{csv,json}, written by
 * test/reference/scripts/panel_reference.R from R's datasets::Seatbelts; the fixture names its
 * sources): the forecast CSVs reproduce R's per-timestamp differentials; the project's
 * Diebold–Mariano core (Bartlett with the automatic lag, and ewc) reproduces R sandwich's values
 * overall, per horizon, per series and after scaling by each series' mean baseline loss; the
 * scales and the Holm / Benjamini–Hochberg adjustments of the per-series p-values match R.
 * panel_seatbelts_statsmodels.json (test/reference/scripts/panel_reference.py) repeats the
 * Bartlett variances, statistics and adjustments with statsmodels, from d recomputed in numpy.
 *
 * Tolerances: d_t to 1e-13 of the mean row loss at t (R's mean accumulates in long double);
 * statistics, variances and p-values 1e-10 relative (measured agreement: within 1e-14 for statistics and
 * variances, up to 1.6e-12 for p-values near 1e-83, whose tails amplify the last bits of the
 * statistic); the lag exactly; adjusted p-values 1e-12 relative.
 */
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { absoluteError } from '../../src/losses/absoluteError.js';
import { squaredError } from '../../src/losses/squaredError.js';
import { benjaminiHochbergAdjust } from '../../src/multiplicity/benjaminiHochbergAdjust.js';
import { holmAdjust } from '../../src/multiplicity/holmAdjust.js';
import { baselineMeanLossScale } from '../../src/scaling/baselineMeanLossScale.js';
import { scaleLossesBySeries } from '../../src/scaling/scaleLossesBySeries.js';
import { dieboldMariano } from '../../src/statistics/dieboldMariano.js';

const FIXTURES = join(dirname(fileURLToPath(import.meta.url)), '..', 'reference', 'fixtures');

interface Stats {
  n: number;
  maxHorizon: number;
  timestamps: [number, number];
  d: number[];
  mean: number;
  bandwidth: number;
  lag: number;
  longRunVariance: number;
  variance: number;
  statistic: number;
  pValue: number;
  smallSample: { statistic: number; pValue: number; degreesOfFreedom: number };
  ewc: { degreesOfFreedom: number; longRunVariance: number; statistic: number; pValue: number };
}
interface Adjusted {
  raw: number[];
  holm: number[];
  bh: number[];
}
interface LossBlock {
  loss: 'squared' | 'absolute';
  meanBaselineLoss: number;
  meanCandidateLoss: number;
  overall: Stats;
  byHorizon: (Stats & { horizon: number })[];
  bySeries: (Stats & { series: string; meanBaselineLoss: number; meanCandidateLoss: number })[];
  seriesAdjusted: { series: string[]; bartlett: Adjusted; ewc: Adjusted; source: string };
  scaled: { scales: Record<string, number>; overall: Stats };
}
interface PanelFixture {
  generator: string;
  dataset: string;
  series: string[];
  horizons: number[];
  files: { baseline: string; candidate: string; rows: number };
  source: string;
  losses: LossBlock[];
}

const fixture = JSON.parse(
  readFileSync(join(FIXTURES, 'panel_seatbelts.json'), 'utf8'),
) as PanelFixture;

interface Rows {
  series: Int32Array;
  timestamp: Int32Array;
  horizon: Int32Array;
  actual: Float64Array;
  baseline: Float64Array;
  candidate: Float64Array;
}

function readRows(): Rows {
  const read = (file: string) => {
    const lines = readFileSync(join(FIXTURES, file), 'utf8').trim().split('\n');
    expect(lines[0]).toBe('series,timestamp,horizon,origin,actual,prediction');
    return lines.slice(1).map((line) => line.split(','));
  };
  const base = read(fixture.files.baseline);
  const cand = read(fixture.files.candidate);
  expect(base.length).toBe(fixture.files.rows);
  expect(cand.length).toBe(fixture.files.rows);
  const n = base.length;
  const rows: Rows = {
    series: new Int32Array(n),
    timestamp: new Int32Array(n),
    horizon: new Int32Array(n),
    actual: new Float64Array(n),
    baseline: new Float64Array(n),
    candidate: new Float64Array(n),
  };
  base.forEach((b, i) => {
    const c = cand[i]!;
    // Same key and actual on both sides, row by row (the script writes them in the same order).
    expect(c.slice(0, 5), `row ${i + 2}`).toEqual(b.slice(0, 5));
    rows.series[i] = fixture.series.indexOf(b[0]!);
    rows.timestamp[i] = Number(b[1]);
    rows.horizon[i] = Number(b[2]);
    rows.actual[i] = Number(b[4]);
    rows.baseline[i] = Number(b[5]);
    rows.candidate[i] = Number(c[5]);
  });
  expect(Math.min(...rows.series)).toBe(0);
  return rows;
}

/** Per-timestamp mean of d_i over the selected rows, ascending timestamps, with a rounding scale. */
function perTimestamp(
  rows: Rows,
  lb: Float64Array,
  lc: Float64Array,
  selected: (i: number) => boolean,
) {
  const groups = new Map<number, { sum: number; size: number; count: number; maxH: number }>();
  for (let i = 0; i < lb.length; i++) {
    if (!selected(i)) continue;
    const t = rows.timestamp[i]!;
    const g = groups.get(t) ?? { sum: 0, size: 0, count: 0, maxH: 0 };
    g.sum += lc[i]! - lb[i]!;
    g.size += Math.abs(lc[i]!) + Math.abs(lb[i]!);
    g.count++;
    g.maxH = Math.max(g.maxH, rows.horizon[i]!);
    groups.set(t, g);
  }
  const times = [...groups.keys()].sort((a, b) => a - b);
  return {
    times,
    d: Float64Array.from(times.map((t) => groups.get(t)!.sum / groups.get(t)!.count)),
    size: times.map((t) => groups.get(t)!.size / groups.get(t)!.count),
    maxHorizon: Math.max(...times.map((t) => groups.get(t)!.maxH)),
  };
}

function checkStats(
  where: string,
  series: ReturnType<typeof perTimestamp>,
  expected: Stats,
): { bartlett: number; ewc: number } {
  const context = `${where} (${fixture.dataset}; ${fixture.source})`;
  expect([series.times[0], series.times.at(-1)], context).toEqual(expected.timestamps);
  expect(series.d.length, context).toBe(expected.n);
  expect(series.maxHorizon, context).toBe(expected.maxHorizon);
  series.d.forEach((v, t) => {
    const e = expected.d[t]!;
    const diff = Math.abs(v - e);
    if (!(diff <= 1e-13 * Math.max(1, series.size[t]!))) {
      expect.fail(`${context}: d at timestamp ${series.times[t]}: expected ${e}, got ${v}`);
    }
  });
  const d = Float64Array.from(expected.d);
  const bartlett = dieboldMariano(d, {
    estimator: 'bartlett',
    lag: { kind: 'auto' },
    horizon: expected.maxHorizon,
    margin: 0,
  });
  expect(bartlett.state, context).toBe('ok');
  expect(bartlett.lag, `${context}: lag (bandwidth ${expected.bandwidth})`).toBe(expected.lag);
  const R = 1e-10;
  expectRelative(bartlett.mean, expected.mean, R, `${context}: mean`);
  expectRelative(bartlett.longRunVariance!, expected.longRunVariance, R, `${context}: ω̂²`);
  expectRelative(bartlett.statistic!, expected.statistic, R, `${context}: DM statistic`);
  expectRelative(bartlett.pValue!, expected.pValue, R, `${context}: one-sided p`);
  expectRelative(
    bartlett.smallSample!.statistic,
    expected.smallSample.statistic,
    R,
    `${context}: HLN statistic`,
  );
  expectRelative(bartlett.smallSample!.pValue, expected.smallSample.pValue, R, `${context}: HLN p`);
  expect(bartlett.smallSample!.degreesOfFreedom).toBe(expected.smallSample.degreesOfFreedom);
  const ewc = dieboldMariano(d, {
    estimator: 'ewc',
    lag: { kind: 'auto' },
    horizon: expected.maxHorizon,
    margin: 0,
  });
  expect(ewc.degreesOfFreedom, context).toBe(expected.ewc.degreesOfFreedom);
  expectRelative(ewc.longRunVariance!, expected.ewc.longRunVariance, R, `${context}: ewc ω̂²`);
  expectRelative(ewc.statistic!, expected.ewc.statistic, R, `${context}: ewc statistic`);
  expectRelative(ewc.pValue!, expected.ewc.pValue, R, `${context}: ewc p`);
  return { bartlett: bartlett.pValue!, ewc: ewc.pValue! };
}

/** |actual − expected| ≤ tol·|expected| (so an expected 0, e.g. an underflowed p-value, needs 0). */
function expectRelative(actual: number, expected: number, tol: number, what: string): void {
  const diff = Math.abs(actual - expected);
  if (!(diff <= tol * Math.abs(expected))) {
    expect.fail(
      `${what}: expected ${expected}, got ${actual}, relative difference ${diff / Math.abs(expected)} > ${tol}`,
    );
  }
}

function expectAdjusted(actual: (number | null)[], expected: number[], what: string): void {
  expect(actual.length, what).toBe(expected.length);
  expected.forEach((e, i) => {
    expectRelative(
      actual[i]!,
      e,
      1e-12,
      `${what}, series ${fixture.series[i]}: ${actual[i]} vs ${e}`,
    );
  });
}

const rows = readRows();
const lossFunctions = { squared: squaredError, absolute: absoluteError };

describe.each(fixture.losses)('$loss loss', (block) => {
  const f = lossFunctions[block.loss];
  const lb = rows.actual.map((y, i) => f(y, rows.baseline[i]!));
  const lc = rows.actual.map((y, i) => f(y, rows.candidate[i]!));

  it('overall: every row at each timestamp, largest horizon 3', () => {
    checkStats(
      'overall',
      perTimestamp(rows, lb, lc, () => true),
      block.overall,
    );
  });
  it.each(block.byHorizon)('horizon $horizon', (h) => {
    checkStats(
      `horizon ${h.horizon}`,
      perTimestamp(rows, lb, lc, (i) => rows.horizon[i] === h.horizon),
      h,
    );
  });
  it('per series, and the Holm / Benjamini–Hochberg adjustment of their p-values', () => {
    const p = block.bySeries.map((s) => {
      const k = fixture.series.indexOf(s.series);
      return checkStats(
        `series ${s.series}`,
        perTimestamp(rows, lb, lc, (i) => rows.series[i] === k),
        s,
      );
    });
    const adjusted = block.seriesAdjusted;
    expect(adjusted.series).toEqual(fixture.series);
    for (const [name, raw] of [
      ['bartlett', p.map((x) => x.bartlett)],
      ['ewc', p.map((x) => x.ewc)],
    ] as const) {
      const expected = adjusted[name];
      expectAdjusted(raw, expected.raw, `${name} raw p`);
      expectAdjusted(holmAdjust(raw), expected.holm, `${name} Holm (${adjusted.source})`);
      expectAdjusted(benjaminiHochbergAdjust(raw), expected.bh, `${name} BH (${adjusted.source})`);
    }
  });
  it('scaled by each series’ mean baseline loss, then pooled', () => {
    const scales = baselineMeanLossScale(fixture.series, rows.series, lb);
    for (const name of fixture.series) {
      const scale = scales.get(name)!;
      expect(scale.state).toBe('ok');
      expectRelative(scale.value!, block.scaled.scales[name]!, 1e-13, `scale of ${name}`);
    }
    const scaled = scaleLossesBySeries(fixture.series, rows.series, lb, lc, scales);
    if (scaled.state !== 'ok') return expect.fail(JSON.stringify(scaled));
    checkStats(
      'scaled overall',
      perTimestamp(rows, scaled.baseline, scaled.candidate, () => true),
      block.scaled.overall,
    );
  });
});

interface StatsmodelsStats {
  n: number;
  timestamps: [number, number];
  mean: number;
  lag: number;
  variance: number;
  longRunVariance: number;
  statistic: number;
  pValue: number;
}
interface StatsmodelsFixture {
  generator: string;
  source: string;
  losses: {
    loss: 'squared' | 'absolute';
    overall: StatsmodelsStats;
    byHorizon: (StatsmodelsStats & { horizon: number })[];
    bySeries: (StatsmodelsStats & { series: string; meanBaselineLoss: number })[];
    seriesAdjusted: { series: string[]; raw: number[]; holm: number[]; bh: number[] };
    scaled: { scales: Record<string, number>; overall: StatsmodelsStats };
  }[];
}
const statsmodels = JSON.parse(
  readFileSync(join(FIXTURES, 'panel_seatbelts_statsmodels.json'), 'utf8'),
) as StatsmodelsFixture;

function checkAgainstStatsmodels(
  where: string,
  series: ReturnType<typeof perTimestamp>,
  expected: StatsmodelsStats,
): void {
  const context = `${where} (${statsmodels.source})`;
  expect([series.times[0], series.times.at(-1)], context).toEqual(expected.timestamps);
  const result = dieboldMariano(series.d, {
    estimator: 'bartlett',
    lag: { kind: 'fixed', lag: expected.lag },
    horizon: series.maxHorizon,
    margin: 0,
  });
  expect(result.n, context).toBe(expected.n);
  const R = 1e-10;
  expectRelative(result.mean, expected.mean, R, `${context}: mean`);
  expectRelative(result.variance!, expected.variance, R, `${context}: variance of the mean`);
  expectRelative(result.statistic!, expected.statistic, R, `${context}: DM statistic`);
  expectRelative(result.pValue!, expected.pValue, R, `${context}: one-sided p`);
}

describe.each(statsmodels.losses)('against statsmodels: $loss loss', (block) => {
  const f = lossFunctions[block.loss];
  const lb = rows.actual.map((y, i) => f(y, rows.baseline[i]!));
  const lc = rows.actual.map((y, i) => f(y, rows.candidate[i]!));
  it('overall, per horizon, per series and scaled, at the lags R chose', () => {
    expect(statsmodels.generator).toBe('test/reference/scripts/panel_reference.py');
    checkAgainstStatsmodels(
      'overall',
      perTimestamp(rows, lb, lc, () => true),
      block.overall,
    );
    for (const h of block.byHorizon) {
      const selected = (i: number) => rows.horizon[i] === h.horizon;
      checkAgainstStatsmodels(`horizon ${h.horizon}`, perTimestamp(rows, lb, lc, selected), h);
    }
    for (const s of block.bySeries) {
      const k = fixture.series.indexOf(s.series);
      const selected = (i: number) => rows.series[i] === k;
      checkAgainstStatsmodels(`series ${s.series}`, perTimestamp(rows, lb, lc, selected), s);
    }
    const scales = baselineMeanLossScale(fixture.series, rows.series, lb);
    for (const [name, value] of Object.entries(block.scaled.scales)) {
      expectRelative(scales.get(name)!.value!, value, 1e-13, `scale of ${name}`);
    }
    const scaled = scaleLossesBySeries(fixture.series, rows.series, lb, lc, scales);
    if (scaled.state !== 'ok') return expect.fail(JSON.stringify(scaled));
    checkAgainstStatsmodels(
      'scaled overall',
      perTimestamp(rows, scaled.baseline, scaled.candidate, () => true),
      block.scaled.overall,
    );
  });
  it('Holm and Benjamini–Hochberg on the per-series p-values (multipletests)', () => {
    const { raw, holm, bh } = block.seriesAdjusted;
    expectAdjusted(holmAdjust(raw), holm, `Holm vs multipletests (${statsmodels.source})`);
    expectAdjusted(benjaminiHochbergAdjust(raw), bh, `BH vs multipletests (${statsmodels.source})`);
  });
});
