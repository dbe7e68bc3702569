// Bundles the CLI and the action into dist/ with esbuild. The output is committed; a test
// rebuilds into a temporary folder and fails when the committed files differ.

import { existsSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { build } from 'esbuild';

const root = path.dirname(path.dirname(fileURLToPath(import.meta.url)));
const outdir = process.argv[2] ? path.resolve(process.argv[2]) : path.join(root, 'dist');

const entries = [
  { in: 'src/cli/main.ts', out: 'cli' },
  { in: 'src/action/main.ts', out: 'index' },
  // The bootstrap's worker thread (src/parallel/resamplePool.ts loads it from next to the bundle).
  { in: 'src/parallel/resampleWorker.ts', out: 'resampleWorker' },
  // The reading worker thread (src/parallel/readForecastFiles.ts loads it from next to the bundle).
  { in: 'src/parallel/readingWorker.ts', out: 'readingWorker' },
].filter((e) => existsSync(path.join(root, e.in)));

await build({
  absWorkingDir: root,
  entryPoints: entries,
  outdir,
  bundle: true,
  platform: 'node',
  target: 'node20',
  format: 'esm',
  sourcemap: false,
  minify: false,
  legalComments: 'none',
  logLevel: 'warning',
  // ESM bundles of CommonJS dependencies need a real `require`.
  banner: {
    js: "import { createRequire as __skillgateCreateRequire } from 'node:module';\nconst require = __skillgateCreateRequire(import.meta.url);",
  },
  outExtension: { '.js': '.js' },
});
