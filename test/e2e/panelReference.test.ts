import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { expectClose } from '../helpers/tolerance.js';
import { root, runCli } from './cliHelpers.js';

// A panel from an open dataset (R datasets::Seatbelts: five monthly series, forecasts for
// h = 1..3 from every origin; written by test/reference/scripts/panel_reference.R), run end to
// end through the bundled CLI. Every check value comes from that script's R computation with the
// same definitions (sandwich::NeweyWest / bwNeweyWest, pnorm, pt, stats::p.adjust), named in the
// fixture's "source" field; tolerance 1e-6 relative.
const fixtures = path.join(root, 'test', 'reference', 'fixtures');
const fixture = JSON.parse(readFileSync(path.join(fixtures, 'panel_seatbelts.json'), 'utf8'));
const work = mkdtempSync(path.join(tmpdir(), 'skillgate-panel-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));
const TOL = 1e-6;

interface Expected {
  mean: number;
  lag: number;
  longRunVariance: number;
  statistic: number;
  pValue: number;
  smallSample: { statistic: number; pValue: number };
  ewc: { degreesOfFreedom: number; longRunVariance: number; statistic: number; pValue: number };
}

function run(loss: string, extra: string[]) {
  const out = path.join(work, `${loss}-${extra.join('_').replace(/[^a-z0-9_]/gi, '')}.json`);
  const r = runCli([
    'compare',
    '--baseline',
    path.join(fixtures, 'panel_seatbelts_baseline.csv'),
    '--candidate',
    path.join(fixtures, 'panel_seatbelts_candidate.csv'),
    '--loss',
    loss,
    '--resamples',
    '199',
    '--min-points',
    '1',
    '--json',
    out,
    ...extra,
  ]);
  expect(r.status === 0 || r.status === 1, r.stderr).toBe(true);
  return JSON.parse(readFileSync(out, 'utf8'));
}

function checkBartlett(
  c: { meanTestedDifferential: number; dieboldMariano: Record<string, unknown> },
  e: Expected,
  what: string,
) {
  const dm = c.dieboldMariano as {
    lag: number;
    longRunVariance: number;
    statistic: number;
    pValue: number;
    smallSample: { statistic: number; pValue: number };
  };
  expectClose(
    c.meanTestedDifferential,
    e.mean,
    { relative: TOL, absolute: TOL },
    `${what}: mean of d`,
  );
  expect(dm.lag, `${what}: lag`).toBe(e.lag);
  expectClose(
    dm.longRunVariance,
    e.longRunVariance,
    { relative: TOL, absolute: TOL },
    `${what}: long-run variance`,
  );
  expectClose(dm.statistic, e.statistic, { relative: TOL, absolute: TOL }, `${what}: statistic`);
  expectClose(dm.pValue, e.pValue, { relative: TOL, absolute: TOL }, `${what}: p`);
  expectClose(
    dm.smallSample.statistic,
    e.smallSample.statistic,
    { relative: TOL, absolute: TOL },
    `${what}: HLN statistic`,
  );
  expectClose(
    dm.smallSample.pValue,
    e.smallSample.pValue,
    { relative: TOL, absolute: TOL },
    `${what}: HLN p`,
  );
}

interface LossFixture {
  loss: string;
  overall: Expected & { n: number };
  byHorizon: (Expected & { horizon: number })[];
  bySeries: (Expected & { series: string })[];
  seriesAdjusted: {
    series: string[];
    source: string;
    ewc: { holm: number[]; bh: number[] };
  };
  scaled: { overall: Expected };
}
const cases = (fixture.losses as LossFixture[]).map((l) => [l.loss, l] as [string, LossFixture]);

describe.each(cases)('Seatbelts panel, %s loss, against R', (loss, expected) => {
  it('overall and per horizon (bartlett, automatic lag ≥ h − 1)', () => {
    const report = run(loss, ['--variance', 'bartlett']);
    const [overall, ...rest] = report.comparisons;
    expect(overall).toMatchObject({ horizon: 'all', series: 'all', n: expected.overall.n });
    checkBartlett(overall, expected.overall, `${loss} overall vs ${fixture.source}`);
    for (const h of expected.byHorizon) {
      const c = rest.find(
        (x: { horizon: unknown; series: unknown }) => x.horizon === h.horizon && x.series === 'all',
      );
      expect(c, `horizon ${h.horizon} comparison`).toBeDefined();
      checkBartlett(c, h, `${loss} horizon ${h.horizon}`);
    }
    for (const s of expected.bySeries) {
      const c = rest.find((x: { series: unknown }) => x.series === s.series);
      expect(c, `series ${s.series}`).toBeDefined();
      expectClose(
        c.dieboldMariano.statistic,
        s.statistic,
        { relative: TOL, absolute: TOL },
        `${loss} series ${s.series}: statistic`,
      );
      expectClose(
        c.dieboldMariano.pValue,
        s.pValue,
        { relative: TOL, absolute: TOL },
        `${loss} series ${s.series}: p`,
      );
    }
  });

  it('ewc, with Holm and Benjamini–Hochberg adjusted per-series p-values', () => {
    for (const method of ['holm', 'bh'] as const) {
      const report = run(loss, ['--adjust', method, '--variance', 'ewc']);
      const overall = report.comparisons[0];
      expect(overall.dieboldMariano.degreesOfFreedom).toBe(expected.overall.ewc.degreesOfFreedom);
      expectClose(
        overall.dieboldMariano.statistic,
        expected.overall.ewc.statistic,
        { relative: TOL, absolute: TOL },
        `${loss} ewc statistic`,
      );
      expectClose(
        overall.dieboldMariano.pValue,
        expected.overall.ewc.pValue,
        { relative: TOL, absolute: TOL },
        `${loss} ewc p`,
      );
      const adjusted = expected.seriesAdjusted.ewc[method] as number[];
      expected.seriesAdjusted.series.forEach((name: string, j: number) => {
        const c = report.comparisons.find((x: { series: unknown }) => x.series === name);
        expectClose(
          c.adjustedPValue,
          adjusted[j]!,
          { relative: TOL, absolute: TOL },
          `${loss} ${method} ${name} vs ${expected.seriesAdjusted.source}`,
        );
      });
      expect(report.seriesSummary).toMatchObject({
        method,
        series: expected.seriesAdjusted.series.length,
      });
    }
  });

  it('scaled pooling (each series divided by its mean baseline loss)', () => {
    const report = run(loss, ['--variance', 'bartlett', '--pooling', 'scaled']);
    checkBartlett(report.comparisons[0], expected.scaled.overall, `${loss} scaled overall`);
  });
});
