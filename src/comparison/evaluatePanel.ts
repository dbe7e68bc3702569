import { aggregateByTime } from '../aggregation/lossSeries.js';
import { InputError } from '../core/inputError.js';
import type { AlignedPanel } from '../core/panel.js';
import { VERSION } from '../core/version.js';
import { hypothesisFor } from '../decision/hypothesis.js';
import { computeRowLosses, LossUnavailableError, type RowLosses } from '../losses/rowLosses.js';
import { buildReport } from '../report/buildReport.js';
import { panelInputsSummary } from '../report/inputsSummary.js';
import type { Report } from '../report/reportModel.js';
import type { Settings } from '../settings/settings.js';
import { compareLossSeries } from './compareLossSeries.js';

/**
 * The pure core from an aligned panel to the report: row losses → per-time-point loss series →
 * tests → decision. No files, no clock; the bootstrap's randomness comes from the seed in the
 * settings. Losses that cannot be computed on this panel are InputErrors.
 */
export function evaluatePanel(panel: AlignedPanel, settings: Settings): Report {
  const losses = rowLossesOrInputError(panel, settings);
  const hypothesis = hypothesisFor(settings.policy, settings.margin, settings.marginKind);
  const overall = compareLossSeries(
    aggregateByTime(panel, losses),
    { loss: settings.loss, horizon: 'all', series: 'all', timestamps: panel.timestamps },
    hypothesis,
    settings,
  );
  return buildReport({
    version: VERSION,
    settings,
    hypothesis,
    inputs: panelInputsSummary(panel, losses),
    comparisons: [overall],
  });
}

function rowLossesOrInputError(panel: AlignedPanel, settings: Settings): RowLosses {
  let losses: RowLosses;
  try {
    losses = computeRowLosses(panel, settings.loss, settings.zeroActuals);
  } catch (error) {
    if (error instanceof LossUnavailableError) {
      throw new InputError(`loss ${settings.loss}: ${error.message}`, {
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
  return losses;
}
