import { automaticBlockLength } from '../statistics/bootstrap/automaticBlockLength.js';
import type { BlockLengthRule } from '../statistics/bootstrap/blockLengthRule.js';

/**
 * The one expected block length b shared by every candidate's bootstrap and the joint tests, so
 * that all of them resample the same blocks: the fixed length when the user set one, else the
 * average over candidates of the Politis & White (2004; Patton, Politis & White 2009) choice for
 * the differential L_k − L_baseline (`automaticBlockLength`, the rule a single comparison uses).
 * Averaging keeps b a property of the whole set, unchanged by the order candidates are listed in.
 */
export function commonBlockLength(
  baseline: Float64Array,
  candidates: readonly Float64Array[],
  rule: BlockLengthRule,
): number {
  if (rule.kind === 'fixed') return rule.length;
  if (baseline.length < 2) return 1;
  const lengths = candidates.map((c) => {
    const d = new Float64Array(baseline.length);
    for (let t = 0; t < d.length; t++) d[t] = c[t]! - baseline[t]!;
    return automaticBlockLength(d).blockLength;
  });
  // Summed in ascending order, so the same set gives the same b to the last bit in any order.
  lengths.sort((a, b) => a - b);
  let sum = 0;
  for (const b of lengths) sum += b;
  return sum / lengths.length;
}
