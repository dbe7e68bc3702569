// Peer for the reading benchmark: DuckDB (dev dependency @duckdb/node-api) doing what
// bench/peer_pandas.py does, with its own CSV reader: join both files on (series, timestamp,
// horizon), absolute-error loss differential (candidate minus baseline, against the baseline's
// actual), mean per timestamp. Prints one JSON line: the time inside the process (ms, from
// before the database is opened to the last result), the joined rows, the timestamps and the
// mean of the per-timestamp means (the checksum the other peers must match). DuckDB uses every
// core by default. Usage: node bench/peerDuckdb.mjs BASELINE.csv CANDIDATE.csv

import { DuckDBInstance } from '@duckdb/node-api';

const [baseline, candidate] = process.argv.slice(2);
const quoted = (path) => `'${path.replaceAll("'", "''")}'`;
const start = performance.now();
const instance = await DuckDBInstance.create(':memory:');
const connection = await instance.connect();
const reader = await connection.runAndReadAll(`
  with per_timestamp as (
    select b.timestamp,
           avg(abs(c.prediction - b.actual) - abs(b.prediction - b.actual)) as differential,
           count(*) as rows
    from read_csv(${quoted(baseline)}, header = true) b
    join read_csv(${quoted(candidate)}, header = true) c using (series, timestamp, horizon)
    group by b.timestamp
  )
  select count(*)::integer, sum(rows)::bigint, avg(differential)::double from per_timestamp`);
const [timestamps, rows, mean] = reader.getRows()[0];
const ms = performance.now() - start;
connection.closeSync();
instance.closeSync();
process.stdout.write(
  `${JSON.stringify({ ms, rows: Number(rows), timestamps: Number(timestamps), mean })}\n`,
);
