/** 'bonferroni' when both checks ran (each at α/2), 'none' otherwise. */
export const STABILITY_ADJUSTMENTS = ['none', 'bonferroni'] as const;

/**
 * The level each stability check runs at (`report.stability.levels`). The report flags "not
 * stable" when either the fluctuation test or the recent window's comparison finds the candidate
 * worse, so when both run the level α is split between them by the Bonferroni inequality
 * (Bonferroni 1936; Dunn 1961): each at α/2, and P(either rejects) ≤ α/2 + α/2 = α under equal
 * and stable accuracy, whatever the dependence between them. A check that runs alone keeps α.
 */
export interface StabilityLevels {
  readonly adjustment: (typeof STABILITY_ADJUSTMENTS)[number];
  /** The gate's α, the bound on the combined "not stable" flag. */
  readonly alpha: number;
  /** Level of the fluctuation test, or null when it was not run. */
  readonly fluctuation: number | null;
  /** Level of the recent window's comparison, or null when there is none. */
  readonly recent: number | null;
}

/** α/2 when two checks share α (Bonferroni), α for one. */
export function splitLevel(alpha: number, checks: 1 | 2): number {
  return checks === 2 ? alpha / 2 : alpha;
}
