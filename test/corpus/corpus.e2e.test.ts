import { spawn } from 'node:child_process';
import { copyFileSync, mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { cliPath } from '../e2e/cliHelpers.js';
import { CASES, type CorpusCase } from './cases.js';

const work = mkdtempSync(path.join(tmpdir(), 'skillgate-corpus-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));
const parquetDir = path.join(import.meta.dirname, 'parquet');

interface Outcome {
  readonly status: number | null;
  readonly stdout: string;
  readonly stderr: string;
}

function prepare(c: CorpusCase): string {
  const dir = path.join(work, c.id);
  mkdirSync(dir, { recursive: true });
  for (const [name, content] of Object.entries(c.files ?? {})) {
    const file = path.join(dir, name);
    mkdirSync(path.dirname(file), { recursive: true });
    writeFileSync(file, typeof content === 'function' ? content() : content);
  }
  for (const name of c.parquet ?? [])
    copyFileSync(path.join(parquetDir, name), path.join(dir, name));
  return dir;
}

function run(c: CorpusCase): Promise<Outcome> {
  const cwd = prepare(c);
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, [cliPath, ...c.args], {
      cwd,
      env: { ...process.env, NO_COLOR: '1' },
    });
    let stdout = '';
    let stderr = '';
    child.stdout.setEncoding('utf8').on('data', (d: string) => {
      stdout += d;
    });
    child.stderr.setEncoding('utf8').on('data', (d: string) => {
      stderr += d;
    });
    const timer = setTimeout(() => child.kill('SIGKILL'), 60_000);
    child.on('error', reject);
    child.on('close', (status) => {
      clearTimeout(timer);
      resolve({ status, stdout, stderr });
    });
  });
}

/** Runs every case, two at a time (the machine's two cores). */
const outcomes = new Map<string, Outcome>();
beforeAll(async () => {
  const queue = [...CASES];
  const worker = async () => {
    for (let c = queue.shift(); c !== undefined; c = queue.shift())
      outcomes.set(c.id, await run(c));
  };
  await Promise.all([worker(), worker()]);
}, 600_000);

describe('the corpus of hostile and unusual inputs, through dist/cli.js', () => {
  it('has at least 80 cases with distinct ids', () => {
    expect(CASES.length).toBeGreaterThanOrEqual(80);
    expect(new Set(CASES.map((c) => c.id)).size).toBe(CASES.length);
  });

  it.each(CASES.map((c) => [c.id, c] as const))('%s', (_id, c) => {
    const r = outcomes.get(c.id)!;
    const shown = `exit ${r.status}\nstderr: ${r.stderr.slice(0, 2000)}\nstdout: ${r.stdout.slice(0, 500)}`;
    expect(r.status, shown).toBe(c.exit);
    if (c.stderr !== undefined) {
      if (typeof c.stderr === 'string') expect(r.stderr, shown).toContain(c.stderr);
      else expect(r.stderr, shown).toMatch(c.stderr);
    }
    if (c.stdout !== undefined) {
      if (typeof c.stdout === 'string') expect(r.stdout, shown).toContain(c.stdout);
      else expect(r.stdout, shown).toMatch(c.stdout);
    }
    if (c.notStdout !== undefined) expect(r.stdout).not.toMatch(c.notStdout);
    // Never a stack trace or an internal error; a refusal is one short paragraph on stderr.
    expect(r.stderr).not.toMatch(/\n\s+at |internal error/);
    if (c.exit === 2 && c.id !== 'no-arguments') {
      expect(r.stderr.trimEnd().split('\n'), shown).toHaveLength(1);
      expect(r.stderr.length).toBeLessThan(3000);
      expect(r.stdout).toBe('');
    }
  });
});
