import { InputError } from '../core/inputError.js';
import { type FileFormat, formatFromPath } from './formatDetection.js';
import { type DecimalMark, type DelimiterName, delimiterFor } from './inputFormat.js';
import { LossSeriesReader, type LossSeriesTable } from './lossSeriesReader.js';
import { streamTextFile } from './streamTextFile.js';

/** Reads a pre-aggregated loss file (see LossSeriesReader) through the shared file edge. */
export async function readLossSeriesFile(
  path: string,
  options: {
    format?: FileFormat;
    timestampColumn?: string;
    delimiter?: DelimiterName;
    decimal?: DecimalMark;
    lineLimit?: number;
    onProgress?: (bytesRead: number, totalBytes: number) => void;
  } = {},
): Promise<LossSeriesTable> {
  const implied = formatFromPath(path);
  const format = options.format ?? implied.format;
  if (format === 'parquet') {
    throw new InputError(
      'a pre-aggregated loss file is read as CSV or TSV (Parquet is read for forecast files)',
      { file: path },
    );
  }
  const reader = new LossSeriesReader(path, {
    format,
    delimiter: delimiterFor(options.delimiter ?? 'auto', format === 'tsv'),
    ...(options.decimal === undefined ? {} : { decimal: options.decimal }),
    ...(options.lineLimit === undefined ? {} : { lineLimit: options.lineLimit }),
    ...(options.timestampColumn === undefined ? {} : { timestampColumn: options.timestampColumn }),
  });
  const sha256 = await streamTextFile(path, implied.gzip, reader, options.onProgress);
  return reader.finish(sha256);
}
