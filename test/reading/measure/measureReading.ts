/**
 * Measures reading + aligning two generated 1M-row files against a bare script that only splits
 * lines and fields (the figure in docs/decisions/0001-csv-reading.md). Not a test; run with
 *   npx esbuild test/reading/measure/measureReading.ts --bundle --platform=node --format=esm \
 *     --outfile=/tmp/measure-reading.mjs && node /tmp/measure-reading.mjs [rows]
 */
import { createReadStream, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { alignPanel } from '../../../src/alignment/alignPanel.js';
import { readForecastFile } from '../../../src/reading/readForecastFile.js';

const rows = Number(process.argv[2] ?? 1_000_000);
const seriesCount = 50;
const horizons = 10;
const times = Math.ceil(rows / seriesCount / horizons);

/** An invented panel: 50 stores, hourly timestamps, horizons 1..10; shuffled-free, key order. */
function generate(path: string, seed: number): void {
  let state = seed;
  const next = () => {
    state = (state * 1103515245 + 12345) % 2147483648;
    return state / 2147483648;
  };
  const parts: string[] = ['series,timestamp,horizon,actual,prediction\n'];
  const start = Date.UTC(2020, 0, 1);
  let written = 0;
  for (let s = 0; s < seriesCount && written < rows; s++) {
    for (let t = 0; t < times && written < rows; t++) {
      const stamp = `${new Date(start + t * 3_600_000).toISOString().slice(0, 19)}Z`;
      const actual = (100 + 10 * Math.sin(t / 24) + ((s * 7919 + t * 104729) % 1000) / 200).toFixed(
        3,
      );
      for (let h = 1; h <= horizons && written < rows; h++, written++) {
        parts.push(
          `store_${s},${stamp},${h},${actual},${(Number(actual) + next() * 4 - 2).toFixed(3)}\n`,
        );
      }
    }
  }
  writeFileSync(path, parts.join(''));
}

async function bare(paths: string[]): Promise<number> {
  const t0 = performance.now();
  let fields = 0;
  for (const path of paths) {
    let carry = '';
    for await (const chunk of createReadStream(path, {
      encoding: 'utf8',
      highWaterMark: 1 << 20,
    })) {
      const lines = (carry + chunk).split('\n');
      carry = lines.pop() ?? '';
      for (const line of lines) fields += line.split(',').length;
    }
  }
  if (fields === 0) throw new Error('nothing read');
  return performance.now() - t0;
}

async function ours(paths: [string, string]): Promise<{ read: number; total: number }> {
  const t0 = performance.now();
  const baseline = await readForecastFile(paths[0], { role: 'baseline' });
  const candidate = await readForecastFile(paths[1], { role: 'candidate' });
  const t1 = performance.now();
  const panel = alignPanel({ baseline, candidate });
  if (panel.size !== rows) throw new Error(`matched ${panel.size}`);
  return { read: t1 - t0, total: performance.now() - t0 };
}

const dir = mkdtempSync(join(tmpdir(), 'skillgate-measure-'));
try {
  const paths: [string, string] = [join(dir, 'baseline.csv'), join(dir, 'candidate.csv')];
  generate(paths[0], 1);
  generate(paths[1], 2);
  const results: { bare: number; read: number; total: number }[] = [];
  for (let run = 0; run < 5; run++) {
    const b = await bare(paths);
    const o = await ours(paths);
    results.push({ bare: b, ...o });
  }
  const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
  const m = {
    bare: median(results.map((r) => r.bare)),
    read: median(results.map((r) => r.read)),
    total: median(results.map((r) => r.total)),
  };
  console.log(`two files of ${rows} rows, median of 5 runs, node ${process.version}`);
  console.log(`bare split (lines and fields): ${m.bare.toFixed(0)} ms`);
  console.log(`readForecastFile ×2:           ${m.read.toFixed(0)} ms`);
  console.log(
    `read + alignPanel:             ${m.total.toFixed(0)} ms  (${(m.total / m.bare).toFixed(2)}× bare)`,
  );
} finally {
  rmSync(dir, { recursive: true, force: true });
}
