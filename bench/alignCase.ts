// alignPanel alone on two files: reads them with the project's reader (not timed), then times
// alignPanel RUNS times in this process and prints the first run, the median, and a digest of the
// panel (so two versions of the code can be checked to produce the same panel). Usage via
// bench/alignment.mjs.
import { createHash } from 'node:crypto';
import { alignPanel } from '../src/alignment/alignPanel.js';
import type { AlignedPanel } from '../src/core/panel.js';
import { readForecastFile } from '../src/reading/readForecastFile.js';

const [baselineFile, candidateFile, runsArg] = process.argv.slice(2);
const RUNS = Number(runsArg ?? 7);
const baseline = await readForecastFile(baselineFile!, { role: 'baseline' });
const candidate = await readForecastFile(candidateFile!, { role: 'candidate' });

/** sha256 over every column and label list of the panel, and its coverage. */
function digest(panel: AlignedPanel): string {
  const hash = createHash('sha256');
  const add = (value: unknown): void => {
    if (ArrayBuffer.isView(value)) {
      hash.update(new Uint8Array(value.buffer, value.byteOffset, value.byteLength));
    } else if (Array.isArray(value)) {
      hash.update(`[${value.length}`);
      for (const item of value) add(item);
    } else if (value !== null && typeof value === 'object') {
      for (const key of Object.keys(value).sort()) {
        hash.update(`${key}:`);
        add((value as Record<string, unknown>)[key]);
      }
    } else hash.update(`${JSON.stringify(value)};`);
  };
  add(panel);
  return hash.digest('hex').slice(0, 16);
}

const times: number[] = [];
let panel: AlignedPanel | null = null;
for (let r = 0; r < RUNS; r++) {
  const t0 = performance.now();
  panel = alignPanel({ baseline, candidate });
  times.push(performance.now() - t0);
}
const sorted = [...times].sort((a, b) => a - b);
process.stdout.write(
  `${JSON.stringify({
    rows: [baseline.size, candidate.size],
    matched: panel!.size,
    first: times[0],
    median: sorted[sorted.length >> 1],
    best: sorted[0],
    digest: digest(panel!),
  })}\n`,
);
