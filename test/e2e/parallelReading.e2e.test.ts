import { existsSync, mkdtempSync, rmSync, statSync, writeFileSync } from 'node:fs';
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
const ROWS = Math.ceil((MINIMUM_PARALLEL_FILE_BYTES * 1.1) / 25);

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

// (That tables read on workers equal those read on one thread is checked in
// test/parallel/readForecastFiles.test.ts, with the worker bundled the same way.)

describe('skillgate compare on files read by worker threads (dist/cli.js)', () => {
  it('ships the reading worker beside the bundles', () => {
    expect(existsSync(path.join(root, 'dist', 'readingWorker.js'))).toBe(true);
  });

  it('gives an error read on a worker as on one thread: file, line, value, exit 2, no stack', async () => {
    const badLine = ROWS - 10;
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
