// The golden comments: invented scenarios (fixed seeds) run through the bundled CLI, and the
// Markdown each writes. `node test/report/golden/goldenScenarios.mjs` rewrites the committed
// golden files; test/e2e/goldenComment.test.ts regenerates them into a temporary folder and
// compares. Scenarios:
// - demo-pass / demo-fail: the demo backtest of examples/generate.mjs (examples/data),
// - warn: a short backtest of 20 days (too little data for a firm verdict),
// - missing-rows: a better candidate that lacks the hardest rows (one zone's longest horizon
//   during a warm spell), so the gate fails although its mean loss is lower on the common rows,
// - wide: 6 zones × 24 hourly-ahead horizons over 90 days, a candidate worse at long horizons.
import { spawnSync } from 'node:child_process';
import { copyFileSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const here = path.dirname(fileURLToPath(import.meta.url));
const root = path.resolve(here, '..', '..', '..');

function mulberry32(seed) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/**
 * An invented demand backtest: zones × days × horizons, AR(1) errors shared in part between the
 * two models. `candidateScale(zone, horizon, day)` scales the candidate's error; `keep(zone,
 * horizon, day, baselineError)` says whether the candidate has the row.
 */
function backtest({ seed, zones, days, horizons, candidateScale, keep = () => true }) {
  const random = mulberry32(seed);
  const normal = () => {
    const u = 1 - random();
    return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * random());
  };
  const start = Date.UTC(2026, 0, 1);
  const date = (i) => new Date(start + i * 86_400_000).toISOString().slice(0, 10);
  const header = 'zone,target_date,horizon,observed,forecast';
  const b = [header];
  const c = [header];
  zones.forEach((zone, z) => {
    for (const h of horizons) {
      let shared = 0;
      let ownB = 0;
      let ownC = 0;
      for (let i = 0; i < days; i++) {
        const scale = 0.8 + 0.05 * h;
        shared = 0.6 * shared + normal();
        ownB = 0.5 * ownB + normal();
        ownC = 0.5 * ownC + normal();
        const y = 40 + 5 * z + 3 * Math.sin((2 * Math.PI * i) / 7) + normal();
        const eb = scale * (shared + 0.55 * ownB);
        const ec = scale * candidateScale(zone, h, i) * (shared + 0.55 * ownC);
        const key = `${zone},${date(i)},${h},${y.toFixed(3)}`;
        b.push(`${key},${(y + eb).toFixed(3)}`);
        if (keep(zone, h, i, eb)) c.push(`${key},${(y + ec).toFixed(3)}`);
      }
    }
  });
  return { baseline: `${b.join('\n')}\n`, candidate: `${c.join('\n')}\n` };
}

const COLUMNS = 'series=zone,timestamp=target_date,actual=observed,prediction=forecast';
const DEMO_COLUMNS =
  'series=zone,timestamp=target_date,origin=issued,actual=observed,prediction=forecast';

export const SCENARIOS = [
  { name: 'demo-pass', demo: 'candidate.csv', args: ['--columns', DEMO_COLUMNS] },
  { name: 'demo-fail', demo: 'candidate-regressed.csv', args: ['--columns', DEMO_COLUMNS] },
  {
    name: 'warn',
    args: ['--columns', COLUMNS],
    files: () =>
      backtest({
        seed: 311,
        zones: ['north', 'south'],
        days: 20,
        horizons: [1, 2],
        candidateScale: () => 0.98,
      }),
  },
  {
    name: 'missing-rows',
    args: ['--columns', COLUMNS],
    files: () =>
      backtest({
        seed: 5261,
        zones: ['north', 'harbour', 'east'],
        days: 120,
        horizons: [1, 2, 3],
        candidateScale: () => 0.97,
        keep: (zone, h, i, eb) =>
          !(zone === 'harbour' && h >= 2 && i >= 50 && i < 100 && Math.abs(eb) > 0.6),
      }),
  },
  {
    name: 'wide',
    args: ['--columns', COLUMNS, '--policy', 'non-inferiority', '--margin', '0.02'],
    files: () =>
      backtest({
        seed: 9024,
        zones: ['zone-a', 'zone-b', 'zone-c', 'zone-d', 'zone-e', 'zone-f'],
        days: 90,
        horizons: Array.from({ length: 24 }, (_, i) => i + 1),
        candidateScale: (zone, h) => (h > 16 ? 1.06 : 0.99) * (zone === 'zone-f' ? 1.05 : 1),
      }),
  },
];

/** Writes each scenario's inputs to `work` and its Markdown comment to `out`/NAME.md. */
export function writeGoldens(work, out, cli = path.join(root, 'dist', 'cli.js')) {
  mkdirSync(work, { recursive: true });
  mkdirSync(out, { recursive: true });
  for (const s of SCENARIOS) {
    const dir = path.join(work, s.name);
    mkdirSync(dir, { recursive: true });
    if (s.demo !== undefined) {
      copyFileSync(
        path.join(root, 'examples', 'data', 'baseline.csv'),
        path.join(dir, 'baseline.csv'),
      );
      copyFileSync(path.join(root, 'examples', 'data', s.demo), path.join(dir, 'candidate.csv'));
    } else {
      const f = s.files();
      writeFileSync(path.join(dir, 'baseline.csv'), f.baseline);
      writeFileSync(path.join(dir, 'candidate.csv'), f.candidate);
    }
    const result = spawnSync(
      process.execPath,
      [
        cli,
        'compare',
        '--baseline',
        'baseline.csv',
        '--candidate',
        'candidate.csv',
        '--resamples',
        '999',
        ...s.args,
        '--json',
        'report.json',
        '--markdown',
        'report.md',
        '--quiet',
      ],
      { cwd: dir, encoding: 'utf8' },
    );
    if (result.status !== 0 && result.status !== 1) {
      throw new Error(`${s.name}: exit ${result.status}: ${result.stderr}`);
    }
    writeFileSync(path.join(out, `${s.name}.md`), readFileSync(path.join(dir, 'report.md')));
  }
}

if (process.argv[1] === fileURLToPath(import.meta.url)) {
  const work = path.join(root, 'tmp', 'golden-work');
  writeGoldens(work, here);
  console.log(
    `wrote ${SCENARIOS.map((s) => `${s.name}.md`).join(', ')} to ${path.relative(process.cwd(), here)}/`,
  );
}
