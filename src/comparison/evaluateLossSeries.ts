import type { LossSeries } from '../aggregation/lossSeries.js';
import type { TimeFormatName } from '../alignment/timeFormat.js';
import type { FileSummary, TimestampKind } from '../core/panel.js';
import { VERSION } from '../core/version.js';
import { hypothesisFor } from '../decision/hypothesis.js';
import { buildReport } from '../report/buildReport.js';
import { lossFileInputsSummary } from '../report/inputsSummary.js';
import type { Report } from '../report/reportModel.js';
import type { Settings } from '../settings/settings.js';
import { assessStability } from '../stability/assessStability.js';
import type { ResampleRunner } from '../statistics/bootstrap/resampleJob.js';
import { compareLossSeries } from './compareLossSeries.js';

/**
 * The pure core for a pre-aggregated loss file: the per-time-point mean losses arrive computed
 * (for instance by a warehouse query), so the same tests and decision run on them unchanged.
 */
export function evaluateLossSeries(
  series: LossSeries,
  source: {
    file: FileSummary;
    timestamps: readonly string[];
    kind: TimestampKind;
    order?: { format: TimeFormatName; reason: string };
  },
  settings: Settings,
  resampleRunner?: ResampleRunner,
): Report {
  const hypothesis = hypothesisFor(settings.policy, settings.margin, settings.marginKind);
  const runner = resampleRunner === undefined ? {} : { runner: resampleRunner };
  const overall = compareLossSeries(
    series,
    { loss: settings.loss, horizon: 'all', series: 'all', timestamps: source.timestamps },
    hypothesis,
    settings,
    runner,
  );
  return buildReport({
    version: VERSION,
    settings,
    hypothesis,
    inputs: lossFileInputsSummary(
      source.file,
      source.timestamps,
      source.kind,
      series.maxHorizon,
      source.order,
    ),
    comparisons: [overall],
    stability: assessStability({
      series,
      timestamps: source.timestamps,
      kind: source.kind,
      hypothesis,
      settings,
      ...runner,
    }),
  });
}
