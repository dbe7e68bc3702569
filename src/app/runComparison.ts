import { alignPanel } from '../alignment/alignPanel.js';
import { historyBySeries } from '../alignment/historyBySeries.js';
import { orderLossSeries } from '../alignment/orderLossSeries.js';
import { runCandidates } from '../candidates/runCandidates.js';
import { evaluateLossSeries } from '../comparison/evaluateLossSeries.js';
import { evaluatePanel } from '../comparison/evaluatePanel.js';
import { InputError } from '../core/inputError.js';
import { checkBacktest } from '../integrity/checkBacktest.js';
import { type ColumnMapping, checkDistinctNames } from '../reading/columnMapping.js';
import type { InputFormat } from '../reading/inputFormat.js';
import { readFoldLayout } from '../reading/readFoldLayout.js';
import { type FileRole, readForecastFile } from '../reading/readForecastFile.js';
import { readLossSeriesFile } from '../reading/readLossSeriesFile.js';
import type { Report } from '../report/reportModel.js';
import type { Settings } from '../settings/settings.js';
import type { ResampleRunner } from '../statistics/bootstrap/resampleJob.js';
import type { Progress } from './progress.js';

export interface RunHooks {
  readonly onProgress?: (progress: Progress) => void;
  /** Where bootstrap resamples run (a worker pool); default: the calling thread. */
  readonly resampleRunner?: ResampleRunner;
}

/**
 * The engine from files to report, shared by the CLI and the action: read the three files,
 * align them on the key, compute row losses, aggregate by time point, test and decide. The only
 * I/O is reading the input files; writing outputs is the caller's job.
 */
export async function runComparison(
  settings: Settings,
  hooks: RunHooks = {},
): Promise<{ report: Report }> {
  if (settings.losses !== null)
    return { report: await runOnLossFile(settings.losses, settings, hooks) };
  if (settings.candidates.length > 1 || settings.modelColumn !== null)
    return { report: await runCandidates(settings, hooks) };
  const read = (path: string, role: FileRole) =>
    readForecastFile(path, {
      role,
      columns: columnsFor(settings, role),
      ...readDialect(settings),
      requireActual: role === 'actuals' || settings.actuals === null,
      onProgress: (done, total) =>
        hooks.onProgress?.({ stage: `reading ${role}`, fraction: total > 0 ? done / total : 1 }),
    });
  const baseline = await read(settings.baseline, 'baseline');
  const candidate = await read(settings.candidate, 'candidate');
  const actuals = settings.actuals === null ? undefined : await read(settings.actuals, 'actuals');
  hooks.onProgress?.({ stage: 'aligning', fraction: 0 });
  const panel = alignPanel(
    { baseline, candidate, ...(actuals === undefined ? {} : { actuals }) },
    {
      onProgress: (fraction) => hooks.onProgress?.({ stage: 'aligning', fraction }),
      timeFormat: settings.timeFormat,
    },
  );

  const folds = settings.folds === null ? undefined : await readFoldLayout(settings.folds);
  const integrity = checkBacktest(
    {
      panel,
      baseline,
      candidate,
      ...(actuals === undefined ? {} : { actuals }),
      ...(folds === undefined ? {} : { folds }),
    },
    { frequency: settings.frequency, embargo: settings.embargo, mode: settings.backtestChecks },
  );

  const history =
    settings.pooling === 'scaled' && settings.scale === 'seasonal-naive'
      ? await readHistory(settings)
      : undefined;
  hooks.onProgress?.({ stage: 'testing', fraction: 0 });
  const report = evaluatePanel(panel, settings, {
    integrity,
    ...(history === undefined ? {} : { history }),
    ...(hooks.resampleRunner === undefined ? {} : { resampleRunner: hooks.resampleRunner }),
  });
  hooks.onProgress?.({ stage: 'testing', fraction: 1 });
  return { report };
}

async function runOnLossFile(path: string, settings: Settings, hooks: RunHooks): Promise<Report> {
  if (settings.folds !== null || settings.frequency !== 'auto' || settings.embargo !== 0) {
    // The backtest checks need forecast rows; a loss file has none, so these would do nothing.
    throw new InputError(
      'frequency, folds and embargo configure the backtest checks, which need the forecast files (baseline and candidate), not a loss file',
      { file: path },
    );
  }
  const table = await readLossSeriesFile(path, {
    ...readDialect(settings),
    ...(settings.columns.timestamp === undefined
      ? {}
      : { timestampColumn: settings.columns.timestamp }),
    onProgress: (done, total) =>
      hooks.onProgress?.({ stage: 'reading losses', fraction: total > 0 ? done / total : 1 }),
  });
  const { series, timestamps, kind, reason, format } = orderLossSeries(table, settings.timeFormat);
  return evaluateLossSeries(
    series,
    { file: table.summary, timestamps, kind, order: { format, reason } },
    settings,
    hooks.resampleRunner,
  );
}

async function readHistory(settings: Settings): Promise<Map<string, Float64Array>> {
  if (settings.history === null) {
    throw new InputError('--scale seasonal-naive needs --history FILE (series, timestamp, actual)');
  }
  const table = await readForecastFile(settings.history, {
    role: 'actuals',
    columns: settings.columns,
    ...readDialect(settings),
    requireActual: true,
  });
  return historyBySeries(table, settings.timeFormat);
}

/** The column renames for one file: the shared ones, then that file's own. */
export function columnsFor(settings: Settings, role: FileRole): ColumnMapping {
  const own =
    role === 'baseline'
      ? settings.baselineColumns
      : role === 'candidate'
        ? settings.candidateColumns
        : {};
  const merged = { ...settings.columns, ...own };
  checkDistinctNames(merged, `--columns with --${role}-columns`);
  return merged;
}

/** Format and CSV dialect options as the readers take them. */
export function readDialect(settings: Settings): {
  format?: Exclude<InputFormat, 'auto'>;
  delimiter: Settings['delimiter'];
  decimal: Settings['decimal'];
  lineLimit: number;
} {
  return {
    ...(settings.format === 'auto' ? {} : { format: settings.format }),
    delimiter: settings.delimiter,
    decimal: settings.decimal,
    lineLimit: settings.lineLimit,
  };
}
