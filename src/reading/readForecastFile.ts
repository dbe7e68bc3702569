/**
 * The reading edge: the only module here that touches the file system. It streams the stored
 * bytes (hashing them as they pass), gunzips `.gz` files, decodes UTF-8 incrementally and feeds
 * the text chunks to the pure ForecastTableReader.
 */
import { createHash } from 'node:crypto';
import { createReadStream } from 'node:fs';
import { stat } from 'node:fs/promises';
import { pipeline } from 'node:stream/promises';
import { TextDecoder } from 'node:util';
import { createGunzip } from 'node:zlib';
import { InputError } from '../core/inputError.js';
import type { ColumnMapping } from './columnMapping.js';
import type { ForecastTable } from './forecastTable.js';
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

const CHUNK_BYTES = 1 << 20;

export async function readForecastFile(path: string, options: ReadOptions): Promise<ForecastTable> {
  const implied = formatFromPath(path);
  const format = options.format ?? implied.format;
  const reader = new ForecastTableReader(path, {
    role: options.role,
    format,
    ...(options.columns === undefined ? {} : { columns: options.columns }),
    ...(options.requireActual === undefined ? {} : { requireActual: options.requireActual }),
  });
  let totalBytes: number;
  try {
    const info = await stat(path);
    if (!info.isFile()) throw new InputError('not a regular file', { file: path });
    totalBytes = info.size;
  } catch (error) {
    throw asInputError(error, path);
  }
  const hash = createHash('sha256');
  const decoder = new TextDecoder('utf-8', { fatal: true });
  let bytesRead = 0;
  const tap = async function* (source: AsyncIterable<Buffer>): AsyncGenerator<Buffer> {
    for await (const chunk of source) {
      hash.update(chunk);
      bytesRead += chunk.length;
      options.onProgress?.(bytesRead, totalBytes);
      yield chunk;
    }
  };
  const consume = async (source: AsyncIterable<Buffer>): Promise<void> => {
    for await (const chunk of source) {
      reader.push(decode(decoder, chunk, true, path, reader));
    }
    reader.push(decode(decoder, undefined, false, path, reader));
  };
  try {
    const raw = createReadStream(path, { highWaterMark: CHUNK_BYTES });
    if (implied.gzip) await pipeline(raw, tap, createGunzip({ chunkSize: CHUNK_BYTES }), consume);
    else await pipeline(raw, tap, consume);
  } catch (error) {
    throw asInputError(error, path);
  }
  return reader.finish(`sha256:${hash.digest('hex')}`);
}

function decode(
  decoder: TextDecoder,
  chunk: Buffer | undefined,
  stream: boolean,
  path: string,
  reader: ForecastTableReader,
): string {
  try {
    return decoder.decode(chunk, { stream });
  } catch {
    throw new InputError(
      `the file is not valid UTF-8 text (the first invalid bytes come after line ${reader.linesRead})`,
      { file: path },
    );
  }
}

function asInputError(error: unknown, path: string): InputError {
  if (error instanceof InputError) return error;
  const code = (error as { code?: unknown } | null)?.code;
  if (code === 'ENOENT') return new InputError('no such file', { file: path });
  if (code === 'EACCES' || code === 'EPERM')
    return new InputError('permission denied', { file: path });
  if (code === 'EISDIR') return new InputError('is a directory, not a file', { file: path });
  if (typeof code === 'string' && code.startsWith('Z_')) {
    return new InputError(`not a valid gzip file (${(error as Error).message})`, { file: path });
  }
  const message = error instanceof Error ? error.message : String(error);
  return new InputError(`cannot read the file: ${message}`, { file: path });
}
