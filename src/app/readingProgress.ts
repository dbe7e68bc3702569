import type { Progress } from './progress.js';

/**
 * Progress of reading several files that may be read at the same time: one stage naming them
 * all ("reading baseline, candidate"; each role named once), whose fraction is the mean of the files' own fractions, so
 * it only grows whichever file reports. `forFile(k)` is the `onProgress` of file k.
 */
export function readingProgress(
  roles: readonly string[],
  report: ((progress: Progress) => void) | undefined,
): { forFile: (k: number) => (bytesRead: number, totalBytes: number) => void } {
  const stage = `reading ${[...new Set(roles)].join(', ')}`;
  const fractions = roles.map(() => 0);
  return {
    forFile: (k) => (bytesRead, totalBytes) => {
      fractions[k] = totalBytes > 0 ? Math.min(1, bytesRead / totalBytes) : 1;
      report?.({ stage, fraction: fractions.reduce((a, b) => a + b, 0) / fractions.length });
    },
  };
}
