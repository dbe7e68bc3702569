// Writes the Parquet fixtures of test/corpus/parquet with DuckDB (the @duckdb/node-api dev
// dependency), and CSV exports of the same tables for the Parquet-equals-CSV test.
// Run: node test/corpus/parquet/generate.mjs  (deterministic: no random numbers; the values are
// sines and cosines of the row number).
//
// No second Parquet writer is used: Debian's archive has none (`apt-cache search parquet` lists
// no pyarrow, fastparquet or other Parquet package), so DuckDB is the only independent writer.
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { DuckDBInstance } from '@duckdb/node-api';

const here = import.meta.dirname;
mkdirSync(here, { recursive: true });
const out = (name) => path.join(here, name).replaceAll("'", "''");
const db = await DuckDBInstance.create(':memory:');
const c = await db.connect();

// 3 series × 60 days × horizons 1–2 = 360 rows (DuckDB writes row groups of at least 2048 rows,
// so these files have one; row-groups.parquet below has several).
await c.run(`create table baseline as
  select 'zone-' || (i % 3) as series,
         date '2026-01-01' + ((i // 6))::int as timestamp,
         ((i // 3) % 2 + 1)::int as horizon,
         round(sin(i / 7.0) * 10 + 50, 6) as actual,
         sin(i / 7.0) * 10 + 50 + cos(i * 1.3) * 2 as prediction
  from range(360) r(i)`);
await c.run(`create table candidate as
  select series, timestamp, horizon, actual,
         actual + (prediction - actual) * 0.9 + 0.05 as prediction
  from baseline`);
for (const codec of ['snappy', 'gzip', 'zstd', 'uncompressed']) {
  for (const table of ['baseline', 'candidate']) {
    await c.run(
      `copy ${table} to '${out(`${table}-${codec}.parquet`)}' (format parquet, compression ${codec}, row_group_size 100)`,
    );
  }
}
for (const table of ['baseline', 'candidate']) {
  await c.run(`copy ${table} to '${out(`${table}.csv`)}' (header, delimiter ',')`);
}

// Hostile or unusual files.
await c.run(`copy (select 1 as timestamp, [1, 2] as actual, 1.0 as prediction)
  to '${out('nested.parquet')}' (format parquet)`);
await c.run(`copy (select i as timestamp, 1.0 as actual,
    case when i = 3 then null else 1.5 end as prediction from range(1, 6) r(i))
  to '${out('null-prediction.parquet')}' (format parquet)`);
await c.run(`copy (select i as timestamp, 1.0 as actual,
    case when i = 4 then 'nan'::double else 1.5 end as prediction from range(1, 6) r(i))
  to '${out('nan-prediction.parquet')}' (format parquet)`);
await c.run(`copy (select timestamp '2026-01-01 00:00:00' + to_hours(i) as timestamp,
    1.0 as actual, 1.0 + i / 10 as prediction from range(40) r(i))
  to '${out('timestamps.parquet')}' (format parquet)`);
await c.run(`copy (select i::bigint as timestamp, 2::bigint as horizon, 1.0 as actual,
    1.0 + i / 10 as prediction from range(1, 41) r(i))
  to '${out('int64.parquet')}' (format parquet)`);
await c.run(`copy (select i as timestamp, 1.0 as actual, 1.5 as prediction
    from range(1, 6) r(i) union all select 2, 1.0, 1.5)
  to '${out('duplicate-key.parquet')}' (format parquet)`);
// 6144 rows in row groups of 2048: three groups, to see reading and progress group by group.
await c.run(`copy (select 's' || (i % 4) as series, (i // 4)::int as timestamp,
    sin(i) as actual, sin(i) + 0.1 as prediction from range(6144) r(i))
  to '${out('row-groups.parquet')}' (format parquet, row_group_size 2048)`);
console.log('wrote Parquet fixtures to', here);
