/**
 * The default level of the report's intervals, 1 − 2α (0.9 for α = 0.05): then each end of a
 * two-sided interval is a one-sided bound at α, the tail each one-sided test of the gate uses, so
 * the interval and the verdict agree at every margin (as in non-inferiority practice, e.g. the
 * two one-sided tests of Schuirmann 1987). Rounded to 15 significant digits so that 1 − 2·0.05
 * reads 0.9 exactly.
 *
 * @example defaultConfidence(0.05) // 0.9
 */
export function defaultConfidence(alpha: number): number {
  return Number((1 - 2 * alpha).toPrecision(15));
}

/** Whether a level differs from the default, so intervals and tests may disagree. */
export function confidenceOverridesDefault(confidence: number, alpha: number): boolean {
  return confidence !== defaultConfidence(alpha);
}
