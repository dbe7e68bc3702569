import { InputError } from '../core/inputError.js';
import { ENGINE_OPTIONS } from '../settings/options.js';
import { type RawOptions, resolveSettings } from '../settings/resolveSettings.js';
import type { Settings } from '../settings/settings.js';
import { INPUT } from './names.js';
import { isLogin } from './postingIdentity.js';

/** Where the report comes from: a fresh comparison, or a JSON report an earlier job wrote. */
export type ReportSource =
  | { readonly kind: 'compare'; readonly settings: Settings }
  | {
      readonly kind: 'report-file';
      readonly path: string;
      /** The `name` input ('' when not given: the report's own name is used). */
      readonly name: string;
      readonly json: string | null;
      readonly markdown: string | null;
      readonly html: string | null;
    };

/** Everything the action's inputs say, validated. */
export interface ActionSettings {
  readonly source: ReportSource;
  readonly comment: boolean;
  readonly token: string;
  /** The `comment-author` input: the login the comments are written as, or null to ask GitHub. */
  readonly commentAuthor: string | null;
  readonly pullRequest: number | null;
}

/** How a message names an input: `input 'alpha'`. */
export const inputLabel = (name: string): string => `input '${name}'`;

/**
 * Reads every input into ActionSettings. The engine's inputs go through the same
 * resolveSettings the CLI uses, so both build the same Settings; a bad value is an InputError
 * naming the input. `getInput` returns '' for an input that is absent.
 */
export function readActionSettings(getInput: (name: string) => string): ActionSettings {
  const raw: Record<string, string> = {};
  for (const option of ENGINE_OPTIONS) raw[option.name] = getInput(option.name);
  const reportFile = getInput(INPUT.reportFile).trim();
  return {
    source: reportFile === '' ? compareSource(raw) : reportFileSource(reportFile, raw),
    comment: readBoolean(INPUT.comment, getInput(INPUT.comment), true),
    token: getInput(INPUT.githubToken).trim(),
    commentAuthor: readCommentAuthor(getInput(INPUT.commentAuthor)),
    pullRequest: readPullRequest(getInput(INPUT.pullRequest)),
  };
}

function compareSource(raw: RawOptions): ReportSource {
  return { kind: 'compare', settings: resolveSettings(raw, inputLabel) };
}

function reportFileSource(path: string, raw: RawOptions): ReportSource {
  for (const name of ['baseline', 'candidate', 'actuals']) {
    if ((raw[name] ?? '').trim() !== '') {
      throw new InputError(
        `${inputLabel(INPUT.reportFile)} posts an existing report and cannot be combined with ${inputLabel(name)}`,
      );
    }
  }
  const optional = (name: string): string | null => {
    const text = (raw[name] ?? '').trim();
    return text === '' ? null : text;
  };
  return {
    kind: 'report-file',
    path,
    name: (raw.name ?? '').trim(),
    json: optional('json'),
    markdown: optional('markdown'),
    html: optional('html'),
  };
}

/** true/false in any letter case (as the runner's YAML booleans arrive); '' is the default. */
export function readBoolean(name: string, text: string, fallback: boolean): boolean {
  const value = text.trim().toLowerCase();
  if (value === '') return fallback;
  if (value === 'true') return true;
  if (value === 'false') return false;
  throw new InputError(`${inputLabel(name)} must be true or false`, { value: text });
}

/**
 * The `comment-author` input: a GitHub login, optionally ending in `[bot]`. It comes from the
 * workflow file (trusted), and only decides whose comments the gate may edit.
 */
function readCommentAuthor(text: string): string | null {
  const value = text.trim();
  if (value === '') return null;
  if (!isLogin(value)) {
    throw new InputError(
      `${inputLabel(INPUT.commentAuthor)} must be a GitHub login such as my-app[bot] (letters, digits and single inner hyphens, at most 39 characters, optionally followed by [bot])`,
      { value: text },
    );
  }
  return value;
}

function readPullRequest(text: string): number | null {
  const value = text.trim().replace(/^#/, '');
  if (value === '') return null;
  const n = Number(value);
  if (!/^\d+$/.test(value) || !Number.isSafeInteger(n) || n < 1) {
    throw new InputError(
      `${inputLabel(INPUT.pullRequest)} must be a pull-request number such as 42`,
      {
        value: text,
      },
    );
  }
  return n;
}
