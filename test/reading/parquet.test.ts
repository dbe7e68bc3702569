import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/inputError.js';
import { readForecastFile } from '../../src/reading/readForecastFile.js';

// Fixtures written by DuckDB: test/corpus/parquet/generate.mjs.
const at = (name: string) => path.join(import.meta.dirname, '..', 'corpus', 'parquet', name);

describe('reading Parquet', () => {
  it('reads row group by row group, reporting progress after each', async () => {
    const progress: number[] = [];
    const grouped = await readForecastFile(at('row-groups.parquet'), {
      role: 'baseline',
      onProgress: (done, total) => progress.push(done / total),
    });
    expect(grouped.size).toBe(6144);
    // 6144 rows in row groups of 2048: three groups, three updates.
    expect(progress).toHaveLength(3);
    expect(progress[0]).toBeCloseTo(1 / 3, 2);
    expect(progress.at(-1)).toBe(1);
    expect(Array.from(grouped.lines.slice(2047, 2050))).toEqual([2049, 2050, 2051]);
    const table = await readForecastFile(at('baseline-zstd.parquet'), { role: 'baseline' });
    expect(table.size).toBe(360);
    expect(table.summary.columns).toEqual([
      'series',
      'timestamp',
      'horizon',
      'actual',
      'prediction',
    ]);
    expect(table.summary.sha256).toMatch(/^sha256:[0-9a-f]{64}$/);
    expect(table.timestamp.labels.slice(0, 2)).toEqual(['2026-01-01', '2026-01-02']);
  });

  it('gives the same typed columns as the CSV export of the same table', async () => {
    for (const codec of ['snappy', 'gzip', 'zstd', 'uncompressed']) {
      const parquet = await readForecastFile(at(`candidate-${codec}.parquet`), {
        role: 'candidate',
      });
      const csv = await readForecastFile(at('candidate.csv'), { role: 'candidate' });
      expect(Array.from(parquet.prediction!.values)).toEqual(Array.from(csv.prediction!.values));
      expect(Array.from(parquet.actual!.values)).toEqual(Array.from(csv.actual!.values));
      expect(Array.from(parquet.horizon!.values)).toEqual(Array.from(csv.horizon!.values));
      expect(parquet.series!.labels).toEqual(csv.series!.labels);
      expect(Array.from(parquet.lines)).toEqual(Array.from(csv.lines));
    }
  });

  it('renders TIMESTAMP as ISO 8601 UTC and INT64 as integers', async () => {
    const ts = await readForecastFile(at('timestamps.parquet'), { role: 'baseline' });
    expect(ts.timestamp.labels.slice(0, 2)).toEqual([
      '2026-01-01T00:00:00Z',
      '2026-01-01T01:00:00Z',
    ]);
    const ints = await readForecastFile(at('int64.parquet'), { role: 'baseline' });
    expect(ints.timestamp.labels.slice(0, 3)).toEqual(['1', '2', '3']);
    expect(Array.from(ints.horizon!.values.slice(0, 2))).toEqual([2, 2]);
  });

  it('refuses nested columns and files that are not Parquet, naming the file', async () => {
    await expect(readForecastFile(at('nested.parquet'), { role: 'baseline' })).rejects.toThrow(
      InputError,
    );
    await expect(
      readForecastFile(at('baseline.csv'), { role: 'baseline', format: 'parquet' }),
    ).rejects.toThrow(/not a readable Parquet file/);
  });
});
