import { execFileSync, spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

// The npm package of the CLI as a user gets it: `npm pack` of this checkout (with the committed
// dist/), installed from the tarball into an empty project without the network, then run
// through npx. The bundles carry every runtime dependency, so the install needs nothing else.
const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
const pkg = JSON.parse(readFileSync(path.join(root, 'package.json'), 'utf8'));
const npm = process.platform === 'win32' ? 'npm.cmd' : 'npm';
const npx = process.platform === 'win32' ? 'npx.cmd' : 'npx';

let work: string;
let project: string;
let files: string[];
beforeAll(() => {
  work = mkdtempSync(path.join(tmpdir(), 'skillgate-pack-'));
  const packed = JSON.parse(
    execFileSync(npm, ['pack', '--json', '--pack-destination', work], {
      cwd: root,
      encoding: 'utf8',
      stdio: ['ignore', 'pipe', 'pipe'],
    }),
  ) as { filename: string; files: { path: string }[] }[];
  const tarball = path.join(work, packed[0]!.filename);
  files = packed[0]!.files.map((f) => f.path);
  project = path.join(work, 'project');
  mkdirSync(project);
  writeFileSync(path.join(project, 'package.json'), '{"name":"try-skillgate","private":true}\n');
  execFileSync(
    npm,
    ['install', '--offline', '--no-audit', '--no-fund', '--ignore-scripts', tarball],
    { cwd: project, stdio: ['ignore', 'pipe', 'pipe'] },
  );
}, 120_000);
afterAll(() => {
  rmSync(work, { recursive: true, force: true });
});

const runNpx = (args: string[]) =>
  spawnSync(npx, ['--offline', 'skillgate', ...args], {
    cwd: project,
    encoding: 'utf8',
    timeout: 120_000,
    env: { ...process.env, NO_COLOR: '1' },
  });

describe('npm pack → install from the tarball → npx skillgate', () => {
  it('ships the bundles, the action, the schema and the licence; no sources, no dependencies', () => {
    expect(files).toEqual(
      expect.arrayContaining([
        'LICENSE',
        'README.md',
        'package.json',
        'action.yml',
        'dist/cli.js',
        'dist/index.js',
        'dist/resampleWorker.js',
        'dist/readingWorker.js',
        'docs/report.schema.json',
      ]),
    );
    expect(files.filter((f) => f.startsWith('src/') || f.startsWith('test/'))).toEqual([]);
    const installed = JSON.parse(
      readFileSync(path.join(project, 'node_modules/skillgate/package.json'), 'utf8'),
    );
    expect(installed.dependencies ?? {}).toEqual({});
  });

  it('--version prints the package version', () => {
    const result = runNpx(['--version']);
    expect(result.stderr).toBe('');
    expect(result.status).toBe(0);
    expect(result.stdout.trim()).toBe(pkg.version);
  });

  it('runs one comparison on the demo data', () => {
    const data = (f: string) => path.join(root, 'examples/data', f);
    const result = runNpx([
      'compare',
      '--baseline',
      data('baseline.csv'),
      '--candidate',
      data('candidate-regressed.csv'),
      '--columns',
      'series=zone,timestamp=target_date,origin=issued,actual=observed,prediction=forecast',
      '--resamples',
      '199',
      '--json',
      path.join(project, 'report.json'),
    ]);
    expect(result.status).toBe(1);
    const report = JSON.parse(readFileSync(path.join(project, 'report.json'), 'utf8'));
    expect(report.verdict).toBe('fail');
    expect(report.tool.version).toBe(pkg.version);
  });
});
