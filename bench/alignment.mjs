// `node bench/alignment.mjs [--against REF] [--runs N] [--series S]`: alignPanel alone on the
// benchmark's two files of S × 1,000 rows (S = 1,000 by default: 2 × 1M rows; the baseline in
// series order, the candidate in time order, so alignment must sort), for the working tree and,
// with --against, for the source of a git revision (e.g. main), run alternately in child
// processes in the same run, so a loaded machine shifts both alike. Prints medians of the
// per-process medians, their ratio, and whether both produced the same panel (digest).
import { execFileSync, spawnSync } from 'node:child_process';
import { copyFileSync, mkdirSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { build } from 'esbuild';
import { writeForecastFile } from './generate.mjs';

const root = path.dirname(path.dirname(fileURLToPath(import.meta.url)));
const work = path.join(root, 'bench', '.work');
const args = process.argv.slice(2);
const option = (name, fallback) => {
  const i = args.indexOf(name);
  return i >= 0 ? args[i + 1] : fallback;
};
const against = option('--against', null);
const RUNS = Number(option('--runs', 5));
const SERIES = Number(option('--series', 1000));
mkdirSync(work, { recursive: true });

const tag = `${SERIES}x1000`;
const baseline = await writeForecastFile(path.join(work, `base-${tag}.csv`), {
  series: SERIES,
  times: 1000,
  seed: 1,
  spread: 4,
  order: 'series',
});
const candidate = await writeForecastFile(path.join(work, `cand-${tag}.csv`), {
  series: SERIES,
  times: 1000,
  seed: 2,
  spread: 4.4,
  order: 'time',
});

async function bundle(sourceRoot, outfile) {
  await build({
    absWorkingDir: sourceRoot,
    entryPoints: [path.join(sourceRoot, 'bench', 'alignCase.ts')],
    outfile,
    bundle: true,
    platform: 'node',
    format: 'esm',
    logLevel: 'warning',
    nodePaths: [path.join(root, 'node_modules')],
  });
  return outfile;
}

const cases = [
  { name: 'working tree', file: await bundle(root, path.join(work, 'alignCase.mjs')) },
];
if (against !== null) {
  const refRoot = path.join(work, 'align-ref');
  rmSync(refRoot, { recursive: true, force: true });
  mkdirSync(refRoot, { recursive: true });
  const archive = execFileSync('git', ['archive', against, 'src'], { cwd: root });
  execFileSync('tar', ['-x', '-C', refRoot], { input: archive });
  // The same case file, compiled against the revision's src/.
  mkdirSync(path.join(refRoot, 'bench'));
  copyFileSync(
    path.join(root, 'bench', 'alignCase.ts'),
    path.join(refRoot, 'bench', 'alignCase.ts'),
  );
  cases.unshift({
    name: against,
    file: await bundle(refRoot, path.join(work, 'alignCase-ref.mjs')),
  });
}

const median = (xs) => [...xs].sort((a, b) => a - b)[xs.length >> 1];
const load = () =>
  os
    .loadavg()
    .map((x) => x.toFixed(2))
    .join(' ');
process.stdout.write(
  `alignPanel alone, 2 × ${SERIES * 1000} rows, ${RUNS} processes each (7 calls per process)\n`,
);
process.stdout.write(`load average at start: ${load()}\n`);
const results = cases.map(() => []);
for (let r = 0; r < RUNS; r++) {
  cases.forEach((c, i) => {
    const out = spawnSync(process.execPath, [c.file, baseline, candidate], { encoding: 'utf8' });
    if (out.status !== 0) throw new Error(`${c.name}: ${out.stderr}`);
    results[i].push(JSON.parse(out.stdout));
  });
}
cases.forEach((c, i) => {
  const rs = results[i];
  process.stdout.write(
    `  ${c.name.padEnd(14)} first call ${median(rs.map((x) => x.first)).toFixed(0)} ms · median call ${median(rs.map((x) => x.median)).toFixed(0)} ms · best ${Math.min(...rs.map((x) => x.best)).toFixed(0)} ms · panel ${rs[0].digest}\n`,
  );
});
if (cases.length === 2) {
  const [a, b] = results.map((rs) => median(rs.map((x) => x.median)));
  const [fa, fb] = results.map((rs) => median(rs.map((x) => x.first)));
  const same = results[0][0].digest === results[1][0].digest;
  process.stdout.write(
    `  ratio ${against} / working tree: median call ${(a / b).toFixed(2)}×, first call ${(fa / fb).toFixed(2)}×; same panel: ${same ? 'yes' : 'NO'}\n`,
  );
}
process.stdout.write(`load average at end: ${load()}\n`);
