import type { Progress } from '../app/progress.js';

/**
 * Shows progress on stderr when it is a terminal (and only then: logs in CI stay clean). Updates
 * are throttled to about ten per second and overwrite one line.
 */
export function progressReporter(stream: NodeJS.WriteStream): {
  update: (p: Progress) => void;
  done: () => void;
} {
  if (stream.isTTY !== true) return { update: () => {}, done: () => {} };
  let last = 0;
  let shown = false;
  return {
    update: (p) => {
      const now = Date.now();
      if (now - last < 100 && p.fraction < 1) return;
      last = now;
      shown = true;
      const pct = Math.round(Math.max(0, Math.min(1, p.fraction)) * 100);
      stream.write(`\r\x1b[2K${p.stage} ${pct}%`);
    },
    done: () => {
      if (shown) stream.write('\r\x1b[2K');
    },
  };
}
