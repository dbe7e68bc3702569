/**
 * The closed sets of words that configure the gate's decision (docs/decisions/0006-decision-policy.md).
 * Each list is the one place its values are written: the option table, the settings, the report
 * model, the schema test and the action's report reader take them from here.
 */

/** Which way the gate leans: what a pull request must show to pass (`--policy`). */
export const POLICIES = ['no-regression', 'non-inferiority', 'superiority'] as const;
export type Policy = (typeof POLICIES)[number];

/** Which tests must reject for the policy's decision; a split gives `warn` (`--agreement`). */
export const AGREEMENTS = ['both', 'either', 'dm', 'bootstrap'] as const;
export type Agreement = (typeof AGREEMENTS)[number];

/** How the margin is read: a fraction of the baseline loss or loss units (`--margin-kind`). */
export const MARGIN_KINDS = ['relative', 'absolute'] as const;
export type MarginKind = (typeof MARGIN_KINDS)[number];

/** The verdict when there are fewer time points than `--min-points` (`--short-data`). */
export const SHORT_DATA_VERDICTS = ['warn', 'fail'] as const;
export type ShortDataVerdict = (typeof SHORT_DATA_VERDICTS)[number];
