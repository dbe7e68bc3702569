import { describe, expect, it } from 'vitest';
import { alignPanel } from '../../src/alignment/alignPanel.js';
import { InputError } from '../../src/core/inputError.js';
import { checkBacktest } from '../../src/integrity/checkBacktest.js';
import type { CheckMode, IntegrityReport } from '../../src/integrity/checkResult.js';
import type { FoldLayout } from '../../src/integrity/foldLayout.js';
import { parseForecastText } from '../../src/reading/forecastTableReader.js';

const run = (
  baseline: string,
  candidate: string,
  options: { frequency?: string; mode?: CheckMode; folds?: FoldLayout; embargo?: number } = {},
): IntegrityReport => {
  const b = parseForecastText(baseline, 'b.csv', { role: 'baseline' });
  const c = parseForecastText(candidate, 'c.csv', { role: 'candidate' });
  const panel = alignPanel({ baseline: b, candidate: c });
  return checkBacktest(
    {
      panel,
      baseline: b,
      candidate: c,
      ...(options.folds === undefined ? {} : { folds: options.folds }),
    },
    {
      frequency: options.frequency ?? 'auto',
      embargo: options.embargo ?? 0,
      mode: options.mode ?? 'enforce',
    },
  );
};
const check = (report: IntegrityReport, id: string) => report.checks.find((c) => c.id === id);
const csv = (header: string, rows: string[]) => `${header}\n${rows.join('\n')}\n`;

/** Hourly rows over a DST change in local offsets (Central Europe, 2024-03-31), horizons 1–2. */
const dstRows = (shift = 0): string[] => {
  const stamps = [
    '2024-03-30T22:00+01:00',
    '2024-03-30T23:00+01:00',
    '2024-03-31T00:00+01:00',
    '2024-03-31T01:00+01:00',
    '2024-03-31T03:00+02:00',
    '2024-03-31T04:00+02:00',
    '2024-03-31T05:00+02:00',
  ];
  const rows: string[] = [];
  for (let i = 2; i < stamps.length; i++) {
    for (const h of [1, 2]) rows.push(`${stamps[i]},${h},${stamps[i - h]},${i},${i + 0.5 + shift}`);
  }
  return rows;
};

describe('row checks', () => {
  it('an hourly backtest across a DST change in local offsets is clean', () => {
    const header = 'timestamp,horizon,origin,actual,prediction';
    const r = run(csv(header, dstRows()), csv(header, dstRows(0.25)));
    expect(r.frequency).toEqual({ text: '1h', source: 'inferred' });
    expect(check(r, 'horizon-steps')).toMatchObject({ status: 'ok', count: 0 });
    expect(check(r, 'look-ahead')).toMatchObject({ status: 'ok', count: 0 });
  });

  it('counts calendar months for a monthly backtest, and flags a mislabelled horizon', () => {
    const header = 'timestamp,horizon,origin,actual,prediction';
    const months = ['2023-11-30', '2023-12-31', '2024-01-31', '2024-02-29', '2024-03-31'];
    const rows = (wrong: boolean) =>
      months.slice(1).map((t, i) => `${t},${wrong && i === 2 ? 2 : 1},${months[i]},${i},${i + 1}`);
    const clean = run(csv(header, rows(false)), csv(header, rows(false)));
    expect(clean.frequency?.text).toBe('1mo');
    expect(check(clean, 'horizon-steps')?.count).toBe(0);
    const planted = run(csv(header, rows(true)), csv(header, rows(true)));
    expect(check(planted, 'horizon-steps')).toMatchObject({ status: 'warn', count: 2 });
    expect(check(planted, 'horizon-steps')?.examples[0]).toBe(
      'baseline line 4: timestamp=2024-02-29 horizon=2 origin=2024-01-31 (1 step of 1mo)',
    );
  });

  it('a given --frequency overrides inference, and must fit the kind of timestamps', () => {
    const header = 'timestamp,horizon,origin,actual,prediction';
    const rows = ['3,2,1,1,1', '5,2,3,1,2', '7,2,5,1,1'];
    // Inferred step 2: horizon 2 is 1 step, so every row disagrees; with --frequency 1 none.
    expect(check(run(csv(header, rows), csv(header, rows)), 'horizon-steps')?.count).toBe(6);
    const given = run(csv(header, rows), csv(header, rows), { frequency: '1' });
    expect(given.frequency).toEqual({ text: '1', source: 'given' });
    expect(check(given, 'horizon-steps')?.count).toBe(0);
    expect(() => run(csv(header, rows), csv(header, rows), { frequency: '1h' })).toThrow(
      InputError,
    );
  });

  it('irregular timestamps leave the horizon check unrun, with the reason', () => {
    const header = 'timestamp,horizon,origin,actual,prediction';
    const rows = [
      '2024-01-01T01:00Z,1,2024-01-01T00:00Z,1,1',
      '2024-01-01T02:30Z,1,2024-01-01T01:00Z,1,2',
      '2024-01-01T03:30Z,1,2024-01-01T02:30Z,1,2',
    ];
    const r = run(csv(header, rows), csv(header, rows));
    expect(r.frequency).toBeNull();
    expect(r.notRun).toContainEqual({
      id: 'horizon-steps',
      reason:
        'no frequency: irregular timestamps: gaps of 1h and 90min (not a multiple of it); give --frequency',
    });
    expect(check(r, 'look-ahead')?.status).toBe('ok');
  });

  it('no origin column: the row checks are listed as not run', () => {
    const rows = ['1,1,1', '2,1,2', '3,1,1'];
    const r = run(
      csv('timestamp,actual,prediction', rows),
      csv('timestamp,actual,prediction', rows),
    );
    expect(r.notRun.map((n) => n.id)).toEqual(
      expect.arrayContaining([
        'look-ahead',
        'horizon-steps',
        'origin-after-actuals',
        'origin-sets',
      ]),
    );
    expect(r.outcome).toBe('ok');
  });
});

describe('like-for-like checks', () => {
  it('labels that denote the same origin are the same origin', () => {
    const header = 'timestamp,horizon,origin,actual,prediction';
    const b = csv(header, ['2024-01-02,1,2024-01-01,1,1', '2024-01-03,1,2024-01-02,1,2']);
    const c = csv(header, [
      '2024-01-02,1,2024-01-01T00:00Z,1,1',
      '2024-01-03,1,2024-01-02T01:00+01:00,1,2',
    ]);
    expect(check(run(b, c), 'origin-sets')).toMatchObject({ status: 'ok', count: 0 });
  });
});

describe('suspicious exactness', () => {
  const header = 'timestamp,actual,prediction';
  const rows = (n: number, exact: (i: number) => boolean) =>
    Array.from(
      { length: n },
      (_, i) => `${i + 1},${10 + (i % 7)},${exact(i) ? 10 + (i % 7) : 10.5 + (i % 3)}`,
    );

  it('is not flagged when both models are often exact (integer data, naive forecasts)', () => {
    const r = run(
      csv(
        header,
        rows(100, (i) => i % 4 === 0),
      ),
      csv(
        header,
        rows(100, (i) => i % 5 === 0),
      ),
    );
    expect(check(r, 'exact-predictions')).toMatchObject({ status: 'ok', count: 0 });
  });

  it('flags from 5 exact rows and a share 5 points and 5 times above the other model', () => {
    const base = csv(
      header,
      rows(100, () => false),
    );
    expect(
      check(
        run(
          base,
          csv(
            header,
            rows(100, (i) => i < 4),
          ),
        ),
        'exact-predictions',
      )?.count,
    ).toBe(0);
    const five = check(
      run(
        base,
        csv(
          header,
          rows(100, (i) => i < 5),
        ),
      ),
      'exact-predictions',
    );
    expect(five).toMatchObject({ status: 'warn', count: 5 });
    expect(five?.examples[0]).toBe('candidate: timestamp=1 horizon=1');
  });
});

describe('policy', () => {
  const header = 'timestamp,horizon,origin,actual,prediction';
  const rows = ['2,1,1,1,1', '3,1,3,1,2', '4,1,3,1,1'];
  it('look-ahead fails under enforce, warns under warn and report; report leaves the verdict alone', () => {
    const enforce = run(csv(header, rows), csv(header, rows));
    expect(check(enforce, 'look-ahead')).toMatchObject({ status: 'fail', count: 2 });
    expect(enforce).toMatchObject({ outcome: 'fail', affectsVerdict: true });
    const warn = run(csv(header, rows), csv(header, rows), { mode: 'warn' });
    expect(warn).toMatchObject({ outcome: 'warn', affectsVerdict: true });
    const report = run(csv(header, rows), csv(header, rows), { mode: 'report' });
    expect(report).toMatchObject({ outcome: 'warn', affectsVerdict: false });
  });
});

describe('fold checks', () => {
  const header = 'timestamp,horizon,path,actual,prediction';
  const rows = Array.from(
    { length: 20 },
    (_, i) => `${i + 1},2,${i < 10 ? 'a' : 'b'},${i},${i + 1}`,
  );
  const layout = (segments: string[][]): FoldLayout => ({
    file: 'folds.csv',
    segments: segments.map(([fold, role, start, end], i) => ({
      fold: fold!,
      role: role as 'train' | 'test',
      start: start!,
      end: end!,
      line: i + 2,
    })),
  });

  it('purging: training must end more than H steps before the test window; embargo after it', () => {
    const clean = layout([
      ['a', 'test', '1', '10'],
      ['a', 'train', '13', '20'],
      ['b', 'train', '-5', '8'],
      ['b', 'test', '11', '20'],
    ]);
    const ok = run(csv(header, rows), csv(header, rows), { folds: clean });
    expect(check(ok, 'fold-purge')).toMatchObject({ status: 'ok', count: 0 });
    expect(check(ok, 'outside-test-window')).toMatchObject({ status: 'ok', count: 0 });
    // H = 2: training up to 9 touches [11 − 2, …]; an embargo of 3 reaches 13.
    const late = layout([
      ['a', 'test', '1', '10'],
      ['a', 'train', '13', '20'],
      ['b', 'train', '-5', '9'],
      ['b', 'test', '11', '20'],
    ]);
    expect(
      check(run(csv(header, rows), csv(header, rows), { folds: late }), 'fold-purge')?.count,
    ).toBe(1);
    const embargo = run(csv(header, rows), csv(header, rows), { folds: clean, embargo: 3 });
    expect(check(embargo, 'fold-purge')?.examples).toEqual([
      'fold a: train 13 to 20 (line 3) touches test 1 to 10 (line 2)',
    ]);
  });

  it('rows outside their fold test window, or of a fold the layout lacks, fail', () => {
    const folds = layout([
      ['a', 'test', '1', '9'],
      ['c', 'test', '11', '20'],
    ]);
    const r = run(csv(header, rows), csv(header, rows), { folds });
    expect(check(r, 'outside-test-window')).toMatchObject({ status: 'fail', count: 11 });
    expect(check(r, 'outside-test-window')?.examples.slice(0, 2)).toEqual([
      'timestamp=10 horizon=2 path=a',
      'timestamp=11 horizon=2 path=b (no such fold in the layout)',
    ]);
  });

  it('refuses a segment that ends before it starts, and a fold without a test segment', () => {
    const backwards = layout([['a', 'test', '9', '1']]);
    expect(() => run(csv(header, rows), csv(header, rows), { folds: backwards })).toThrow(
      /ends \(1\) before it starts \(9\)/,
    );
    const trainOnly = layout([
      ['a', 'test', '1', '10'],
      ['b', 'train', '1', '10'],
    ]);
    expect(() => run(csv(header, rows), csv(header, rows), { folds: trainOnly })).toThrow(
      /fold "b" has no test segment/,
    );
  });
});
