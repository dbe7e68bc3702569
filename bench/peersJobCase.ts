// The peers' job done with skillgate's engine, in one process: read both files as the CLI does
// (`readForecastFiles`, at once on a reading worker when they are large), align them
// (`alignPanel`), absolute-error row losses (`computeRowLosses`), per-timestamp means
// (`aggregateByTime`) and the mean of the per-timestamp mean differentials, which is what the
// pandas script and the DuckDB query compute. No tests, checks or report. Prints the wall time in
// ms, the rows matched and that mean (to check it is the same job).
// Usage: node peersJobCase.mjs WORKER_URL|- BASELINE CANDIDATE
import { aggregateByTime, lossDifferential } from '../src/aggregation/lossSeries.js';
import { alignPanel } from '../src/alignment/alignPanel.js';
import { computeRowLosses } from '../src/losses/rowLosses.js';
import { readForecastFiles } from '../src/parallel/readForecastFiles.js';
import { mean as meanOf } from '../src/statistics/mean.js';

const [worker, baselineFile, candidateFile] = process.argv.slice(2);
const t0 = performance.now();
const [baseline, candidate] = await readForecastFiles(
  [
    { path: baselineFile!, options: { role: 'baseline' } },
    { path: candidateFile!, options: { role: 'candidate' } },
  ],
  worker === '-' || worker === undefined ? { threads: 1 } : { workerUrl: new URL(worker) },
);
const panel = alignPanel({ baseline: baseline!, candidate: candidate! });
const losses = computeRowLosses(panel, 'absolute', 'error');
const series = aggregateByTime(panel, losses);
const mean = meanOf(lossDifferential(series, 0));
process.stdout.write(`${JSON.stringify({ ms: performance.now() - t0, rows: panel.size, mean })}\n`);
