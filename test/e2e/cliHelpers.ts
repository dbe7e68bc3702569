import { spawnSync } from 'node:child_process';
import path from 'node:path';

export const root = path.resolve(import.meta.dirname, '..', '..');
export const cliPath = path.join(root, 'dist', 'cli.js');
export const demoColumns =
  'series=zone,timestamp=target_date,origin=issued,actual=observed,prediction=forecast';
export const demo = (file: string) => path.join(root, 'examples', 'data', file);

export interface CliResult {
  readonly status: number | null;
  readonly stdout: string;
  readonly stderr: string;
}

/** Runs the bundled CLI as a user would (node dist/cli.js …), with a bounded timeout. */
export function runCli(args: readonly string[], cwd = root): CliResult {
  const r = spawnSync(process.execPath, [cliPath, ...args], {
    cwd,
    encoding: 'utf8',
    timeout: 120_000,
    env: { ...process.env, NO_COLOR: '1' },
  });
  return { status: r.status, stdout: r.stdout, stderr: r.stderr };
}
