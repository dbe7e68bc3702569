import { readdirSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { alignPanel } from '../../src/alignment/alignPanel.js';
import { checkBacktest } from '../../src/integrity/checkBacktest.js';
import { parseColumnMapping } from '../../src/reading/columnMapping.js';
import { readForecastFile } from '../../src/reading/readForecastFile.js';

const root = path.resolve(import.meta.dirname, '..', '..');
const fixtures = path.join(root, 'test', 'reference', 'fixtures');
const examples = path.join(root, 'examples', 'data');
const demoColumns = parseColumnMapping(
  'series=zone,timestamp=target_date,origin=issued,actual=observed,prediction=forecast',
  '--columns',
);

/** Every clean backtest in the repository: reference fixtures (R / statsmodels datasets) and the demo. */
const cases = [
  ...readdirSync(fixtures)
    .filter((f) => f.endsWith('_baseline.csv'))
    .map((f) => ({
      name: f.replace('_baseline.csv', ''),
      baseline: path.join(fixtures, f),
      candidate: path.join(fixtures, f.replace('_baseline.csv', '_candidate.csv')),
      columns: {},
    })),
  ...['candidate.csv', 'candidate-regressed.csv'].map((c) => ({
    name: `demo ${c}`,
    baseline: path.join(examples, 'baseline.csv'),
    candidate: path.join(examples, c),
    columns: demoColumns,
  })),
];

const checksOf = async (baseline: string, candidate: string, columns: object) => {
  const b = await readForecastFile(baseline, { role: 'baseline', columns, requireActual: true });
  const c = await readForecastFile(candidate, { role: 'candidate', columns, requireActual: true });
  const panel = alignPanel({ baseline: b, candidate: c });
  return checkBacktest(
    { panel, baseline: b, candidate: c },
    { frequency: 'auto', embargo: 0, mode: 'enforce' },
  );
};

describe('the backtest checks raise no false alarm on the clean backtests in the repository', () => {
  it('control: the same harness does raise the alarm on the demo candidate that peeks', async () => {
    const report = await checksOf(
      path.join(examples, 'baseline.csv'),
      path.join(examples, 'candidate-peeking.csv'),
      demoColumns,
    );
    expect(report.outcome).toBe('fail');
  });

  it('finds every reference fixture pair and the demo', () => {
    expect(cases.length).toBeGreaterThanOrEqual(14);
  });

  it.each(cases)('$name', async ({ baseline, candidate, columns }) => {
    const b = await readForecastFile(baseline, { role: 'baseline', columns, requireActual: true });
    const c = await readForecastFile(candidate, {
      role: 'candidate',
      columns,
      requireActual: true,
    });
    const panel = alignPanel({ baseline: b, candidate: c });
    const report = checkBacktest(
      { panel, baseline: b, candidate: c },
      { frequency: 'auto', embargo: 0, mode: 'enforce' },
    );
    const flagged = report.checks.filter((check) => check.status !== 'ok');
    expect(flagged).toEqual([]);
    expect(report.outcome).toBe('ok');
    // The like-for-like and exactness checks run on every pair; a frequency is found for each.
    const ran = report.checks.map((check) => check.id);
    expect(ran).toEqual(expect.arrayContaining(['time-spans', 'exact-predictions']));
    expect(report.frequency).not.toBeNull();
    if (b.origin !== null) {
      expect(ran).toEqual(expect.arrayContaining(['look-ahead', 'horizon-steps', 'origin-sets']));
    }
  });
});
