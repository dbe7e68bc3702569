import { createHash } from 'node:crypto';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import { afterAll, describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/inputError.js';
import { parseForecastText } from '../../src/reading/forecastTableReader.js';
import { formatFromPath } from '../../src/reading/formatDetection.js';
import { readForecastFile } from '../../src/reading/readForecastFile.js';

const dir = mkdtempSync(join(tmpdir(), 'skillgate-reading-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function write(name: string, content: string | Buffer): string {
  const path = join(dir, name);
  writeFileSync(path, content);
  return path;
}

async function errorOf(promise: Promise<unknown>): Promise<InputError> {
  try {
    await promise;
  } catch (error) {
    if (error instanceof InputError) return error;
    throw error;
  }
  throw new Error('expected an InputError');
}

const csv =
  'series,timestamp,horizon,actual,prediction\nA,2024-01-01,1,1.5,2\nB,2024-01-02,2,3,4\n';

describe('formatFromPath', () => {
  it('derives TSV and gzip from the extension, case-insensitively', () => {
    expect(formatFromPath('a.csv')).toEqual({ format: 'csv', gzip: false });
    expect(formatFromPath('a.TSV')).toEqual({ format: 'tsv', gzip: false });
    expect(formatFromPath('a.tsv.gz')).toEqual({ format: 'tsv', gzip: true });
    expect(formatFromPath('a.csv.GZ')).toEqual({ format: 'csv', gzip: true });
    expect(formatFromPath('data')).toEqual({ format: 'csv', gzip: false });
  });
});

describe('readForecastFile', () => {
  it('reads a CSV file and hashes the stored bytes', async () => {
    const path = write('plain.csv', csv);
    const table = await readForecastFile(path, { role: 'baseline' });
    expect(table.size).toBe(2);
    expect(table.summary.path).toBe(path);
    expect(table.summary.sha256).toBe(`sha256:${createHash('sha256').update(csv).digest('hex')}`);
    const { summary: _s1, ...fromFile } = table;
    const { summary: _s2, ...fromText } = parseForecastText(csv, path, { role: 'baseline' });
    expect(fromFile).toEqual(fromText);
  });

  it('gives the same table for gzip and TSV variants; the hash is of the compressed bytes', async () => {
    const plain = await readForecastFile(write('v.csv', csv), { role: 'baseline' });
    const gz = gzipSync(csv);
    const zipped = await readForecastFile(write('v.csv.gz', gz), { role: 'baseline' });
    const tsvText = csv.replaceAll(',', '\t');
    const tsv = await readForecastFile(write('v.tsv', tsvText), { role: 'baseline' });
    const tsvGz = await readForecastFile(write('v.tsv.gz', gzipSync(tsvText)), {
      role: 'baseline',
    });
    const forced = await readForecastFile(write('v.txt', tsvText), {
      role: 'baseline',
      format: 'tsv',
    });
    const strip = ({ summary: _s, ...rest }: typeof plain) => rest;
    for (const other of [zipped, tsv, tsvGz, forced]) expect(strip(other)).toEqual(strip(plain));
    expect(zipped.summary.sha256).toBe(`sha256:${createHash('sha256').update(gz).digest('hex')}`);
  });

  it('streams a file much larger than one chunk with exact line numbers', async () => {
    const rows: string[] = ['timestamp,prediction,note'];
    for (let i = 0; i < 60_000; i++) rows.push(`${i},${i / 2},"multi\nline ${i}"`);
    rows.push('60000,oops,x');
    const text = `${rows.join('\n')}\n`;
    let lastProgress: [number, number] = [0, 0];
    const error = await errorOf(
      readForecastFile(write('big.csv.gz', gzipSync(text)), {
        role: 'baseline',
        onProgress: (read, total) => {
          lastProgress = [read, total];
        },
      }),
    );
    // Header on line 1, each row takes two physical lines.
    expect(error.location.line).toBe(2 + 60_000 * 2);
    expect(error.describe()).toContain(
      'not a finite decimal number (column "prediction", value "oops")',
    );
    expect(lastProgress[0]).toBe(lastProgress[1]);
    expect(lastProgress[1]).toBeGreaterThan(0);
  });

  it('reports a missing file, a broken gzip file and invalid UTF-8 as InputErrors', async () => {
    const missing = join(dir, 'nope.csv');
    expect((await errorOf(readForecastFile(missing, { role: 'baseline' }))).describe()).toBe(
      `${missing}: no such file`,
    );
    const broken = write('broken.csv.gz', 'not gzip at all');
    expect((await errorOf(readForecastFile(broken, { role: 'baseline' }))).describe()).toMatch(
      /broken\.csv\.gz: not a valid gzip file/,
    );
    const latin1 = write(
      'latin1.csv',
      Buffer.from('timestamp,prediction\nd\xe9j\xe0,1\n', 'latin1'),
    );
    expect((await errorOf(readForecastFile(latin1, { role: 'baseline' }))).describe()).toMatch(
      /latin1\.csv:2: the file is not UTF-8 text: line 2 has bytes that are not UTF-8 \(byte 0xE9 suggests Latin-1/,
    );
    expect((await errorOf(readForecastFile(dir, { role: 'baseline' }))).describe()).toMatch(
      /not a regular file/,
    );
  });

  it('reports an empty file', async () => {
    const error = await errorOf(readForecastFile(write('empty.csv', ''), { role: 'candidate' }));
    expect(error.describe()).toMatch(/empty\.csv:1: the file is empty/);
  });
});
