// The block-length sweep of `npm run bench` (docs/performance.md): the stationary bootstrap at
// n = 100,000 for b = 1, 2, 5, 20, 68, in one thread, against the vectorised numpy peer and
// against the previous block-draw path (the RandomSource interface over pure-rand, one word per
// step), all measured in the same run. Short blocks mean many blocks: at b = 1 a resample has n.
// Every case runs in a child process; wall and CPU milliseconds are medians over the runs. On a
// shared machine the CPU time is the fairer measure (it leaves out time spent waiting for a
// core); both are printed, and the ratios are taken within the run.

import { spawnSync } from 'node:child_process';
import { existsSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { autoregressiveSeries } from './generate.mjs';

const median = (xs) => {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 === 1 ? s[m] : (s[m - 1] + s[m]) / 2;
};

function child(command, args, cwd) {
  const result = spawnSync(command, args, { cwd, encoding: 'utf8', maxBuffer: 1 << 26 });
  if (result.status !== 0) {
    throw new Error(`${command} ${args.join(' ')} exited with ${result.status}: ${result.stderr}`);
  }
  return JSON.parse(result.stdout);
}

/**
 * Runs the sweep and returns its rows; `log` prints the table. Resample counts differ by
 * implementation (each sized to take about a second or less per run) and are compared per
 * resample.
 */
export function blockLengthSweep({
  work,
  root,
  bootstrapCase,
  runs,
  log,
  n = 100_000,
  blockLengths = [1, 2, 5, 20, 68],
  resamples = 999,
  previousResamples = 200,
  numpyResamples = 40,
  hasNumpy = true,
}) {
  const file = path.join(work, `series-${n}-phi0.6.f64`);
  if (!existsSync(file)) {
    const d = autoregressiveSeries(n, 0.6, 5);
    writeFileSync(file, Buffer.from(d.buffer, d.byteOffset, d.byteLength));
  }
  const measure = (implementation, b, count) => {
    const walls = [];
    const cpus = [];
    for (let r = 0; r < runs; r++) {
      const out =
        implementation === 'numpy'
          ? child(
              '/usr/bin/python3',
              [path.join(root, 'bench', 'bootstrap_numpy.py'), file, String(b), String(count), '1'],
              work,
            )
          : child(
              process.execPath,
              [bootstrapCase, implementation, file, String(b), String(count), '1'],
              work,
            );
      walls.push(out.wall);
      cpus.push(out.cpu);
    }
    return {
      wall: median(walls) / count,
      cpu: median(cpus) / count,
      bestCpu: Math.min(...cpus) / count,
    };
  };
  const ms = (x) => `${x.toFixed(3)} ms`;
  log(
    `   block-length sweep, n = ${n}, 1 thread (per resample: median wall / median CPU over ${runs} runs; ns per block from CPU)`,
  );
  log(
    '     b │ skillgate wall / CPU   │ ns/block │ previous path CPU │ ns/block │ numpy wall / CPU      │ numpy ÷ skillgate (CPU / wall) │ previous ÷ skillgate (CPU) │ best runs: ns/block, previous, numpy ÷ skillgate',
  );
  const rows = [];
  for (const b of blockLengths) {
    const ours = measure('single', b, resamples);
    const before = measure('previous', b, previousResamples);
    const numpy = hasNumpy ? measure('numpy', b, numpyResamples) : null;
    const blocks = n / b;
    const row = {
      b,
      skillgate: ours,
      previous: before,
      numpy,
      nsPerBlock: (ours.cpu * 1e6) / blocks,
      previousNsPerBlock: (before.cpu * 1e6) / blocks,
      numpyOverSkillgateCpu: numpy === null ? null : numpy.cpu / ours.cpu,
      numpyOverSkillgateWall: numpy === null ? null : numpy.wall / ours.wall,
      previousOverSkillgateCpu: before.cpu / ours.cpu,
      // Other work on the machine only ever adds time: the best runs are the least disturbed.
      bestNsPerBlock: (ours.bestCpu * 1e6) / blocks,
      bestPreviousNsPerBlock: (before.bestCpu * 1e6) / blocks,
      bestNumpyOverSkillgateCpu: numpy === null ? null : numpy.bestCpu / ours.bestCpu,
    };
    rows.push(row);
    log(
      `  ${String(b).padStart(4)} │ ${ms(ours.wall).padStart(9)} / ${ms(ours.cpu).padStart(9)} │ ${row.nsPerBlock.toFixed(1).padStart(8)} │ ${ms(before.cpu).padStart(17)} │ ${row.previousNsPerBlock.toFixed(1).padStart(8)} │ ${numpy === null ? 'not installed'.padStart(21) : `${ms(numpy.wall).padStart(9)} / ${ms(numpy.cpu).padStart(9)}`} │ ${numpy === null ? '' : `${row.numpyOverSkillgateCpu.toFixed(2)}× / ${row.numpyOverSkillgateWall.toFixed(2)}×`.padStart(30)} │ ${`${row.previousOverSkillgateCpu.toFixed(2)}×`.padStart(26)} │ ${row.bestNsPerBlock.toFixed(1)}, ${row.bestPreviousNsPerBlock.toFixed(1)}, ${numpy === null ? '—' : `${row.bestNumpyOverSkillgateCpu.toFixed(2)}×`}`,
    );
  }
  return rows;
}
