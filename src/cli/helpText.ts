import { VERSION } from '../core/version.js';
import { DEFAULT_COLUMNS } from '../reading/columnMapping.js';
import { ENGINE_OPTIONS } from '../settings/options.js';

/** The short usage printed when skillgate runs without arguments. */
export function usageText(): string {
  return [
    'Usage: skillgate compare --baseline FILE --candidate FILE [options]',
    '       skillgate compare --losses FILE [options]',
    'Files are CSV, TSV (optionally .gz) or Parquet with the columns series, timestamp, horizon,',
    'actual, prediction (see skillgate --help for all columns and options).',
    '',
  ].join('\n');
}

/** The `--help` text, generated from the option table so it cannot go stale. */
export function helpText(): string {
  const c = DEFAULT_COLUMNS;
  const lines = [
    `skillgate ${VERSION}: is the candidate forecasting model worse than the baseline?`,
    '',
    'Usage:',
    '  skillgate compare --baseline FILE --candidate FILE [options]',
    '  skillgate --help | --version',
    '',
    'Input columns (header names; rename with --columns ROLE=HEADER):',
    `  ${c.series}      series name (optional: one series when absent)`,
    `  ${c.timestamp}   time of the forecast target: numbers, or ISO 8601 dates (see --time-format)`,
    `  ${c.horizon}     steps ahead, a whole number ≥ 1 (optional: 1)`,
    `  ${c.origin}      forecast origin (optional)`,
    `  ${c.path}        backtest path or fold (optional)`,
    `  ${c.actual}      observed value (or in a separate --actuals file)`,
    `  ${c.prediction}  point forecast`,
    `  ${c.quantile}0.1, ${c.quantile}0.9, …  quantile forecasts at those levels (for pinball / interval)`,
    `  ${c.weight}      row weight ≥ 0 (optional, with --weights)`,
    '  A --losses file has timestamp, baseline_loss, candidate_loss (optional differential, rows, horizon).',
    '',
    'Options:',
  ];
  for (const o of ENGINE_OPTIONS) {
    const flag = o.flag
      ? `--${o.name}`
      : `--${o.name} ${o.choices ? o.choices.join('|') : (o.valueName ?? 'VALUE')}`;
    const dflt =
      o.defaultValue === null || o.defaultValue === '' || o.flag
        ? ''
        : ` (default ${o.defaultValue})`;
    lines.push(`  ${flag}`, `      ${o.help}${dflt}`);
  }
  lines.push(
    '  --quiet',
    '      print nothing but errors on the terminal (the exit code still carries the verdict)',
    '',
    'Exit codes: 0 the gate passes (warnings allowed), 1 the gate fails, 2 usage or input error, 3 internal error (a bug).',
    '',
  );
  return lines.join('\n');
}
