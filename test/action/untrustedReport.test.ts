import { describe, expect, it } from 'vitest';
import { parseUntrustedReport } from '../../src/action/untrustedReport.js';
import { InputError } from '../../src/core/inputError.js';
import { sampleReport } from './sampleReport.js';

const describeError = (text: string): string => {
  try {
    parseUntrustedReport(text, 'report.json');
  } catch (error) {
    if (error instanceof InputError) return error.describe();
    throw error;
  }
  throw new Error('expected an InputError');
};

describe('parseUntrustedReport', () => {
  it('reads back a report runComparison wrote, diagnostics aside', () => {
    const report = sampleReport();
    const parsed = parseUntrustedReport(JSON.stringify(report), 'report.json');
    const c = report.comparisons[0]!;
    expect(parsed).toEqual({
      ...report,
      comparisons: [
        {
          ...c,
          dieboldMariano: { ...c.dieboldMariano, lagSelection: null },
          bootstrap: { ...c.bootstrap, blockLengthSelection: null },
        },
      ],
    });
  });

  it('reads the relative change with unbounded ends and pieces, and refuses too many pieces', () => {
    const report = sampleReport();
    const c = report.comparisons[0]!;
    const rays = {
      ...c.relativeChange!,
      lower: null,
      upper: null,
      pieces: [
        { lower: null, upper: -0.5 },
        { lower: 0.1, upper: null },
      ],
    };
    const parsed = parseUntrustedReport(
      JSON.stringify({ ...report, comparisons: [{ ...c, relativeChange: rays }] }),
      'r.json',
    );
    expect(parsed.comparisons[0]!.relativeChange).toEqual(rays);
    const many = { ...rays, pieces: Array.from({ length: 65 }, () => ({ lower: 0, upper: 1 })) };
    expect(
      describeError(JSON.stringify({ ...report, comparisons: [{ ...c, relativeChange: many }] })),
    ).toMatch(/relativeChange\.pieces must be at most 64 pieces/);
    const older = { ...report, comparisons: [{ ...c, relativeChange: undefined }] };
    expect(
      parseUntrustedReport(JSON.stringify(older), 'r.json').comparisons[0]!.relativeChange,
    ).toBe(null);
  });

  it('drops unknown fields, so a renderer never sees them', () => {
    const report = sampleReport();
    const hostile = {
      ...report,
      settings: { ...report.settings, '<img src=x>': 'y' },
      extra: '<!--',
    };
    const parsed = parseUntrustedReport(JSON.stringify(hostile), 'r.json');
    expect(Object.keys(parsed.settings)).not.toContain('<img src=x>');
    expect(parsed).not.toHaveProperty('extra');
  });

  it('refuses malformed fields, naming the file and the JSON path', () => {
    const report = sampleReport();
    const c = report.comparisons[0]!;
    expect(describeError('{')).toMatch(/^report\.json: is not valid JSON/);
    expect(describeError(JSON.stringify({ ...report, verdict: 'maybe' }))).toBe(
      'report.json: field $.verdict must be one of pass, warn, fail (value "\\"maybe\\"")',
    );
    const badHash = {
      ...report,
      inputs: { ...report.inputs, files: [{ ...report.inputs.files[0], sha256: '`@x`' }] },
    };
    expect(describeError(JSON.stringify(badHash))).toMatch(
      /field \$\.inputs\.files\[0\]\.sha256 must be sha256:/,
    );
    const badNumber = { ...report, comparisons: [{ ...c, n: '240' }] };
    expect(describeError(JSON.stringify(badNumber))).toMatch(
      /field \$\.comparisons\[0\]\.n must be a finite number/,
    );
    expect(describeError(JSON.stringify({ ...report, comparisons: [] }))).toMatch(
      /\$\.comparisons must be a non-empty array/,
    );
    expect(
      describeError(JSON.stringify({ ...report, tool: { name: 'other', version: '1' } })),
    ).toMatch(/\$\.tool\.name/);
  });

  it('reads report.stability field by field; a report without it reads as null', () => {
    const report = sampleReport();
    const { stability: _, ...older } = report;
    expect(parseUntrustedReport(JSON.stringify(older), 'r.json').stability).toBeNull();
    const stability = report.stability!;
    const badPeriod = {
      ...report,
      stability: { ...stability, periods: [{ ...stability.periods[0], start: 3 }] },
    };
    expect(describeError(JSON.stringify(badPeriod))).toMatch(
      /field \$\.stability\.periods\[0\]\.start must be a string/,
    );
    const tooMany = {
      ...report,
      stability: { ...stability, periods: Array(61).fill(stability.periods[0]) },
    };
    expect(describeError(JSON.stringify(tooMany))).toMatch(
      /\$\.stability\.periods must be at most 60/,
    );
    const badFlag = {
      ...report,
      stability: { ...stability, fluctuation: { ...stability.fluctuation, rejected: 'yes' } },
    };
    expect(describeError(JSON.stringify(badFlag))).toMatch(
      /\$\.stability\.fluctuation\.rejected must be true or false/,
    );
    const recent = { ...report, stability: { ...stability, recent: report.comparisons[0] } };
    const parsed = parseUntrustedReport(JSON.stringify(recent), 'r.json');
    expect(parsed.stability?.recent?.n).toBe(240);
  });
});

describe('parseUntrustedReport: backtest checks', () => {
  it('refuses an unknown check id or status', () => {
    const report = sampleReport();
    const bad = (check: object) =>
      JSON.stringify({ ...report, integrity: { ...report.integrity, checks: [check] } });
    const check = report.integrity.checks[0]!;
    expect(() => parseUntrustedReport(bad({ ...check, id: '<b>x</b>' }), 'r.json')).toThrow(
      /field \$\.integrity\.checks\[0\]\.id must be one of look-ahead/,
    );
    expect(() => parseUntrustedReport(bad({ ...check, status: 'maybe' }), 'r.json')).toThrow(
      /\$\.integrity\.checks\[0\]\.status/,
    );
  });

  it('reads a report written before the checks existed as having none, outside the verdict', () => {
    const { integrity: _dropped, ...older } = sampleReport();
    const {
      frequency: _f,
      folds: _d,
      embargo: _e,
      backtestChecks: _b,
      ...settings
    } = older.settings;
    const parsed = parseUntrustedReport(JSON.stringify({ ...older, settings }), 'r.json');
    expect(parsed.integrity).toMatchObject({ checks: [], affectsVerdict: false, outcome: 'ok' });
    expect(parsed.settings).toMatchObject({ frequency: 'auto', folds: null, embargo: 0 });
  });
});
