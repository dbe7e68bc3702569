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
  /** Physical lines consumed so far, to locate invalid UTF-8. */
  readonly linesRead: number;
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
  const consume = async (source: AsyncIterable<Buffer>): Promise<void> => {
    for await (const chunk of source) sink.push(decode(decoder, chunk, true, path, sink));
    sink.push(decode(decoder, undefined, false, path, sink));
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

function decode(
  decoder: TextDecoder,
  chunk: Buffer | undefined,
  stream: boolean,
  path: string,
  sink: TextSink,
): string {
  try {
    return decoder.decode(chunk, { stream });
  } catch {
    throw new InputError(
      `the file is not valid UTF-8 text (the first invalid bytes come after line ${sink.linesRead})`,
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
