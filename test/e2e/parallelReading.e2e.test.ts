import { existsSync, mkdtempSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/inputError.js';
import { MINIMUM_PARALLEL_FILE_BYTES } from '../../src/parallel/readForecastFiles.js';
import { readForecastFile } from '../../src/reading/readForecastFile.js';
import { root, runCli } from './cliHelpers.js';

// Files above the size threshold, so the bundled CLI reads them on its reading workers.
const work = mkdtempSync(path.join(tmpdir(), 'skillgate-parallel-cli-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));

// About 25 bytes a row.
const ROWS = Math.ceil((MINIMUM_PARALLEL_FILE_BYTES * 1.3) / 25);

function forecastFile(name: string, seed: number, badLine?: number): string {
  const lines = ['series,timestamp,actual,prediction'];
  for (let i = 0; i < ROWS; i++) {
    const actual = ((i * 7919) % 1000) / 10;
    const prediction = actual + (((i * seed * 104729) % 200) - 100) / 50;
    const line = `series_${i % 50},${Math.floor(i / 50)},${actual.toFixed(2)},${prediction.toFixed(2)}`;
    lines.push(lines.length + 1 === badLine ? line.replace(/,[^,]*$/, ',4.2.1') : line);
  }
  const file = path.join(work, name);
  writeFileSync(file, `${lines.join('\n')}\n`);
  expect(statSync(file).size).toBeGreaterThan(MINIMUM_PARALLEL_FILE_BYTES);
  return file;
}

const baseline = forecastFile('baseline.csv', 1);
const rows = ROWS;

describe('skillgate compare on files read by worker threads (dist/cli.js)', () => {
  it('ships the reading worker beside the bundles', () => {
    expect(existsSync(path.join(root, 'dist', 'readingWorker.js'))).toBe(true);
  });

  it('reads, aligns and compares them', () => {
    const candidate = forecastFile('candidate.csv', 3);
    const json = path.join(work, 'report.json');
    const r = runCli([
      'compare',
      '--baseline',
      baseline,
      '--candidate',
      candidate,
      '--resamples',
      '99',
      '--json',
      json,
      '--quiet',
    ]);
    expect(r.stderr).toBe('');
    expect([0, 1]).toContain(r.status);
    expect(JSON.parse(readFileSync(json, 'utf8')).inputs.rowsMatched).toBe(rows);
  });

  it('gives an error read on a worker as on one thread: file, line, value, exit 2, no stack', async () => {
    const badLine = rows - 10;
    const candidate = forecastFile('candidate-bad.csv', 3, badLine);
    let expected = '';
    try {
      await readForecastFile(candidate, { role: 'candidate', requireActual: true });
    } catch (error) {
      if (error instanceof InputError) expected = `skillgate: ${error.describe()}\n`;
    }
    expect(expected).toContain(`candidate-bad.csv:${badLine}:`);
    expect(expected).toContain('"4.2.1"');
    const r = runCli(['compare', '--baseline', baseline, '--candidate', candidate, '--quiet']);
    expect(r.status).toBe(2);
    expect(r.stderr).toBe(expected);
    expect(r.stderr).not.toContain('    at ');
  });
});
