/**
 * The Parquet file edge: reads a Parquet file one row group at a time with hyparquet (a pure
 * JavaScript reader; docs/decisions/0013-parquet-input.md) and hands each row, as the fields a
 * CSV of the same data would hold, to the same ForecastTableReader that reads CSV. So every check
 * and message is the one CSV gets; numbers match because a CSV writer prints a double as its shortest
 * round-trip decimal text, which parses back to the same double, so a double is handed over as it
 * is and a CSV written with round-trip precision gives the very same numbers.
 *
 * Conventions:
 * - The header is the schema's top-level column names; nested columns (lists, structs, maps)
 *   are refused.
 * - Messages call row r (0-based) "line r + 2", as if the header were line 1: the line the same
 *   row has in a CSV export with a header.
 * - Null is the empty field (refused where a value is required, as in CSV). DATE becomes
 *   YYYY-MM-DD; TIMESTAMP becomes YYYY-MM-DDTHH:MM:SS[.fraction]Z at the stored precision (UTC,
 *   as Parquet defines it for adjusted-to-UTC timestamps; others are read as UTC too); integers
 *   (including INT64) their decimal text; booleans true/false. Binary that is not text is refused.
 * - Only the columns that play a role are decoded; memory is one row group of those columns on
 *   top of the typed columns being built.
 * - Compression: whatever hyparquet and hyparquet-compressors decode (uncompressed, snappy, gzip,
 *   zstd, brotli, lz4); a corrupt or truncated file is an InputError naming it.
 */
import { createHash } from 'node:crypto';
import { createReadStream } from 'node:fs';
import { type FileHandle, open, stat } from 'node:fs/promises';
import { pipeline } from 'node:stream/promises';
import { type AsyncBuffer, type FileMetaData, parquetMetadataAsync, parquetRead } from 'hyparquet';
import { compressors } from 'hyparquet-compressors';
import { echo, InputError } from '../core/inputError.js';
import { fileReadError } from './fileReadError.js';
import type { Field, ForecastTableReader } from './forecastTableReader.js';

const MAX_EXACT = BigInt(Number.MAX_SAFE_INTEGER);

/** Streams `path` into `reader`; returns "sha256:<hex>" of the file's bytes. */
export async function streamParquetFile(
  path: string,
  reader: ForecastTableReader,
  onProgress?: (bytesRead: number, totalBytes: number) => void,
): Promise<string> {
  let size: number;
  try {
    const info = await stat(path);
    if (!info.isFile()) throw new InputError('not a regular file', { file: path });
    size = info.size;
  } catch (error) {
    throw fileReadError(error, path);
  }
  const handle = await open(path, 'r').catch((error: unknown) => {
    throw fileReadError(error, path);
  });
  try {
    const file = fileBuffer(handle, size);
    let metadata: FileMetaData;
    try {
      metadata = await parquetMetadataAsync(file);
    } catch (error) {
      throw notParquet(error, path);
    }
    const names = topLevelColumns(metadata, path);
    reader.record([...names], names.length, 1);
    const used = reader.usedColumns;
    const usedNames = used.map((i) => names[i]!);
    const fields = new Array<Field>(names.length).fill('');
    const total = Number(metadata.num_rows);
    const slot = new Map(usedNames.map((name, k) => [name, k]));
    let groupStart = 0;
    for (const group of metadata.row_groups) {
      const groupRows = Number(group.num_rows);
      const groupEnd = groupStart + groupRows;
      const columns = usedNames.map(() => new Array<unknown>(groupRows));
      try {
        await parquetRead({
          file,
          metadata,
          columns: usedNames,
          rowStart: groupStart,
          rowEnd: groupEnd,
          compressors,
          parsers: TEXT_PARSERS,
          onChunk: ({ columnName, columnData, rowStart }) => {
            const target = columns[slot.get(columnName)!]!;
            const offset = rowStart - groupStart;
            for (let i = 0; i < columnData.length; i++) {
              const at = offset + i;
              if (at >= 0 && at < groupRows) target[at] = columnData[i];
            }
          },
        });
      } catch (error) {
        throw notParquet(error, path);
      }
      for (let r = 0; r < groupRows; r++) {
        const line = groupStart + r + 2;
        for (let k = 0; k < used.length; k++) {
          fields[used[k]!] = fieldValue(columns[k]![r], path, line, usedNames[k]!);
        }
        reader.record(fields, names.length, line);
      }
      groupStart = groupEnd;
      onProgress?.(total > 0 ? Math.round((size * groupStart) / total) : size, size);
    }
  } finally {
    await handle.close();
  }
  return sha256Of(path);
}

/** An AsyncBuffer over an open file: each slice is one positioned read. */
function fileBuffer(handle: FileHandle, size: number): AsyncBuffer {
  return {
    byteLength: size,
    async slice(start: number, end?: number): Promise<ArrayBuffer> {
      const stop = Math.min(end ?? size, size);
      const length = Math.max(0, stop - start);
      const bytes = new Uint8Array(length);
      let done = 0;
      while (done < length) {
        const { bytesRead } = await handle.read(bytes, done, length - done, start + done);
        if (bytesRead === 0) break;
        done += bytesRead;
      }
      return bytes.buffer;
    },
  };
}

function topLevelColumns(metadata: FileMetaData, path: string): string[] {
  const schema = metadata.schema;
  const root = schema[0];
  const names: string[] = [];
  let i = 1;
  const count = root?.num_children ?? 0;
  for (let c = 0; c < count && i < schema.length; c++) {
    const element = schema[i]!;
    if ((element.num_children ?? 0) > 0) {
      throw new InputError(
        `the Parquet column "${echo(element.name)}" is nested (a list, struct or map); forecast files need flat columns`,
        { file: path, column: element.name },
      );
    }
    names.push(element.name);
    i++;
  }
  return names;
}

/** Parsers that render dates and timestamps as the ISO 8601 text a CSV would hold. */
const TEXT_PARSERS = {
  dateFromDays: (days: number): string => isoDate(days),
  timestampFromMilliseconds: (ms: bigint): string => isoTimestamp(ms, 3),
  timestampFromMicroseconds: (us: bigint): string => isoTimestamp(us, 6),
  timestampFromNanoseconds: (ns: bigint): string => isoTimestamp(ns, 9),
};

function isoDate(days: number): string {
  return new Date(days * 86_400_000).toISOString().slice(0, 10);
}

/** YYYY-MM-DDTHH:MM:SS[.f]Z from a count of 10^-digits seconds; the fraction without trailing zeros. */
function isoTimestamp(count: bigint, digits: number): string {
  const unit = 10n ** BigInt(digits);
  let seconds = count / unit;
  let fraction = count % unit;
  if (fraction < 0n) {
    fraction += unit;
    seconds -= 1n;
  }
  const text = new Date(Number(seconds) * 1000).toISOString().slice(0, 19);
  const f =
    fraction === 0n ? '' : `.${fraction.toString().padStart(digits, '0').replace(/0+$/, '')}`;
  return `${text}${f}Z`;
}

/**
 * A Parquet value as the reader's field: text as it is, a double as it is (the number the CSV of
 * the same data holds, written to round-trip), a 64-bit integer as a number when it is exact in a
 * double and as its decimal text otherwise, null as the empty field.
 */
function fieldValue(value: unknown, path: string, line: number, column: string): Field {
  switch (typeof value) {
    case 'string':
    case 'number':
      return value;
    case 'bigint':
      return value >= -MAX_EXACT && value <= MAX_EXACT ? Number(value) : value.toString();
    case 'boolean':
      return value ? 'true' : 'false';
    case 'undefined':
      return '';
    case 'object':
      if (value === null) return '';
      if (value instanceof Date) return value.toISOString();
      if (value instanceof Uint8Array) {
        throw new InputError('a binary Parquet value that is not UTF-8 text', {
          file: path,
          line,
          column,
        });
      }
      throw new InputError(
        'a Parquet value that is neither a number nor text (binary or nested data)',
        { file: path, line, column },
      );
    default:
      throw new InputError('a Parquet value of an unsupported type', { file: path, line, column });
  }
}

async function sha256Of(path: string): Promise<string> {
  const hash = createHash('sha256');
  await pipeline(createReadStream(path, { highWaterMark: 1 << 20 }), async (source) => {
    for await (const chunk of source) hash.update(chunk as Buffer);
  });
  return `sha256:${hash.digest('hex')}`;
}

function notParquet(error: unknown, path: string): InputError {
  if (error instanceof InputError) return error;
  const message = error instanceof Error ? error.message : String(error);
  return new InputError(`not a readable Parquet file (${echo(message, 200)})`, { file: path });
}
