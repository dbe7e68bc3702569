import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli } from './cliHelpers.js';

// Fixtures written by DuckDB from one table (test/corpus/parquet/generate.mjs): the same rows as
// Parquet (four codecs, row groups of 100 rows) and as CSV.
const dir = path.join(import.meta.dirname, '..', 'corpus', 'parquet');
const at = (name: string) => path.join(dir, name);

function report(baseline: string, candidate: string): Record<string, unknown> {
  const r = runCli([
    'compare',
    '--baseline',
    at(baseline),
    '--candidate',
    at(candidate),
    '--resamples',
    '999',
    '--json',
    '-',
  ]);
  expect(r.stderr).toBe('');
  expect([0, 1]).toContain(r.status);
  return JSON.parse(r.stdout);
}

/** The report as bytes, apart from the input section and the file names in the settings. */
function withoutInputs(report: Record<string, unknown>): string {
  const settings = report.settings as Record<string, unknown>;
  return JSON.stringify(
    { ...report, inputs: null, settings: { ...settings, baseline: '', candidate: '' } },
    null,
    2,
  );
}

describe('Parquet and CSV of the same data', () => {
  const csv = report('baseline.csv', 'candidate.csv');

  it.each(['snappy', 'gzip', 'zstd', 'uncompressed'])(
    'give byte-identical reports apart from the inputs (%s)',
    (codec) => {
      const parquet = report(`baseline-${codec}.parquet`, `candidate-${codec}.parquet`);
      expect(withoutInputs(parquet)).toBe(withoutInputs(csv));
      // The input sections agree too, except for file names, hashes and header spelling.
      const a = parquet.inputs as Record<string, unknown>;
      const b = csv.inputs as Record<string, unknown>;
      expect({ ...a, files: null }).toEqual({ ...b, files: null });
      expect((a.files as { rows: number }[]).map((f) => f.rows)).toEqual([360, 360]);
    },
  );

  it('mixes: a Parquet baseline against a CSV candidate gives the same report', () => {
    const mixed = report('baseline-zstd.parquet', 'candidate.csv');
    expect(withoutInputs(mixed)).toBe(withoutInputs(csv));
  });
});
