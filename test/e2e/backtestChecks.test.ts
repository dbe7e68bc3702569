import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { Ajv } from 'ajv';
import { afterAll, describe, expect, it } from 'vitest';
import { demo, demoColumns, root, runCli } from './cliHelpers.js';

// A planted and a clean case for every backtest check, through the bundled CLI. The files are
// the invented demo backtest (examples/data) with a path column (two folds split at 1 July 2026),
// altered one defect at a time.

const work = mkdtempSync(path.join(tmpdir(), 'skillgate-checks-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));
const schema = JSON.parse(readFileSync(path.join(root, 'docs', 'report.schema.json'), 'utf8'));
const validate = new Ajv({ allErrors: true, strict: false }).compile(schema);

interface Row {
  zone: string;
  target: string;
  horizon: number;
  issued: string;
  observed: string;
  forecast: string;
  path: string;
}
const read = (file: string): Row[] =>
  readFileSync(demo(file), 'utf8')
    .trim()
    .split('\n')
    .slice(1)
    .map((line) => {
      const [zone, target, horizon, issued, observed, forecast] = line.split(',');
      return {
        zone: zone!,
        target: target!,
        horizon: Number(horizon),
        issued: issued!,
        observed: observed!,
        forecast: forecast!,
        path: target! < '2026-07-01' ? '1' : '2',
      };
    });
const baseRows = read('baseline.csv');
const candRows = read('candidate.csv');
let files = 0;
const write = (rows: readonly Row[]): string => {
  const p = path.join(work, `f${files++}.csv`);
  const lines = rows.map(
    (r) => `${r.zone},${r.target},${r.horizon},${r.issued},${r.observed},${r.forecast},${r.path}`,
  );
  writeFileSync(p, `zone,target_date,horizon,issued,observed,forecast,path\n${lines.join('\n')}\n`);
  return p;
};
const writeText = (text: string): string => {
  const p = path.join(work, `f${files++}.csv`);
  writeFileSync(p, text);
  return p;
};

// Largest horizon H = 3 days. Fold 1 tests March–June and trains before (ending more than 3 days
// before its test window) and after it (from 3 days after: clean with an embargo of 2); fold 2
// tests July–October and trains before.
const layout = (fold2TrainEnd = '2026-06-27', fold2TestEnd = '2026-10-29') =>
  writeText(
    [
      'fold,role,start,end',
      '1,train,2025-01-01,2026-02-28',
      '1,test,2026-03-04,2026-06-30',
      '1,train,2026-07-03,2026-10-29',
      `2,train,2025-01-01,${fold2TrainEnd}`,
      `2,test,2026-07-01,${fold2TestEnd}`,
    ].join('\n'),
  );
const cleanLayout = layout();

interface Check {
  id: string;
  status: 'ok' | 'warn' | 'fail';
  count: number;
  examples: string[];
}
interface Run {
  status: number | null;
  report: {
    verdict: string;
    reasons: string[];
    integrity: { outcome: string; checks: Check[]; notRun: { id: string }[] };
  };
  markdown: string;
  check: (id: string) => Check;
}
const compare = (
  baseline: readonly Row[],
  candidate: readonly Row[],
  extra: string[] = [],
  folds: string | null = cleanLayout,
): Run => {
  const json = path.join(work, `r${files}.json`);
  const md = path.join(work, `r${files}.md`);
  const r = runCli([
    'compare',
    '--baseline',
    write(baseline),
    '--candidate',
    write(candidate),
    '--columns',
    demoColumns,
    '--resamples',
    '99',
    '--embargo',
    '2',
    ...(folds === null ? [] : ['--folds', folds]),
    '--json',
    json,
    '--markdown',
    md,
    ...extra,
  ]);
  expect(r.stderr).toBe('');
  const report = JSON.parse(readFileSync(json, 'utf8'));
  expect(validate(report), JSON.stringify(validate.errors)).toBe(true);
  return {
    status: r.status,
    report,
    markdown: readFileSync(md, 'utf8'),
    check: (id) => {
      const found = report.integrity.checks.find((c: Check) => c.id === id);
      if (found === undefined) throw new Error(`check ${id} did not run`);
      return found;
    },
  };
};
const ALL = [
  'look-ahead',
  'horizon-steps',
  'origin-after-actuals',
  'origin-sets',
  'path-sets',
  'horizon-sets',
  'time-spans',
  'series-coverage',
  'fold-purge',
  'outside-test-window',
  'exact-predictions',
];
const tweak = (rows: readonly Row[], pick: (r: Row, i: number) => boolean, change: Partial<Row>) =>
  rows.map((r, i) => (pick(r, i) ? { ...r, ...change } : r));

describe('backtest checks through dist/cli.js', () => {
  it('clean: every check runs and is ok on the demo backtest with its fold layout', () => {
    const run = compare(baseRows, candRows);
    expect(run.report.integrity.checks.map((c) => c.id)).toEqual(ALL);
    expect(run.report.integrity.checks.every((c) => c.status === 'ok' && c.count === 0)).toBe(true);
    expect(run.report.integrity.notRun).toEqual([]);
    expect(run.report.integrity.outcome).toBe('ok');
    expect(run.report.verdict).toBe('pass');
    expect(run.status).toBe(0);
    expect(run.markdown).toMatch(/\*\*Backtest checks\*\*: ok\. Steps of 1d \(inferred\)\./);
    expect(run.markdown).toMatch(/^- ok · look-ahead \(origin at or after the timestamp\): 0$/m);
  });

  it('look-ahead: a candidate forecast issued on its target date fails the gate', () => {
    const peeks = (r: Row) => r.zone === 'old-town' && r.horizon === 1 && r.target >= '2026-09-01';
    const peeked = candRows.map((r) => (peeks(r) ? { ...r, issued: r.target } : r));
    const run = compare(baseRows, peeked, ['--allow-missing']);
    const c = run.check('look-ahead');
    expect(c).toMatchObject({ status: 'fail', count: 59 });
    expect(c.examples[0]).toBe(
      `candidate line ${lineOf(peeked, peeks)}: series=old-town timestamp=2026-09-01 horizon=1 origin=2026-09-01 path=2`,
    );
    expect(run.report.integrity.outcome).toBe('fail');
    expect(run.report.verdict).toBe('fail');
    expect(run.status).toBe(1);
    expect(run.report.reasons.join(' ')).toMatch(/A backtest check failed \(look-ahead\)/);
    expect(run.markdown).toMatch(
      /^- fail · look-ahead \(origin at or after the timestamp\): 59, e\.g\. candidate line \d+: series=old-town/m,
    );
  });

  it('look-ahead under --backtest-checks warn and report', () => {
    const peeked = candRows.map((r, i) =>
      i < 3 && r.horizon === 1 ? { ...r, issued: r.target } : r,
    );
    const warn = compare(baseRows, peeked, ['--allow-missing', '--backtest-checks', 'warn']);
    expect(warn.check('look-ahead').status).toBe('warn');
    expect(warn.report.verdict).toBe('warn');
    expect(warn.status).toBe(0);
    const report = compare(baseRows, peeked, ['--allow-missing', '--backtest-checks', 'report']);
    expect(report.check('look-ahead')).toMatchObject({ status: 'warn', count: 3 });
    expect(report.report.verdict).toBe('pass');
  });

  it('horizon-steps: a row labelled horizon 2 but issued one day before its target', () => {
    const mislabel = (rows: readonly Row[]) =>
      tweak(rows, (r) => r.zone === 'harbourside' && r.horizon === 1 && r.target < '2026-03-11', {
        horizon: 2,
      });
    const run = compare(mislabel(baseRows), mislabel(candRows));
    const c = run.check('horizon-steps');
    expect(c).toMatchObject({ status: 'warn', count: 14 });
    expect(c.examples[0]).toMatch(
      /^baseline line \d+: series=harbourside timestamp=2026-03-04 horizon=2 origin=2026-03-03 path=1 \(1 step of 1d\)$/,
    );
    expect(run.report.verdict).toBe('warn');
    expect(run.status).toBe(0);
  });

  it('origin-after-actuals: rows issued after the last actual of the actuals file', () => {
    const actuals = writeText(
      `zone,target_date,observed\n${[...new Map(baseRows.map((r) => [`${r.zone},${r.target}`, r.observed])).entries()].map(([k, v]) => `${k},${v}`).join('\n')}\n`,
    );
    const late: Row = {
      ...baseRows[0]!,
      target: '2026-11-02',
      horizon: 3,
      issued: '2026-10-30',
      path: '2',
    };
    const clean = compare(baseRows, candRows, ['--actuals', actuals]);
    expect(clean.check('origin-after-actuals')).toMatchObject({ status: 'ok', count: 0 });
    const run = compare([...baseRows, late], [...candRows, late], ['--actuals', actuals]);
    const c = run.check('origin-after-actuals');
    expect(c).toMatchObject({ status: 'warn', count: 2 });
    expect(c.examples[0]).toMatch(/^baseline line 2882: .*origin=2026-10-30/);
  });

  it('origin-sets: the candidate skips every forecast issued on one day', () => {
    const run = compare(
      baseRows,
      candRows.filter((r) => r.issued !== '2026-05-01'),
      ['--allow-missing'],
    );
    expect(run.check('origin-sets')).toMatchObject({
      status: 'warn',
      count: 1,
      examples: ['origin=2026-05-01 only in the baseline'],
    });
  });

  it('path-sets: the candidate labels its second fold otherwise', () => {
    const run = compare(
      baseRows,
      tweak(candRows, (r) => r.path === '2', { path: '3' }),
      ['--allow-missing'],
    );
    expect(run.check('path-sets')).toMatchObject({
      status: 'warn',
      count: 2,
      examples: ['path=2 only in the baseline', 'path=3 only in the candidate'],
    });
  });

  it('horizon-sets: the candidate leaves out horizon 3', () => {
    const run = compare(
      baseRows,
      candRows.filter((r) => r.horizon !== 3),
      ['--allow-missing'],
    );
    expect(run.check('horizon-sets')).toMatchObject({
      status: 'warn',
      count: 1,
      examples: ['horizon=3 only in the baseline'],
    });
  });

  it('time-spans: the candidate starts ten days later', () => {
    const run = compare(
      baseRows,
      candRows.filter((r) => r.target >= '2026-03-14'),
      ['--allow-missing'],
    );
    const c = run.check('time-spans');
    expect(c).toMatchObject({ status: 'warn', count: 10 });
    expect(c.examples[0]).toBe(
      "timestamp=2026-03-04 in the baseline, outside the candidate's span",
    );
  });

  it('series-coverage: the candidate leaves out a zone', () => {
    const run = compare(
      baseRows,
      candRows.filter((r) => r.zone !== 'east-meadows'),
      ['--allow-missing'],
    );
    expect(run.check('series-coverage')).toMatchObject({
      status: 'warn',
      count: 1,
      examples: ['series=east-meadows only in the baseline'],
    });
  });

  it('fold-purge: training that reaches into the purge window or the embargo', () => {
    // Fold 2 trains up to 28 June: 3 days (the largest horizon) before its test window.
    const purge = compare(baseRows, candRows, [], layout('2026-06-28'));
    expect(purge.check('fold-purge')).toMatchObject({ status: 'warn', count: 1 });
    expect(purge.check('fold-purge').examples[0]).toBe(
      'fold 2: train 2025-01-01 to 2026-06-28 (line 5) touches test 2026-07-01 to 2026-10-29 (line 6)',
    );
    // Fold 1 trains again from 3 July, 3 days after its test window: inside an embargo of 3.
    const embargo = compare(baseRows, candRows, ['--embargo', '3']);
    expect(embargo.check('fold-purge')).toMatchObject({ status: 'warn', count: 1 });
    expect(embargo.check('fold-purge').examples[0]).toMatch(
      /^fold 1: train 2026-07-03 to 2026-10-29/,
    );
    expect(embargo.report.verdict).toBe('warn');
  });

  it('outside-test-window: rows scored after their fold test window ended fail the gate', () => {
    const run = compare(baseRows, candRows, [], layout('2026-06-27', '2026-10-19'));
    const c = run.check('outside-test-window');
    // 10 days (20–29 October) × 4 zones × 3 horizons.
    expect(c).toMatchObject({ status: 'fail', count: 120 });
    expect(c.examples[0]).toMatch(/timestamp=2026-10-2\d .*path=2$/);
    expect(run.report.verdict).toBe('fail');
    expect(run.status).toBe(1);
  });

  it('exact-predictions: a candidate that repeats the observed value on one row in eight', () => {
    const leaky = candRows.map((r, i) => (i % 8 === 0 ? { ...r, forecast: r.observed } : r));
    const run = compare(baseRows, leaky);
    const c = run.check('exact-predictions');
    expect(c).toMatchObject({ status: 'warn', count: 360 });
    expect(c.examples[0]).toMatch(/^candidate: series=/);
  });

  it('a fold layout with an unreadable date is an input error naming file and line', () => {
    const bad = writeText('fold,role,start,end\n1,test,2026-03-04,2026-13-01\n');
    const r = runCli([
      'compare',
      '--baseline',
      write(baseRows),
      '--candidate',
      write(candRows),
      '--columns',
      demoColumns,
      '--folds',
      bad,
    ]);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(new RegExp(`${path.basename(bad)}:2: .*end.*2026-13-01`));
  });

  it('a loss file has no rows to check: listed as not run; fold options with it are refused', () => {
    const losses = writeText(
      `timestamp,baseline_loss,candidate_loss\n${Array.from({ length: 40 }, (_, i) => `${i + 1},${1 + (i % 3)},${1 + (i % 4)}`).join('\n')}\n`,
    );
    const json = path.join(work, 'losses.json');
    const r = runCli(['compare', '--losses', losses, '--resamples', '99', '--json', json]);
    expect(r.stderr).toBe('');
    const report = JSON.parse(readFileSync(json, 'utf8'));
    expect(validate(report), JSON.stringify(validate.errors)).toBe(true);
    expect(report.integrity.checks).toEqual([]);
    expect(report.integrity.notRun).toHaveLength(ALL.length);
    const refused = runCli(['compare', '--losses', losses, '--folds', cleanLayout]);
    expect(refused.status).toBe(2);
    expect(refused.stderr).toMatch(/need the forecast files/);
  });

  it('the peeking candidate of the demo is caught', () => {
    const json = path.join(work, 'peeking.json');
    const r = runCli([
      'compare',
      '--baseline',
      demo('baseline.csv'),
      '--candidate',
      demo('candidate-peeking.csv'),
      '--columns',
      demoColumns,
      '--resamples',
      '99',
      '--allow-missing',
      '--json',
      json,
    ]);
    expect(r.status).toBe(1);
    const report = JSON.parse(readFileSync(json, 'utf8'));
    expect(report.integrity.checks.find((c: Check) => c.id === 'look-ahead')).toMatchObject({
      status: 'fail',
      count: 960,
    });
    expect(report.verdict).toBe('fail');
  });
});

/** The physical line (header = 1) of the first row matching `pick`. */
function lineOf(rows: readonly Row[], pick: (r: Row) => boolean): number {
  return rows.findIndex(pick) + 2;
}
