import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { Ajv } from 'ajv';
import { afterAll, describe, expect, it } from 'vitest';
import type { Report } from '../../src/report/reportModel.js';
import { root, runCli } from './cliHelpers.js';

// The bundled CLI on six rolling-origin forecasts of R's co2 (test/reference/scripts/
// candidates_co2_rolling.R): the long file with a model column, and the same models as files.
const work = mkdtempSync(path.join(tmpdir(), 'skillgate-candidates-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));
const longFile = path.join(root, 'test/reference/fixtures/candidates_co2_rolling.csv');
const schema = JSON.parse(readFileSync(path.join(root, 'docs', 'report.schema.json'), 'utf8'));
const validate = new Ajv({ allErrors: true, strict: false }).compile(schema);

const lines = readFileSync(longFile, 'utf8').trim().split('\n');
const byModel = new Map<string, string[]>();
for (const line of lines.slice(1)) {
  const [timestamp, model, actual, prediction] = line.split(',');
  if (!byModel.has(model!)) byModel.set(model!, ['timestamp,actual,prediction']);
  byModel.get(model!)!.push(`${timestamp},${actual},${prediction}`);
}
const fileOf = (model: string, keep = (_: number) => true) => {
  const p = path.join(work, `${model}.csv`);
  writeFileSync(
    p,
    `${byModel
      .get(model)!
      .filter((_, i) => keep(i))
      .join('\n')}\n`,
  );
  return p;
};
const common = ['--resamples', '999', '--seed', '7'];
const run = (args: string[]) => {
  const json = path.join(work, `r${Math.random().toString(36).slice(2)}.json`);
  const r = runCli(['compare', ...args, ...common, '--json', json]);
  return {
    ...r,
    report:
      r.status === 0 || r.status === 1 ? (JSON.parse(readFileSync(json, 'utf8')) as Report) : null,
  };
};

describe('several candidates from the CLI', () => {
  const long = run([
    '--candidate',
    longFile,
    '--model-column',
    'model',
    '--baseline-model',
    'naive',
  ]);

  it('reads the long file, ranks five candidates and writes a schema-valid report', () => {
    expect(long.status, long.stderr).toBe(0);
    const report = long.report!;
    expect(validate(report), JSON.stringify(validate.errors)).toBe(true);
    expect(report.candidates!.map((c) => c.name).sort()).toEqual(
      ['drift', 'mean', 'seasonal-drift', 'seasonal-naive', 'ses'].sort(),
    );
    expect(report.confidenceSet!.eliminationOrder).toHaveLength(6);
    expect(report.confidenceSet!.baseline.name).toBe('naive');
    const { pValueLower, pValueConsistent, pValueUpper } = report.spa!;
    expect(pValueLower).toBeLessThanOrEqual(pValueConsistent);
    expect(pValueConsistent).toBeLessThanOrEqual(pValueUpper);
    // The 'mean' forecast of a trending series is far worse than every other: out of the set.
    expect(report.candidates!.find((c) => c.name === 'mean')!.inConfidenceSet).toBe(false);
    expect(long.stdout).toContain('Model confidence set');
  });

  it('gives the same answers from separate NAME=FILE candidates, in any order', () => {
    const models = ['drift', 'mean', 'seasonal-drift', 'seasonal-naive', 'ses'];
    const files = Object.fromEntries(models.map((m) => [m, fileOf(m)]));
    const args = (order: string[]) => [
      '--baseline',
      fileOf('naive'),
      ...order.flatMap((m) => ['--candidate', `${m}=${files[m]}`]),
    ];
    const a = run(args(models));
    const b = run(args([...models].reverse()));
    expect(a.status, a.stderr).toBe(0);
    for (const r of [a.report!, b.report!]) {
      expect(r.spa).toEqual(long.report!.spa);
      expect(r.confidenceSet).toEqual(long.report!.confidenceSet);
      const byName = (x: Report) =>
        Object.fromEntries(x.candidates!.map((c) => [c.name, [c.mcsPValue, c.spaPValue, c.rank]]));
      expect(byName(r)).toEqual(byName(long.report!));
    }
  });

  it('every candidate comparison uses the one block length and seed of the joint tests', () => {
    const report = long.report!;
    for (const c of report.candidates!) {
      expect(c.comparison.bootstrap.expectedBlockLength).toBe(report.spa!.expectedBlockLength);
      expect(c.comparison.bootstrap.seed).toBe(7);
    }
  });

  it('the none-worse rule fails when some candidate is clearly worse', () => {
    const r = run([
      '--candidate',
      longFile,
      '--model-column',
      'model',
      '--baseline-model',
      'naive',
      '--selection-rule',
      'none-worse',
    ]);
    expect(r.status).toBe(1);
    expect(r.report!.spa!.hypothesis).toBe('none-worse');
    expect(r.report!.spa!.pValueConsistent).toBeLessThanOrEqual(0.05);
  });

  it('refuses candidates scored on different rows, naming the file (exit 2)', () => {
    const short = fileOf('ses', (i) => i !== 10);
    const r = run([
      '--baseline',
      fileOf('naive'),
      '--candidate',
      `a=${fileOf('drift')}`,
      '--candidate',
      `b=${short}`,
      '--allow-missing',
    ]);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain(short);
    expect(r.stderr).toContain('not scored on the same rows');
    expect(r.stderr).not.toContain('    at ');
  });

  it('refuses an unknown preferred candidate and a model name with markup (exit 2)', () => {
    const r = run([
      '--candidate',
      longFile,
      '--model-column',
      'model',
      '--baseline-model',
      'naive',
      '--preferred',
      'nope',
    ]);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain('nope');
    const bad = path.join(work, 'bad.csv');
    writeFileSync(bad, 'timestamp,model,actual,prediction\n1,a,1,1\n2,<b>,1,2\n');
    const s = run(['--candidate', bad, '--model-column', 'model', '--baseline-model', 'a']);
    expect(s.status).toBe(2);
    expect(s.stderr).toContain(`${bad}:3:`);
  });
});
