/**
 * The one error type the edges turn into exit code 2: something about the user's input or
 * invocation is wrong. It carries where (file, line, column) and what (the offending value), so
 * the message can name them without a stack trace.
 */
export interface InputErrorLocation {
  /** The file as the user named it (or the option / input name for usage errors). */
  readonly file?: string;
  /** 1-based physical line in the file (the header is line 1). */
  readonly line?: number;
  /** The column's name as it appears in the header. */
  readonly column?: string;
  /** The offending value, verbatim. */
  readonly value?: string;
}

export class InputError extends Error {
  readonly location: InputErrorLocation;

  constructor(message: string, location: InputErrorLocation = {}) {
    super(message);
    this.name = 'InputError';
    this.location = location;
  }

  /**
   * One line: "file:line: message (column "c", value "v")". Everything echoed from the input
   * (file and column names, values, and whatever the message quotes, such as a series name) is
   * passed through `printable`, so the line cannot be broken into several, and a name cannot
   * start a line that the Actions runner would read as a workflow command (`::error::…`).
   */
  describe(): string {
    const { file, line, column, value } = this.location;
    const name = file === undefined ? '' : echo(file);
    const where = file === undefined ? '' : line === undefined ? `${name}: ` : `${name}:${line}: `;
    const details: string[] = [];
    if (column !== undefined) details.push(`column "${echo(column)}"`);
    if (value !== undefined) details.push(`value ${JSON.stringify(echo(value))}`);
    const message = echo(this.message, MESSAGE_LIMIT);
    return printable(`${where}${message}${details.length > 0 ? ` (${details.join(', ')})` : ''}`);
  }
}

/** Longest echoed value (file name, column, value) in a message: about 200 characters. */
export const ECHO_LIMIT = 200;
const MESSAGE_LIMIT = 2000;

/**
 * Text from the input as a message may echo it: at most `max` characters (default ECHO_LIMIT),
 * cut with "…" and the full length, so a 256 MiB header line is never printed whole.
 */
export function echo(text: string, max: number = ECHO_LIMIT): string {
  if (text.length <= max) return text;
  return `${text.slice(0, max)}… (${text.length} characters)`;
}

/**
 * Shows control characters instead of obeying them: LF, CR and tab as `\n`, `\r`, `\t`, every
 * other C0/C1 control, U+2028/U+2029 and the bidirectional embedding, override and isolate
 * controls (U+202A–U+202E, U+2066–U+2069) as `\u{XXXX}`. Other text is unchanged (a backslash
 * already in the text stays as it is).
 */
export function printable(text: string): string {
  return text.replace(
    // biome-ignore lint/suspicious/noControlCharactersInRegex: control characters are the target
    /[\u0000-\u001f\u007f-\u009f\u2028\u2029\u202a-\u202e\u2066-\u2069]/g,
    (ch) =>
      ch === '\n'
        ? '\\n'
        : ch === '\r'
          ? '\\r'
          : ch === '\t'
            ? '\\t'
            : `\\u{${ch.codePointAt(0)?.toString(16).toUpperCase().padStart(4, '0')}}`,
  );
}
