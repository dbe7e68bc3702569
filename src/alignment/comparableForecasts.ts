import { InputError } from '../core/inputError.js';
import type { ModelForecasts, QuantileColumn, QuantileLevels } from '../core/panel.js';
import type { ForecastTable } from '../reading/forecastTable.js';
import { gatherRows } from './gatherRows.js';

/**
 * What the two models can be compared on, gathered to the panel's rows: the point forecast when
 * both files have one, and the quantile levels both have (the others are listed, not compared).
 * Refuses two files with nothing in common.
 */
export function comparableForecasts(
  baseline: ForecastTable,
  candidate: ForecastTable,
  baselineRows: Int32Array,
  candidateRows: Int32Array,
): { baseline: ModelForecasts; candidate: ModelForecasts; quantileLevels: QuantileLevels } {
  const bLevels = baseline.quantiles.map((q) => q.level);
  const cLevels = candidate.quantiles.map((q) => q.level);
  const common = bLevels.filter((l) => cLevels.includes(l));
  const bothPredict = baseline.prediction !== null && candidate.prediction !== null;
  if (!bothPredict && common.length === 0) {
    const offer = (t: ForecastTable): string =>
      [
        t.prediction === null ? '' : `point forecasts ("${t.prediction.column}")`,
        t.quantiles.length === 0 ? '' : `quantiles ${t.quantiles.map((q) => q.column).join(', ')}`,
      ]
        .filter((s) => s !== '')
        .join(' and ');
    throw new InputError(
      `nothing to compare: ${baseline.summary.path} has ${offer(baseline)}, ${candidate.summary.path} has ${offer(candidate)}`,
      { file: candidate.summary.path, line: 1 },
    );
  }
  const forecasts = (table: ForecastTable, rows: Int32Array): ModelForecasts => ({
    prediction: bothPredict ? gatherRows(table.prediction!.values, rows) : null,
    quantiles: table.quantiles
      .filter((q) => common.includes(q.level))
      .map(
        (q): QuantileColumn => ({
          level: q.level,
          column: q.column,
          values: gatherRows(q.values, rows),
        }),
      ),
  });
  return {
    baseline: forecasts(baseline, baselineRows),
    candidate: forecasts(candidate, candidateRows),
    quantileLevels: {
      common,
      baselineOnly: bLevels.filter((l) => !cLevels.includes(l)),
      candidateOnly: cLevels.filter((l) => !bLevels.includes(l)),
    },
  };
}
