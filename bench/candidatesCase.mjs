// Several candidates end to end (bench section "several candidates"): k = 20 candidate files of
// n = 10,000 time points against one baseline, B = 9,999, through the CLI, against one two-model
// comparison of the same size measured in the same run. `node bench/candidatesCase.mjs [--runs N]`
// runs this section alone (building the CLI under bench/.work/); bench/run.mjs runs it as well.

import { execFileSync, spawnSync } from 'node:child_process';
import { mkdirSync, rmSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { writeForecastFile } from './generate.mjs';

const K = 20;
const N = 10_000;
const B = 9999;

/**
 * Measures both cases `runs` times each (alternating, so load drifts hit both alike) and returns
 * medians in ms, the ratio, and the per-candidate cost.
 */
export async function candidatesSection({ cli, work, runs, log }) {
  const file = (name, seed, spread) =>
    writeForecastFile(path.join(work, `k-${name}.csv`), {
      series: 1,
      times: N,
      seed,
      spread,
      order: 'time',
    });
  const baseline = await file('baseline', 101, 4);
  const candidates = [];
  for (let k = 1; k <= K; k++)
    candidates.push([`m${k}`, await file(`m${k}`, 101 + k, 4 + 0.02 * k)]);
  const base = ['compare', '--baseline', baseline, '--resamples', String(B), '--quiet'];
  const two = [...base, '--candidate', candidates[0][1]];
  const many = [...base, ...candidates.flatMap(([name, p]) => ['--candidate', `${name}=${p}`])];
  const time = (args) => {
    const t0 = performance.now();
    const r = spawnSync(process.execPath, [cli, ...args], { cwd: work, encoding: 'utf8' });
    const wall = performance.now() - t0;
    if (r.status !== 0 && r.status !== 1) throw new Error(`exit ${r.status}: ${r.stderr}`);
    return wall;
  };
  const pairs = [];
  const kWalls = [];
  for (let r = 0; r < runs; r++) {
    pairs.push(time(two));
    kWalls.push(time(many));
  }
  const median = (xs) => {
    const s = [...xs].sort((a, b) => a - b);
    const m = s.length >> 1;
    return s.length % 2 === 1 ? s[m] : (s[m - 1] + s[m]) / 2;
  };
  const result = { k: K, n: N, resamples: B, runs, pair: median(pairs), many: median(kWalls) };
  result.ratio = result.many / result.pair;
  result.perCandidate = result.ratio / K;
  log(
    `several candidates: k = ${K}, n = ${N}, B = ${B}, end to end through the CLI (${runs} runs each, medians)`,
  );
  log(`   one two-model comparison │ ${(result.pair / 1000).toFixed(2)} s`);
  log(`   ${K} candidates (SPA, MCS) │ ${(result.many / 1000).toFixed(2)} s`);
  log(
    `   ratio ${result.ratio.toFixed(1)}× (${result.perCandidate.toFixed(2)}× a two-model comparison per candidate)`,
  );
  return result;
}

if (process.argv[1] === fileURLToPath(import.meta.url)) {
  const root = path.dirname(path.dirname(fileURLToPath(import.meta.url)));
  const work = path.join(root, 'bench', '.work');
  mkdirSync(work, { recursive: true });
  const distDir = path.join(work, 'dist-candidates');
  rmSync(distDir, { recursive: true, force: true });
  execFileSync(process.execPath, [path.join(root, 'scripts', 'build.mjs'), distDir], { cwd: root });
  const i = process.argv.indexOf('--runs');
  const runs = i >= 0 ? Number(process.argv[i + 1]) : 3;
  await candidatesSection({
    cli: path.join(distDir, 'cli.js'),
    work,
    runs,
    log: (line) => process.stdout.write(`${line}\n`),
  });
}
