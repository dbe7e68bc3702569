// Benchmark section: reading Parquet against reading CSV of the same data (2 files × 1M rows),
// with the project's own readers, in child processes; medians of `runs` runs and the ratio
// measured in the same run. The Parquet files are written from the CSV files by DuckDB (dev
// dependency), snappy-compressed as DuckDB writes by default, and reused while they exist.
import { existsSync } from 'node:fs';
import path from 'node:path';
import { build } from 'esbuild';

export async function parquetReadingSection({
  root,
  work,
  cli,
  files,
  runs,
  measure,
  log,
  fmt,
  median,
}) {
  const caseFile = path.join(work, 'readFileCase.mjs');
  await build({
    absWorkingDir: root,
    entryPoints: ['bench/readFileCase.ts'],
    outfile: caseFile,
    bundle: true,
    platform: 'node',
    format: 'esm',
    logLevel: 'warning',
  });
  const parquet = {
    baseline: files.baseline.replace(/\.csv$/, '.parquet'),
    candidate: files.candidate.replace(/\.csv$/, '.parquet'),
  };
  if (!existsSync(parquet.baseline) || !existsSync(parquet.candidate)) {
    const { DuckDBInstance } = await import('@duckdb/node-api');
    const db = await DuckDBInstance.create(':memory:');
    const c = await db.connect();
    for (const side of ['baseline', 'candidate']) {
      const q = (p) => p.replaceAll("'", "''");
      await c.run(
        `copy (select * from read_csv('${q(files[side])}', header = true)) to '${q(parquet[side])}' (format parquet, compression snappy)`,
      );
    }
  }
  const read = (pair) => {
    const m = measure(process.execPath, [caseFile, pair.baseline, pair.candidate]);
    return { ...m, inner: JSON.parse(m.stdout).ms };
  };
  const compare = (pair) =>
    measure(
      process.execPath,
      [
        cli,
        'compare',
        '--baseline',
        pair.baseline,
        '--candidate',
        pair.candidate,
        '--quiet',
        '--resamples',
        '99',
      ],
      { okCodes: [0, 1] },
    );
  const csvRead = [];
  const pqRead = [];
  const csvAll = [];
  const pqAll = [];
  for (let r = 0; r < runs; r++) {
    csvRead.push(read(files));
    pqRead.push(read(parquet));
    csvAll.push(compare(files));
    pqAll.push(compare(parquet));
  }
  const result = {
    rows: files.rows,
    readCsvMs: median(csvRead.map((m) => m.inner)),
    readParquetMs: median(pqRead.map((m) => m.inner)),
    readCsvRss: Math.max(...csvRead.map((m) => m.rss ?? 0)),
    readParquetRss: Math.max(...pqRead.map((m) => m.rss ?? 0)),
    compareCsvMs: median(csvAll.map((m) => m.wall)),
    compareParquetMs: median(pqAll.map((m) => m.wall)),
  };
  result.readRatio = result.readParquetMs / result.readCsvMs;
  result.compareRatio = result.compareParquetMs / result.compareCsvMs;
  log(
    `4. reading Parquet against CSV of the same data: 2 files × ${files.rows} rows (${runs} runs)`,
  );
  log(
    '   case                          │ CSV        │ Parquet    │ ratio │ peak RSS CSV │ peak RSS Parquet',
  );
  log(
    `   reading both files            │ ${fmt(result.readCsvMs / 1000).padStart(8)} s │ ${fmt(result.readParquetMs / 1000).padStart(8)} s │ ${fmt(result.readRatio).padStart(4)}× │ ${fmt(result.readCsvRss).padStart(8)} MiB │ ${fmt(result.readParquetRss).padStart(8)} MiB`,
  );
  log(
    `   compare end to end (B = 99)   │ ${fmt(result.compareCsvMs / 1000).padStart(8)} s │ ${fmt(result.compareParquetMs / 1000).padStart(8)} s │ ${fmt(result.compareRatio).padStart(4)}× │`,
  );
  log();
  return result;
}
