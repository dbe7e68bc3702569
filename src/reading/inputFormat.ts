/**
 * The input formats and CSV dialects a user can name (the `format`, `delimiter` and `decimal`
 * options), and what a file name implies when the format is `auto`.
 */
export const INPUT_FORMATS = ['auto', 'csv', 'tsv', 'parquet'] as const;
export type InputFormat = (typeof INPUT_FORMATS)[number];

/** Field separators by the name the options take ("tab" for the tab character). */
export const DELIMITER_NAMES = ['auto', ',', ';', '|', 'tab'] as const;
export type DelimiterName = (typeof DELIMITER_NAMES)[number];

/** Decimal marks of numbers in text files (`--decimal`). */
export const DECIMAL_MARKS = ['.', ','] as const;
export type DecimalMark = (typeof DECIMAL_MARKS)[number];

/** A field separator of a text file. */
export type Delimiter = ',' | ';' | '|' | '\t';

/** The separator a name stands for; `auto` is tab for TSV and comma otherwise. */
export function delimiterFor(name: DelimiterName, tsv: boolean): Delimiter {
  if (name === 'auto') return tsv ? '\t' : ',';
  return name === 'tab' ? '\t' : name;
}

/** How a delimiter is named in messages. */
export function delimiterLabel(delimiter: Delimiter): string {
  return delimiter === '\t' ? 'tab' : `"${delimiter}"`;
}
