import { echo, InputError } from '../core/inputError.js';
import type { FileSummary, FileSummaryRole, QuantileColumn } from '../core/panel.js';
import { type ColumnMapping, checkDistinctNames, resolveColumns } from './columnMapping.js';
import type { ForecastTable, LabelColumn } from './forecastTable.js';
import { type Delimiter, delimiterLabel } from './inputFormat.js';
import { parseDecimal, parseHorizon } from './numbers.js';
import { RowKeySet } from './rowKeySet.js';
import { Tokenizer } from './tokenizer.js';

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
export type TextFormat = 'csv' | 'tsv';

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
  readonly decimal?: '.' | ',';
  /** Longest record in characters (default 1 MiB). */
  readonly lineLimit?: number;
}

/**
 * Pure reader of one forecast file: feed it decoded text chunks with push(), then finish(). It
 * tokenizes, checks the header once, validates every value into typed columns and throws an
 * InputError (file, line, column, value) at the first problem.
 */
export class ForecastTableReader {
  private readonly tokenizer: Tokenizer;
  private readonly path: string;
  private readonly options: ParseOptions;
  private header: Header | null = null;
  private headerLine = 0;
  private rows = 0;
  private capacity = 0;
  private lines: Int32Array = new Int32Array(0);
  private seriesIds: Int32Array = new Int32Array(0);
  private timeIds: Int32Array = new Int32Array(0);
  private originIds: Int32Array = new Int32Array(0);
  private pathIds: Int32Array = new Int32Array(0);
  private horizons: Int32Array = new Int32Array(0);
  private actual: Float64Array = new Float64Array(0);
  private prediction: Float64Array = new Float64Array(0);
  private weight: Float64Array = new Float64Array(0);
  private quantileValues: Float64Array[] = [];
  private readonly seriesLabels = new Interner();
  private readonly timeLabels = new Interner();
  private readonly originLabels = new Interner();
  private readonly pathLabels = new Interner();
  private readonly delimiter: Delimiter;
  private readonly decimalComma: boolean;
  private keys: RowKeySet | null = null;

  constructor(path: string, options: ParseOptions) {
    this.path = path;
    this.options = options;
    checkDistinctNames(options.columns ?? {});
    const delimiter = options.delimiter ?? (options.format === 'tsv' ? '\t' : ',');
    this.delimiter = delimiter;
    this.decimalComma = options.decimal === ',';
    if (this.decimalComma && delimiter === ',') {
      throw new InputError(
        'a decimal comma needs a field separator other than the comma (e.g. --delimiter ";")',
        { file: path },
      );
    }
    this.tokenizer = new Tokenizer(
      delimiter,
      (fields, count, line) => this.record(fields, count, line),
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
    if (this.header === null) this.readHeader(fields.map(String), count, line);
    else this.readRow(fields, count, line);
  }

  /** Header indices of the columns that play a role (after the header was read). */
  get usedColumns(): readonly number[] {
    const h = this.header;
    if (h === null) return [];
    return h.names.map((_, i) => i).filter((i) => !h.ignored.includes(h.names[i]!));
  }

  push(chunk: string): void {
    this.tokenizer.push(chunk);
  }

  /** Physical lines fully read so far. */
  get linesRead(): number {
    return this.tokenizer.lines;
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
    const label = (interner: Interner, ids: Int32Array, column: string): LabelColumn => ({
      column,
      ids: ids.slice(0, n),
      labels: interner.labels,
      firstLines: Int32Array.from(interner.firstLines),
    });
    const quantiles: QuantileColumn[] = header.quantiles.map((q, k) => ({
      level: q.level,
      column: q.column,
      values: this.quantileValues[k]!.slice(0, n),
    }));
    return {
      summary,
      size: n,
      lines: this.lines.slice(0, n),
      series:
        header.series < 0
          ? null
          : label(this.seriesLabels, this.seriesIds, header.names[header.series]!),
      timestamp: label(this.timeLabels, this.timeIds, header.names[header.timestamp]!),
      horizon:
        header.horizon < 0
          ? null
          : { column: header.names[header.horizon]!, values: this.horizons.slice(0, n) },
      origin:
        header.origin < 0
          ? null
          : label(this.originLabels, this.originIds, header.names[header.origin]!),
      path:
        header.path < 0 ? null : label(this.pathLabels, this.pathIds, header.names[header.path]!),
      actual:
        header.actual < 0
          ? null
          : { column: header.names[header.actual]!, values: this.actual.slice(0, n) },
      prediction:
        header.prediction < 0
          ? null
          : { column: header.names[header.prediction]!, values: this.prediction.slice(0, n) },
      weight:
        header.weight < 0
          ? null
          : { column: header.names[header.weight]!, values: this.weight.slice(0, n) },
      quantiles,
    };
  }

  private readHeader(fields: string[], count: number, line: number): void {
    this.header = resolveHeader(
      fields.slice(0, count),
      this.path,
      line,
      this.options,
      this.delimiter,
    );
    this.headerLine = line;
    this.quantileValues = this.header.quantiles.map(() => new Float64Array(0));
    const h = this.header;
    // Series first, then time: the orders files are usually written in (see RowKeySet).
    const key: (() => Int32Array)[] = [];
    if (h.series >= 0) key.push(() => this.seriesIds);
    key.push(() => this.timeIds);
    if (this.options.role !== 'actuals') {
      if (h.horizon >= 0) key.push(() => this.horizons);
      if (h.origin >= 0) key.push(() => this.originIds);
      if (h.path >= 0) key.push(() => this.pathIds);
    }
    this.keys = new RowKeySet(key);
  }

  private grow(): void {
    const capacity = Math.max(1024, this.capacity * 2);
    const h = this.header!;
    this.lines = growInt(this.lines, capacity);
    this.timeIds = growInt(this.timeIds, capacity);
    if (h.series >= 0) this.seriesIds = growInt(this.seriesIds, capacity);
    if (h.origin >= 0) this.originIds = growInt(this.originIds, capacity);
    if (h.path >= 0) this.pathIds = growInt(this.pathIds, capacity);
    if (h.horizon >= 0) this.horizons = growInt(this.horizons, capacity);
    if (h.actual >= 0) this.actual = growFloat(this.actual, capacity);
    if (h.prediction >= 0) this.prediction = growFloat(this.prediction, capacity);
    if (h.weight >= 0) this.weight = growFloat(this.weight, capacity);
    this.quantileValues = this.quantileValues.map((v) => growFloat(v, capacity));
    this.capacity = capacity;
    this.keys?.refresh();
  }

  private readRow(fields: readonly Field[], count: number, line: number): void {
    const h = this.header!;
    if (count !== h.names.length) {
      throw new InputError(`expected ${h.names.length} fields as in the header, found ${count}`, {
        file: this.path,
        line,
        value: echo(fields.slice(0, Math.min(count, 50)).join(this.delimiter)),
      });
    }
    const r = this.rows;
    if (r === this.capacity) this.grow();
    this.lines[r] = line;
    if (h.series >= 0) {
      this.seriesIds[r] = this.keyLabel(this.seriesLabels, fields[h.series]!, h.series, line);
    }
    this.timeIds[r] = this.keyLabel(this.timeLabels, fields[h.timestamp]!, h.timestamp, line);
    if (h.origin >= 0) {
      this.originIds[r] = this.keyLabel(this.originLabels, fields[h.origin]!, h.origin, line);
    }
    if (h.path >= 0) {
      this.pathIds[r] = this.keyLabel(this.pathLabels, fields[h.path]!, h.path, line);
    }
    if (h.horizon >= 0) {
      const text = fields[h.horizon]!;
      const value =
        typeof text === 'number'
          ? Number.isInteger(text) && text >= 1 && text <= 0x7fffffff
            ? text
            : 0
          : parseHorizon(text);
      if (value === 0) {
        throw new InputError('the horizon must be a whole number ≥ 1', {
          file: this.path,
          line,
          column: h.names[h.horizon]!,
          value: String(text),
        });
      }
      this.horizons[r] = value;
    }
    if (h.actual >= 0) this.actual[r] = this.number(fields[h.actual]!, h.actual, line);
    if (h.prediction >= 0) {
      this.prediction[r] = this.number(fields[h.prediction]!, h.prediction, line);
    }
    if (h.weight >= 0) {
      const value = this.number(fields[h.weight]!, h.weight, line);
      if (value < 0) {
        throw new InputError('weights must be ≥ 0', {
          file: this.path,
          line,
          column: h.names[h.weight]!,
          value: String(fields[h.weight]!),
        });
      }
      this.weight[r] = value;
    }
    const qs = h.quantiles;
    for (let k = 0; k < qs.length; k++) {
      const index = qs[k]!.index;
      this.quantileValues[k]![r] = this.number(fields[index]!, index, line);
    }
    const earlier = this.keys!.add(r);
    if (earlier >= 0) this.duplicate(earlier, r, line);
    this.rows = r + 1;
  }

  /** A key seen twice in this file: refused at once, naming both lines. */
  private duplicate(earlier: number, row: number, line: number): never {
    const h = this.header!;
    // Spelled as alignment spells keys (role names; horizon 1 when there is no horizon column).
    const parts: string[] = [];
    const label = (role: string, interner: Interner, ids: Int32Array, index: number): void => {
      if (index >= 0) parts.push(`${role}=${interner.labels[ids[row]!]}`);
    };
    label('series', this.seriesLabels, this.seriesIds, h.series);
    label('timestamp', this.timeLabels, this.timeIds, h.timestamp);
    if (this.options.role !== 'actuals') {
      parts.push(`horizon=${h.horizon >= 0 ? this.horizons[row] : 1}`);
      label('origin', this.originLabels, this.originIds, h.origin);
      label('path', this.pathLabels, this.pathIds, h.path);
    }
    const key = echo(parts.join(' '));
    throw new InputError(
      `duplicated key ${key}: lines ${this.lines[earlier]} and ${line} have the same key`,
      { file: this.path, line, value: key },
    );
  }

  private keyLabel(interner: Interner, field: Field, index: number, line: number): number {
    const text = typeof field === 'string' ? field : String(field);
    if (text.length > MAX_LABEL) {
      throw new InputError(
        `a key value longer than ${MAX_LABEL} characters (${text.length}); series names, timestamps, origins and paths are kept in memory for every distinct value, so they must be short`,
        { file: this.path, line, column: this.header!.names[index]!, value: text },
      );
    }
    if (text.length === 0) {
      throw new InputError('empty value in a key column', {
        file: this.path,
        line,
        column: this.header!.names[index]!,
        value: text,
      });
    }
    return interner.id(text, line);
  }

  private number(field: Field, index: number, line: number): number {
    if (typeof field === 'number') {
      if (Number.isFinite(field)) return field;
      throw new InputError('not a finite number', {
        file: this.path,
        line,
        column: this.header!.names[index]!,
        value: String(field),
      });
    }
    const text = field;
    const value = this.decimalComma ? parseDecimalComma(text) : parseDecimal(text);
    if (!Number.isNaN(value)) return value; // not NaN
    let hint = '';
    if (!this.decimalComma && /^[-+]?\d*,\d+$/.test(text)) {
      hint = ` (a decimal comma? add --decimal , with a separator other than the comma, e.g. --delimiter ";")`;
    } else if (this.decimalComma && text.includes('.')) {
      hint =
        ' (with --decimal , a point is not a decimal mark, and thousands separators are not read)';
    }
    throw new InputError(
      text.length === 0
        ? 'empty value where a number is required'
        : `not a finite decimal number${hint}`,
      { file: this.path, line, column: this.header!.names[index]!, value: text },
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

interface Header {
  readonly names: readonly string[];
  readonly ignored: readonly string[];
  readonly series: number;
  readonly timestamp: number;
  readonly horizon: number;
  readonly origin: number;
  readonly path: number;
  readonly actual: number;
  readonly prediction: number;
  readonly weight: number;
  readonly quantiles: readonly {
    readonly level: number;
    readonly column: string;
    readonly index: number;
  }[];
}

function resolveHeader(
  names: string[],
  file: string,
  line: number,
  options: ParseOptions,
  delimiter: Delimiter = ',',
): Header {
  const columns = resolveColumns(options.columns);
  const predictions = options.role !== 'actuals';
  const used = new Set<number>();
  const find = (name: string, wanted: boolean): number => {
    if (!wanted) return -1;
    const first = names.indexOf(name);
    if (first < 0) return -1;
    const second = names.indexOf(name, first + 1);
    if (second >= 0) {
      throw new InputError(
        `the column "${name}" appears twice in the header (fields ${first + 1} and ${second + 1})`,
        { file, line, column: name, value: name },
      );
    }
    used.add(first);
    return first;
  };
  const series = find(columns.series, true);
  const timestamp = find(columns.timestamp, true);
  const horizon = find(columns.horizon, predictions);
  const origin = find(columns.origin, predictions);
  const path = find(columns.path, predictions);
  const actual = find(columns.actual, true);
  const prediction = find(columns.prediction, predictions);
  const weight = find(columns.weight, true);

  const quantiles: { level: number; column: string; index: number }[] = [];
  if (predictions) {
    const prefix = columns.quantile;
    names.forEach((name, index) => {
      if (used.has(index) || !name.startsWith(prefix)) return;
      const levelText = name.slice(prefix.length);
      const level = parseDecimal(levelText);
      if (Number.isNaN(level)) return; // not q<number>: an ordinary extra column
      if (!(level > 0 && level < 1)) {
        throw new InputError(
          `quantile level ${levelText} is not strictly between 0 and 1 (write e.g. ${prefix}0.1 for the 10% quantile)`,
          { file, line, column: name, value: name },
        );
      }
      const same = quantiles.find((q) => q.level === level);
      if (same !== undefined) {
        throw new InputError(
          `quantile level ${level} appears twice in the header (columns "${same.column}" and "${name}")`,
          { file, line, column: name, value: name },
        );
      }
      quantiles.push({ level, column: name, index });
      used.add(index);
    });
    quantiles.sort((a, b) => a.level - b.level);
  }

  const shown = names.slice(0, 20).map((n) => JSON.stringify(echo(n, 60)));
  const header = `${shown.join(', ')}${names.length > 20 ? `, … (${names.length} columns)` : ''}`;
  const missing = (role: string, name: string, why: string): InputError =>
    new InputError(
      `missing the ${role} column "${name}" ${why}; the header has ${header} (map another column with e.g. ${role}=NAME)${delimiterHint(names, delimiter)}`,
      { file, line, column: name },
    );
  if (timestamp < 0) throw missing('timestamp', columns.timestamp, '(required)');
  if (actual < 0 && (!predictions || options.requireActual === true)) {
    throw missing(
      'actual',
      columns.actual,
      predictions
        ? '(required when there is no separate actuals file)'
        : '(required in an actuals file)',
    );
  }
  if (predictions && prediction < 0 && quantiles.length === 0) {
    throw missing(
      'prediction',
      columns.prediction,
      `(required unless quantile columns such as ${columns.quantile}0.5 are present)`,
    );
  }
  const ignored = names.filter((_, index) => !used.has(index));
  return {
    names,
    ignored,
    series,
    timestamp,
    horizon,
    origin,
    path,
    actual,
    prediction,
    weight,
    quantiles,
  };
}

/**
 * When a header is one field that holds another separator ("series;timestamp;actual" read with
 * commas), the likely fix.
 */
function delimiterHint(names: readonly string[], delimiter: Delimiter): string {
  if (names.length !== 1) return '';
  const only = names[0]!;
  for (const [candidate, option] of [
    [';', '";"'],
    ['\t', 'tab'],
    ['|', '"|"'],
    [',', '","'],
  ] as const) {
    if (candidate !== delimiter && only.includes(candidate)) {
      return `; the header is one field that contains ${candidate === '\t' ? 'tabs' : `"${candidate}"`} but the separator is ${delimiterLabel(delimiter)}: add --delimiter ${option}`;
    }
  }
  return '';
}

/** A number written with a decimal comma ("3,25"); a point anywhere makes it NaN. */
function parseDecimalComma(text: string): number {
  if (text.includes('.')) return Number.NaN;
  return parseDecimal(text.replace(',', '.'));
}

/** Interns labels to dense ids, remembering the first line of each. */
class Interner {
  readonly labels: string[] = [];
  readonly firstLines: number[] = [];
  private readonly map = new Map<string, number>();
  private last = '';
  private lastId = -1;

  id(text: string, line: number): number {
    if (this.lastId >= 0 && text === this.last) return this.lastId;
    let id = this.map.get(text);
    if (id === undefined) {
      // A copy that does not keep the whole input chunk alive (substrings may point into it).
      const own = ` ${text}`.slice(1);
      id = this.labels.length;
      this.labels.push(own);
      this.firstLines.push(line);
      this.map.set(own, id);
    }
    this.last = text;
    this.lastId = id;
    return id;
  }
}

function growInt(array: Int32Array, capacity: number): Int32Array {
  const next = new Int32Array(capacity);
  next.set(array);
  return next;
}

function growFloat(array: Float64Array, capacity: number): Float64Array {
  const next = new Float64Array(capacity);
  next.set(array);
  return next;
}
