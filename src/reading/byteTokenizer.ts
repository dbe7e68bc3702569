import { echo, InputError } from '../core/inputError.js';
import type { Delimiter } from './inputFormat.js';
import { asBytes, type Bytes, decodeUtf8, Utf8Encoder, utf16Length } from './utf8.js';

/**
 * Receives one record as byte ranges: field k is `bytes[starts[k], ends[k])` for k < `count`;
 * `line` is the 1-based physical line the record starts on. The arrays and the bytes are reused
 * between calls, so copy what must outlive the call.
 */
export type ByteRecordSink = (
  bytes: Bytes,
  starts: Int32Array,
  ends: Int32Array,
  count: number,
  line: number,
) => void;

/** Default longest record: 1 MiB of text (`line-limit`), counted in UTF-16 code units. */
export const DEFAULT_LINE_LIMIT = 1 << 20;

const QUOTE = 34;
const LF = 10;
const CR = 13;
const EMPTY: Bytes = Buffer.alloc(0);
const LINE_BREAK: Bytes = Buffer.from('\n');

/**
 * A streaming RFC 4180 tokenizer over UTF-8 byte chunks that builds no string per field: it hands
 * each record to the sink as byte ranges (docs/decisions/0001-csv-reading.md).
 *
 * - Records end at LF or CRLF; a lone CR is data. Fields are separated by `delimiter`.
 * - A field that starts with a double quote is quoted: it runs to the next lone quote, `""` inside
 *   stands for one quote, and delimiters and line breaks inside are data. After the closing quote
 *   comes a delimiter or the end of the record, else it is an InputError. A quote anywhere else in
 *   an unquoted field is an ordinary character. A record with a quote is handed over from a copy
 *   with the quotes removed; other records point into the input.
 * - A UTF-8 byte-order mark at the very start is skipped.
 * - Empty lines are skipped and counted in `blankLines` (nothing is dropped silently).
 * - Line numbers are physical: a record whose quoted field spans three lines advances the count by
 *   three, so the next record's line is the line an editor shows.
 * - A record longer than `lineLimit` UTF-16 code units (the length the same text has as a
 *   JavaScript string, quoted line breaks included) is an InputError naming its first line, found
 *   as soon as that much is buffered, so a file without line breaks cannot exhaust memory.
 *
 * Chunks may split anywhere (inside a field, a character, a quote pair, or a CRLF); the records
 * are the same as for the whole input at once. Only the unfinished tail of a chunk is kept. Text
 * chunks are accepted too (encoded as UTF-8). The bytes must be UTF-8; the file edge checks that.
 */
export class ByteTokenizer {
  /** Empty lines skipped so far. */
  blankLines = 0;
  private readonly delimiter: number;
  private readonly sink: ByteRecordSink;
  private readonly file: string;
  private readonly lineLimit: number;
  private starts: Int32Array = new Int32Array(64);
  private ends: Int32Array = new Int32Array(64);
  /** The unfinished tail of the input so far: `carry[0, carryLength)`. */
  private carry: Bytes = EMPTY;
  private carryLength = 0;
  /** Where the carry and the next chunk are joined. */
  private joined: Bytes = EMPTY;
  /** Fields of a record with quotes, unquoted. */
  private scratch: Bytes = EMPTY;
  private linesDone = 0;
  /** Bytes pushed so far, and the offset in the input of the buffer being read. */
  private pushed = 0;
  private base = 0;
  /** End of the last record handed over, in the buffer being read. */
  private recordEnd = 0;
  private started = false;
  private readonly encoder = new Utf8Encoder();

  constructor(
    delimiter: Delimiter,
    sink: ByteRecordSink,
    file: string,
    lineLimit: number = DEFAULT_LINE_LIMIT,
  ) {
    this.delimiter = delimiter.charCodeAt(0);
    this.sink = sink;
    this.file = file;
    this.lineLimit = lineLimit;
  }

  /** Physical lines consumed so far (complete records and blank lines). */
  get lines(): number {
    return this.linesDone;
  }

  /** Bytes of the input up to the end of the last record handed over (exact inside the sink). */
  get bytesDone(): number {
    return this.base + this.recordEnd;
  }

  push(chunk: string | Uint8Array): void {
    const bytes = typeof chunk === 'string' ? this.encoder.encode(chunk) : asBytes(chunk);
    let buf = bytes;
    this.base = this.pushed - this.carryLength;
    this.pushed += bytes.length;
    this.recordEnd = 0;
    if (this.carryLength > 0) {
      const n = this.carryLength + bytes.length;
      if (this.joined.length < n) {
        this.joined = Buffer.allocUnsafe(Math.max(n, 2 * this.joined.length));
      }
      this.carry.copy(this.joined, 0, 0, this.carryLength);
      this.joined.set(bytes, this.carryLength);
      buf = this.joined.subarray(0, n);
      this.carryLength = 0;
    }
    let pos = 0;
    if (!this.started) {
      if (buf.length === 0) return;
      if (buf.length < 3 && isBomPrefix(buf)) {
        this.keep(buf, 0);
        return;
      }
      this.started = true;
      if (buf[0] === 0xef && buf[1] === 0xbb && buf[2] === 0xbf) pos = 3;
    }
    pos = this.records(buf, pos);
    if (pos < buf.length) {
      const n = buf.length;
      if (n - pos > this.lineLimit && utf16Length(buf, pos, n) > this.lineLimit) {
        this.tooLong(buf, pos, this.linesDone + 1);
      }
      this.keep(buf, pos);
    }
  }

  /** Flushes the last record (which need not end with a line break). */
  end(): void {
    const rest = this.encoder.flush();
    if (rest.length > 0) this.push(rest);
    if (this.carryLength === 0) return;
    const startLine = this.linesDone + 1;
    this.push(LINE_BREAK);
    if (this.carryLength > 0) {
      throw new InputError('a quoted field is not closed before the end of the file', {
        file: this.file,
        line: startLine,
        value: echo(decodeUtf8(this.carry, 0, this.carryLength), 60),
      });
    }
  }

  /** Hands over the complete records in `buf` from `pos`; returns where the unfinished tail starts. */
  private records(buf: Bytes, pos: number): number {
    const n = buf.length;
    const d = this.delimiter;
    const limit = this.lineLimit;
    let starts = this.starts;
    let ends = this.ends;
    while (pos < n) {
      let count = 0;
      let start = pos;
      let j = pos;
      let quoted = false;
      for (; j < n; j++) {
        const c = buf[j]!;
        if (c === LF) break;
        if (c === QUOTE) {
          quoted = true;
          break;
        }
        if (c === d) {
          if (count + 1 >= starts.length) {
            this.growFields();
            starts = this.starts;
            ends = this.ends;
          }
          starts[count] = start;
          ends[count] = j;
          count++;
          start = j + 1;
        }
      }
      // A record with a quote before its line break takes the slow path.
      if (quoted) {
        const end = this.slowRecord(buf, pos);
        if (end < 0) break;
        pos = end;
        starts = this.starts;
        ends = this.ends;
        continue;
      }
      if (j === n) break;
      if (j - pos > limit && utf16Length(buf, pos, j) > limit) {
        this.tooLong(buf, pos, this.linesDone + 1);
      }
      let lineEnd = j;
      if (lineEnd > pos && buf[lineEnd - 1] === CR) lineEnd--;
      this.linesDone++;
      if (lineEnd === pos) {
        this.blankLines++;
        pos = j + 1;
        continue;
      }
      starts[count] = start;
      ends[count] = lineEnd;
      count++;
      this.recordEnd = j + 1;
      this.sink(buf, starts, ends, count, this.linesDone);
      pos = j + 1;
    }
    return pos;
  }

  /**
   * Reads one record that contains a quote, byte by byte, into the scratch buffer with the quotes
   * removed. Returns the position after its line break, or −1 when the buffer ends first (the
   * caller keeps the tail for the next chunk).
   */
  private slowRecord(buf: Bytes, pos: number): number {
    const n = buf.length;
    const d = this.delimiter;
    if (this.scratch.length < n - pos) {
      this.scratch = Buffer.allocUnsafe(Math.max(n - pos, 2 * this.scratch.length, 1024));
    }
    const out = this.scratch;
    let written = 0;
    let count = 0;
    let i = pos;
    let newlines = 0;
    for (;;) {
      if (count + 1 >= this.starts.length) this.growFields();
      const starts = this.starts;
      const ends = this.ends;
      // At the start of a field.
      if (i < n && buf[i] === QUOTE) {
        i++;
        const fieldStart = i;
        const outStart = written;
        for (;;) {
          let q = i;
          for (; q < n; q++) {
            const c = buf[q]!;
            if (c === QUOTE) break;
            out[written++] = c;
          }
          if (q + 1 >= n) return -1;
          if (buf[q + 1] === QUOTE) {
            out[written++] = QUOTE;
            i = q + 2;
            continue;
          }
          newlines += countLineFeeds(buf, fieldStart, q);
          i = q + 1;
          break;
        }
        starts[count] = outStart;
        ends[count] = written;
        count++;
        const c = buf[i];
        if (c === d) {
          i++;
          continue;
        }
        if (c === LF) {
          i++;
          break;
        }
        if (c === CR) {
          if (i + 1 >= n) return -1;
          if (buf[i + 1] === LF) {
            i += 2;
            break;
          }
        }
        throw new InputError(
          'unexpected character after a closing quote (a quoted field must be followed by a delimiter or the end of the line)',
          {
            file: this.file,
            line: this.linesDone + 1 + newlines,
            value: echo(textAround(buf, pos, i, 20), 60),
          },
        );
      }
      // Unquoted field: up to the delimiter or the line break.
      let j = i;
      while (j < n) {
        const c = buf[j];
        if (c === d || c === LF) break;
        j++;
      }
      if (j >= n) return -1;
      const end = buf[j] === d ? j : j > i && buf[j - 1] === CR ? j - 1 : j;
      starts[count] = written;
      for (let k = i; k < end; k++) out[written++] = buf[k]!;
      ends[count] = written;
      count++;
      const last = buf[j] !== d;
      i = j + 1;
      if (last) break;
    }
    const line = this.linesDone + 1;
    if (i - pos > this.lineLimit && utf16Length(buf, pos, i) > this.lineLimit) {
      this.tooLong(buf, pos, line);
    }
    this.linesDone += 1 + newlines;
    this.recordEnd = i;
    this.sink(out, this.starts, this.ends, count, line);
    return i;
  }

  private tooLong(buf: Bytes, pos: number, line: number): never {
    throw new InputError(
      `the line is longer than the limit of ${this.lineLimit} characters (raise it with --line-limit if the file is right; a file without line breaks, or with an unclosed quote, also ends here)`,
      {
        file: this.file,
        line,
        value: decodeUtf8(buf, pos, Math.min(buf.length, pos + 800)).slice(0, 200),
      },
    );
  }

  /** Copies `buf[pos, end)` to the carry. */
  private keep(buf: Bytes, pos: number): void {
    const length = buf.length - pos;
    if (this.carry.length < length) {
      this.carry = Buffer.allocUnsafe(Math.max(length, 2 * this.carry.length, 256));
    }
    buf.copy(this.carry, 0, pos);
    this.carryLength = length;
  }

  private growFields(): void {
    const starts = new Int32Array(this.starts.length * 2);
    const ends = new Int32Array(this.ends.length * 2);
    starts.set(this.starts);
    ends.set(this.ends);
    this.starts = starts;
    this.ends = ends;
  }
}

/** The text from `from` to `units` UTF-16 code units past `to` (as the echo of an error). */
function textAround(buf: Bytes, from: number, to: number, units: number): string {
  const head = decodeUtf8(buf, from, to);
  return decodeUtf8(buf, from, Math.min(buf.length, to + 4 * units)).slice(0, head.length + units);
}

function isBomPrefix(buf: Uint8Array): boolean {
  return buf[0] === 0xef && (buf.length < 2 || buf[1] === 0xbb);
}

function countLineFeeds(bytes: Bytes, from: number, to: number): number {
  let count = 0;
  let i = bytes.indexOf(LF, from);
  while (i !== -1 && i < to) {
    count++;
    i = bytes.indexOf(LF, i + 1);
  }
  return count;
}
