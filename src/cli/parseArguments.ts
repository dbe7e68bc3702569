import { parseArgs } from 'node:util';
import { InputError } from '../core/inputError.js';
import { ENGINE_OPTIONS } from '../settings/options.js';
import type { RawOptions } from '../settings/resolveSettings.js';

export type CliRequest =
  | { readonly kind: 'help' }
  | { readonly kind: 'version' }
  | { readonly kind: 'compare'; readonly options: RawOptions; readonly quiet: boolean };

/** Parses argv (without node and script) into a request; bad usage is an InputError. */
export function parseArguments(argv: readonly string[]): CliRequest {
  if (argv.length === 0 || argv.includes('--help') || argv.includes('-h') || argv[0] === 'help') {
    return { kind: 'help' };
  }
  if (argv.includes('--version')) return { kind: 'version' };
  const [command, ...rest] = argv;
  if (command !== 'compare') {
    throw new InputError(
      `unknown command "${command}"; the command is "compare" (see skillgate --help)`,
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
    const message = error instanceof Error ? error.message : String(error);
    throw new InputError(`${message.replace(/\.$/, '')}; see skillgate --help`);
  }
  const options: Record<string, string | undefined> = {};
  for (const o of ENGINE_OPTIONS) {
    const v = values[o.name];
    options[o.name] = typeof v === 'boolean' ? String(v) : Array.isArray(v) ? v.join('\n') : v;
  }
  return { kind: 'compare', options, quiet: values.quiet === true };
}
