// `node bench/backtestChecks.mjs [SERIES DAYS RUNS]`: the backtest checks' run time as a ratio to
// alignment on the same tables, measured in the same process (see bench/backtestChecksCase.ts).
// Run it under `nice` on a shared machine; the ratio, not the milliseconds, is the result.
import { spawnSync } from 'node:child_process';
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { build } from 'esbuild';

const root = path.dirname(path.dirname(fileURLToPath(import.meta.url)));
const work = path.join(root, 'bench', '.work');
mkdirSync(work, { recursive: true });
const outfile = path.join(work, 'backtestChecksCase.mjs');
await build({
  absWorkingDir: root,
  entryPoints: ['bench/backtestChecksCase.ts'],
  outfile,
  bundle: true,
  platform: 'node',
  format: 'esm',
  logLevel: 'warning',
});
const r = spawnSync(
  process.execPath,
  ['--max-old-space-size=8192', outfile, ...process.argv.slice(2)],
  {
    stdio: 'inherit',
  },
);
process.exit(r.status ?? 1);
