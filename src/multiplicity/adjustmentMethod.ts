import { benjaminiHochbergAdjust } from './benjaminiHochbergAdjust.js';
import { holmAdjust } from './holmAdjust.js';

/**
 * The multiplicity adjustments of the per-series p-values (`--adjust`): `holm` (Holm 1979,
 * family-wise error rate) or `bh` (Benjamini & Hochberg 1995, false discovery rate).
 */
export const ADJUSTMENT_METHODS = ['holm', 'bh'] as const;
export type AdjustmentMethod = (typeof ADJUSTMENT_METHODS)[number];

/** Each method's name in reports and its adjustment (null p-values pass through as null). */
export const ADJUSTMENTS: Readonly<
  Record<
    AdjustmentMethod,
    {
      readonly name: string;
      readonly adjust: (pValues: readonly (number | null)[]) => (number | null)[];
    }
  >
> = {
  holm: { name: 'Holm', adjust: holmAdjust },
  bh: { name: 'Benjamini–Hochberg', adjust: benjaminiHochbergAdjust },
};
