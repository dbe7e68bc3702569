#!/usr/bin/env node
import { once } from 'node:events';
import { createWriteStream } from 'node:fs';
import { writeFile } from 'node:fs/promises';
import { runComparison } from '../app/runComparison.js';
import { InputError, printable } from '../core/inputError.js';
import { VERSION } from '../core/version.js';
import { createResamplePool } from '../parallel/resamplePool.js';
import { renderMarkdown } from '../report/renderMarkdown.js';
import { renderTerminal } from '../report/renderTerminal.js';
import type { Report } from '../report/reportModel.js';
import { resolveSettings } from '../settings/resolveSettings.js';
import { helpText, usageText } from './helpText.js';
import { checkWritable, jsonPieces, STANDARD_OUTPUT } from './outputs.js';
import { parseArguments } from './parseArguments.js';
import { progressReporter } from './progressReporter.js';

/** The CLI's one place where outcomes become exit codes: 0 pass/warn, 1 fail, 2 input error. */
async function main(argv: readonly string[]): Promise<number> {
  try {
    const request = parseArguments(argv);
    if (request.kind === 'usage') {
      process.stderr.write(usageText());
      return 2;
    }
    if (request.kind === 'help') {
      process.stdout.write(helpText());
      return 0;
    }
    if (request.kind === 'version') {
      process.stdout.write(`${VERSION}\n`);
      return 0;
    }
    const settings = resolveSettings(request.options, (name) => `--${name}`);
    if (settings.json === STANDARD_OUTPUT && settings.markdown === STANDARD_OUTPUT) {
      throw new InputError(
        '--json - and --markdown - both ask for standard output; send one of them to a file',
      );
    }
    if (settings.json !== null) await checkWritable(settings.json, '--json');
    if (settings.markdown !== null) await checkWritable(settings.markdown, '--markdown');
    const progress = progressReporter(process.stderr);
    const pool = createResamplePool();
    let report: Report;
    try {
      ({ report } = await runComparison(settings, {
        onProgress: progress.update,
        resampleRunner: pool.runner,
      }));
    } finally {
      await pool.close();
      progress.done();
    }
    if (settings.json !== null) await writeJson(settings.json, report);
    if (settings.markdown !== null) {
      if (settings.markdown === STANDARD_OUTPUT) await write(renderMarkdown(report));
      else await writeFile(settings.markdown, renderMarkdown(report));
    }
    const toStdout = settings.json === STANDARD_OUTPUT || settings.markdown === STANDARD_OUTPUT;
    if (!request.quiet && !toStdout) {
      const color = process.stdout.isTTY === true && process.env.NO_COLOR === undefined;
      await write(renderTerminal(report, { color }));
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

/** Writes the JSON report (to a file, or standard output for "-") in pieces. */
async function writeJson(path: string, report: Report): Promise<void> {
  const pieces = jsonPieces(report as unknown as Record<string, unknown>);
  if (path === STANDARD_OUTPUT) {
    for (const piece of pieces) await write(piece);
    await write('\n');
    return;
  }
  const out = createWriteStream(path);
  for (const piece of pieces) if (!out.write(piece)) await once(out, 'drain');
  out.end('\n');
  await once(out, 'finish');
}

/** Writes to standard output, waiting when the pipe is full. */
async function write(text: string): Promise<void> {
  if (!process.stdout.write(text)) await once(process.stdout, 'drain');
}

main(process.argv.slice(2)).then((code) => {
  process.exitCode = code;
});
