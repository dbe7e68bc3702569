import { describe, expect, it } from 'vitest';
import { renderTerminal } from '../../src/report/renderTerminal.js';
import { sampleReport } from '../action/sampleReport.js';

const plain = { color: false };

describe('renderTerminal', () => {
  it('opens with the title and the verdict in capitals, and ends with one newline', () => {
    const text = renderTerminal(sampleReport(), plain);
    expect(text.split('\n')[0]).toBe('skillgate: PASS');
    expect(renderTerminal(sampleReport({ name: 'nightly' }), plain).split('\n')[0]).toBe(
      'skillgate · nightly: PASS',
    );
    expect(text.endsWith('\n')).toBe(true);
    expect(text.endsWith('\n\n')).toBe(false);
  });

  it('writes no escape sequence without colour; paints the verdict green, yellow or red with it', () => {
    // biome-ignore lint/suspicious/noControlCharactersInRegex: looking for ANSI escapes
    expect(renderTerminal(sampleReport(), plain)).not.toMatch(/\x1b/);
    const first = (verdict: 'pass' | 'warn' | 'fail') =>
      renderTerminal(sampleReport({ verdict }), { color: true }).split('\n')[0];
    expect(first('pass')).toBe('\x1b[1mskillgate\x1b[0m: \x1b[1;32mPASS\x1b[0m');
    expect(first('warn')).toBe('\x1b[1mskillgate\x1b[0m: \x1b[1;33mWARN\x1b[0m');
    expect(first('fail')).toBe('\x1b[1mskillgate\x1b[0m: \x1b[1;31mFAIL\x1b[0m');
  });

  it('replaces control characters from the inputs by spaces', () => {
    const text = renderTerminal(sampleReport({ name: 'x\x1b[2J\ry' }), plain);
    expect(text.split('\n')[0]).toBe('skillgate · x [2J y: PASS');
    // biome-ignore lint/suspicious/noControlCharactersInRegex: looking for any control character
    expect(text.replace(/\n/g, '')).not.toMatch(/[\u0000-\u001f\u007f-\u009f]/);
  });

  it('wraps the lead at 100 characters', () => {
    const lines = renderTerminal(sampleReport(), plain).split('\n');
    const lead = lines.slice(1, lines.indexOf(''));
    expect(lead.length).toBeGreaterThan(1);
    for (const line of lead) expect(line.length).toBeLessThanOrEqual(100);
    expect(lead.join(' ')).toMatch(/^The gate passes: neither test finds evidence/);
  });

  it('right-aligns the number columns of the main table under their headers', () => {
    const lines = renderTerminal(sampleReport(), plain).split('\n');
    const header = lines.find((l) => l.startsWith('scope'))!;
    const row = lines.find((l) => l.startsWith('overall'))!;
    // "baseline loss" ends where the baseline's mean loss 4.597 ends.
    const end = header.indexOf('baseline loss') + 'baseline loss'.length;
    expect(row.slice(end - '4.597'.length, end)).toBe('4.597');
  });

  it('counts the rows left out from the inputs and lists missing baseline rows', () => {
    const base = sampleReport();
    const report = sampleReport({
      inputs: {
        ...base.inputs,
        rowsMatched: 2873,
        rowsDropped: { ...base.inputs.rowsDropped, baseline: 7, candidate: 2, skippedByLoss: 1 },
      },
      reasons: ['The candidate lacks 7 rows that the baseline has.', 'Another reason.'],
    });
    const text = renderTerminal(report, plain);
    expect(text).toContain(
      'rows matched 2873; left out: 7 baseline-only, 2 candidate-only, 0 without actual, 1 skipped by loss',
    );
    expect(text).toContain('\n- The candidate lacks 7 rows that the baseline has.\n');
    expect(text).not.toContain('Another reason.');
  });
});
