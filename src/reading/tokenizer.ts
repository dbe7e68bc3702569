import { ByteTokenizer, DEFAULT_LINE_LIMIT } from './byteTokenizer.js';
import type { Delimiter } from './inputFormat.js';

/**
 * Receives one record: `fields[0..count-1]` are its fields (the array is reused between calls, so
 * copy what must outlive the call), `line` the 1-based physical line the record starts on.
 */
export type RecordSink = (fields: string[], count: number, line: number) => void;

/**
 * The ByteTokenizer with each field decoded to a string, for the small files whose readers work
 * on text (fold layouts, pre-aggregated losses). The rules (quoting, line breaks, byte-order
 * mark, blank lines, physical line numbers, the line limit) are the ByteTokenizer's.
 *
 * Example: push('a,"b\n""c"""\r\nd,e') then end() gives ['a', 'b\n"c"'] on line 1 and ['d', 'e']
 * on line 3.
 */
export class Tokenizer {
  private readonly bytes: ByteTokenizer;
  private readonly fields: string[] = [];

  constructor(
    delimiter: Delimiter,
    sink: RecordSink,
    file: string,
    lineLimit: number = DEFAULT_LINE_LIMIT,
  ) {
    const fields = this.fields;
    this.bytes = new ByteTokenizer(
      delimiter,
      (bytes, starts, ends, count, line) => {
        for (let k = 0; k < count; k++) fields[k] = bytes.toString('utf8', starts[k], ends[k]);
        sink(fields, count, line);
      },
      file,
      lineLimit,
    );
  }

  /** Empty lines skipped so far. */
  get blankLines(): number {
    return this.bytes.blankLines;
  }

  /** Physical lines consumed so far (complete records and blank lines). */
  get lines(): number {
    return this.bytes.lines;
  }

  push(chunk: string | Uint8Array): void {
    this.bytes.push(chunk);
  }

  /** Flushes the last record (which need not end with a line break). */
  end(): void {
    this.bytes.end();
  }
}
