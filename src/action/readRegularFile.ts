import { constants } from 'node:fs';
import { lstat, open } from 'node:fs/promises';
import { InputError } from '../core/inputError.js';

/**
 * Reads a file named by the workflow but written by someone else (an artifact of a pull request
 * from a fork), accepting only a regular file of at most `maxBytes`: a symbolic link (which
 * could point at the runner's own files), a directory, a FIFO or a device is refused with an
 * InputError labelled `label`. The file is opened with O_NOFOLLOW (and O_NONBLOCK, so a FIFO
 * swapped in after the check cannot hang the step) and checked again on the open descriptor,
 * so replacing it between the check and the read changes nothing.
 */
export async function readRegularFile(
  file: string,
  maxBytes: number,
  label: string,
): Promise<string> {
  const refuse = (why: string): never => {
    throw new InputError(`${label}: ${why}`, { value: file });
  };
  const link = await lstat(file).catch(() => refuse('cannot read the file'));
  if (link.isSymbolicLink()) refuse('is a symbolic link; only a regular file is read');
  if (!link.isFile()) refuse('is not a regular file');
  const handle = await open(
    file,
    constants.O_RDONLY | constants.O_NOFOLLOW | constants.O_NONBLOCK,
  ).catch(() => refuse('cannot read the file'));
  try {
    const opened = await handle.stat();
    if (!opened.isFile()) refuse('is not a regular file');
    if (opened.size > maxBytes) refuse(`the report is larger than ${maxBytes} bytes`);
    const buffer = Buffer.alloc(opened.size);
    let read = 0;
    while (read < opened.size) {
      const { bytesRead } = await handle.read(buffer, read, opened.size - read, read);
      if (bytesRead === 0) break;
      read += bytesRead;
    }
    return buffer.subarray(0, read).toString('utf8');
  } finally {
    await handle.close();
  }
}
