// Benchmark section: skillgate against what a user would run instead, on the same two files in
// the same run: a bare line-and-field split in Node (bench/bareSplit.mjs), a pandas script
// (bench/peer_pandas.py, Debian's python3-pandas) and DuckDB's CSV reader through
// @duckdb/node-api (bench/peerDuckdb.mjs), each joining the files on the key and averaging the
// absolute-error loss differential per timestamp. skillgate runs `compare --loss absolute` (the
// same loss) end to end, which
// also runs Diebold–Mariano, the integrity checks, the stationary bootstrap and the report; the
// peers do no bootstrap, so the fair row is the one with the fewest resamples (199), and the
// default (9,999) is shown beside it. Also: reading both files at once against one after the
// other (the CLI without its reading worker, and the reader alone), the reading-thread threshold
// by file size, and the tokenizer alone when bench/tokenizerCase.ts exists. Every case runs in
// its own child process, interleaved run by run so load drifts hit all alike; medians.

import { cpSync, existsSync, mkdirSync, readFileSync, rmSync, statSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { build } from 'esbuild';

const MiB = 2 ** 20;
/** The targets of the reading work (docs/performance.md, "Against the peers"). */
export const TARGETS = {
  pandasSpeedup: 2,
  duckdbProcessRatio: 1.5,
  rssMiB: 400,
  largeSeconds: 12,
  largeRssMiB: 2048,
  tokenizerMBps: 150,
};

const load = () =>
  os
    .loadavg()
    .map((x) => x.toFixed(2))
    .join(' ');

async function bundle(root, work, name) {
  const outfile = path.join(work, `${name}.mjs`);
  await build({
    absWorkingDir: root,
    entryPoints: [`bench/${name}.ts`],
    outfile,
    bundle: true,
    platform: 'node',
    format: 'esm',
    logLevel: 'warning',
  });
  return outfile;
}

/**
 * Builds what the section runs: the reading cases, the tokenizer case when its source exists,
 * and a copy of the CLI without its reading worker (which then reads in the calling thread, as
 * readForecastFiles does when the worker script is missing).
 */
export async function preparePeers({ root, work, distDir }) {
  const oneThreadDir = `${distDir}-one-thread`;
  rmSync(oneThreadDir, { recursive: true, force: true });
  mkdirSync(oneThreadDir, { recursive: true });
  for (const file of ['cli.js', 'resampleWorker.js']) {
    cpSync(path.join(distDir, file), path.join(oneThreadDir, file));
  }
  const tokenizerSource = path.join(root, 'bench', 'tokenizerCase.ts');
  return {
    cliOneThread: path.join(oneThreadDir, 'cli.js'),
    readFilesCase: await bundle(root, work, 'readFilesCase'),
    peersJobCase: await bundle(root, work, 'peersJobCase'),
    readingWorkerUrl: pathToFileURL(path.join(distDir, 'readingWorker.js')).href,
    tokenizerCase: existsSync(tokenizerSource) ? await bundle(root, work, 'tokenizerCase') : null,
  };
}

/** `compare` on the two files with the peers' loss, then `extra`. */
const compareArguments = (files, extra) => [
  'compare',
  '--baseline',
  files.baseline,
  '--candidate',
  files.candidate,
  '--quiet',
  '--loss',
  'absolute',
  ...extra,
];

const hasPandas = (spawnSync) =>
  spawnSync('/usr/bin/python3', ['-c', 'import pandas'], { encoding: 'utf8' }).status === 0;

/**
 * Runs every case on `files` `runs` times; returns per case the median wall (ms), the best
 * wall, the median in-process time where the case reports one, and the largest peak RSS (MiB).
 */
export function peersOnFiles({ root, cli, prepared, files, runs, measure, median, spawnSync }) {
  const compare = (command, resamples) => () =>
    measure(
      process.execPath,
      [
        command,
        ...compareArguments(files, resamples === null ? [] : ['--resamples', String(resamples)]),
      ],
      { okCodes: [0, 1] },
    );
  const inner = (m) => ({ ...m, inner: JSON.parse(m.stdout).ms, out: JSON.parse(m.stdout) });
  const pair = [files.baseline, files.candidate];
  const cases = [
    ['skillgate compare, default B = 9,999', compare(cli, null)],
    ['skillgate compare --resamples 199', compare(cli, 199)],
    [
      'skillgate compare --resamples 199, reading in one thread',
      compare(prepared.cliOneThread, 199),
    ],
    [
      'bare line-and-field split (Node)',
      () => measure(process.execPath, [path.join(root, 'bench', 'bareSplit.mjs'), ...pair]),
    ],
    ...(hasPandas(spawnSync)
      ? [
          [
            'pandas script',
            () =>
              inner(
                measure('/usr/bin/python3', [path.join(root, 'bench', 'peer_pandas.py'), ...pair]),
              ),
          ],
        ]
      : []),
    [
      'DuckDB (@duckdb/node-api)',
      () => inner(measure(process.execPath, [path.join(root, 'bench', 'peerDuckdb.mjs'), ...pair])),
    ],
    [
      "skillgate engine, the peers' job (read, align, mean)",
      () =>
        inner(
          measure(process.execPath, [prepared.peersJobCase, prepared.readingWorkerUrl, ...pair]),
        ),
    ],
    [
      'skillgate reader alone, both files at once',
      () =>
        inner(
          measure(process.execPath, [prepared.readFilesCase, prepared.readingWorkerUrl, ...pair]),
        ),
    ],
    [
      'skillgate reader alone, one file after the other',
      () => inner(measure(process.execPath, [prepared.readFilesCase, '-', ...pair])),
    ],
    ...(prepared.tokenizerCase === null
      ? []
      : [
          [
            'tokenizer alone, one thread',
            () => inner(measure(process.execPath, [prepared.tokenizerCase, ...pair])),
          ],
        ]),
  ];
  const measured = new Map(cases.map(([name]) => [name, []]));
  const loads = [load()];
  for (let r = 0; r < runs; r++) {
    for (const [name, run] of cases) measured.get(name).push(run());
    loads.push(load());
  }
  const results = {};
  for (const [name, ms] of measured) {
    const withInner = ms.filter((m) => m.inner !== undefined);
    results[name] = {
      wall: median(ms.map((m) => m.wall)),
      best: Math.min(...ms.map((m) => m.wall)),
      inner: withInner.length > 0 ? median(withInner.map((m) => m.inner)) : null,
      rss: Math.max(...ms.map((m) => m.rss ?? 0)),
      cpu: median(ms.map((m) => m.cpu ?? 0)),
      out: ms.at(-1).out ?? null,
    };
  }
  const bytes = statSync(files.baseline).size + statSync(files.candidate).size;
  return { rows: files.rows, bytes, runs, loads, results };
}

/** The checksum of the job, the same for every peer: skillgate's mean differential. */
export function skillgateMean({ cli, files, work, spawnSync }) {
  const json = path.join(work, 'peers-report.json');
  spawnSync(process.execPath, [
    cli,
    ...compareArguments(files, ['--resamples', '99', '--json', json]),
  ]);
  try {
    return JSON.parse(readFileSync(json, 'utf8')).comparisons[0].meanDifference;
  } catch {
    return null;
  }
}

export function printPeers({ peers, log, fmt, large, mean }) {
  const r = peers.results;
  const pandas = r['pandas script'];
  const duck = r['DuckDB (@duckdb/node-api)'];
  const fair = r['skillgate compare --resamples 199'];
  const oneThread = r['skillgate compare --resamples 199, reading in one thread'];
  const s = (ms) => `${fmt(ms / 1000)} s`;
  log(
    `   ${(peers.rows / 1e6).toFixed(0)}M rows per file, ${fmt(peers.bytes / 1e6)} MB in all; ${peers.runs} run(s), medians; load average (1/5/15 min) by run: ${peers.loads.join(' → ')}`,
  );
  log(
    '   case                                                      │    wall │ best run │ in process │ CPU (user+sys) │ peak RSS │ pandas ÷ case │ case ÷ DuckDB process',
  );
  for (const [name, c] of Object.entries(r)) {
    const vsPandas = pandas === undefined ? '—' : `${fmt(pandas.wall / c.wall)}×`;
    const vsDuck = duck === undefined ? '—' : `${fmt(c.wall / duck.wall)}×`;
    log(
      `   ${name.padEnd(57)} │ ${s(c.wall).padStart(7)} │ ${s(c.best).padStart(8)} │ ${(c.inner === null ? '—' : s(c.inner)).padStart(10)} │ ${s(c.cpu).padStart(14)} │ ${`${fmt(c.rss)} MiB`.padStart(8)} │ ${vsPandas.padStart(13)} │ ${vsDuck.padStart(8)}`,
    );
  }
  const means = [
    ['skillgate', mean],
    [
      "skillgate engine (peers' job)",
      r["skillgate engine, the peers' job (read, align, mean)"]?.out?.mean,
    ],
    ['pandas', pandas?.out?.mean],
    ['DuckDB', duck?.out?.mean],
  ].filter(([, m]) => m !== undefined && m !== null);
  log(
    `   same job: mean per-timestamp loss differential ${means.map(([n, m]) => `${n} ${m.toPrecision(10)}`).join(', ')}`,
  );
  const readAtOnce = r['skillgate reader alone, both files at once'];
  const readInOrder = r['skillgate reader alone, one file after the other'];
  log(
    `   both files at once: reader alone ${fmt(readInOrder.inner / readAtOnce.inner)}× faster (in process), compare end to end ${fmt(oneThread.wall / fair.wall)}× (${s(oneThread.wall)} → ${s(fair.wall)})`,
  );
  const verdict = (ok) => (ok ? 'met' : 'NOT met');
  const job = r["skillgate engine, the peers' job (read, align, mean)"];
  if (job !== undefined) {
    log(
      `   the peers' job in skillgate's engine: ${s(job.wall)}${pandas === undefined ? '' : `, ${fmt(pandas.wall / job.wall)}× faster than pandas`}${duck === undefined ? '' : `, ${fmt(job.wall / duck.wall)}× DuckDB's process time`} (whole processes)`,
    );
  }
  if (!large) {
    if (pandas !== undefined) {
      const speedup = pandas.wall / fair.wall;
      log(
        `   target: ≥ ${TARGETS.pandasSpeedup}× faster than pandas: ${fmt(speedup)}× (B = 199), ${fmt(pandas.wall / r['skillgate compare, default B = 9,999'].wall)}× (B = 9,999): ${verdict(speedup >= TARGETS.pandasSpeedup)}`,
      );
    }
    const vsDuck = fair.wall / duck.wall;
    log(
      `   target: within ${TARGETS.duckdbProcessRatio}× of DuckDB's process time: ${fmt(vsDuck)}× (B = 199): ${verdict(vsDuck <= TARGETS.duckdbProcessRatio)}`,
    );
    const rss = Math.max(fair.rss, r['skillgate compare, default B = 9,999'].rss);
    log(
      `   target: peak memory < ${TARGETS.rssMiB} MiB: ${fmt(rss)} MiB: ${verdict(rss < TARGETS.rssMiB)}`,
    );
  } else {
    const wall = r['skillgate compare, default B = 9,999'].wall;
    log(
      `   target: < ${TARGETS.largeSeconds} s: ${s(wall)} (B = 9,999), ${s(fair.wall)} (B = 199): ${verdict(wall < TARGETS.largeSeconds * 1000)}`,
    );
    const rss = Math.max(fair.rss, r['skillgate compare, default B = 9,999'].rss);
    log(
      `   target: < ${TARGETS.largeRssMiB / 1024} GiB: ${fmt(rss)} MiB: ${verdict(rss < TARGETS.largeRssMiB)}`,
    );
  }
  const tokenizer = r['tokenizer alone, one thread'];
  if (tokenizer !== undefined) {
    // Per core: from the case's own CPU time when it reports one (the wall time on a shared
    // machine also holds the time spent waiting for a core).
    const { bytes, ms, cpuMs } = tokenizer.out;
    const mbps = (t) => bytes / 1e6 / (t / 1000);
    const perCore = mbps(cpuMs ?? ms);
    log(
      `   target: tokenizer alone ≥ ${TARGETS.tokenizerMBps} MB/s per core: ${fmt(perCore)} MB/s of CPU, ${fmt(mbps(ms))} MB/s of wall time (last run, ${fmt(bytes / 1e6)} MB): ${verdict(perCore >= TARGETS.tokenizerMBps)}`,
    );
  } else {
    log('   tokenizer alone: bench/tokenizerCase.ts is not there yet');
  }
}

/**
 * Reading two files of the same size at once against one after the other, by size: where the
 * reading worker starts to pay (MINIMUM_PARALLEL_FILE_BYTES in src/parallel/readForecastFiles.ts).
 */
export function readingThreshold({ prepared, pairs, runs, measure, median, log, fmt }) {
  log(
    `   reading threads by file size (reader alone, in process, ${runs} runs, medians; load ${load()}):`,
  );
  const rows = [];
  for (const files of pairs) {
    const once = [];
    const inOrder = [];
    const pair = [files.baseline, files.candidate];
    for (let r = 0; r < runs; r++) {
      inOrder.push(
        JSON.parse(measure(process.execPath, [prepared.readFilesCase, '-', ...pair]).stdout).ms,
      );
      once.push(
        JSON.parse(
          measure(process.execPath, [
            prepared.readFilesCase,
            prepared.readingWorkerUrl,
            '--at-once',
            ...pair,
          ]).stdout,
        ).ms,
      );
    }
    const bytes = statSync(files.baseline).size;
    const row = { bytes, inOrder: median(inOrder), atOnce: median(once) };
    rows.push(row);
    log(
      `     2 × ${fmt(bytes / MiB)} MiB: one after the other ${fmt(row.inOrder)} ms, at once ${fmt(row.atOnce)} ms (${fmt(row.inOrder / row.atOnce)}×)`,
    );
  }
  log(`     load at the end: ${load()}`);
  return rows;
}
