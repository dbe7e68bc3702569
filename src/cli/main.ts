#!/usr/bin/env node
import { writeFile } from 'node:fs/promises';
import { runComparison } from '../app/runComparison.js';
import { InputError, printable } from '../core/inputError.js';
import { VERSION } from '../core/version.js';
import { createResamplePool } from '../parallel/resamplePool.js';
import { renderMarkdown } from '../report/renderMarkdown.js';
import { renderTerminal } from '../report/renderTerminal.js';
import { resolveSettings } from '../settings/resolveSettings.js';
import { helpText } from './helpText.js';
import { parseArguments } from './parseArguments.js';
import { progressReporter } from './progressReporter.js';

/** The CLI's one place where outcomes become exit codes: 0 pass/warn, 1 fail, 2 input error. */
async function main(argv: readonly string[]): Promise<number> {
  try {
    const request = parseArguments(argv);
    if (request.kind === 'help') {
      process.stdout.write(helpText());
      return 0;
    }
    if (request.kind === 'version') {
      process.stdout.write(`${VERSION}\n`);
      return 0;
    }
    const settings = resolveSettings(request.options, (name) => `--${name}`);
    const progress = progressReporter(process.stderr);
    const pool = createResamplePool();
    const { report } = await runComparison(settings, {
      onProgress: progress.update,
      resampleRunner: pool.runner,
    });
    await pool.close();
    progress.done();
    if (settings.json !== null)
      await writeFile(settings.json, `${JSON.stringify(report, null, 2)}\n`);
    if (settings.markdown !== null) await writeFile(settings.markdown, renderMarkdown(report));
    if (!request.quiet) {
      const color = process.stdout.isTTY === true && process.env.NO_COLOR === undefined;
      process.stdout.write(renderTerminal(report, { color }));
    }
    return report.verdict === 'fail' ? 1 : 0;
  } catch (error) {
    if (error instanceof InputError) {
      process.stderr.write(`skillgate: ${error.describe()}\n`);
      return 2;
    }
    const message = printable(error instanceof Error ? error.message : String(error));
    process.stderr.write(
      `skillgate: internal error: ${message}\nThis is a bug in skillgate; set SKILLGATE_DEBUG=1 for details.\n`,
    );
    if (process.env.SKILLGATE_DEBUG && error instanceof Error)
      process.stderr.write(`${error.stack}\n`);
    return 3;
  }
}

main(process.argv.slice(2)).then((code) => {
  process.exitCode = code;
});
