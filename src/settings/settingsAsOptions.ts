import { confidenceOverridesDefault } from './defaultConfidence.js';
import { ENGINE_OPTIONS } from './options.js';
import type { Settings } from './settings.js';

export interface OptionValue {
  /** The option's name as typed after `--` on the CLI (and as the action's input). */
  readonly name: string;
  /** The value as a user would type it ('' for an option left empty). */
  readonly value: string;
  readonly isDefault: boolean;
  /** A switch: typed as `--name` alone when true. */
  readonly flag: boolean;
  /** The option names a file. */
  readonly file: boolean;
}

const FILE_OPTIONS = new Set([
  'baseline',
  'candidate',
  'losses',
  'actuals',
  'history',
  'json',
  'markdown',
  'html',
]);

/**
 * The settings in force as the options a user types, in the order of the option table
 * (ENGINE_OPTIONS), each marked as default or not: the inverse of resolveSettings. `paths` turns
 * a file path into the text to show (e.g. relative to the working directory).
 */
export function settingsAsOptions(
  settings: Settings,
  paths: (file: string) => string = (f) => f,
): OptionValue[] {
  const record = settings as unknown as Record<string, unknown>;
  const out: OptionValue[] = [];
  for (const spec of ENGINE_OPTIONS) {
    const key = spec.name.replace(/-([a-z])/g, (_, ch: string) => ch.toUpperCase());
    if (!(key in record)) continue;
    const file = FILE_OPTIONS.has(spec.name);
    const raw = optionText(record[key]);
    const value = file && raw !== '' ? paths(raw) : raw;
    const defaultText = spec.defaultValue ?? '';
    // The intervals' level defaults to 1 − 2α, whatever α is.
    const isDefault =
      spec.name === 'confidence'
        ? !confidenceOverridesDefault(settings.confidence, settings.alpha)
        : sameValue(raw, defaultText);
    out.push({ name: spec.name, value, isDefault, flag: spec.flag === true, file });
  }
  return out;
}

/** `--alpha 0.1 --allow-missing --name 'two words'`: options as typed in a shell. */
export function asCommandLine(options: readonly OptionValue[]): string {
  return options
    .map((o) => {
      if (o.flag) return o.value === 'true' ? `--${o.name}` : `--${o.name}=false`;
      return `--${o.name} ${shellWord(o.value)}`;
    })
    .join(' ');
}

function optionText(value: unknown): string {
  if (value === null || value === undefined) return '';
  if (typeof value === 'string') return value;
  if (typeof value === 'number' || typeof value === 'boolean') return String(value);
  if (Array.isArray(value)) return value.join(',');
  const v = value as Record<string, unknown>;
  if (typeof v.kind === 'string') {
    // lag and block-length rules
    if (v.kind === 'auto') return 'auto';
    if (v.kind === 'horizon') return 'h-1';
    if (typeof v.lag === 'number') return String(v.lag);
    if (typeof v.length === 'number') return String(v.length);
    // the recent window: N time points or P%
    if (v.kind === 'points' && typeof v.points === 'number') return String(v.points);
    if (v.kind === 'share' && typeof v.share === 'number')
      return `${Number((v.share * 100).toPrecision(12))}%`;
  }
  // the column mapping: role=header pairs
  return Object.entries(v)
    .filter(([, header]) => typeof header === 'string')
    .map(([role, header]) => `${role}=${header as string}`)
    .join(',');
}

function sameValue(a: string, b: string): boolean {
  if (a === b) return true;
  const x = Number(a);
  const y = Number(b);
  return a !== '' && b !== '' && Number.isFinite(x) && Number.isFinite(y) && x === y;
}

/** A word a POSIX shell reads back unchanged: bare when safe, else single-quoted. */
function shellWord(text: string): string {
  if (text === '') return "''";
  if (/^[A-Za-z0-9_./:=,+@%-]+$/.test(text)) return text;
  return `'${text.replace(/'/g, `'\\''`)}'`;
}
