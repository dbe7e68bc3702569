// Writes the demo backtest under examples/data/: an invented water utility, "Harbour Valley
// Water", forecasting daily demand (megalitres) in four pressure zones, 1 to 3 days ahead, over
// 240 days. Five models: the current one on main (baseline.csv), a pull request that improves
// it (candidate.csv), one that regresses in two zones (candidate-regressed.csv), one whose
// backtest peeks at the future (candidate-peeking.csv), and one that is better for most of the
// backtest but worse in its last six weeks (candidate-late.csv). Invented
// data, for the demo and examples only. Fixed seed: the files are the same on every run.
import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const here = path.dirname(fileURLToPath(import.meta.url));
const out = path.join(here, 'data');
mkdirSync(out, { recursive: true });

// mulberry32: a tiny seeded generator, good enough for invented demo data.
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
const random = mulberry32(20261201);
// A second stream for the late-regressing candidate, so the other files stay as they were.
const lateRandom = mulberry32(20261202);
const lateNormal = () => {
  const u = 1 - lateRandom();
  const v = lateRandom();
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
};
// From this day on (the last 42 of 240) the late candidate's errors are about 30% larger in
// squared loss than the baseline's; before, it is the improved candidate.
const lateFrom = 240 - 42;
const normal = () => {
  const u = 1 - random();
  const v = random();
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
};

const zones = [
  { name: 'north-ridge', level: 42 },
  { name: 'old-town', level: 65 },
  { name: 'harbourside', level: 31 },
  { name: 'east-meadows', level: 18 },
];
const days = 240;
const horizons = [1, 2, 3];
const start = Date.UTC(2026, 2, 1);
const date = (i) => new Date(start + i * 86_400_000).toISOString().slice(0, 10);

// A shared warm-spell signal: demand rises on hot days in every zone at once.
const heat = [];
let h = 0;
for (let i = 0; i < days + 3; i++) {
  h = 0.8 * h + normal();
  heat.push(h);
}

const header = 'zone,target_date,horizon,issued,observed,forecast';
const rows = {
  baseline: [header],
  candidate: [header],
  regressed: [header],
  peeking: [header],
  late: [header],
};
for (const zone of zones) {
  const actual = [];
  let noise = 0;
  for (let i = 0; i < days + 3; i++) {
    noise = 0.6 * noise + normal();
    const weekly = [1.04, 1.0, 0.99, 0.98, 1.0, 1.06, 1.1][i % 7];
    actual.push(zone.level * weekly * (1 + 0.03 * heat[i]) + 0.9 * noise);
  }
  for (const horizon of horizons) {
    // Errors grow with the horizon and are serially dependent (AR(1)); baseline and candidate
    // share most of their error, as two versions of one model do.
    let shared = 0;
    let ownB = 0;
    let ownC = 0;
    let ownL = 0;
    for (let i = 3; i < days + 3; i++) {
      const scale = 0.8 + 0.35 * horizon;
      shared = 0.6 * shared + normal();
      ownB = 0.5 * ownB + normal();
      ownC = 0.5 * ownC + normal();
      const y = actual[i];
      const baseline = y + scale * (shared + 0.55 * ownB);
      const candidate = y + scale * (0.93 * shared + 0.45 * ownC);
      const worse = zone.name === 'old-town' || zone.name === 'harbourside' ? 1.1 : 1.0;
      const regressed = y + scale * worse * (shared + 0.55 * ownC);
      ownL = 0.5 * ownL + lateNormal();
      const late = i - 3 < lateFrom ? candidate : y + scale * (1.15 * shared + 0.6 * ownL);
      const key = `${zone.name},${date(i)},${horizon},${date(i - horizon)},${y.toFixed(3)}`;
      rows.baseline.push(`${key},${baseline.toFixed(3)}`);
      rows.candidate.push(`${key},${candidate.toFixed(3)}`);
      rows.regressed.push(`${key},${regressed.toFixed(3)}`);
      rows.late.push(`${key},${late.toFixed(3)}`);
      // A pull request whose backtest peeks: its one-day-ahead forecasts are issued on the
      // target date itself, after the demand was observed, and simply repeat it. No new random
      // draws, so the other files stay the same.
      rows.peeking.push(
        horizon === 1
          ? `${zone.name},${date(i)},${horizon},${date(i)},${y.toFixed(3)},${y.toFixed(3)}`
          : `${key},${candidate.toFixed(3)}`,
      );
    }
  }
}
writeFileSync(path.join(out, 'baseline.csv'), `${rows.baseline.join('\n')}\n`);
writeFileSync(path.join(out, 'candidate.csv'), `${rows.candidate.join('\n')}\n`);
writeFileSync(path.join(out, 'candidate-regressed.csv'), `${rows.regressed.join('\n')}\n`);
writeFileSync(path.join(out, 'candidate-late.csv'), `${rows.late.join('\n')}\n`);
writeFileSync(path.join(out, 'candidate-peeking.csv'), `${rows.peeking.join('\n')}\n`);
console.log(
  `wrote ${rows.baseline.length - 1} rows per model to ${path.relative(process.cwd(), out)}/`,
);
