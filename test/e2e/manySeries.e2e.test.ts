import { spawnSync } from 'node:child_process';
import { once } from 'node:events';
import { createWriteStream, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { cliPath } from './cliHelpers.js';

const work = mkdtempSync(path.join(tmpdir(), 'skillgate-series-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));

/** One row per series: 10⁶ distinct series names, written in chunks (never held whole). */
async function write(file: string, series: number, shift: number): Promise<void> {
  const out = createWriteStream(file);
  out.write('series,timestamp,actual,prediction\n');
  let chunk = '';
  for (let i = 0; i < series; i++) {
    const y = (i % 97) / 10;
    chunk += `s${i},1,${y},${y + shift}\n`;
    if (chunk.length > 1 << 20) {
      if (!out.write(chunk)) await once(out, 'drain');
      chunk = '';
    }
  }
  out.end(chunk);
  await once(out, 'finish');
}

// About 26 s for the CLI alone on this 2-core machine (load average 9.5, GNU time: 2.5 GiB peak
// RSS); the generous timeout is for a full `npm test` on a shared machine, not a speed claim
// (speed is measured by the benchmark).
describe('a million distinct series', () => {
  it('are read, aligned, compared and reported without exhausting the stack', async () => {
    const n = 1_000_000;
    await write(path.join(work, 'b.csv'), n, 0.5);
    await write(path.join(work, 'c.csv'), n, 0.4);
    const r = spawnSync(
      process.execPath,
      [
        cliPath,
        'compare',
        '--baseline',
        'b.csv',
        '--candidate',
        'c.csv',
        '--markdown',
        '-',
        '--resamples',
        '199',
      ],
      { cwd: work, encoding: 'utf8', timeout: 540_000, maxBuffer: 64 << 20 },
    );
    expect(r.stderr).toBe('');
    expect(r.status).toBe(0);
    expect(r.stdout).toContain(`**Series**: of ${n},`);
  }, 600_000);
});
