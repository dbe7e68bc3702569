import { echo, InputError } from '../core/inputError.js';
import { resolveColumns } from './columnMapping.js';
import type { ParseOptions } from './forecastTableReader.js';
import { type Delimiter, delimiterLabel } from './inputFormat.js';
import { parseDecimal } from './numbers.js';

/**
 * The header of a forecast file, resolved once: which field plays which role (index −1 when
 * absent), the quantile columns sorted by level, and the columns that play none.
 */
export interface Header {
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

export function resolveHeader(
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
