import { formatNumber } from '../core/formatNumber.js';
import type { Report } from './reportModel.js';

/**
 * Lines about the inputs that every renderer shows, in plain text (the caller escapes for
 * Markdown): the time order the timestamps were put in, and, under the squared loss with raw
 * pooling, the root mean squared errors beside the mean squared errors (RMSE is in the data's
 * units, which is how the trade usually quotes accuracy; the test itself is on the MSE).
 */
export function inputNotes(report: Report): string[] {
  const notes: string[] = [];
  const order = report.inputs.timestamps.order;
  if (order !== '') notes.push(`Time order: ${order}.`);
  const overall = report.comparisons[0];
  if (
    overall !== undefined &&
    report.settings.loss === 'squared' &&
    report.settings.pooling === 'raw' &&
    overall.meanBaselineLoss >= 0 &&
    overall.meanCandidateLoss >= 0
  ) {
    notes.push(
      `RMSE: baseline ${formatNumber(Math.sqrt(overall.meanBaselineLoss))}, candidate ${formatNumber(
        Math.sqrt(overall.meanCandidateLoss),
      )} (square roots of the mean squared errors compared above).`,
    );
  }
  return notes;
}
