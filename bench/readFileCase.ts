// One reading run for the benchmark: reads the files given on the command line with the
// project's reader (CSV or Parquet by extension) and prints the wall time in ms and the rows.
import { readForecastFile } from '../src/reading/readForecastFile.js';

const files = process.argv.slice(2);
const t0 = performance.now();
let rows = 0;
for (const [i, file] of files.entries()) {
  const table = await readForecastFile(file, { role: i === 0 ? 'baseline' : 'candidate' });
  rows += table.size;
}
process.stdout.write(`${JSON.stringify({ ms: performance.now() - t0, rows })}\n`);
