import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import { afterAll, describe, expect, it } from 'vitest';
import { cliPath } from '../e2e/cliHelpers.js';

const work = mkdtempSync(path.join(tmpdir(), 'skillgate-bomb-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));
const preload = path.join(import.meta.dirname, 'peakMemory.mjs');

/**
 * A gzip bomb: gzip members of 16 MiB of a repeated text each, concatenated (RFC 1952 allows
 * several members; gunzip reads them as one stream), after a member holding `head` — as many as
 * fit in 1.95 MB. Returns the compressed and the inflated size.
 */
function bomb(file: string, head: string, text: string): { stored: number; inflated: number } {
  const block = Buffer.from(text.repeat(Math.floor((16 << 20) / text.length)));
  const member = gzipSync(block, { level: 9 });
  const first = gzipSync(head);
  const members = Math.floor((1_950_000 - first.length) / member.length);
  writeFileSync(file, Buffer.concat([first, ...Array.from({ length: members }, () => member)]));
  return { stored: statSync(file).size, inflated: head.length + members * block.length };
}

/** Runs the CLI, measuring wall time and the peak resident memory the process reports. */
function measure(args: string[]) {
  const usage = path.join(work, `usage-${Date.now()}.json`);
  const start = process.hrtime.bigint();
  const r = spawnSync(process.execPath, ['--import', preload, cliPath, ...args], {
    cwd: work,
    encoding: 'utf8',
    timeout: 60_000,
    env: { ...process.env, NO_COLOR: '1', SKILLGATE_RUSAGE_FILE: usage },
  });
  const seconds = Number(process.hrtime.bigint() - start) / 1e9;
  const peakMiB = JSON.parse(readFileSync(usage, 'utf8')).maxRSS / 1024;
  return { ...r, seconds, peakMiB };
}

describe('a gzip bomb fails fast in bounded memory', () => {
  writeFileSync(path.join(work, 'c.csv'), 'timestamp,actual,prediction\n1,1,1\n');

  it('over 1 GiB of one repeated row: the duplicated key at line 3', () => {
    const size = bomb(
      path.join(work, 'rows.csv.gz'),
      'series,timestamp,actual,prediction\n',
      'a,1,1,1\n',
    );
    expect(size.stored).toBeLessThan(2_000_000);
    expect(size.inflated).toBeGreaterThan(1 << 30);
    const r = measure(['compare', '--baseline', 'rows.csv.gz', '--candidate', 'c.csv']);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain(
      'rows.csv.gz:3: duplicated key series=a timestamp=1 horizon=1: lines 2 and 3',
    );
    expect(r.seconds).toBeLessThan(10);
    expect(r.peakMiB).toBeLessThan(512);
  });

  it('over 1 GiB without a line break: the line limit at line 2', () => {
    const size = bomb(
      path.join(work, 'line.csv.gz'),
      'timestamp,actual,prediction\n',
      'x'.repeat(64),
    );
    expect(size.stored).toBeLessThan(2_000_000);
    expect(size.inflated).toBeGreaterThan(1 << 30);
    const r = measure(['compare', '--baseline', 'line.csv.gz', '--candidate', 'c.csv']);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain(
      'line.csv.gz:2: the line is longer than the limit of 1048576 characters',
    );
    expect(r.stderr.length).toBeLessThan(1000);
    expect(r.seconds).toBeLessThan(10);
    expect(r.peakMiB).toBeLessThan(512);
  });

  it('hundreds of MiB of distinct-looking rows that repeat in blocks: refused at the first repeat', () => {
    // 16 distinct rows repeated: a duplicate at line 18.
    const rows = Array.from({ length: 16 }, (_, i) => `s${i},1,1,1\n`).join('');
    const size = bomb(
      path.join(work, 'block.csv.gz'),
      'series,timestamp,actual,prediction\n',
      rows,
    );
    expect(size.stored).toBeLessThan(2_000_000);
    expect(size.inflated).toBeGreaterThan(400 << 20);
    const r = measure(['compare', '--baseline', 'block.csv.gz', '--candidate', 'c.csv']);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain(
      'block.csv.gz:18: duplicated key series=s0 timestamp=1 horizon=1: lines 2 and 18',
    );
    expect(r.seconds).toBeLessThan(10);
    expect(r.peakMiB).toBeLessThan(512);
  });
});
