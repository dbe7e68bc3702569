/**
 * The file edge shared by every reader: streams a file's stored bytes in 1 MiB chunks (hashing
 * them as they pass), gunzips `.gz` files, checks that the bytes are UTF-8 text and hands the byte
 * chunks to `push` (a chunk may end inside a character; the next one completes it). A UTF-8
 * byte-order mark at the start is removed, as a UTF-8 decoder does. Nothing holds the whole file.
 * File-system errors become InputErrors naming the file.
 */
import { isUtf8 } from 'node:buffer';
import { createHash } from 'node:crypto';
import { createReadStream } from 'node:fs';
import { stat } from 'node:fs/promises';
import { pipeline } from 'node:stream/promises';
import { createGunzip } from 'node:zlib';
import { InputError } from '../core/inputError.js';
import { fileReadError } from './fileReadError.js';

const CHUNK_BYTES = 1 << 20;

export interface TextSink {
  /** Receives the next chunk of UTF-8 bytes. */
  push(bytes: Buffer): void;
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
    throw fileReadError(error, path);
  }
  const hash = createHash('sha256');
  let bytesRead = 0;
  const tap = async function* (source: AsyncIterable<Buffer>): AsyncGenerator<Buffer> {
    for await (const chunk of source) {
      hash.update(chunk);
      bytesRead += chunk.length;
      onProgress?.(bytesRead, totalBytes);
      yield chunk;
    }
  };
  // Line breaks in the bytes checked so far, to name the line of an invalid byte.
  let newlines = 0;
  const check = new Utf8Check();
  const bom = new LeadingBom();
  const consume = async (source: AsyncIterable<Buffer>): Promise<void> => {
    for await (const chunk of source) {
      const nul = chunk.indexOf(0);
      if (nul >= 0) throw notText(chunk, nul, newlines, path, 'a NUL byte');
      if (!check.valid(chunk)) {
        throw notText(chunk, firstInvalidUtf8(chunk), newlines, path, 'bytes that are not UTF-8');
      }
      newlines += countByte(chunk, 10);
      const text = bom.strip(chunk);
      if (text.length > 0) sink.push(text);
    }
    if (check.inCharacter) {
      throw new InputError(
        `the file is not valid UTF-8 text: it ends inside a multi-byte character (line ${newlines + 1})`,
        { file: path, line: newlines + 1 },
      );
    }
    const rest = bom.strip(Buffer.alloc(0), true);
    if (rest.length > 0) sink.push(rest);
  };
  try {
    const raw = createReadStream(path, { highWaterMark: CHUNK_BYTES });
    if (gzip) await pipeline(raw, tap, createGunzip({ chunkSize: CHUNK_BYTES }), consume);
    else await pipeline(raw, tap, consume);
  } catch (error) {
    throw fileReadError(error, path);
  }
  return `sha256:${hash.digest('hex')}`;
}

/**
 * Checks a stream of chunks as UTF-8 (with Node's native validator), carrying a character that a
 * chunk boundary cuts into the next chunk. A cut character whose bytes so far cannot start a valid
 * character fails with its own chunk, as a streaming decoder fails.
 */
class Utf8Check {
  private pending: Buffer = Buffer.alloc(0);

  /** True while the bytes so far end inside a character. */
  get inCharacter(): boolean {
    return this.pending.length > 0;
  }

  valid(chunk: Buffer): boolean {
    let body = chunk;
    if (this.pending.length > 0) {
      const need = sequenceLength(this.pending[0]!) - this.pending.length;
      const joined = Buffer.concat([this.pending, chunk.subarray(0, need)]);
      if (joined.length < need + this.pending.length) {
        this.pending = joined;
        return validPrefix(joined);
      }
      if (!isUtf8(joined)) return false;
      this.pending = Buffer.alloc(0);
      body = chunk.subarray(need);
    }
    const cut = cutCharacter(body);
    if (!isUtf8(body.subarray(0, cut))) return false;
    if (cut < body.length) {
      this.pending = Buffer.from(body.subarray(cut));
      return validPrefix(this.pending);
    }
    return true;
  }
}

/** Bytes in the character a lead byte starts (1 for anything that is not a multi-byte lead). */
function sequenceLength(lead: number): number {
  return lead >= 0xf0 && lead <= 0xf4
    ? 4
    : lead >= 0xe0
      ? lead <= 0xef
        ? 3
        : 1
      : lead >= 0xc2
        ? 2
        : 1;
}

/** Where a multi-byte character the end of `bytes` cuts begins, or `bytes.length`. */
function cutCharacter(bytes: Buffer): number {
  const n = bytes.length;
  let k = n;
  while (k > 0 && n - k < 3 && (bytes[k - 1]! & 0xc0) === 0x80) k--;
  if (k === 0) return n;
  const length = sequenceLength(bytes[k - 1]!);
  return length > 1 && n - (k - 1) < length ? k - 1 : n;
}

/** Whether the first bytes of a character can still be completed into valid UTF-8. */
function validPrefix(bytes: Buffer): boolean {
  if (bytes.length === 1) return true;
  const padded = Buffer.alloc(sequenceLength(bytes[0]!), 0x80);
  bytes.copy(padded);
  return isUtf8(padded);
}

/** Removes the byte-order mark EF BB BF from the start of a stream of chunks. */
class LeadingBom {
  private head: Buffer | null = Buffer.alloc(0);

  strip(chunk: Buffer, last = false): Buffer {
    if (this.head === null) return chunk;
    const bytes = this.head.length > 0 ? Buffer.concat([this.head, chunk]) : chunk;
    if (!last && bytes.length < 3 && BOM.subarray(0, bytes.length).equals(bytes)) {
      this.head = bytes;
      return Buffer.alloc(0);
    }
    this.head = null;
    return bytes.subarray(0, 3).equals(BOM) ? bytes.subarray(3) : bytes;
  }
}

const BOM = Buffer.from([0xef, 0xbb, 0xbf]);

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
