/**
 * The corpus of hostile and unusual inputs: one row per case, with the files it writes (small
 * text, bytes, or a generator), the arguments, and what must come out — the exit code and a
 * fragment of standard error (for refusals) or standard output. corpus.e2e.test.ts runs every
 * case through dist/cli.js in a fresh folder. Invented data: these check behaviour, not numbers.
 */
import { gzipSync } from 'node:zlib';

export interface CorpusCase {
  readonly id: string;
  /** File name → contents (a string is written as UTF-8). */
  readonly files?: Readonly<Record<string, string | Buffer | (() => string | Buffer)>>;
  /** Files copied from test/corpus/parquet. */
  readonly parquet?: readonly string[];
  readonly args: readonly string[];
  readonly exit: 0 | 1 | 2;
  /** Must appear in standard error (refusals) … */
  readonly stderr?: string | RegExp;
  /** … or in standard output. */
  readonly stdout?: string | RegExp;
  /** Must not appear in standard output (injection checks). */
  readonly notStdout?: RegExp;
}

const H = 'series,timestamp,actual,prediction\n';

/** n time points × 2 series; the candidate's error is `scale` times the baseline's. */
function rows(n: number, shift = 0.5, sep = ',', decimal = '.'): string {
  let text = '';
  for (let t = 1; t <= n; t++) {
    for (const s of ['a', 'b']) {
      const y = 10 + Math.sin(t + (s === 'a' ? 0 : 1));
      const p = y + shift * Math.cos(3 * t);
      const f = (x: number) => x.toFixed(4).replace('.', decimal);
      text += [s, String(t), f(y), f(p)].join(sep) + '\n';
    }
  }
  return text;
}
const base = H + rows(40, 0.5);
const cand = H + rows(40, 0.45);
const pair = { 'b.csv': base, 'c.csv': cand };
const BC = ['--baseline', 'b.csv', '--candidate', 'c.csv', '--resamples', '199'];
const compare = (...extra: string[]) => ['compare', ...BC, ...extra];
/** A candidate file with one line replaced (1-based data row k → line k + 1). */
function withLine(text: string, line: number, replacement: string): string {
  const lines = text.split('\n');
  lines[line - 1] = replacement;
  return lines.join('\n');
}
/** The text with field `field` (0-based) of physical line `line` set to `value`. */
function setField(text: string, line: number, field: number, value: string): string {
  const lines = text.split('\n');
  const fields = lines[line - 1]!.split(',');
  fields[field] = value;
  lines[line - 1] = fields.join(',');
  return lines.join('\n');
}
const small = (body: string) => ({ 'b.csv': body, 'c.csv': body });

export const CASES: readonly CorpusCase[] = [
  // --- Invocation -------------------------------------------------------------------------------
  { id: 'no-arguments', args: [], exit: 2, stderr: 'Usage: skillgate compare' },
  { id: 'unknown-command', args: ['comapre'], exit: 2, stderr: 'unknown command "comapre"' },
  {
    id: 'options-before-command',
    args: ['--baseline', 'b.csv'],
    exit: 2,
    stderr: 'options follow the command',
  },
  {
    id: 'mistyped-baseline',
    files: pair,
    args: ['compare', '--basline', 'b.csv'],
    exit: 2,
    stderr: 'did you mean --baseline?',
  },
  {
    id: 'mistyped-margin',
    files: pair,
    args: compare('--margn', '0.1'),
    exit: 2,
    stderr: 'did you mean --margin?',
  },
  {
    id: 'mistyped-json',
    files: pair,
    args: compare('--jsn', 'x'),
    exit: 2,
    stderr: 'did you mean --json?',
  },
  {
    id: 'unknown-far-option',
    files: pair,
    args: compare('--frobnicate', '1'),
    exit: 2,
    stderr: /unknown option --frobnicate \(see/,
  },
  {
    id: 'positional-argument',
    files: pair,
    args: [...compare(), 'extra'],
    exit: 2,
    stderr: 'unexpected argument "extra"',
  },
  {
    id: 'option-without-value',
    files: pair,
    args: ['compare', '--candidate', 'c.csv', '--baseline'],
    exit: 2,
    stderr: '--baseline needs a value',
  },
  {
    id: 'missing-candidate',
    files: pair,
    args: ['compare', '--baseline', 'b.csv'],
    exit: 2,
    stderr: '--candidate is required',
  },
  {
    id: 'help-lists-columns',
    args: ['--help'],
    exit: 0,
    stdout: /Input columns[\s\S]*timestamp[\s\S]*prediction/,
  },
  // --- Options people type ----------------------------------------------------------------------
  {
    id: 'margin-above-one',
    files: pair,
    args: compare('--margin', '5'),
    exit: 2,
    stderr: 'write 5% for 5 percent',
  },
  {
    id: 'margin-percent',
    files: pair,
    args: compare('--margin', '5%', '--json', '-'),
    exit: 0,
    stdout: '"margin": 0.05',
  },
  {
    id: 'margin-percent-absolute',
    files: pair,
    args: compare('--margin', '5%', '--margin-kind', 'absolute'),
    exit: 2,
    stderr: 'as a percentage needs --margin-kind relative',
  },
  {
    id: 'margin-absolute-large',
    files: pair,
    args: compare('--margin', '5', '--margin-kind', 'absolute'),
    exit: 0,
  },
  {
    id: 'margin-negative',
    files: pair,
    args: compare('--margin=-1'),
    exit: 2,
    stderr: '--margin must be a number ≥ 0',
  },
  {
    id: 'margin-text',
    files: pair,
    args: compare('--margin', 'five'),
    exit: 2,
    stderr: '--margin must be a number',
  },
  {
    id: 'loss-mae',
    files: pair,
    args: compare('--loss', 'mae', '--json', '-'),
    exit: 0,
    stdout: '"loss": "absolute"',
  },
  {
    id: 'loss-mse-rmse',
    files: pair,
    args: compare('--loss', 'mse'),
    exit: 0,
    stdout: 'RMSE: baseline',
  },
  {
    id: 'loss-mape',
    files: pair,
    args: compare('--loss', 'mape', '--json', '-'),
    exit: 0,
    stdout: '"loss": "ape"',
  },
  {
    id: 'loss-unknown',
    files: pair,
    args: compare('--loss', 'rmsle'),
    exit: 2,
    stderr: '--loss must be one of',
  },
  {
    id: 'alpha-out-of-range',
    files: pair,
    args: compare('--alpha', '0.7'),
    exit: 2,
    stderr: '--alpha must be',
  },
  {
    id: 'delimiter-unknown',
    files: pair,
    args: compare('--delimiter', ':'),
    exit: 2,
    stderr: '--delimiter must be one of',
  },
  {
    id: 'time-format-unknown',
    files: pair,
    args: compare('--time-format', 'us'),
    exit: 2,
    stderr: '--time-format must be one of',
  },
  {
    id: 'decimal-comma-with-comma',
    files: pair,
    args: compare('--decimal', ','),
    exit: 2,
    stderr: 'needs a field separator other than the comma',
  },
  {
    id: 'option-value-with-dash',
    files: pair,
    args: compare('--margin', '-1'),
    exit: 2,
    stderr: 'write --margin=VALUE',
  },
  {
    id: 'line-limit-too-small',
    files: pair,
    args: compare('--line-limit', '5'),
    exit: 2,
    stderr: '--line-limit must be an integer from 1024',
  },
  {
    id: 'columns-bad-pair',
    files: pair,
    args: compare('--columns', 'actual'),
    exit: 2,
    stderr: 'expected role=column pairs',
  },
  {
    id: 'baseline-columns-unknown-role',
    files: pair,
    args: compare('--baseline-columns', 'truth=y'),
    exit: 2,
    stderr: 'unknown column role "truth"',
  },
  {
    id: 'losses-with-baseline',
    files: pair,
    args: ['compare', '--losses', 'b.csv', '--baseline', 'b.csv'],
    exit: 2,
    stderr: '--losses replaces --baseline',
  },
  // --- Outputs ----------------------------------------------------------------------------------
  {
    id: 'json-to-stdout',
    files: pair,
    args: compare('--json', '-'),
    exit: 0,
    stdout: /^\{\n {2}"tool"/,
  },
  {
    id: 'markdown-to-stdout',
    files: pair,
    args: compare('--markdown', '-'),
    exit: 0,
    stdout: /^#/,
  },
  {
    id: 'both-to-stdout',
    files: pair,
    args: compare('--json', '-', '--markdown', '-'),
    exit: 2,
    stderr: 'both ask for standard output',
  },
  {
    id: 'json-missing-folder',
    files: pair,
    args: compare('--json', 'no/such/dir/r.json'),
    exit: 2,
    stderr: 'the folder "no/such/dir" does not exist',
  },
  {
    id: 'json-is-directory',
    files: { ...pair, 'out/.keep': '' },
    args: compare('--json', 'out'),
    exit: 2,
    stderr: '--json names a directory',
  },
  {
    id: 'markdown-missing-folder',
    files: pair,
    args: compare('--markdown', 'nowhere/r.md'),
    exit: 2,
    stderr: 'does not exist',
  },
  // --- Files ------------------------------------------------------------------------------------
  {
    id: 'missing-file',
    files: { 'c.csv': cand },
    args: compare(),
    exit: 2,
    stderr: 'b.csv: no such file',
  },
  {
    id: 'directory-as-file',
    files: { 'b.csv/.keep': '', 'c.csv': cand },
    args: compare(),
    exit: 2,
    stderr: 'b.csv: not a regular file',
  },
  {
    id: 'empty-file',
    files: { 'b.csv': '', 'c.csv': cand },
    args: compare(),
    exit: 2,
    stderr: 'b.csv:1: the file is empty',
  },
  {
    id: 'header-only',
    files: { 'b.csv': H, 'c.csv': cand },
    args: compare(),
    exit: 2,
    stderr: 'the file has a header but no data rows',
  },
  {
    id: 'only-blank-lines',
    files: { 'b.csv': '\n\n\n', 'c.csv': cand },
    args: compare(),
    exit: 2,
    stderr: 'the file is empty',
  },
  {
    id: 'missing-timestamp-column',
    files: { 'b.csv': 'series,actual,prediction\na,1,1\n', 'c.csv': cand },
    args: compare(),
    exit: 2,
    stderr: 'missing the timestamp column "timestamp"',
  },
  { id: 'utf8-bom', files: { 'b.csv': `\ufeff${base}`, 'c.csv': cand }, args: compare(), exit: 0 },
  {
    id: 'crlf-lines',
    files: { 'b.csv': base.replaceAll('\n', '\r\n'), 'c.csv': cand },
    args: compare(),
    exit: 0,
  },
  // --- Separators and decimal marks -------------------------------------------------------------
  {
    id: 'semicolon-hint',
    files: small(H.replaceAll(',', ';') + rows(40, 0.5, ';')),
    args: compare(),
    exit: 2,
    stderr: 'add --delimiter ";"',
  },
  {
    id: 'tab-in-csv-hint',
    files: small(H.replaceAll(',', '\t') + rows(40, 0.5, '\t')),
    args: compare(),
    exit: 2,
    stderr: 'add --delimiter tab',
  },
  {
    id: 'pipe-hint',
    files: small(H.replaceAll(',', '|') + rows(40, 0.5, '|')),
    args: compare(),
    exit: 2,
    stderr: 'add --delimiter "|"',
  },
  {
    id: 'semicolon-read',
    files: small(H.replaceAll(',', ';') + rows(40, 0.5, ';')),
    args: compare('--delimiter', ';'),
    exit: 0,
  },
  {
    id: 'pipe-read',
    files: small(H.replaceAll(',', '|') + rows(40, 0.5, '|')),
    args: compare('--delimiter', '|'),
    exit: 0,
  },
  {
    id: 'tab-read',
    files: small(H.replaceAll(',', '\t') + rows(40, 0.5, '\t')),
    args: compare('--delimiter', 'tab'),
    exit: 0,
  },
  {
    id: 'decimal-comma-hint',
    files: small(H.replaceAll(',', ';') + rows(40, 0.5, ';', ',')),
    args: compare('--delimiter', ';'),
    exit: 2,
    stderr: 'a decimal comma? add --decimal ,',
  },
  {
    id: 'decimal-comma-read',
    files: {
      'b.csv': H.replaceAll(',', ';') + rows(40, 0.5, ';', ','),
      'c.csv': H.replaceAll(',', ';') + rows(40, 0.45, ';', ','),
    },
    args: compare('--delimiter', ';', '--decimal', ',', '--json', '-'),
    exit: 0,
    stdout: '"decimal": ","',
  },
  {
    id: 'decimal-comma-thousands',
    files: small(`timestamp;actual;prediction\n1;1.234,5;1\n`),
    args: compare('--delimiter', ';', '--decimal', ','),
    exit: 2,
    stderr: 'thousands separators are not read',
  },
  // --- Encodings --------------------------------------------------------------------------------
  {
    id: 'invalid-utf8-line-5',
    files: {
      'b.csv': Buffer.concat([
        Buffer.from(H + rows(2)),
        Buffer.from('a,3,1,1\xff\n', 'latin1'),
        Buffer.from(rows(3)),
      ]),
      'c.csv': cand,
    },
    args: compare(),
    exit: 2,
    stderr: 'b.csv:6: the file is not UTF-8 text: line 6',
  },
  {
    id: 'latin1-hint',
    files: { 'b.csv': Buffer.from(`${H}caf\xe9,1,1,1\n`, 'latin1'), 'c.csv': cand },
    args: compare(),
    exit: 2,
    stderr: 'suggests Latin-1 or Windows-1252',
  },
  {
    id: 'utf16-bom',
    files: {
      'b.csv': Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from(base, 'utf16le')]),
      'c.csv': cand,
    },
    args: compare(),
    exit: 2,
    stderr: 'it looks like UTF-16',
  },
  {
    id: 'utf16-no-bom',
    files: { 'b.csv': Buffer.from(base, 'utf16le'), 'c.csv': cand },
    args: compare(),
    exit: 2,
    stderr: 'b.csv:1: the file is not UTF-8 text: line 1 has a NUL byte',
  },
  {
    id: 'invalid-utf8-in-gzip',
    files: {
      'b.csv.gz': gzipSync(
        Buffer.concat([Buffer.from(H + rows(5)), Buffer.from([0xc3, 0x28, 10])]),
      ),
      'c.csv': cand,
    },
    args: ['compare', '--baseline', 'b.csv.gz', '--candidate', 'c.csv'],
    exit: 2,
    stderr: 'b.csv.gz:12: the file is not UTF-8 text: line 12',
  },
  {
    id: 'binary-file',
    files: { 'b.csv': Buffer.from([0x7f, 0x45, 0x4c, 0x46, 2, 1, 1, 0, 0, 0]), 'c.csv': cand },
    args: compare(),
    exit: 2,
    stderr: 'the file is not UTF-8 text',
  },
  // --- Structure --------------------------------------------------------------------------------
  {
    id: 'unclosed-quote',
    files: { 'b.csv': `${H}"a,1,1,1\n`, 'c.csv': cand },
    args: compare(),
    exit: 2,
    stderr: 'a quoted field is not closed',
  },
  {
    id: 'junk-after-quote',
    files: { 'b.csv': `${H}"a"x,1,1,1\n`, 'c.csv': cand },
    args: compare(),
    exit: 2,
    stderr: 'b.csv:2: unexpected character after a closing quote',
  },
  {
    id: 'quoted-newline-lines',
    files: { 'b.csv': `${H}"a\nb",1,1,1\na,2,1,x\n`, 'c.csv': cand },
    args: compare(),
    exit: 2,
    stderr: 'b.csv:4: not a finite decimal number',
  },
  {
    id: 'field-count',
    files: { 'b.csv': withLine(base, 5, 'a,3,1'), 'c.csv': cand },
    args: compare(),
    exit: 2,
    stderr: 'b.csv:5: expected 4 fields as in the header, found 3',
  },
  {
    id: 'duplicate-header',
    files: { 'b.csv': 'timestamp,actual,actual,prediction\n1,1,1,1\n', 'c.csv': cand },
    args: compare(),
    exit: 2,
    stderr: 'the column "actual" appears twice',
  },
  {
    id: 'duplicate-key',
    files: { 'b.csv': `${base}a,3,1,1\n`, 'c.csv': cand },
    args: compare(),
    exit: 2,
    stderr: 'duplicated key series=a timestamp=3 horizon=1: lines 6 and 82',
  },
  {
    id: 'duplicate-instant',
    files: small('timestamp,actual,prediction\n2026-01-01,1,1\n2026-01-01T00:00Z,1,2\n'),
    args: compare(),
    exit: 2,
    stderr: 'duplicated key',
  },
  {
    id: 'empty-key',
    files: { 'b.csv': withLine(base, 3, ',1,1,1'), 'c.csv': cand },
    args: compare(),
    exit: 2,
    stderr: 'b.csv:3: empty value in a key column',
  },
  {
    id: 'no-common-keys',
    files: { 'b.csv': base, 'c.csv': cand.replaceAll('\na,', '\nx,').replaceAll('\nb,', '\ny,') },
    args: compare(),
    exit: 2,
    stderr: 'have no key',
  },
  {
    id: 'candidate-lacks-rows',
    files: { 'b.csv': base, 'c.csv': cand.split('\n').slice(0, 60).join('\n') },
    args: compare(),
    exit: 1,
    stdout: 'The candidate lacks',
  },
  {
    id: 'actuals-disagree',
    files: { 'b.csv': base, 'c.csv': setField(cand, 4, 2, '99') },
    args: compare(),
    exit: 2,
    stderr: 'the actual differs between files',
  },
  // --- Values -----------------------------------------------------------------------------------
  {
    id: 'nan-value',
    files: { 'b.csv': setField(base, 7, 2, 'NaN'), 'c.csv': cand },
    args: compare(),
    exit: 2,
    stderr: 'b.csv:7: not a finite decimal number (column "actual", value "NaN")',
  },
  {
    id: 'infinity-value',
    files: { 'b.csv': setField(base, 7, 3, 'Infinity'), 'c.csv': cand },
    args: compare(),
    exit: 2,
    stderr: 'value "Infinity"',
  },
  {
    id: 'hex-value',
    files: { 'b.csv': setField(base, 7, 3, '0x10'), 'c.csv': cand },
    args: compare(),
    exit: 2,
    stderr: 'value "0x10"',
  },
  {
    id: 'padded-value',
    files: { 'b.csv': setField(base, 7, 3, ' 2'), 'c.csv': cand },
    args: compare(),
    exit: 2,
    stderr: 'value " 2"',
  },
  {
    id: 'empty-prediction',
    files: { 'b.csv': setField(base, 7, 3, ''), 'c.csv': cand },
    args: compare(),
    exit: 2,
    stderr: 'empty value where a number is required',
  },
  {
    id: 'horizon-zero',
    files: small('timestamp,horizon,actual,prediction\n1,0,1,1\n'),
    args: compare(),
    exit: 2,
    stderr: 'the horizon must be a whole number ≥ 1',
  },
  {
    id: 'horizon-fraction',
    files: small('timestamp,horizon,actual,prediction\n1,1.5,1,1\n'),
    args: compare(),
    exit: 2,
    stderr: 'value "1.5"',
  },
  {
    id: 'negative-weight',
    files: small('timestamp,actual,prediction,weight\n1,1,1,-2\n'),
    args: compare(),
    exit: 2,
    stderr: 'weights must be ≥ 0',
  },
  {
    id: 'quantile-level-out-of-range',
    files: small('timestamp,actual,q1.5\n1,1,1\n'),
    args: compare(),
    exit: 2,
    stderr: 'quantile level 1.5 is not strictly between 0 and 1',
  },
  {
    id: 'ape-zero-actual',
    files: { 'b.csv': setField(base, 9, 2, '0'), 'c.csv': setField(cand, 9, 2, '0') },
    args: compare('--loss', 'ape'),
    exit: 2,
    stderr: 'the absolute percentage error is undefined where the actual is 0',
  },
  // --- Numbers that overflow --------------------------------------------------------------------
  {
    id: 'loss-overflows',
    files: { 'b.csv': setField(base, 11, 3, '1e308'), 'c.csv': cand },
    args: compare(),
    exit: 2,
    stderr: /b\.csv:11: the baseline's squared loss .* is Infinity/,
  },
  {
    id: 'sum-would-overflow',
    files: {
      'b.csv': setField(
        setField(setField(setField(base, 11, 2, '0'), 11, 3, '1.3e154'), 13, 2, '0'),
        13,
        3,
        '1.3e154',
      ),
      'c.csv': setField(
        setField(setField(setField(cand, 11, 2, '0'), 11, 3, '1'), 13, 2, '0'),
        13,
        3,
        '1',
      ),
    },
    args: compare(),
    exit: 2,
    stderr: /b\.csv:11: the baseline's squared loss .* is 1\.6\d*e\+308/,
  },
  {
    id: 'absolute-huge',
    files: { 'b.csv': setField(base, 11, 3, '1e200'), 'c.csv': cand },
    args: compare('--loss', 'absolute'),
    exit: 2,
    stderr: 'beyond 1e+100',
  },
  {
    id: 'loss-file-huge',
    files: { 'l.csv': 'timestamp,baseline_loss,candidate_loss\n1,1.7e308,1.7e308\n2,1,1\n' },
    args: ['compare', '--losses', 'l.csv'],
    exit: 2,
    stderr: 'l.csv:2: a loss beyond 1e+100',
  },
  // --- Time order -------------------------------------------------------------------------------
  {
    id: 'text-among-numbers',
    files: { 'b.csv': `${base}a,zz-extra,1,1\n`, 'c.csv': `${cand}a,zz-extra,1,1\n` },
    args: compare(),
    exit: 2,
    stderr: 'b.csv:82: the timestamps cannot be put in a reliable time order',
  },
  {
    id: 'us-dates-refused',
    files: small('timestamp,actual,prediction\n1/6/2026 0:00,1,1\n1/7/2026 0:00,1,2\n'),
    args: compare(),
    exit: 2,
    stderr: '--time-format month-day-year',
  },
  {
    id: 'us-dates-read',
    files: small(
      'timestamp,actual,prediction\n1/6/2026 0:00,1,1\n1/7/2026 0:00,1,2\n12/31/2025 23:00,1,2\n',
    ),
    args: compare('--time-format', 'month-day-year', '--json', '-'),
    exit: 0,
    stdout: '"first": "12/31/2025 23:00"',
  },
  {
    id: 'day-first-as-month-first',
    files: small('timestamp,actual,prediction\n13/6/2026,1,1\n'),
    args: compare('--time-format', 'month-day-year'),
    exit: 2,
    stderr: 'month 13 is not 1–12',
  },
  {
    id: 'two-digit-year',
    files: small('timestamp,actual,prediction\n1/6/26,1,1\n'),
    args: compare('--time-format', 'day-month-year'),
    exit: 2,
    stderr: 'four digits',
  },
  {
    id: 'text-order-opt-in',
    files: small('timestamp,actual,prediction\nweek-1,1,1\nweek-2,1,2\n'),
    args: compare('--time-format', 'text-order', '--json', '-'),
    exit: 0,
    stdout: '"kind": "text"',
  },
  {
    id: 'invalid-iso-date',
    files: small('timestamp,actual,prediction\n2026-02-30,1,1\n'),
    args: compare(),
    exit: 2,
    stderr: 'day 30 does not exist in 2026-02',
  },
  {
    id: 'numbers-and-dates-across-files',
    files: {
      'b.csv': 'timestamp,actual,prediction\n1,1,1\n2,1,1\n3,1,1\n',
      'c.csv': 'timestamp,actual,prediction\n2026-01-01,1,1\n',
    },
    args: compare(),
    exit: 2,
    stderr:
      'c.csv:2: the timestamps cannot be put in a reliable time order: this one is an ISO 8601 date',
  },
  {
    id: 'number-format-refuses-date',
    files: small('timestamp,actual,prediction\n1,1,1\n2026-01-01,1,1\n'),
    args: compare('--time-format', 'number'),
    exit: 2,
    stderr: 'b.csv:3: not a timestamp in the number format',
  },
  {
    id: 'time-order-named',
    files: pair,
    args: compare(),
    exit: 0,
    stdout: 'Time order: every timestamp is a decimal number: numeric order.',
  },
  // --- Bounded resources ------------------------------------------------------------------------
  {
    id: 'line-too-long',
    files: { 'b.csv': () => `${H}a,1,1,${'9'.repeat(1_100_000)}\n`, 'c.csv': cand },
    args: compare(),
    exit: 2,
    stderr: 'b.csv:2: the line is longer than the limit of 1048576 characters',
  },
  {
    id: 'line-limit-raised-long-value',
    files: { 'b.csv': () => `${H}a,1,1,${'9'.repeat(3000)}x\n`, 'c.csv': cand },
    args: compare('--line-limit', '4096'),
    exit: 2,
    stderr: '… (3001 characters)',
  },
  {
    id: 'line-limit-lowered',
    files: { 'b.csv': () => `${H}a,1,1,${'9'.repeat(3000)}\n`, 'c.csv': cand },
    args: compare('--line-limit', '2048'),
    exit: 2,
    stderr: 'b.csv:2: the line is longer than the limit of 2048 characters',
  },

  {
    id: 'no-line-breaks',
    files: { 'b.csv': () => 'x'.repeat(3_000_000), 'c.csv': cand },
    args: compare(),
    exit: 2,
    stderr: 'b.csv:1: the line is longer than the limit',
  },
  {
    id: 'huge-header-echo',
    files: { 'b.csv': () => `${'h'.repeat(500_000)},actual\n1,1\n`, 'c.csv': cand },
    args: compare(),
    exit: 2,
    stderr: /missing the timestamp column .*"h{60}… \(500000 characters\)"/,
  },
  {
    id: 'many-columns-echo',
    files: { 'b.csv': () => `${Array.from({ length: 5000 }, (_, i) => `c${i}`).join(',')}\n` },
    args: compare(),
    exit: 2,
    stderr: '… (5000 columns)',
  },
  {
    id: 'huge-value-echo',
    files: { 'b.csv': () => `${H}a,1,1,${'7'.repeat(300_000)}x\n`, 'c.csv': cand },
    args: compare(),
    exit: 2,
    stderr: '… (300001 characters)',
  },
  {
    id: 'gzip-repeated-rows',
    files: { 'b.csv.gz': () => gzipSync(H + 'a,1,1,1\n'.repeat(2_000_000)), 'c.csv': cand },
    args: ['compare', '--baseline', 'b.csv.gz', '--candidate', 'c.csv'],
    exit: 2,
    stderr: 'b.csv.gz:3: duplicated key series=a timestamp=1 horizon=1: lines 2 and 3',
  },
  {
    id: 'gzip-one-endless-line',
    files: { 'b.csv.gz': () => gzipSync(Buffer.alloc(50_000_000, 0x61)), 'c.csv': cand },
    args: ['compare', '--baseline', 'b.csv.gz', '--candidate', 'c.csv'],
    exit: 2,
    stderr: 'b.csv.gz:1: the line is longer than the limit',
  },
  {
    id: 'gzip-corrupt',
    files: { 'b.csv.gz': () => gzipSync(base).subarray(0, 40), 'c.csv': cand },
    args: ['compare', '--baseline', 'b.csv.gz', '--candidate', 'c.csv'],
    exit: 2,
    stderr: 'b.csv.gz',
  },
  {
    id: 'gzip-not-gzip',
    files: { 'b.csv.gz': base, 'c.csv': cand },
    args: ['compare', '--baseline', 'b.csv.gz', '--candidate', 'c.csv'],
    exit: 2,
    stderr: 'not a valid gzip file',
  },
  {
    id: 'long-key-label',
    files: { 'b.csv': () => `${H}${'s'.repeat(600)},1,1,1\n`, 'c.csv': cand },
    args: compare(),
    exit: 2,
    stderr: 'b.csv:2: a key value longer than 512 characters (600)',
  },
  // --- Names from a pull request ----------------------------------------------------------------
  {
    id: 'markdown-injection',
    files: {
      'b.csv': base.replaceAll('\na,', '\n<img src=x onerror=alert(1)>,'),
      'c.csv': cand.replaceAll('\na,', '\n<img src=x onerror=alert(1)>,'),
    },
    args: compare('--markdown', '-'),
    exit: 0,
    notStdout: /<img/,
  },
  {
    id: 'workflow-command-injection',
    files: {
      'b.csv': base.replaceAll('\na,', '\n"::error::pwned",'),
      'c.csv': cand.replaceAll('\na,', '\n"::error::pwned",'),
    },
    args: compare(),
    exit: 0,
    notStdout: /^::/m,
  },
  {
    id: 'control-characters-in-value',
    files: { 'b.csv': setField(base, 5, 3, '\u001b[31mred'), 'c.csv': cand },
    args: compare(),
    exit: 2,
    stderr: 'not a finite decimal number',
  },
  // --- Column mappings --------------------------------------------------------------------------
  {
    id: 'per-file-columns',
    files: { 'b.csv': base, 'c.csv': cand.replace(H, 'zone,time,observed,forecast\n') },
    args: compare(
      '--candidate-columns',
      'series=zone,timestamp=time,actual=observed,prediction=forecast',
    ),
    exit: 0,
  },
  {
    id: 'per-file-columns-missing',
    files: { 'b.csv': base, 'c.csv': cand.replace(H, 'zone,time,observed,forecast\n') },
    args: compare('--baseline-columns', 'timestamp=time'),
    exit: 2,
    stderr: 'b.csv:1: missing the timestamp column "time"',
  },
  {
    id: 'per-file-columns-clash',
    files: pair,
    args: compare('--columns', 'actual=y', '--baseline-columns', 'prediction=y'),
    exit: 2,
    stderr: 'both use the column "y"',
  },
  // --- Parquet ----------------------------------------------------------------------------------
  ...(['snappy', 'gzip', 'zstd', 'uncompressed'] as const).map(
    (codec): CorpusCase => ({
      id: `parquet-${codec}`,
      parquet: [`baseline-${codec}.parquet`, `candidate-${codec}.parquet`],
      args: [
        'compare',
        '--baseline',
        `baseline-${codec}.parquet`,
        '--candidate',
        `candidate-${codec}.parquet`,
        '--resamples',
        '199',
      ],
      exit: 0,
      stdout: 'rows matched 360',
    }),
  ),
  {
    id: 'parquet-truncated',
    files: { 'b.parquet': Buffer.from('PAR1\x00\x00\x00'), 'c.csv': cand },
    args: ['compare', '--baseline', 'b.parquet', '--candidate', 'c.csv'],
    exit: 2,
    stderr: 'b.parquet: not a readable Parquet file',
  },
  {
    id: 'csv-named-parquet',
    files: { 'b.parquet': base, 'c.csv': cand },
    args: ['compare', '--baseline', 'b.parquet', '--candidate', 'c.csv'],
    exit: 2,
    stderr: 'not a readable Parquet file',
  },
  {
    id: 'parquet-format-on-csv',
    files: pair,
    args: compare('--format', 'parquet'),
    exit: 2,
    stderr: 'b.csv: not a readable Parquet file',
  },
  {
    id: 'parquet-nested',
    parquet: ['nested.parquet'],
    args: ['compare', '--baseline', 'nested.parquet', '--candidate', 'nested.parquet'],
    exit: 2,
    stderr: 'the Parquet column "actual" is nested',
  },
  {
    id: 'parquet-null',
    parquet: ['null-prediction.parquet'],
    args: [
      'compare',
      '--baseline',
      'null-prediction.parquet',
      '--candidate',
      'null-prediction.parquet',
    ],
    exit: 2,
    stderr: 'null-prediction.parquet:4: empty value where a number is required',
  },
  {
    id: 'parquet-nan',
    parquet: ['nan-prediction.parquet'],
    args: [
      'compare',
      '--baseline',
      'nan-prediction.parquet',
      '--candidate',
      'nan-prediction.parquet',
    ],
    exit: 2,
    stderr: 'nan-prediction.parquet:5: not a finite number',
  },
  {
    id: 'parquet-duplicate-key',
    parquet: ['duplicate-key.parquet'],
    args: [
      'compare',
      '--baseline',
      'duplicate-key.parquet',
      '--candidate',
      'duplicate-key.parquet',
    ],
    exit: 2,
    stderr: 'duplicate-key.parquet:7: duplicated key timestamp=2 horizon=1: lines 3 and 7',
  },
  {
    id: 'parquet-timestamp-type',
    parquet: ['timestamps.parquet'],
    args: [
      'compare',
      '--baseline',
      'timestamps.parquet',
      '--candidate',
      'timestamps.parquet',
      '--json',
      '-',
      '--resamples',
      '199',
    ],
    exit: 0,
    stdout: '"first": "2026-01-01T00:00:00Z"',
  },
  {
    id: 'parquet-int64',
    parquet: ['int64.parquet'],
    args: [
      'compare',
      '--baseline',
      'int64.parquet',
      '--candidate',
      'int64.parquet',
      '--json',
      '-',
      '--resamples',
      '199',
    ],
    exit: 0,
    stdout: '"horizons": [\n      2\n    ]',
  },
  {
    id: 'parquet-against-csv',
    parquet: ['baseline-zstd.parquet', 'candidate.csv'],
    args: [
      'compare',
      '--baseline',
      'baseline-zstd.parquet',
      '--candidate',
      'candidate.csv',
      '--resamples',
      '199',
    ],
    exit: 0,
    stdout: 'rows matched 360',
  },
];
