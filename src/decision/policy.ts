/**
 * The closed sets of words that configure the gate's decision (docs/decisions/0006-decision-policy.md).
 * Each list is the one place its values are written: the option table, the settings, the report
 * model, the schema test and the action's report reader take them from here.
 */

/** Which way the gate leans: what a pull request must show to pass (`--policy`). */
export const POLICIES = ['no-regression', 'non-inferiority', 'superiority'] as const;
export type Policy = (typeof POLICIES)[number];

/**
 * Which side of the baseline each policy puts the margin on: +1 above it (the candidate may be,
 * or is tested for being, worse by up to the margin), −1 below it (superiority: better by more
 * than the margin). The signed margin enters the tested differential (see `hypothesisFor`) and
 * the charts' margin line.
 */
export const MARGIN_SIGN: Readonly<Record<Policy, 1 | -1>> = {
  'no-regression': 1,
  'non-inferiority': 1,
  superiority: -1,
};

/** Which tests must reject for the policy's decision; a split gives `warn` (`--agreement`). */
export const AGREEMENTS = ['both', 'either', 'dm', 'bootstrap'] as const;
export type Agreement = (typeof AGREEMENTS)[number];

/** How the margin is read: a fraction of the baseline loss or loss units (`--margin-kind`). */
export const MARGIN_KINDS = ['relative', 'absolute'] as const;
export type MarginKind = (typeof MARGIN_KINDS)[number];

/** The verdict when there are fewer time points than `--min-points` (`--short-data`). */
export const SHORT_DATA_VERDICTS = ['warn', 'fail'] as const;
export type ShortDataVerdict = (typeof SHORT_DATA_VERDICTS)[number];
