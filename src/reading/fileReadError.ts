import { InputError } from '../core/inputError.js';

/**
 * An error from opening or reading an input file as the InputError the CLI prints (file named,
 * exit code 2, no stack): missing file, permission, a directory, a broken gzip stream, or the
 * system's own message. An InputError passes through unchanged.
 */
export function fileReadError(error: unknown, path: string): InputError {
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
