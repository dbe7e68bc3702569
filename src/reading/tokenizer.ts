import { echo, InputError } from '../core/inputError.js';
import { type Delimiter, delimiterLabel } from './inputFormat.js';

/**
 * Receives one record: `fields[0..count-1]` are its fields (the array is reused between calls, so
 * copy what must outlive the call), `line` the 1-based physical line the record starts on.
 */
export type RecordSink = (fields: string[], count: number, line: number) => void;

/**
 * A streaming RFC 4180 tokenizer over text chunks.
 *
 * - Records end at LF or CRLF; a lone CR is data. Fields are separated by `delimiter`.
 * - A field that starts with a double quote is quoted: it runs to the next lone quote, `""` inside
 *   stands for one quote, and delimiters and line breaks inside are data. After the closing quote
 *   comes a delimiter or the end of the record, else it is an InputError. A quote anywhere else in
 *   an unquoted field is an ordinary character.
 * - A UTF-8 byte-order mark at the very start is skipped.
 * - Empty lines are skipped and counted in `blankLines` (nothing is dropped silently).
 * - Line numbers are physical: a record whose quoted field spans three lines advances the count by
 *   three, so the next record's line is the line an editor shows.
 *
 * - A record longer than `lineLimit` code units (the whole record, quoted line breaks included)
 *   is an InputError naming its first line, found as soon as that many characters are buffered,
 *   so a file without line breaks cannot exhaust memory.
 *
 * Chunks may split anywhere (inside a field, a quote pair, or a CRLF); the records are the same as
 * for the whole text at once. Only the unfinished tail of a chunk is kept, so input larger than
 * one JavaScript string can hold streams through.
 *
 * Example: push('a,"b\n""c"""\r\nd,e') then end() gives ['a', 'b\n"c"'] on line 1 and ['d', 'e']
 * on line 3.
 */
export class Tokenizer {
  /** Empty lines skipped so far. */
  blankLines = 0;
  private readonly delimiter: string;
  private readonly delimiterCode: number;
  private readonly sink: RecordSink;
  private readonly file: string;
  private readonly fields: string[] = [];
  private carry = '';
  private linesDone = 0;
  private started = false;
  private readonly lineLimit: number;

  constructor(
    delimiter: Delimiter,
    sink: RecordSink,
    file: string,
    lineLimit: number = DEFAULT_LINE_LIMIT,
  ) {
    this.delimiter = delimiter;
    this.delimiterCode = delimiter.charCodeAt(0);
    this.sink = sink;
    this.file = file;
    this.lineLimit = lineLimit;
  }

  /** Physical lines consumed so far (complete records and blank lines). */
  get lines(): number {
    return this.linesDone;
  }

  push(chunk: string): void {
    let buf = this.carry.length > 0 ? this.carry + chunk : chunk;
    this.carry = '';
    if (!this.started) {
      if (buf.length === 0) return;
      this.started = true;
      if (buf.charCodeAt(0) === 0xfeff) buf = buf.slice(1);
    }
    const n = buf.length;
    const delimiter = this.delimiter;
    const fields = this.fields;
    const sink = this.sink;
    let pos = 0;
    let nextQuote = buf.indexOf('"');
    let nextDelim = -2; // -2: not searched yet; -1: none left in buf
    while (pos < n) {
      const nl = buf.indexOf('\n', pos);
      if (nextQuote !== -1 && nextQuote < pos) nextQuote = buf.indexOf('"', pos);
      if (nextQuote !== -1 && (nl === -1 || nextQuote < nl)) {
        const end = this.slowRecord(buf, pos);
        if (end < 0) break;
        pos = end;
        continue;
      }
      if (nl === -1) break;
      if (nl - pos > this.lineLimit) this.tooLong(buf, pos, this.linesDone + 1);
      let lineEnd = nl;
      if (lineEnd > pos && buf.charCodeAt(lineEnd - 1) === 13) lineEnd--;
      this.linesDone++;
      if (lineEnd === pos) {
        this.blankLines++;
        pos = nl + 1;
        continue;
      }
      let count = 0;
      let start = pos;
      for (;;) {
        if (nextDelim !== -1 && nextDelim < start) nextDelim = buf.indexOf(delimiter, start);
        if (nextDelim === -1 || nextDelim >= lineEnd) {
          fields[count++] = buf.slice(start, lineEnd);
          break;
        }
        fields[count++] = buf.slice(start, nextDelim);
        start = nextDelim + 1;
      }
      sink(fields, count, this.linesDone);
      pos = nl + 1;
    }
    if (pos < n) {
      if (n - pos > this.lineLimit) this.tooLong(buf, pos, this.linesDone + 1);
      this.carry = buf.slice(pos);
    }
  }

  private tooLong(buf: string, pos: number, line: number): never {
    throw new InputError(
      `the line is longer than the limit of ${this.lineLimit} characters (raise it with --line-limit if the file is right; a file without line breaks, or with an unclosed quote, also ends here)`,
      { file: this.file, line, value: buf.slice(pos, pos + 200) },
    );
  }

  /** How the delimiter is named in messages. */
  get delimiterName(): string {
    return delimiterLabel(this.delimiter as Delimiter);
  }

  /** Flushes the last record (which need not end with a line break). */
  end(): void {
    if (this.carry.length === 0) return;
    const startLine = this.linesDone + 1;
    this.push('\n');
    if (this.carry.length > 0) {
      throw new InputError('a quoted field is not closed before the end of the file', {
        file: this.file,
        line: startLine,
        value: truncateValue(this.carry),
      });
    }
  }

  /**
   * Parses one record that contains a quote, char by char. Returns the position after its line
   * break, or −1 when the buffer ends first (the caller keeps the tail for the next chunk).
   */
  private slowRecord(buf: string, pos: number): number {
    const n = buf.length;
    const d = this.delimiterCode;
    const fields = this.fields;
    let count = 0;
    let i = pos;
    let newlines = 0;
    for (;;) {
      // At the start of a field.
      if (i < n && buf.charCodeAt(i) === 34) {
        i++;
        const fieldStart = i;
        let value = '';
        let segment = i;
        for (;;) {
          const q = buf.indexOf('"', i);
          if (q === -1 || q + 1 >= n) return -1;
          if (buf.charCodeAt(q + 1) === 34) {
            value += buf.slice(segment, q + 1);
            i = q + 2;
            segment = i;
            continue;
          }
          value += buf.slice(segment, q);
          newlines += countNewlines(buf, fieldStart, q);
          i = q + 1;
          break;
        }
        fields[count++] = value;
        const c = buf.charCodeAt(i);
        if (c === d) {
          i++;
          continue;
        }
        if (c === 10) {
          i++;
          break;
        }
        if (c === 13) {
          if (i + 1 >= n) return -1;
          if (buf.charCodeAt(i + 1) === 10) {
            i += 2;
            break;
          }
        }
        throw new InputError(
          'unexpected character after a closing quote (a quoted field must be followed by a delimiter or the end of the line)',
          {
            file: this.file,
            line: this.linesDone + 1 + newlines,
            value: truncateValue(buf.slice(pos, Math.min(n, i + 20))),
          },
        );
      }
      // Unquoted field: up to the delimiter or the line break.
      let j = i;
      while (j < n) {
        const c = buf.charCodeAt(j);
        if (c === d || c === 10) break;
        j++;
      }
      if (j >= n) return -1;
      if (buf.charCodeAt(j) === d) {
        fields[count++] = buf.slice(i, j);
        i = j + 1;
        continue;
      }
      const end = j > i && buf.charCodeAt(j - 1) === 13 ? j - 1 : j;
      fields[count++] = buf.slice(i, end);
      i = j + 1;
      break;
    }
    const line = this.linesDone + 1;
    if (i - pos > this.lineLimit) this.tooLong(buf, pos, line);
    this.linesDone += 1 + newlines;
    this.sink(fields, count, line);
    return i;
  }
}

function countNewlines(text: string, from: number, to: number): number {
  let count = 0;
  let i = text.indexOf('\n', from);
  while (i !== -1 && i < to) {
    count++;
    i = text.indexOf('\n', i + 1);
  }
  return count;
}

function truncateValue(text: string): string {
  return echo(text, 60);
}

/** Default longest record: 1 MiB of text (`line-limit`). */
export const DEFAULT_LINE_LIMIT = 1 << 20;
