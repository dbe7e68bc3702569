import { LossSeriesReader, type LossSeriesTable } from './lossSeriesReader.js';
import { formatFromPath } from './readForecastFile.js';
import { streamTextFile } from './streamTextFile.js';
import type { TextFormat } from './tableBuilder.js';

/** Reads a pre-aggregated loss file (see LossSeriesReader) through the shared file edge. */
export async function readLossSeriesFile(
  path: string,
  options: {
    format?: TextFormat;
    timestampColumn?: string;
    onProgress?: (bytesRead: number, totalBytes: number) => void;
  } = {},
): Promise<LossSeriesTable> {
  const implied = formatFromPath(path);
  const reader = new LossSeriesReader(path, {
    format: options.format ?? implied.format,
    ...(options.timestampColumn === undefined ? {} : { timestampColumn: options.timestampColumn }),
  });
  const sha256 = await streamTextFile(path, implied.gzip, reader, options.onProgress);
  return reader.finish(sha256);
}
