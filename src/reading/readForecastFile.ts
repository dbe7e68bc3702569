/**
 * Reads one forecast file: the file edge (`streamTextFile`) feeds the pure ForecastTableReader.
 */
import type { ColumnMapping } from './columnMapping.js';
import type { ForecastTable } from './forecastTable.js';
import { streamTextFile } from './streamTextFile.js';
import { type FileRole, ForecastTableReader, type TextFormat } from './tableBuilder.js';

export interface ReadOptions {
  readonly role: FileRole;
  readonly columns?: ColumnMapping;
  /** Overrides the format the file name implies (.tsv / .tsv.gz → tsv, else csv). */
  readonly format?: TextFormat;
  /** See ParseOptions.requireActual. */
  readonly requireActual?: boolean;
  /** Called after each chunk of stored bytes with the bytes read so far and the file size. */
  readonly onProgress?: (bytesRead: number, totalBytes: number) => void;
}

/** What the file name implies: gzip by a final `.gz`, TSV by `.tsv` before it (any case). */
export function formatFromPath(path: string): { format: TextFormat; gzip: boolean } {
  const lower = path.toLowerCase();
  const gzip = lower.endsWith('.gz');
  const base = gzip ? lower.slice(0, -3) : lower;
  return { format: base.endsWith('.tsv') ? 'tsv' : 'csv', gzip };
}

export async function readForecastFile(path: string, options: ReadOptions): Promise<ForecastTable> {
  const implied = formatFromPath(path);
  const format = options.format ?? implied.format;
  const reader = new ForecastTableReader(path, {
    role: options.role,
    format,
    ...(options.columns === undefined ? {} : { columns: options.columns }),
    ...(options.requireActual === undefined ? {} : { requireActual: options.requireActual }),
  });
  const sha256 = await streamTextFile(path, implied.gzip, reader, options.onProgress);
  return reader.finish(sha256);
}
