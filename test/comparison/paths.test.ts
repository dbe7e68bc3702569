import { readFileSync } from 'node:fs';
import path from 'node:path';
import { Ajv } from 'ajv';
import { describe, expect, it } from 'vitest';
import { alignPanel } from '../../src/alignment/alignPanel.js';
import { evaluatePanel } from '../../src/comparison/evaluatePanel.js';
import { parseForecastText } from '../../src/reading/forecastTableReader.js';
import { resolveSettings } from '../../src/settings/resolveSettings.js';

// Backtest paths (issue 6, item 5): three complete out-of-sample paths over the same 60 time
// points, two series, two horizons (invented numbers; the checks are exact identities).
const root = path.resolve(import.meta.dirname, '..', '..');
const schema = JSON.parse(readFileSync(path.join(root, 'docs', 'report.schema.json'), 'utf8'));
const HASH = `sha256:${'0'.repeat(64)}`;
const validate = new Ajv({ allErrors: true, strict: false }).compile(schema);

function files(worseOn: ReadonlySet<string>) {
  const header = 'series,timestamp,horizon,path,actual,prediction';
  const b = [header];
  const c = [header];
  for (const p of ['A', 'B', 'C']) {
    for (const s of ['north', 'south']) {
      for (let t = 1; t <= 60; t++) {
        for (const h of [1, 2]) {
          const y = 50 + 10 * Math.sin(t / 5) + (s === 'north' ? 5 : 0);
          const e = Math.sin(1.3 * t + 2.1 * h + p.charCodeAt(0)) * h;
          const scale = worseOn.has(p) ? 1.4 : 0.95;
          b.push(`${s},${t},${h},${p},${y},${y + e}`);
          c.push(`${s},${t},${h},${p},${y},${y + scale * e * (1 + 0.2 * Math.cos(t))}`);
        }
      }
    }
  }
  return { baseline: `${b.join('\n')}\n`, candidate: `${c.join('\n')}\n` };
}

function evaluate(text: { baseline: string; candidate: string }) {
  const panel = alignPanel({
    baseline: parseForecastText(text.baseline, 'b.csv', { role: 'baseline' }, HASH),
    candidate: parseForecastText(text.candidate, 'c.csv', { role: 'candidate' }, HASH),
  });
  const settings = resolveSettings(
    { baseline: 'b.csv', candidate: 'c.csv', resamples: '199' },
    (n) => `--${n}`,
  );
  return evaluatePanel(panel, settings);
}

describe('backtest paths', () => {
  const report = evaluate(files(new Set(['A', 'C'])));

  it('reports each path and the share of paths on which the candidate is worse', () => {
    expect(report.pathSummary).toMatchObject({ paths: 3, worse: 2 });
    expect(report.pathSummary!.shareWorse).toBeCloseTo(2 / 3, 15);
    const perPath = report.comparisons.filter((c) => c.path !== undefined);
    expect(perPath.map((c) => c.path)).toEqual(['A', 'B', 'C']);
    expect(perPath.map((c) => c.meanDifference > 0)).toEqual([true, false, true]);
  });

  it('tests the path-averaged differential (equal rows per path: the mean of the path means)', () => {
    const overall = report.comparisons[0]!;
    const perPath = report.comparisons.filter((c) => c.path !== undefined);
    const average = perPath.reduce((s, c) => s + c.meanDifference, 0) / perPath.length;
    expect(Math.abs(overall.meanDifference - average)).toBeLessThan(1e-12);
    expect(overall.n).toBe(60);
    expect(overall.rows).toBe(3 * 2 * 60 * 2);
  });

  it('keeps the report valid against the schema, with horizons, series and paths', () => {
    const json = JSON.parse(JSON.stringify(report));
    expect(validate(json), JSON.stringify(validate.errors)).toBe(true);
    expect(report.comparisons.filter((c) => c.horizon !== 'all').length).toBe(2);
    expect(report.seriesSummary?.series).toBe(2);
  });
});
