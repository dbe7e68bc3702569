import type { SortedKeys } from './sortedKeys.js';

/** How many one-sided keys a join keeps as examples for the report. */
export const KEY_EXAMPLES = 5;

/** The outcome of matching the baseline's keys with the candidate's. */
export interface KeyMatch {
  readonly matched: number;
  /** Matched rows, in key order: baselineRows[m] and candidateRows[m] have the same key. */
  readonly baselineRows: Int32Array;
  readonly candidateRows: Int32Array;
  /** Baseline rows whose key the candidate lacks, in key order. */
  readonly baselineOnlyRows: Int32Array;
  readonly candidateOnly: number;
  /** Up to KEY_EXAMPLES keys of each one-sided set, as describe wrote them. */
  readonly examples: { readonly baselineOnly: string[]; readonly candidateOnly: string[] };
}

/**
 * Merge join of two files sorted by key: one pass over both, comparing their key codes in key
 * order. `describe` writes a one-sided key for the examples.
 */
export function mergeJoin(
  baseline: SortedKeys,
  candidate: SortedKeys,
  describe: (side: SortedKeys, row: number) => string,
): KeyMatch {
  const bOrder = baseline.order;
  const cOrder = candidate.order;
  const bCodes = baseline.sorted;
  const cCodes = candidate.sorted;
  const nb = bOrder.length;
  const nc = cOrder.length;
  const baselineRows = new Int32Array(Math.min(nb, nc));
  const candidateRows = new Int32Array(Math.min(nb, nc));
  const examples = { baselineOnly: [] as string[], candidateOnly: [] as string[] };
  let matched = 0;
  let baselineOnly = 0;
  let candidateOnly = 0;
  let i = 0;
  let j = 0;
  while (i < nb && j < nc) {
    const b = bOrder[i]!;
    const c = cOrder[j]!;
    const bCode = bCodes[i]!;
    const cCode = cCodes[j]!;
    if (bCode === cCode) {
      baselineRows[matched] = b;
      candidateRows[matched] = c;
      matched++;
      i++;
      j++;
    } else if (bCode < cCode) {
      if (baselineOnly++ < KEY_EXAMPLES) examples.baselineOnly.push(describe(baseline, b));
      i++;
    } else {
      if (candidateOnly++ < KEY_EXAMPLES) examples.candidateOnly.push(describe(candidate, c));
      j++;
    }
  }
  for (; i < nb; i++) {
    if (baselineOnly++ < KEY_EXAMPLES) examples.baselineOnly.push(describe(baseline, bOrder[i]!));
  }
  for (; j < nc; j++) {
    if (candidateOnly++ < KEY_EXAMPLES)
      examples.candidateOnly.push(describe(candidate, cOrder[j]!));
  }
  return {
    matched,
    baselineRows: baselineRows.subarray(0, matched),
    candidateRows: candidateRows.subarray(0, matched),
    baselineOnlyRows: oneSided(bOrder, baselineRows.subarray(0, matched), baselineOnly),
    candidateOnly,
    examples,
  };
}

/** The rows of `order` not among `matchedRows` (`count` of them), in key order. */
function oneSided(order: Int32Array, matchedRows: Int32Array, count: number): Int32Array {
  const out = new Int32Array(count);
  if (count === 0) return out;
  const isMatched = new Uint8Array(order.length);
  for (let m = 0; m < matchedRows.length; m++) isMatched[matchedRows[m]!] = 1;
  let k = 0;
  for (let i = 0; i < order.length; i++) if (isMatched[order[i]!] === 0) out[k++] = order[i]!;
  return out;
}
