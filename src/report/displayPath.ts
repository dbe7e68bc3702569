import path from 'node:path';

/**
 * A file path as a reviewer reads it: relative to the working directory (the workspace in the
 * action) when it lies inside it, with forward slashes; other paths are left as they are.
 */
export function displayPath(file: string, workingDirectory: string | undefined): string {
  if (workingDirectory === undefined || workingDirectory === '' || file === '') return file;
  if (!path.isAbsolute(file)) return file.split(path.sep).join('/');
  const relative = path.relative(workingDirectory, file);
  if (relative === '' || relative.startsWith('..') || path.isAbsolute(relative)) return file;
  return relative.split(path.sep).join('/');
}
