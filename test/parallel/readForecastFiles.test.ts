import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { MessageChannel } from 'node:worker_threads';
import { build } from 'esbuild';
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/inputError.js';
import { type FileToRead, readForecastFiles } from '../../src/parallel/readForecastFiles.js';
import { tableBuffers } from '../../src/parallel/tableTransfer.js';
import type { ForecastTable } from '../../src/reading/forecastTable.js';
import { readForecastFile } from '../../src/reading/readForecastFile.js';

// The worker runs bundled JavaScript, as in dist/: bundle it once for these tests.
const root = path.resolve(import.meta.dirname, '..', '..');
const dir = mkdtempSync(path.join(tmpdir(), 'skillgate-parallel-reading-'));
const workerUrl = pathToFileURL(path.join(dir, 'readingWorker.js'));
// Threshold 0: every file goes to a worker, however small.
const onWorkers = { threads: 2, minimumFileBytes: 0, workerUrl };

beforeAll(async () => {
  await build({
    absWorkingDir: root,
    entryPoints: ['src/parallel/readingWorker.ts'],
    outdir: dir,
    bundle: true,
    platform: 'node',
    format: 'esm',
    logLevel: 'warning',
  });
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

let written = 0;
function write(content: string, extension = 'csv'): string {
  const file = path.join(dir, `f${written++}.${extension}`);
  writeFileSync(file, content);
  return file;
}

/** Runs both paths; returns each one's tables, or its error as the CLI would print it. */
async function bothPaths(files: readonly FileToRead[]) {
  const outcome = async (read: () => Promise<ForecastTable[]>) => {
    try {
      return { tables: await read() };
    } catch (error) {
      if (!(error instanceof InputError)) throw error;
      return { error: error.describe() };
    }
  };
  const oneThread = await outcome(async () => {
    const tables: ForecastTable[] = [];
    for (const f of files) tables.push(await readForecastFile(f.path, f.options));
    return tables;
  });
  const workers = await outcome(() => readForecastFiles(files, onWorkers));
  return { oneThread, workers };
}

// Small forecast files: a few series and dates, optional horizon and quantile columns, and now
// and then a bad cell (text where a number belongs, an empty key) so the errors are compared too.
const cell = fc.oneof(
  { weight: 60, arbitrary: fc.double({ min: -1e6, max: 1e6, noNaN: true }).map(String) },
  { weight: 1, arbitrary: fc.constantFrom('abc', '', '1e', 'NaN', '0x10', '  2') },
);
const row = fc.record({
  series: fc.oneof(
    { weight: 40, arbitrary: fc.constantFrom('a', 'b', 'c', 'sensor "x"') },
    { weight: 1, arbitrary: fc.constant('') },
  ),
  month: fc.integer({ min: 1, max: 12 }),
  day: fc.integer({ min: 1, max: 28 }),
  horizon: fc.integer({ min: 1, max: 3 }),
  actual: cell,
  prediction: cell,
  q: cell,
});
const fileText = fc
  .record({ rows: fc.array(row, { minLength: 0, maxLength: 20 }), quantile: fc.boolean() })
  .map(({ rows, quantile }) => {
    const header = `series,timestamp,horizon,actual,prediction${quantile ? ',q0.5' : ''}`;
    const lines = rows.map(
      (r) =>
        `${r.series.includes('"') ? `"${r.series.replace(/"/g, '""')}"` : r.series},2024-${String(r.month).padStart(2, '0')}-${String(r.day).padStart(2, '0')},${r.horizon},${r.actual},${r.prediction}${quantile ? `,${r.q}` : ''}`,
    );
    return `${[header, ...lines].join('\n')}\n`;
  });

describe('readForecastFiles', () => {
  it('gives the tables (or the error) of reading the files one after the other', async () => {
    let read = 0;
    await fc.assert(
      fc.asyncProperty(fc.array(fileText, { minLength: 2, maxLength: 3 }), async (texts) => {
        const roles = ['baseline', 'candidate', 'actuals'] as const;
        const files = texts.map((text, k) => ({
          path: write(text),
          options: { role: roles[k]!, requireActual: k === 2 || texts.length === 2 },
        }));
        const { oneThread, workers } = await bothPaths(files);
        expect(workers).toEqual(oneThread);
        if ('tables' in workers) read++;
      }),
      { seed: 1717, numRuns: 30 },
    );
    // Both outcomes were compared: tables and errors.
    expect(read).toBeGreaterThan(5);
    expect(read).toBeLessThan(30);
  });

  it('reports the error of the earliest failing file, as reading in order would', async () => {
    const good = write('series,timestamp,actual,prediction\na,1,1,2\n');
    const bad = (value: string) =>
      write(`series,timestamp,actual,prediction\na,1,1,2\na,2,1,${value}\n`);
    const files = [
      { path: good, options: { role: 'baseline' as const } },
      { path: bad('x'), options: { role: 'candidate' as const } },
      { path: bad('y'), options: { role: 'actuals' as const, requireActual: true } },
    ];
    const { oneThread, workers } = await bothPaths(files);
    expect(oneThread.error).toMatch(/:3: .*"x"/);
    expect(workers).toEqual(oneThread);
  });

  it('names a missing file the same way', async () => {
    const files = [
      { path: path.join(dir, 'missing.csv'), options: { role: 'baseline' as const } },
      {
        path: write('series,timestamp,actual,prediction\na,1,1,2\n'),
        options: { role: 'candidate' as const },
      },
    ];
    const { oneThread, workers } = await bothPaths(files);
    expect(oneThread.error).toContain('missing.csv');
    expect(workers).toEqual(oneThread);
  });

  it('keeps reporting progress from the workers, up to the whole file', async () => {
    const rows = Array.from({ length: 50_000 }, (_, t) => `a,${t},1,2\n`).join('');
    const seen = new Map<string, { bytesRead: number; totalBytes: number }>();
    const files = ['baseline', 'candidate'].map((role) => ({
      path: write(`series,timestamp,actual,prediction\n${rows}`),
      options: {
        role: role as 'baseline' | 'candidate',
        onProgress: (bytesRead: number, totalBytes: number) =>
          seen.set(role, { bytesRead, totalBytes }),
      },
    }));
    const tables = await readForecastFiles(files, onWorkers);
    expect(tables.map((t) => t.size)).toEqual([50_000, 50_000]);
    // Every file reported, ending at its full size.
    for (const role of ['baseline', 'candidate']) {
      const last = seen.get(role);
      expect(last?.bytesRead).toBe(last?.totalBytes);
      expect(last?.totalBytes).toBeGreaterThan(0);
    }
  });

  it('reads in the calling thread below the size threshold or without the worker script', async () => {
    const text = 'series,timestamp,actual,prediction\na,1,1,2\n';
    const files = [write(text), write(text)].map((p, k) => ({
      path: p,
      options: { role: k === 0 ? ('baseline' as const) : ('candidate' as const) },
    }));
    const missing = pathToFileURL(path.join(dir, 'no-such-worker.js'));
    const expected = await Promise.all(files.map((f) => readForecastFile(f.path, f.options)));
    await expect(readForecastFiles(files, { workerUrl })).resolves.toEqual(expected);
    await expect(
      readForecastFiles(files, { minimumFileBytes: 0, workerUrl: missing }),
    ).resolves.toEqual(expected);
  });
});

describe('tableBuffers', () => {
  it('moves the typed columns instead of copying them', async () => {
    const file = write(
      'series,timestamp,horizon,actual,prediction,q0.1\na,1,1,1,2,3\nb,2,2,4,5,6\n',
    );
    const table = await readForecastFile(file, { role: 'baseline' });
    const copy = structuredClone(table);
    const buffers = tableBuffers(table);
    // lines; ids and first lines of series and timestamp; horizon; actual, prediction, q0.1.
    expect(buffers.length).toBe(9);
    const { port1, port2 } = new MessageChannel();
    const received = new Promise<ForecastTable>((resolve) => port2.once('message', resolve));
    port1.postMessage(table, buffers);
    const moved = await received;
    port1.close();
    port2.close();
    expect(moved).toEqual(copy);
    // Detached on the sending side: nothing was copied.
    for (const buffer of buffers) expect(buffer.byteLength).toBe(0);
    expect(table.lines.length).toBe(0);
    expect(table.prediction?.values.length).toBe(0);
    expect(table.quantiles[0]?.values.length).toBe(0);
  });
});
