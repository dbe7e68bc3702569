import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { Ajv } from 'ajv';
import { afterAll, describe, expect, it } from 'vitest';
import { demo, demoColumns, root, runCli } from './cliHelpers.js';

const work = mkdtempSync(path.join(tmpdir(), 'skillgate-cli-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));
const file = (name: string, text: string) => {
  const p = path.join(work, name);
  writeFileSync(p, text);
  return p;
};
const schema = JSON.parse(readFileSync(path.join(root, 'docs', 'report.schema.json'), 'utf8'));
const validate = new Ajv({ allErrors: true, strict: false }).compile(schema);

const demoArgs = (candidate: string, extra: string[] = []) => [
  'compare',
  '--baseline',
  demo('baseline.csv'),
  '--candidate',
  demo(candidate),
  '--columns',
  demoColumns,
  '--resamples',
  '999',
  ...extra,
];

describe('skillgate compare on the demo backtest', () => {
  it('passes the improved candidate with exit 0 and writes a schema-valid report', () => {
    const json = path.join(work, 'improved.json');
    const md = path.join(work, 'improved.md');
    const r = runCli(demoArgs('candidate.csv', ['--json', json, '--markdown', md]));
    expect(r.stderr).toBe('');
    expect(r.status).toBe(0);
    expect(r.stdout).toMatch(/PASS/);
    const report = JSON.parse(readFileSync(json, 'utf8'));
    expect(validate(report), JSON.stringify(validate.errors)).toBe(true);
    expect(report.verdict).toBe('pass');
    expect(report.comparisons[0]).toMatchObject({ horizon: 'all', series: 'all' });
    expect(report.inputs.rowsMatched).toBe(2880);
    expect(readFileSync(md, 'utf8')).toMatch(/^### skillgate: PASS/);
  });

  it('fails the regressed candidate with exit 1', () => {
    const json = path.join(work, 'regressed.json');
    const r = runCli(demoArgs('candidate-regressed.csv', ['--json', json]));
    expect(r.status).toBe(1);
    const report = JSON.parse(readFileSync(json, 'utf8'));
    expect(validate(report), JSON.stringify(validate.errors)).toBe(true);
    expect(report.verdict).toBe('fail');
    expect(report.comparisons[0].dieboldMariano.pValue).toBeLessThan(0.05);
  });

  it('points out the candidate that gets worse late, and warns without failing', () => {
    const json = path.join(work, 'late.json');
    const md = path.join(work, 'late.md');
    const r = runCli(
      demoArgs('candidate-late.csv', ['--recent', '15%', '--json', json, '--markdown', md]),
    );
    expect(r.stderr).toBe('');
    expect(r.status).toBe(0);
    const report = JSON.parse(readFileSync(json, 'utf8'));
    expect(validate(report), JSON.stringify(validate.errors)).toBe(true);
    expect(report.verdict).toBe('warn');
    expect(report.comparisons[0].verdict).toBe('pass');
    expect(report.stability.recent).toMatchObject({
      n: 36,
      firstTimestamp: '2026-09-24',
      lastTimestamp: '2026-10-29',
      verdict: 'fail',
    });
    expect(report.headline).toMatch(
      /worse in the most recent 5 weeks \(2026-09-24 to 2026-10-29\): \+\d+(\.\d+)?% mean loss \(\d+% interval \+[\d.]+% to \+[\d.]+%\)/,
    );
    expect(report.headline).toMatch(/it does not fail it \(stability-gate warn\)/);
    expect(report.stability.periods).toHaveLength(35);
    expect(readFileSync(md, 'utf8')).toMatch(/\| most recent \| 2026-09-24 to 2026-10-29 \| 36 \|/);
    const failing = runCli(
      demoArgs('candidate-late.csv', ['--recent', '15%', '--stability-gate', 'fail']),
    );
    expect(failing.status).toBe(1);
  });

  it('refuses a malformed --recent with exit 2 and names the option', () => {
    const r = runCli(demoArgs('candidate.csv', ['--recent', '150%']));
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/--recent must be a number of time points .* \(value "?150%"?\)/);
  });

  it('gives byte-identical JSON for the same seed and another interval for another seed', () => {
    // The report records its own --json path among the settings, so all runs write one file.
    const out = path.join(work, 'seeded.json');
    const run = (seed: string) => {
      expect(runCli(demoArgs('candidate.csv', ['--json', out, '--seed', seed])).status).toBe(0);
      return readFileSync(out, 'utf8');
    };
    const first = run('7');
    const again = run('7');
    const other = run('8');
    expect(again).toBe(first);
    const ia = JSON.parse(first).comparisons[0].bootstrap.interval;
    const ic = JSON.parse(other).comparisons[0].bootstrap.interval;
    expect(ic.lower).not.toBe(ia.lower);
  });
});

describe('usage and input errors exit 2 with a message and no stack trace', () => {
  const header = 'timestamp,actual,prediction\n';
  const good = file('good.csv', `${header}1,1,1.5\n2,2,2.5\n3,3,2\n4,4,4.5\n`);
  const cases: { name: string; args: () => string[]; expect: RegExp }[] = [
    { name: 'no command', args: () => ['frobnicate'], expect: /unknown command/ },
    {
      name: 'unknown option',
      args: () => ['compare', '--baseline', good, '--candidate', good, '--bogus', '1'],
      expect: /bogus/,
    },
    {
      name: 'missing --candidate',
      args: () => ['compare', '--baseline', good],
      expect: /--candidate is required/,
    },
    {
      name: 'bad alpha',
      args: () => ['compare', '--baseline', good, '--candidate', good, '--alpha', 'x'],
      expect: /--alpha must be/,
    },
    {
      name: 'missing file',
      args: () => ['compare', '--baseline', path.join(work, 'nope.csv'), '--candidate', good],
      expect: /nope\.csv/,
    },
    {
      name: 'non-numeric prediction',
      args: () => [
        'compare',
        '--baseline',
        good,
        '--candidate',
        file('bad-number.csv', `${header}1,1,1.5\n2,2,abc\n`),
      ],
      expect: /bad-number\.csv:3.*"abc"/,
    },
    {
      name: 'duplicated key',
      args: () => [
        'compare',
        '--baseline',
        good,
        '--candidate',
        file('dup.csv', `${header}1,1,1.5\n1,1,2\n`),
      ],
      expect: /dup\.csv:3/,
    },
    {
      name: 'actual differs between files',
      args: () => [
        'compare',
        '--baseline',
        good,
        '--candidate',
        file('other-actual.csv', `${header}1,1,1.5\n2,9,2.5\n`),
      ],
      expect: /other-actual\.csv:3/,
    },
    {
      name: 'missing required column',
      args: () => [
        'compare',
        '--baseline',
        good,
        '--candidate',
        file('no-ts.csv', 'actual,prediction\n1,2\n'),
      ],
      expect: /no-ts\.csv.*timestamp/,
    },
    {
      name: 'empty file',
      args: () => ['compare', '--baseline', good, '--candidate', file('empty.csv', '')],
      expect: /empty\.csv/,
    },
    {
      name: 'a zero actual under the absolute percentage error',
      args: () => {
        const zero = file('zero-actual.csv', `${header}1,1,1.5\n2,0,2.5\n3,3,2\n`);
        return ['compare', '--baseline', zero, '--candidate', zero, '--loss', 'ape'];
      },
      expect: /zero-actual\.csv:3: .*actual is 0.*zero-actuals skip/,
    },
    {
      name: 'no common keys',
      args: () => [
        'compare',
        '--baseline',
        good,
        '--candidate',
        file('disjoint.csv', `${header}10,1,1\n11,1,1\n`),
      ],
      expect: /no .*common|common .*key/i,
    },
  ];
  for (const c of cases) {
    it(c.name, () => {
      const r = runCli(c.args());
      expect(r.status, r.stderr).toBe(2);
      expect(r.stderr).toMatch(c.expect);
      expect(r.stderr).not.toMatch(/\n\s+at /);
      expect(r.stderr.trim().split('\n').length).toBeLessThanOrEqual(3);
    });
  }
});

describe('missing candidate rows', () => {
  const header = 'timestamp,actual,prediction\n';
  const rows = Array.from(
    { length: 60 },
    (_, i) => `${i + 1},${Math.sin(i)},${Math.sin(i) + 0.1 * Math.cos(3 * i)}`,
  );
  const base = file('full.csv', `${header}${rows.join('\n')}\n`);
  const partial = file('partial.csv', `${header}${rows.slice(0, 50).join('\n')}\n`);
  it('fail the gate by default and pass with --allow-missing', () => {
    const strict = runCli([
      'compare',
      '--baseline',
      base,
      '--candidate',
      partial,
      '--resamples',
      '199',
    ]);
    expect(strict.status).toBe(1);
    expect(strict.stdout).toMatch(/lacks 10 rows/);
    const allowed = runCli([
      'compare',
      '--baseline',
      base,
      '--candidate',
      partial,
      '--resamples',
      '199',
      '--allow-missing',
    ]);
    expect(allowed.status).toBe(0);
  });
});

describe('help and version', () => {
  it('--help lists every option and exits 0', () => {
    const r = runCli(['--help']);
    expect(r.status).toBe(0);
    for (const flag of [
      '--baseline',
      '--candidate',
      '--loss',
      '--variance',
      '--lag',
      '--block-length',
      '--seed',
    ]) {
      expect(r.stdout).toContain(flag);
    }
  });
  it('--version prints the package version', () => {
    const pkg = JSON.parse(readFileSync(path.join(root, 'package.json'), 'utf8'));
    expect(runCli(['--version']).stdout.trim()).toBe(pkg.version);
  });
});
