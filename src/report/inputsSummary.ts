import type { TimeFormatName } from '../alignment/timeFormat.js';
import type { AlignedPanel, FileSummary, TimestampKind } from '../core/panel.js';
import type { RowLosses } from '../losses/rowLosses.js';
import type { InputsSummary } from './reportModel.js';

/** The report's account of the inputs of a panel comparison: files, matches and what was left out. */
export function panelInputsSummary(panel: AlignedPanel, losses: RowLosses): InputsSummary {
  const horizons = new Set<number>();
  for (let i = 0; i < panel.size; i++) horizons.add(panel.horizon[i]!);
  const ts = panel.timestamps;
  return {
    files: panel.coverage.files,
    rowsMatched: panel.coverage.rowsMatched,
    rowsDropped: {
      baseline: panel.coverage.baselineOnly,
      candidate: panel.coverage.candidateOnly,
      withoutActual: panel.coverage.withoutActual,
      actualsUnused: panel.coverage.actualsUnused,
      skippedByLoss: losses.included === null ? 0 : losses.zeroActualRows.length,
    },
    examples: {
      baselineOnly: panel.coverage.examples.baselineOnly,
      candidateOnly: panel.coverage.examples.candidateOnly,
    },
    timestamps: {
      count: ts.length,
      kind: panel.timestampKind,
      first: ts[0] ?? null,
      last: ts.at(-1) ?? null,
      format: panel.timeFormat,
      order: panel.timestampKindReason,
    },
    series: panel.seriesNames.length,
    horizons: [...horizons].sort((a, b) => a - b),
    quantileLevels: losses.levels,
    intervalCoverage: losses.coverage,
  };
}

/** The same account for a pre-aggregated loss file: one file, every row a time point. */
export function lossFileInputsSummary(
  file: FileSummary,
  timestamps: readonly string[],
  kind: TimestampKind,
  maxHorizon: number,
  order: { format: TimeFormatName; reason: string } = { format: 'auto', reason: '' },
): InputsSummary {
  return {
    files: [file],
    rowsMatched: file.rows,
    rowsDropped: {
      baseline: 0,
      candidate: 0,
      withoutActual: 0,
      actualsUnused: 0,
      skippedByLoss: 0,
    },
    examples: { baselineOnly: [], candidateOnly: [] },
    timestamps: {
      count: timestamps.length,
      kind,
      first: timestamps[0] ?? null,
      last: timestamps.at(-1) ?? null,
      format: order.format,
      order: order.reason,
    },
    series: 1,
    horizons: Array.from({ length: maxHorizon }, (_, i) => i + 1).slice(-1),
    quantileLevels: [],
    intervalCoverage: null,
  };
}
