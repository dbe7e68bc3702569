import { InputError } from '../core/inputError.js';
import { type DecimalMark, type Delimiter, delimiterFor } from './inputFormat.js';

/**
 * What every file reader decides before reading: the format a file name implies, and the text
 * dialect (field separator and decimal mark) a CSV or TSV file is read with.
 */
export type TextFormat = 'csv' | 'tsv';
export type FileFormat = TextFormat | 'parquet';

/**
 * What the file name implies: Parquet by `.parquet` (or `.pq`), gzip by a final `.gz`, TSV by
 * `.tsv` before it (any case), else CSV.
 */
export function formatFromPath(path: string): { format: FileFormat; gzip: boolean } {
  const lower = path.toLowerCase();
  if (lower.endsWith('.parquet') || lower.endsWith('.pq'))
    return { format: 'parquet', gzip: false };
  const gzip = lower.endsWith('.gz');
  const base = gzip ? lower.slice(0, -3) : lower;
  return { format: base.endsWith('.tsv') ? 'tsv' : 'csv', gzip };
}

export interface TextDialect {
  readonly delimiter: Delimiter;
  /** Numbers are written with a decimal comma ("3,25"). */
  readonly decimalComma: boolean;
}

/**
 * The dialect of a text file: the given separator, else tab for TSV and comma for CSV; a decimal
 * comma needs a separator other than the comma (an InputError naming `file` otherwise).
 */
export function textDialect(
  file: string,
  options: { format?: TextFormat; delimiter?: Delimiter; decimal?: DecimalMark },
): TextDialect {
  const delimiter = options.delimiter ?? delimiterFor('auto', options.format === 'tsv');
  const decimalComma = options.decimal === ',';
  if (decimalComma && delimiter === ',') {
    throw new InputError(
      'a decimal comma needs a field separator other than the comma (e.g. --delimiter ";")',
      { file },
    );
  }
  return { delimiter, decimalComma };
}
