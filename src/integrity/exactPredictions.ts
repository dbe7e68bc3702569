import type { AlignedPanel } from '../core/panel.js';
import { type CheckFinding, type CheckNotRun, FindingCollector } from './checkResult.js';
import { describePanelRow } from './panelRowKey.js';

/** Relative tolerance under which a prediction counts as equal to the actual. */
export const EXACT_TOLERANCE = 1e-9;
/**
 * When a model's share of exact rows is "far above" the other's: at least MIN_ROWS rows, a share
 * at least MIN_SHARE_GAP above the other model's, and at least RATIO times it. Rules of thumb of
 * this project (common practice has none): an honest forecast of a continuous quantity is
 * almost never exact, while integer-valued data (counts, a naive forecast of a flat stretch)
 * make some exact rows ordinary for both models alike.
 */
export const EXACT_RULE = { MIN_ROWS: 5, MIN_SHARE_GAP: 0.05, RATIO: 5 } as const;

/** |prediction − actual| ≤ 1e-9 · max(|prediction|, |actual|) (so 0 = 0 is exact). */
export function isExact(prediction: number, actual: number): boolean {
  return (
    Math.abs(prediction - actual) <=
    EXACT_TOLERANCE * Math.max(Math.abs(prediction), Math.abs(actual))
  );
}

/**
 * Suspicious exactness: the share of matched rows on which each model's point forecast equals
 * the actual. A model that reproduces the actual far more often than the other has likely seen
 * it (target leakage: the actual, or a feature computed from it, reached the model). Counts the
 * flagged model's exact rows (the candidate's when neither is flagged).
 */
export function checkExactPredictions(panel: AlignedPanel): {
  findings: CheckFinding[];
  notRun: CheckNotRun[];
} {
  const b = panel.baseline.prediction;
  const c = panel.candidate.prediction;
  if (b === null || c === null) {
    return {
      findings: [],
      notRun: [{ id: 'exact-predictions', reason: 'the models have no point forecasts in common' }],
    };
  }
  const exactB = new FindingCollector();
  const exactC = new FindingCollector();
  for (let p = 0; p < panel.size; p++) {
    const a = panel.actual[p]!;
    if (isExact(b[p]!, a)) exactB.add(() => `baseline: ${describePanelRow(panel, p)}`);
    if (isExact(c[p]!, a)) exactC.add(() => `candidate: ${describePanelRow(panel, p)}`);
  }
  const n = panel.size;
  const shareB = exactB.count / n;
  const shareC = exactC.count / n;
  const flagged = (mine: FindingCollector, share: number, other: number): boolean =>
    mine.count >= EXACT_RULE.MIN_ROWS &&
    share - other >= EXACT_RULE.MIN_SHARE_GAP &&
    share >= EXACT_RULE.RATIO * other;
  const flagB = flagged(exactB, shareB, shareC);
  const flagC = flagged(exactC, shareC, shareB);
  const pct = (x: number) => `${(x * 100).toFixed(2)}%`;
  const shares = `candidate ${exactC.count} (${pct(shareC)}), baseline ${exactB.count} (${pct(shareB)})`;
  let count = 0;
  let examples: string[] = [];
  let summary = `rows where the prediction equals the actual (to 1e-9 relative), of ${n}: ${shares}; no model stands out`;
  if (flagC || flagB) {
    const who = flagC && flagB ? 'both models' : flagC ? 'the candidate' : 'the baseline';
    count = (flagC ? exactC.count : 0) + (flagB ? exactB.count : 0);
    examples = [...(flagC ? exactC.examples : []), ...(flagB ? exactB.examples : [])].slice(0, 5);
    summary = `${who} reproduce${flagC && flagB ? '' : 's'} the actual far more often than the other model, a sign of target leakage: ${shares} of ${n} rows`;
  }
  return { findings: [{ id: 'exact-predictions', count, examples, summary }], notRun: [] };
}
