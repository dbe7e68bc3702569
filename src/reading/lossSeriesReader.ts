import { InputError } from '../core/inputError.js';
import type { FileSummary } from '../core/panel.js';
import { MAX_LOSS } from '../losses/lossMagnitude.js';
import type { LabelColumn } from './forecastTable.js';
import { type TextFormat, textDialect } from './formatDetection.js';
import type { DecimalMark, Delimiter } from './inputFormat.js';
import { parseDecimal, parseDecimalComma } from './numbers.js';
import { Tokenizer } from './tokenizer.js';

/**
 * A pre-aggregated loss file: one row per time point with the two models' mean losses, as a team
 * computes it where its predictions live (a warehouse, a distributed engine) and hands to the gate
 * (docs/large-backtests.md). Columns:
 *
 * | column | meaning | required |
 * |---|---|---|
 * | `timestamp` (remappable) | the time point | yes |
 * | `baseline_loss`, `candidate_loss` | mean loss of each model over the rows at that time | yes |
 * | `differential` | candidate_loss − baseline_loss, checked when present | no |
 * | `rows` | rows averaged into the point (integer ≥ 1), for the report | no (1) |
 * | `horizon` | the largest horizon among those rows (lag floor h − 1, HLN) | no (1) |
 */
export interface LossSeriesTable {
  readonly summary: FileSummary;
  readonly size: number;
  readonly lines: Int32Array;
  readonly timestamp: LabelColumn;
  readonly baseline: Float64Array;
  readonly candidate: Float64Array;
  readonly rows: Int32Array;
  readonly horizon: Int32Array;
}

const REQUIRED = ['baseline_loss', 'candidate_loss'] as const;
const KNOWN = ['baseline_loss', 'candidate_loss', 'differential', 'rows', 'horizon'];

export class LossSeriesReader {
  private readonly path: string;
  private readonly timestampName: string;
  private readonly tokenizer: Tokenizer;
  private header: { names: string[]; index: Record<string, number> } | null = null;
  private lines: number[] = [];
  private labels: string[] = [];
  private ids: number[] = [];
  private firstLines: number[] = [];
  private readonly idOf = new Map<string, number>();
  private baseline: number[] = [];
  private candidate: number[] = [];
  private rows: number[] = [];
  private horizon: number[] = [];

  private readonly decimalComma: boolean;

  constructor(
    path: string,
    options: {
      format: TextFormat;
      timestampColumn?: string;
      delimiter?: Delimiter;
      decimal?: DecimalMark;
      lineLimit?: number;
    },
  ) {
    this.path = path;
    this.timestampName = options.timestampColumn ?? 'timestamp';
    const { delimiter, decimalComma } = textDialect(path, options);
    this.decimalComma = decimalComma;
    this.tokenizer = new Tokenizer(
      delimiter,
      (fields, count, line) => this.record(fields, count, line),
      path,
      options.lineLimit,
    );
  }

  push(chunk: string | Uint8Array): void {
    this.tokenizer.push(chunk);
  }

  finish(sha256 = ''): LossSeriesTable {
    this.tokenizer.end();
    if (this.header === null) throw new InputError('the file is empty', { file: this.path });
    if (this.baseline.length === 0) {
      throw new InputError('the file has a header but no data rows', { file: this.path });
    }
    const names = this.header.names;
    return {
      summary: {
        role: 'losses',
        path: this.path,
        rows: this.baseline.length,
        sha256,
        columns: names,
        ignoredColumns: names.filter((n) => n !== this.timestampName && !KNOWN.includes(n)),
        blankLines: this.tokenizer.blankLines,
      },
      size: this.baseline.length,
      lines: Int32Array.from(this.lines),
      timestamp: {
        column: this.timestampName,
        ids: Int32Array.from(this.ids),
        labels: this.labels,
        firstLines: Int32Array.from(this.firstLines),
      },
      baseline: Float64Array.from(this.baseline),
      candidate: Float64Array.from(this.candidate),
      rows: Int32Array.from(this.rows),
      horizon: Int32Array.from(this.horizon),
    };
  }

  private record(fields: string[], count: number, line: number): void {
    if (this.header === null) {
      const names = fields.slice(0, count).map((f) => f.trim());
      const index: Record<string, number> = {};
      names.forEach((n, i) => {
        if (n in index) {
          throw new InputError(`the header names the column "${n}" twice`, {
            file: this.path,
            line,
          });
        }
        index[n] = i;
      });
      for (const need of [this.timestampName, ...REQUIRED]) {
        if (!(need in index)) {
          throw new InputError(
            `a loss file needs the columns ${this.timestampName}, baseline_loss and candidate_loss; "${need}" is missing`,
            { file: this.path, line, column: need },
          );
        }
      }
      this.header = { names, index };
      return;
    }
    const { names, index } = this.header;
    if (count !== names.length) {
      throw new InputError(`expected ${names.length} fields as in the header, found ${count}`, {
        file: this.path,
        line,
      });
    }
    const at = (name: string) => fields[index[name]!]!;
    const number = (name: string): number => {
      const text = at(name);
      const x = this.decimalComma ? parseDecimalComma(text) : parseDecimal(text);
      if (Number.isNaN(x)) {
        throw new InputError('not a finite decimal number', {
          file: this.path,
          line,
          column: name,
          value: text,
        });
      }
      return x;
    };
    const integer = (name: string): number => {
      if (!(name in index)) return 1;
      const x = number(name);
      if (!Number.isInteger(x) || x < 1) {
        throw new InputError('expected a whole number ≥ 1', {
          file: this.path,
          line,
          column: name,
          value: at(name),
        });
      }
      return x;
    };
    const label = at(this.timestampName);
    if (label === '') {
      throw new InputError('empty timestamp', {
        file: this.path,
        line,
        column: this.timestampName,
      });
    }
    const b = number('baseline_loss');
    const c = number('candidate_loss');
    const refuseOverflow = (name: 'baseline_loss' | 'candidate_loss', x: number) => {
      if (Math.abs(x) > MAX_LOSS) {
        throw new InputError(
          `a loss beyond ${MAX_LOSS} would overflow means and variances in double precision; rescale the data`,
          { file: this.path, line, column: name, value: at(name) },
        );
      }
    };
    refuseOverflow('baseline_loss', b);
    refuseOverflow('candidate_loss', c);
    if ('differential' in index) {
      const d = number('differential');
      const scale = Math.max(1, Math.abs(b), Math.abs(c));
      if (Math.abs(d - (c - b)) > 1e-9 * scale) {
        throw new InputError(`differential should be candidate_loss − baseline_loss = ${c - b}`, {
          file: this.path,
          line,
          column: 'differential',
          value: at('differential'),
        });
      }
    }
    let id = this.idOf.get(label);
    if (id === undefined) {
      id = this.labels.length;
      this.idOf.set(label, id);
      this.labels.push(label);
      this.firstLines.push(line);
    } else {
      throw new InputError(
        `timestamp ${JSON.stringify(label)} appears twice (first on line ${this.firstLines[id]})`,
        {
          file: this.path,
          line,
          column: this.timestampName,
          value: label,
        },
      );
    }
    this.ids.push(id);
    this.lines.push(line);
    this.baseline.push(b);
    this.candidate.push(c);
    this.rows.push(integer('rows'));
    this.horizon.push(integer('horizon'));
  }
}
