import { aggregateByTime } from '../aggregation/lossSeries.js';
import { alignPanel } from '../alignment/alignPanel.js';
import { compareLossSeries } from '../comparison/compareLossSeries.js';
import { InputError } from '../core/inputError.js';
import { VERSION } from '../core/version.js';
import { hypothesisFor } from '../decision/hypothesis.js';
import { computeRowLosses, LossUnavailableError, type RowLosses } from '../losses/rowLosses.js';
import { readForecastFile } from '../reading/readForecastFile.js';
import { buildReport } from '../report/buildReport.js';
import type { Report } from '../report/reportModel.js';
import type { Settings } from '../settings/settings.js';
import type { Progress } from './progress.js';

export interface RunHooks {
  readonly onProgress?: (progress: Progress) => void;
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
  const read = (path: string, role: 'baseline' | 'candidate' | 'actuals') =>
    readForecastFile(path, {
      role,
      columns: settings.columns,
      ...(settings.format === 'auto' ? {} : { format: settings.format }),
      requireActual: role === 'actuals' || settings.actuals === null,
      onProgress: (done, total) =>
        hooks.onProgress?.({ stage: `reading ${role}`, fraction: total > 0 ? done / total : 1 }),
    });
  const baseline = await read(settings.baseline, 'baseline');
  const candidate = await read(settings.candidate, 'candidate');
  const actuals = settings.actuals === null ? undefined : await read(settings.actuals, 'actuals');
  hooks.onProgress?.({ stage: 'aligning', fraction: 0 });
  const panel = alignPanel({ baseline, candidate, ...(actuals === undefined ? {} : { actuals }) });

  let losses: RowLosses;
  try {
    losses = computeRowLosses(panel, settings.loss, settings.zeroActuals);
  } catch (error) {
    if (error instanceof LossUnavailableError) {
      throw new InputError(`--loss ${settings.loss}: ${error.message}`, {
        file: `${settings.baseline}, ${settings.candidate}`,
      });
    }
    throw error;
  }
  if (settings.zeroActuals === 'error' && losses.zeroActualRows.length > 0) {
    const row = losses.zeroActualRows[0]!;
    throw new InputError(
      `the absolute percentage error is undefined where the actual is 0 (${losses.zeroActualRows.length} rows; first at series ${JSON.stringify(
        panel.seriesNames[panel.series[row]!],
      )}, timestamp ${JSON.stringify(panel.timestamps[panel.time[row]!])}); use zero-actuals skip to leave them out and count them, or another loss`,
      { file: settings.actuals ?? settings.baseline, column: 'actual', value: '0' },
    );
  }

  hooks.onProgress?.({ stage: 'testing', fraction: 0 });
  const hypothesis = hypothesisFor(settings.policy, settings.margin, settings.marginKind);
  const overall = compareLossSeries(
    aggregateByTime(panel, losses),
    { loss: settings.loss, horizon: 'all', series: 'all', timestamps: panel.timestamps },
    hypothesis,
    settings,
  );
  hooks.onProgress?.({ stage: 'testing', fraction: 1 });
  const report = buildReport({
    version: VERSION,
    settings,
    hypothesis,
    panel,
    losses,
    comparisons: [overall],
  });
  return { report };
}
