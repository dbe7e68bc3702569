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

  /** One paragraph: "file:line: message (column "c", value "v")". */
  describe(): string {
    const { file, line, column, value } = this.location;
    const where = file === undefined ? '' : line === undefined ? `${file}: ` : `${file}:${line}: `;
    const details: string[] = [];
    if (column !== undefined) details.push(`column "${column}"`);
    if (value !== undefined) details.push(`value ${JSON.stringify(truncate(value, 80))}`);
    return `${where}${this.message}${details.length > 0 ? ` (${details.join(', ')})` : ''}`;
  }
}

function truncate(text: string, max: number): string {
  return text.length <= max ? text : `${text.slice(0, max)}…`;
}
