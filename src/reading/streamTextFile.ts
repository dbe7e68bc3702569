/**
 * The file edge shared by every reader: streams a file's stored bytes in 1 MiB chunks (hashing
 * them as they pass), gunzips `.gz` files, decodes UTF-8 incrementally and hands the text chunks
 * to `push`. Nothing holds the whole file. File-system errors become InputErrors naming the file.
 */
import { createHash } from 'node:crypto';
import { createReadStream } from 'node:fs';
import { stat } from 'node:fs/promises';
import { pipeline } from 'node:stream/promises';
import { TextDecoder } from 'node:util';
import { createGunzip } from 'node:zlib';
import { InputError } from '../core/inputError.js';

const CHUNK_BYTES = 1 << 20;

export interface TextSink {
  /** Receives the next decoded text chunk (the last call may be an empty string). */
  push(text: string): void;
}

/** Streams `path` into `sink`; returns "sha256:<hex>" of the stored bytes. */
export async function streamTextFile(
  path: string,
  gzip: boolean,
  sink: TextSink,
  onProgress?: (bytesRead: number, totalBytes: number) => void,
): Promise<string> {
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
      onProgress?.(bytesRead, totalBytes);
      yield chunk;
    }
  };
  // Line breaks in the bytes decoded so far, to name the line of an invalid byte.
  let newlines = 0;
  const consume = async (source: AsyncIterable<Buffer>): Promise<void> => {
    for await (const chunk of source) {
      const nul = chunk.indexOf(0);
      if (nul >= 0) throw notText(chunk, nul, newlines, path, 'a NUL byte');
      let text: string;
      try {
        text = decoder.decode(chunk, { stream: true });
      } catch {
        throw notText(chunk, firstInvalidUtf8(chunk), newlines, path, 'bytes that are not UTF-8');
      }
      newlines += countByte(chunk, 10);
      sink.push(text);
    }
    try {
      sink.push(decoder.decode(undefined, { stream: false }));
    } catch {
      throw new InputError(
        `the file is not valid UTF-8 text: it ends inside a multi-byte character (line ${newlines + 1})`,
        { file: path, line: newlines + 1 },
      );
    }
  };
  try {
    const raw = createReadStream(path, { highWaterMark: CHUNK_BYTES });
    if (gzip) await pipeline(raw, tap, createGunzip({ chunkSize: CHUNK_BYTES }), consume);
    else await pipeline(raw, tap, consume);
  } catch (error) {
    throw asInputError(error, path);
  }
  return `sha256:${hash.digest('hex')}`;
}

/**
 * The refusal of bytes that are not UTF-8 text, at their line, with a hint at the likely encoding:
 * UTF-16 (a byte-order mark FF FE / FE FF, or NUL bytes between letters) or a single-byte code page
 * such as Latin-1 / Windows-1252 (a byte ≥ 0x80 that does not start a valid sequence).
 */
function notText(
  chunk: Buffer,
  at: number,
  before: number,
  path: string,
  what: string,
): InputError {
  const line = before + countByte(chunk.subarray(0, Math.max(0, at)), 10) + 1;
  const b0 = chunk[0];
  const b1 = chunk[1];
  const utf16 =
    (before === 0 && ((b0 === 0xff && b1 === 0xfe) || (b0 === 0xfe && b1 === 0xff))) ||
    what === 'a NUL byte';
  const byte = chunk[at];
  const hint = utf16
    ? 'it looks like UTF-16: convert it, e.g. iconv -f UTF-16 -t UTF-8'
    : byte !== undefined && byte >= 0x80
      ? `byte 0x${byte.toString(16).toUpperCase()} suggests Latin-1 or Windows-1252: convert it, e.g. iconv -f WINDOWS-1252 -t UTF-8`
      : 'convert it to UTF-8';
  return new InputError(`the file is not UTF-8 text: line ${line} has ${what} (${hint})`, {
    file: path,
    line,
    value: chunk
      .subarray(Math.max(0, at - 20), at + 20)
      .toString('latin1')
      .replace(/[^\x20-\x7e]/g, '?'),
  });
}

/** Offset of the first byte that breaks UTF-8 (a chunk may start inside a character). */
export function firstInvalidUtf8(bytes: Uint8Array): number {
  let i = 0;
  const n = bytes.length;
  while (i < 3 && i < n && (bytes[i]! & 0xc0) === 0x80) i++; // continuation of the last chunk
  while (i < n) {
    const b = bytes[i]!;
    if (b < 0x80) {
      i++;
      continue;
    }
    const length =
      b >= 0xc2 && b <= 0xdf ? 2 : b >= 0xe0 && b <= 0xef ? 3 : b >= 0xf0 && b <= 0xf4 ? 4 : 0;
    if (length === 0) return i;
    if (i + length > n) return i; // cut at the end of the chunk
    for (let k = 1; k < length; k++) if ((bytes[i + k]! & 0xc0) !== 0x80) return i;
    i += length;
  }
  return n;
}

function countByte(bytes: Buffer, byte: number): number {
  let count = 0;
  let i = bytes.indexOf(byte);
  while (i !== -1) {
    count++;
    i = bytes.indexOf(byte, i + 1);
  }
  return count;
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
