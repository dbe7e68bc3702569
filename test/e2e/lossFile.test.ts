import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { DuckDBInstance } from '@duckdb/node-api';
import { afterAll, describe, expect, it } from 'vitest';
import { expectClose } from '../helpers/tolerance.js';
import { demo, demoColumns, root, runCli } from './cliHelpers.js';

// The pre-aggregated mode: the SQL query of docs/large-backtests.md, run as written in DuckDB on
// the demo backtest, gives a loss file on which the CLI must reach the same statistics as on the
// rows themselves.
const work = mkdtempSync(path.join(tmpdir(), 'skillgate-losses-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));

function queryFromDocs(): string {
  const doc = readFileSync(path.join(root, 'docs', 'large-backtests.md'), 'utf8');
  const match = /```sql\n([\s\S]*?)```/.exec(doc);
  if (match === null) throw new Error('docs/large-backtests.md has no sql block');
  return match[1]!;
}

async function lossFileFromDuckDb(candidate: string): Promise<string> {
  const db = await DuckDBInstance.create(':memory:');
  const c = await db.connect();
  const view = (name: string, file: string) =>
    `CREATE VIEW ${name} AS SELECT zone AS series, target_date AS timestamp, horizon, issued AS origin, observed AS actual, forecast AS prediction FROM read_csv('${file}', header = true, types = {'target_date': 'VARCHAR', 'issued': 'VARCHAR'})`;
  await c.run(view('baseline', demo('baseline.csv')));
  await c.run(view('candidate', demo(candidate)));
  const out = path.join(work, `losses-${candidate}`);
  await c.run(`COPY (${queryFromDocs()}) TO '${out}' (HEADER, DELIMITER ',')`);
  c.closeSync();
  return out;
}

const json = (name: string) => path.join(work, `${name}.json`);

describe('--losses: a pre-aggregated loss file', () => {
  for (const candidate of ['candidate.csv', 'candidate-regressed.csv']) {
    it(`gives the row-level verdict and statistics (${candidate}, query from the docs in DuckDB)`, async () => {
      const losses = await lossFileFromDuckDb(candidate);
      const rows = runCli([
        'compare',
        '--baseline',
        demo('baseline.csv'),
        '--candidate',
        demo(candidate),
        '--columns',
        demoColumns,
        '--resamples',
        '999',
        '--json',
        json('rows'),
      ]);
      const agg = runCli([
        'compare',
        '--losses',
        losses,
        '--resamples',
        '999',
        '--json',
        json('agg'),
      ]);
      expect(agg.stderr).toBe('');
      expect(agg.status).toBe(rows.status);
      const a = JSON.parse(readFileSync(json('rows'), 'utf8')).comparisons[0];
      const b = JSON.parse(readFileSync(json('agg'), 'utf8')).comparisons[0];
      expect(b.n).toBe(a.n);
      expect(b.rows).toBe(a.rows);
      expect(b.dieboldMariano.degreesOfFreedom).toBe(a.dieboldMariano.degreesOfFreedom);
      for (const key of ['meanBaselineLoss', 'meanCandidateLoss', 'meanDifference'] as const) {
        expectClose(b[key], a[key], { relative: 1e-9, absolute: 1e-9 }, key);
      }
      expectClose(
        b.dieboldMariano.statistic,
        a.dieboldMariano.statistic,
        { relative: 1e-9, absolute: 1e-9 },
        'DM statistic',
      );
      expectClose(
        b.dieboldMariano.pValue,
        a.dieboldMariano.pValue,
        { relative: 1e-9, absolute: 1e-9 },
        'DM p-value',
      );
      expectClose(
        b.bootstrap.expectedBlockLength,
        a.bootstrap.expectedBlockLength,
        { relative: 1e-9, absolute: 1e-9 },
        'block length',
      );
      expectClose(
        b.bootstrap.interval.lower,
        a.bootstrap.interval.lower,
        { relative: 1e-9, absolute: 1e-9 },
        'bootstrap lower',
      );
      expect(b.verdict).toBe(a.verdict);
    });
  }

  it('refuses a differential that does not match the two losses, naming file, line and value', () => {
    const file = path.join(work, 'bad.csv');
    writeFileSync(
      file,
      'timestamp,baseline_loss,candidate_loss,differential\n1,1,2,1\n2,1,2,0.5\n',
    );
    const r = runCli(['compare', '--losses', file]);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/bad\.csv:3: .*differential.*"0\.5"/);
  });

  it('refuses --losses together with --baseline', () => {
    const r = runCli(['compare', '--losses', 'x.csv', '--baseline', 'y.csv']);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/--losses replaces/);
  });
});
