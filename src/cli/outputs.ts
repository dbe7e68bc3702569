/**
 * Where the CLI writes its reports: a file, or standard output for "-". Paths are checked before
 * the comparison runs, so a typo in an output path costs no computation and is a usage error
 * (exit 2), not a failure after the work is done.
 */
import { constants } from 'node:fs';
import { access, stat } from 'node:fs/promises';
import { dirname } from 'node:path';
import { InputError } from '../core/inputError.js';

/** The standard-output name of an output option. */
export const STANDARD_OUTPUT = '-';

/** Refuses an output path that cannot be written (missing folder, a directory, no permission). */
export async function checkWritable(path: string, option: string): Promise<void> {
  if (path === STANDARD_OUTPUT) return;
  const info = await stat(path).catch(() => null);
  if (info !== null) {
    if (info.isDirectory()) {
      throw new InputError(`${option} names a directory; give a file name`, { file: path });
    }
    await access(path, constants.W_OK).catch(() => {
      throw new InputError(`${option}: the file cannot be written (permission denied)`, {
        file: path,
      });
    });
    return;
  }
  const folder = dirname(path);
  const parent = await stat(folder).catch(() => null);
  if (parent === null || !parent.isDirectory()) {
    throw new InputError(`${option}: the folder ${JSON.stringify(folder)} does not exist`, {
      file: path,
    });
  }
  await access(folder, constants.W_OK).catch(() => {
    throw new InputError(`${option}: the folder ${JSON.stringify(folder)} is not writable`, {
      file: path,
    });
  });
}

/**
 * Text of `JSON.stringify(value, null, 2)` in pieces: one per top-level field and one per element
 * of top-level arrays, so a report with a million per-series comparisons is written without ever
 * forming one string longer than the engine allows. The bytes are those of JSON.stringify.
 */
export function* jsonPieces(value: Readonly<Record<string, unknown>>): Generator<string> {
  const entries = Object.entries(value).filter(
    ([, v]) => v !== undefined && typeof v !== 'function',
  );
  if (entries.length === 0) {
    yield '{}';
    return;
  }
  yield '{\n';
  for (let k = 0; k < entries.length; k++) {
    const [key, v] = entries[k]!;
    yield `  ${JSON.stringify(key)}: `;
    if (Array.isArray(v) && v.length > 0) {
      yield '[\n';
      for (let i = 0; i < v.length; i++) {
        const item = v[i] === undefined ? null : v[i];
        yield `${indent(JSON.stringify(item, null, 2), '    ')}${i + 1 < v.length ? ',\n' : '\n'}`;
      }
      yield '  ]';
    } else {
      yield indent(JSON.stringify(v, null, 2), '  ').slice(2);
    }
    yield k + 1 < entries.length ? ',\n' : '\n';
  }
  yield '}';
}

function indent(text: string, prefix: string): string {
  return prefix + text.replaceAll('\n', `\n${prefix}`);
}
