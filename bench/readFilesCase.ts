// One reading run for the benchmark: reads the files given on the command line as the CLI does
// (`readForecastFiles`: at once on reading workers when they are large), or one after the other
// in this thread when the worker argument is "-"; "--at-once" lowers the size threshold to 0 (for
// measuring where it should be). Prints the wall time in ms and the rows.
// Usage: node readFilesCase.mjs WORKER_URL|- [--at-once] FILE...
import { readForecastFiles } from '../src/parallel/readForecastFiles.js';

const [worker, ...rest] = process.argv.slice(2);
const atOnce = rest[0] === '--at-once';
const files = atOnce ? rest.slice(1) : rest;
const t0 = performance.now();
const tables = await readForecastFiles(
  files.map((path, i) => ({ path, options: { role: i === 0 ? 'baseline' : 'candidate' } })),
  worker === '-' || worker === undefined
    ? { threads: 1 }
    : { workerUrl: new URL(worker), ...(atOnce ? { minimumFileBytes: 0 } : {}) },
);
const rows = tables.reduce((sum, t) => sum + t.size, 0);
process.stdout.write(`${JSON.stringify({ ms: performance.now() - t0, rows })}\n`);
