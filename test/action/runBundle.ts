import { spawn } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { readActionYml } from './actionYml.js';

export const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
export const BUNDLE = path.join(ROOT, 'dist/index.js');
const TIMEOUT_MS = 60_000;

export interface BundleRun {
  readonly code: number | null;
  readonly stdout: string;
  readonly stderr: string;
  readonly outputs: Readonly<Record<string, string>>;
  readonly summary: string;
  readonly dir: string;
}

export interface BundleOptions {
  readonly inputs: Readonly<Record<string, string>>;
  readonly eventName: string;
  readonly event: unknown;
  readonly apiUrl: string;
  readonly token?: string;
  readonly env?: Readonly<Record<string, string>>;
}

/**
 * Runs dist/index.js the way the runner does: every input of action.yml as INPUT_<NAME>
 * (upper-cased, hyphens kept), defaults filled in from action.yml, the event in a file named by
 * GITHUB_EVENT_PATH, and fresh GITHUB_OUTPUT / GITHUB_STEP_SUMMARY files. Killed after a minute.
 */
export async function runBundle(options: BundleOptions): Promise<BundleRun> {
  const dir = mkdtempSync(path.join(tmpdir(), 'skillgate-action-'));
  const eventPath = path.join(dir, 'event.json');
  const outputPath = path.join(dir, 'output.txt');
  const summaryPath = path.join(dir, 'summary.md');
  writeFileSync(eventPath, JSON.stringify(options.event));
  writeFileSync(outputPath, '');
  writeFileSync(summaryPath, '');
  const token = options.token ?? 'test-token';

  const env: Record<string, string> = {
    PATH: process.env.PATH ?? '',
    HOME: dir,
    GITHUB_ACTIONS: 'true',
    GITHUB_EVENT_NAME: options.eventName,
    GITHUB_EVENT_PATH: eventPath,
    GITHUB_REPOSITORY: 'acme/models',
    GITHUB_API_URL: options.apiUrl,
    GITHUB_SERVER_URL: 'https://github.example',
    GITHUB_RUN_ID: '4242',
    GITHUB_SHA: 'c0ffee0000000000000000000000000000000001',
    GITHUB_OUTPUT: outputPath,
    GITHUB_STEP_SUMMARY: summaryPath,
    RUNNER_TEMP: dir,
  };
  for (const [name, entry] of readActionYml(path.join(ROOT, 'action.yml')).inputs) {
    // biome-ignore lint/suspicious/noTemplateCurlyInString: the runner expands this expression
    const fallback = (entry.default ?? '').replace('${{ github.token }}', token);
    env[`INPUT_${name.toUpperCase()}`] = options.inputs[name] ?? fallback;
  }
  for (const name of Object.keys(options.inputs)) {
    if (env[`INPUT_${name.toUpperCase()}`] === undefined)
      throw new Error(`no input ${name} in action.yml`);
  }
  Object.assign(env, options.env);

  const child = spawn(process.execPath, [BUNDLE], {
    cwd: ROOT,
    env,
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let stdout = '';
  let stderr = '';
  child.stdout.on('data', (d: Buffer) => {
    stdout += d.toString('utf8');
  });
  child.stderr.on('data', (d: Buffer) => {
    stderr += d.toString('utf8');
  });
  const timer = setTimeout(() => child.kill('SIGKILL'), TIMEOUT_MS);
  const code = await new Promise<number | null>((resolve) => child.on('close', resolve));
  clearTimeout(timer);
  return {
    code,
    stdout,
    stderr,
    outputs: parseOutputs(readFileSync(outputPath, 'utf8')),
    summary: readFileSync(summaryPath, 'utf8'),
    dir,
  };
}

/** GITHUB_OUTPUT holds `name<<DELIMITER\nvalue\nDELIMITER` blocks. */
export function parseOutputs(text: string): Record<string, string> {
  const out: Record<string, string> = {};
  const lines = text.split('\n');
  for (let i = 0; i < lines.length; i += 1) {
    const m = /^([^<=]+)<<(.+)$/.exec(lines[i] ?? '');
    if (m === null) continue;
    const [, name = '', delimiter] = m;
    const value: string[] = [];
    for (i += 1; i < lines.length && lines[i] !== delimiter; i += 1) value.push(lines[i] ?? '');
    out[name] = value.join('\n');
  }
  return out;
}

export const DEMO_COLUMNS =
  'series=zone,timestamp=target_date,origin=issued,actual=observed,prediction=forecast';

export function demoInputs(
  candidate: 'candidate.csv' | 'candidate-regressed.csv',
): Record<string, string> {
  return {
    baseline: 'examples/data/baseline.csv',
    candidate: `examples/data/${candidate}`,
    columns: DEMO_COLUMNS,
    resamples: '999',
  };
}

export function pullRequestEvent(number: number, headRepo = 'acme/models'): unknown {
  return {
    action: 'synchronize',
    number,
    pull_request: {
      number,
      head: { sha: 'c0ffee0000000000000000000000000000000001', repo: { full_name: headRepo } },
      base: { repo: { full_name: 'acme/models' } },
    },
    repository: { full_name: 'acme/models', name: 'models', owner: { login: 'acme' } },
  };
}
