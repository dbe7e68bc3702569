import { echo, InputError } from '../core/inputError.js';
import type { FileSummary, FileSummaryRole } from '../core/panel.js';
import { ByteTokenizer } from './byteTokenizer.js';
import { type ColumnMapping, checkDistinctNames } from './columnMapping.js';
import {
  columnOf,
  type ForecastColumn,
  forecastColumns,
  growColumns,
  HORIZON,
  KEY_PARTS,
  LABEL,
  tableColumns,
  WEIGHT,
} from './forecastColumns.js';
import { type Header, resolveHeader } from './forecastHeader.js';
import type { ForecastTable } from './forecastTable.js';
import { type TextDialect, type TextFormat, textDialect } from './formatDetection.js';
import type { DecimalMark, Delimiter } from './inputFormat.js';
import {
  horizonFromBytes,
  parseDecimal,
  parseDecimalComma,
  parseHorizon,
  storeDecimalFromBytes,
} from './numbers.js';
import { RowKeySet } from './rowKeySet.js';
import { type Bytes, utf16Length } from './utf8.js';

/** The part a forecast file plays (a loss file is read elsewhere). */
export type FileRole = Exclude<FileSummaryRole, 'losses'>;
/**
 * Longest key value (series, timestamp, origin, path). Distinct key values are kept for the whole
 * file, so a cap on them (with the line limit and duplicate keys found while reading) bounds the
 * memory a small compressed file can make the reader use.
 */
export const MAX_LABEL = 512;

/** One field of a record: text from a CSV, or a number from a typed source such as Parquet. */
export type Field = string | number;

export interface ParseOptions {
  readonly role: FileRole;
  readonly columns?: ColumnMapping;
  /** Field delimiter: comma for 'csv' (the default), tab for 'tsv'. */
  readonly format?: TextFormat;
  /**
   * For predictions files: the actual column is required (there is no separate actuals file).
   * Actuals files always require it.
   */
  readonly requireActual?: boolean;
  /** Field separator; overrides the one `format` implies. */
  readonly delimiter?: Delimiter;
  /** Decimal mark of numbers: "." (default) or "," (then the delimiter must not be a comma). */
  readonly decimal?: DecimalMark;
  /** Longest record in characters (default 1 MiB). */
  readonly lineLimit?: number;
}

/**
 * Pure reader of one forecast file: feed it UTF-8 byte chunks (or text chunks) with push(), then
 * finish(). It tokenizes the bytes (ByteTokenizer), checks the header once, validates every value
 * straight from its bytes into typed columns — numbers by the exact fast path where it applies,
 * keys interned from their bytes — and throws an InputError (file, line, column, value) at the
 * first problem. Each column is handled by its entry in one descriptor list (forecastColumns).
 */
export class ForecastTableReader {
  private readonly tokenizer: ByteTokenizer;
  private readonly path: string;
  private readonly options: ParseOptions;
  private readonly dialect: TextDialect;
  private header: Header | null = null;
  private headerLine = 0;
  private columns: ForecastColumn[] = [];
  private rows = 0;
  private capacity = 0;
  private lines: Int32Array = new Int32Array(0);
  private keys: RowKeySet | null = null;
  private expectedBytes = 0;

  constructor(path: string, options: ParseOptions) {
    this.path = path;
    this.options = options;
    checkDistinctNames(options.columns ?? {});
    this.dialect = textDialect(path, options);
    this.tokenizer = new ByteTokenizer(
      this.dialect.delimiter,
      (bytes, starts, ends, count, line) => {
        if (this.header === null) {
          const names: string[] = [];
          for (let k = 0; k < count; k++) names.push(bytes.toString('utf8', starts[k], ends[k]));
          this.readHeader(names, line);
        } else this.readBytes(bytes, starts, ends, count, line);
      },
      path,
      options.lineLimit,
    );
  }

  /**
   * Takes one record (the header first, then rows) from a source other than text, such as a
   * Parquet file's rows; `line` is what messages call the record's line. A field may be a number
   * already (a Parquet double): it is taken as the double a CSV's shortest round-trip text of it
   * parses to, that is, as it is.
   */
  record(fields: readonly Field[], count: number, line: number): void {
    if (this.header === null) this.readHeader(fields.slice(0, count).map(String), line);
    else this.readFields(fields, count, line);
  }

  /** Header indices of the columns that play a role (after the header was read). */
  get usedColumns(): readonly number[] {
    const h = this.header;
    if (h === null) return [];
    return h.names.map((_, i) => i).filter((i) => !h.ignored.includes(h.names[i]!));
  }

  push(chunk: string | Uint8Array): void {
    this.tokenizer.push(chunk);
  }

  /** The size of the text input, if known: the columns then grow to the rows it holds. */
  expectBytes(total: number): void {
    this.expectedBytes = total;
  }

  /** Ends the input and returns the table; `sha256` is recorded in the summary as given. */
  finish(sha256 = ''): ForecastTable {
    this.tokenizer.end();
    const header = this.header;
    if (header === null) {
      throw new InputError('the file is empty (expected a header line and data rows)', {
        file: this.path,
        line: 1,
      });
    }
    if (this.rows === 0) {
      throw new InputError('the file has a header but no data rows', {
        file: this.path,
        line: this.headerLine + 1,
      });
    }
    const n = this.rows;
    const summary: FileSummary = {
      role: this.options.role,
      path: this.path,
      rows: n,
      sha256,
      columns: header.names,
      ignoredColumns: header.ignored,
      blankLines: this.tokenizer.blankLines,
    };
    return { summary, size: n, lines: this.lines.slice(0, n), ...tableColumns(this.columns, n) };
  }

  private readHeader(names: string[], line: number): void {
    const h = resolveHeader(names, this.path, line, this.options, this.dialect.delimiter);
    this.header = h;
    this.headerLine = line;
    this.columns = forecastColumns(h);
    // Series first, then time: the orders files are usually written in (see RowKeySet). An
    // actuals file is keyed on series and timestamp only.
    const parts = this.options.role === 'actuals' ? KEY_PARTS.slice(0, 2) : KEY_PARTS;
    const key = parts
      .map((part) => columnOf(this.columns, part))
      .filter((c) => c !== undefined)
      .map((c) => () => c.ints);
    this.keys = new RowKeySet(key);
  }

  /** Makes room for the next row; returns its index. */
  private nextRow(line: number): number {
    const r = this.rows;
    if (r === this.capacity) {
      const capacity = this.nextCapacity(r);
      const lines = new Int32Array(capacity);
      lines.set(this.lines);
      this.lines = lines;
      growColumns(this.columns, capacity);
      this.capacity = capacity;
      this.keys!.refresh();
    }
    this.lines[r] = line;
    return r;
  }

  /**
   * Room for the rows after row `r`: twice as many, or — once the size of the input is known and
   * a few thousand rows are read — the rows the whole input holds at the bytes per row so far,
   * plus 2%, but at least half as many again and at most four times as many (so a huge file that
   * fails early has not reserved its whole table).
   */
  private nextCapacity(r: number): number {
    const doubled = Math.max(1024, 2 * this.capacity);
    const done = this.tokenizer.bytesDone;
    if (this.expectedBytes <= 0 || r < 4096 || done <= 0) return doubled;
    const estimate = Math.ceil(((r * this.expectedBytes) / done) * 1.02) + 1024;
    return Math.min(4 * this.capacity, Math.max(this.capacity + (this.capacity >> 1), estimate));
  }

  /** Ends a row: a key seen before is refused at once, naming both lines. */
  private endRow(r: number, line: number): void {
    const earlier = this.keys!.add(r);
    if (earlier >= 0) this.duplicate(earlier, r, line);
    this.rows = r + 1;
  }

  /** One row of a text file, read from its bytes. */
  private readBytes(
    bytes: Bytes,
    starts: Int32Array,
    ends: Int32Array,
    count: number,
    line: number,
  ): void {
    const width = this.header!.names.length;
    if (count !== width) {
      const fields: string[] = [];
      for (let k = 0; k < Math.min(count, 50); k++) {
        fields.push(bytes.toString('utf8', starts[k], ends[k]));
      }
      this.fieldCount(fields, count, line);
    }
    const r = this.nextRow(line);
    const columns = this.columns;
    const comma = this.dialect.decimalComma;
    for (let k = 0; k < columns.length; k++) {
      const c = columns[k]!;
      const a = starts[c.field]!;
      const b = ends[c.field]!;
      switch (c.kind) {
        case LABEL:
          if (a === b || (b - a > MAX_LABEL && utf16Length(bytes, a, b) > MAX_LABEL)) {
            this.checkLabel(c, bytes.toString('utf8', a, b), line);
          }
          c.ints[r] = c.labels!.id(bytes, a, b, line);
          break;
        case HORIZON: {
          const value = horizonFromBytes(bytes, a, b);
          if (value === 0) this.badHorizon(c, bytes.toString('utf8', a, b), line);
          c.ints[r] = value;
          break;
        }
        default: {
          const floats = c.floats;
          if (!storeDecimalFromBytes(bytes, a, b, comma, floats, r)) {
            this.numberOfText(c, bytes.toString('utf8', a, b), line);
          }
          if (c.kind === WEIGHT && floats[r]! < 0) {
            this.negativeWeight(c, bytes.toString('utf8', a, b), line);
          }
        }
      }
    }
    this.endRow(r, line);
  }

  /** One row from a typed source (fields are text or numbers). */
  private readFields(fields: readonly Field[], count: number, line: number): void {
    const width = this.header!.names.length;
    if (count !== width) this.fieldCount(fields.slice(0, Math.min(count, 50)), count, line);
    const r = this.nextRow(line);
    const columns = this.columns;
    for (let k = 0; k < columns.length; k++) {
      const c = columns[k]!;
      const field = fields[c.field]!;
      if (c.kind === LABEL) {
        const text = typeof field === 'string' ? field : String(field);
        if (text.length === 0 || text.length > MAX_LABEL) this.checkLabel(c, text, line);
        c.ints[r] = c.labels!.idOfText(text, line);
      } else if (c.kind === HORIZON) {
        const value =
          typeof field === 'number'
            ? Number.isInteger(field) && field >= 1 && field <= 0x7fffffff
              ? field
              : 0
            : parseHorizon(field);
        if (value === 0) this.badHorizon(c, String(field), line);
        c.ints[r] = value;
      } else {
        let value: number;
        if (typeof field === 'number') {
          if (!Number.isFinite(field)) {
            throw new InputError('not a finite number', {
              file: this.path,
              line,
              column: c.name,
              value: String(field),
            });
          }
          value = field;
        } else value = this.numberOfText(c, field, line);
        if (c.kind === WEIGHT && value < 0) this.negativeWeight(c, String(field), line);
        c.floats[r] = value;
      }
    }
    this.endRow(r, line);
  }

  private fieldCount(shown: readonly Field[], count: number, line: number): never {
    const width = this.header!.names.length;
    throw new InputError(`expected ${width} fields as in the header, found ${count}`, {
      file: this.path,
      line,
      value: echo(shown.join(this.dialect.delimiter)),
    });
  }

  /** A key seen twice in this file: refused at once, naming both lines. */
  private duplicate(earlier: number, row: number, line: number): never {
    // Spelled as alignment spells keys (part names; horizon 1 when there is no horizon column).
    const parts: string[] = [];
    const spelled = this.options.role === 'actuals' ? KEY_PARTS.slice(0, 2) : KEY_PARTS;
    for (const part of spelled) {
      const c = columnOf(this.columns, part);
      if (c === undefined) {
        if (part === 'horizon') parts.push('horizon=1');
      } else if (c.kind === HORIZON) parts.push(`horizon=${c.ints[row]}`);
      else parts.push(`${part}=${c.labels!.labels[c.ints[row]!]}`);
    }
    const key = echo(parts.join(' '));
    throw new InputError(
      `duplicated key ${key}: lines ${this.lines[earlier]} and ${line} have the same key`,
      { file: this.path, line, value: key },
    );
  }

  /** Refuses a key value that is too long or empty. */
  private checkLabel(c: ForecastColumn, text: string, line: number): void {
    if (text.length > MAX_LABEL) {
      throw new InputError(
        `a key value longer than ${MAX_LABEL} characters (${text.length}); series names, timestamps, origins and paths are kept in memory for every distinct value, so they must be short`,
        { file: this.path, line, column: c.name, value: text },
      );
    }
    if (text.length === 0) {
      throw new InputError('empty value in a key column', {
        file: this.path,
        line,
        column: c.name,
        value: text,
      });
    }
  }

  private badHorizon(c: ForecastColumn, text: string, line: number): never {
    throw new InputError('the horizon must be a whole number ≥ 1', {
      file: this.path,
      line,
      column: c.name,
      value: text,
    });
  }

  private negativeWeight(c: ForecastColumn, text: string, line: number): never {
    throw new InputError('weights must be ≥ 0', {
      file: this.path,
      line,
      column: c.name,
      value: text,
    });
  }

  /** The number a text field holds, or an InputError with a hint at the likely dialect. */
  private numberOfText(c: ForecastColumn, text: string, line: number): number {
    const comma = this.dialect.decimalComma;
    const value = comma ? parseDecimalComma(text) : parseDecimal(text);
    if (!Number.isNaN(value)) return value;
    let hint = '';
    if (!comma && /^[-+]?\d*,\d+$/.test(text)) {
      hint = ` (a decimal comma? add --decimal , with a separator other than the comma, e.g. --delimiter ";")`;
    } else if (comma && text.includes('.')) {
      hint =
        ' (with --decimal , a point is not a decimal mark, and thousands separators are not read)';
    }
    throw new InputError(
      text.length === 0
        ? 'empty value where a number is required'
        : `not a finite decimal number${hint}`,
      { file: this.path, line, column: c.name, value: text },
    );
  }
}

/** Parses a whole text (or an iterable of chunks) at once; for tests and small inputs. */
export function parseForecastText(
  text: string | Iterable<string>,
  path: string,
  options: ParseOptions,
  sha256 = '',
): ForecastTable {
  const reader = new ForecastTableReader(path, options);
  if (typeof text === 'string') reader.push(text);
  else for (const chunk of text) reader.push(chunk);
  return reader.finish(sha256);
}
