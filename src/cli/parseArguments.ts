import { parseArgs } from 'node:util';
import { echo, InputError } from '../core/inputError.js';
import { ENGINE_OPTIONS } from '../settings/options.js';
import type { RawOptions } from '../settings/resolveSettings.js';
import { closestName } from './didYouMean.js';

export type CliRequest =
  | { readonly kind: 'help' }
  | { readonly kind: 'version' }
  | { readonly kind: 'usage' }
  | { readonly kind: 'compare'; readonly options: RawOptions; readonly quiet: boolean };

/**
 * Parses argv (without node and script) into a request; bad usage is an InputError. No arguments
 * at all is a request for the short usage (which exits 2: nothing was compared).
 */
export function parseArguments(argv: readonly string[]): CliRequest {
  if (argv.length === 0) return { kind: 'usage' };
  if (argv.includes('--help') || argv.includes('-h') || argv[0] === 'help') {
    return { kind: 'help' };
  }
  if (argv.includes('--version')) return { kind: 'version' };
  const [command, ...rest] = argv;
  if (command !== 'compare') {
    const hint = command?.startsWith('-')
      ? `; options follow the command: skillgate compare ${echo(command, 60)} …`
      : '';
    throw new InputError(
      `unknown command "${echo(command ?? '', 60)}"; the command is "compare" (see skillgate --help)${hint}`,
    );
  }
  const spec: Record<string, { type: 'string' | 'boolean'; multiple?: boolean }> = {
    quiet: { type: 'boolean' },
  };
  for (const o of ENGINE_OPTIONS) spec[o.name] = { type: o.flag ? 'boolean' : 'string' };
  // --candidate may be repeated (several candidates); the lines reach the settings joined.
  spec.candidate = { type: 'string', multiple: true };
  let values: Record<string, string | boolean | (string | boolean)[] | undefined>;
  try {
    ({ values } = parseArgs({
      args: [...rest],
      options: spec,
      strict: true,
      allowPositionals: false,
    }));
  } catch (error) {
    throw usageError(error, Object.keys(spec));
  }
  const options: Record<string, string | undefined> = {};
  for (const o of ENGINE_OPTIONS) {
    const v = values[o.name];
    options[o.name] = typeof v === 'boolean' ? String(v) : Array.isArray(v) ? v.join('\n') : v;
  }
  return { kind: 'compare', options, quiet: values.quiet === true };
}

/** node:util's parse errors in the CLI's words, with "did you mean" for a mistyped option. */
function usageError(error: unknown, names: readonly string[]): InputError {
  const message = error instanceof Error ? error.message : String(error);
  const unknown = /Unknown option '(-{1,2})([^']*)'/.exec(message);
  if (unknown !== null) {
    const typed = unknown[2]!.split('=')[0]!;
    const close = closestName(typed, names);
    return new InputError(
      `unknown option ${unknown[1]}${echo(typed, 60)}${close === null ? '' : `; did you mean --${close}?`} (see skillgate --help)`,
    );
  }
  const positional = /Unexpected argument '([^']*)'/.exec(message);
  if (positional !== null) {
    return new InputError(
      `unexpected argument "${echo(positional[1]!, 60)}": every value follows its option, e.g. --baseline FILE (see skillgate --help)`,
    );
  }
  const ambiguous = /Option '(--[^']*)' argument is ambiguous/.exec(message);
  if (ambiguous !== null) {
    return new InputError(
      `the value after ${ambiguous[1]} starts with "-" and looks like an option; write ${ambiguous[1]}=VALUE (see skillgate --help)`,
    );
  }
  const missing = /Option '(?:-., )?(--[^ ']*)[^']*' argument missing/.exec(message);
  if (missing !== null) {
    return new InputError(`${missing[1]} needs a value (see skillgate --help)`);
  }
  return new InputError(`${echo(message.replace(/\.$/, ''), 300)}; see skillgate --help`);
}
