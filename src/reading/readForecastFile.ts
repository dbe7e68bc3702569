/**
 * Reads one forecast file: the file edge (`streamTextFile` for CSV/TSV, `streamParquetFile` for
 * Parquet) feeds the pure ForecastTableReader.
 */
import type { ColumnMapping } from './columnMapping.js';
import type { ForecastTable } from './forecastTable.js';
import { type FileRole, ForecastTableReader } from './forecastTableReader.js';
import { type FileFormat, formatFromPath, type TextFormat } from './formatDetection.js';
import { type DecimalMark, type DelimiterName, delimiterFor } from './inputFormat.js';
import { streamParquetFile } from './streamParquetFile.js';
import { streamTextFile } from './streamTextFile.js';

export type { FileRole } from './forecastTableReader.js';

export interface ReadOptions {
  readonly role: FileRole;
  readonly columns?: ColumnMapping;
  /** Overrides the format the file name implies (.parquet → parquet, .tsv / .tsv.gz → tsv, else csv). */
  readonly format?: FileFormat;
  /** See ParseOptions.requireActual. */
  readonly requireActual?: boolean;
  /** CSV dialect (ignored for Parquet). */
  readonly delimiter?: DelimiterName;
  readonly decimal?: DecimalMark;
  readonly lineLimit?: number;
  /** Called after each chunk of stored bytes with the bytes read so far and the file size. */
  readonly onProgress?: (bytesRead: number, totalBytes: number) => void;
}

export async function readForecastFile(path: string, options: ReadOptions): Promise<ForecastTable> {
  const implied = formatFromPath(path);
  const format = options.format ?? implied.format;
  const textFormat: TextFormat = format === 'tsv' ? 'tsv' : 'csv';
  const reader = new ForecastTableReader(path, {
    role: options.role,
    format: textFormat,
    delimiter: delimiterFor(options.delimiter ?? 'auto', textFormat === 'tsv'),
    ...(format === 'parquet' ? {} : withDialect(options)),
    ...(options.columns === undefined ? {} : { columns: options.columns }),
    ...(options.requireActual === undefined ? {} : { requireActual: options.requireActual }),
  });
  const sha256 =
    format === 'parquet'
      ? await streamParquetFile(path, reader, options.onProgress)
      : await streamTextFile(path, implied.gzip, reader, (bytesRead, totalBytes) => {
          // The stored size is the text's size unless it is gzipped.
          if (!implied.gzip) reader.expectBytes(totalBytes);
          options.onProgress?.(bytesRead, totalBytes);
        });
  return reader.finish(sha256);
}

function withDialect(options: ReadOptions): { decimal?: DecimalMark; lineLimit?: number } {
  return {
    ...(options.decimal === undefined ? {} : { decimal: options.decimal }),
    ...(options.lineLimit === undefined ? {} : { lineLimit: options.lineLimit }),
  };
}
