/** The gate's three outcomes. `warn` passes the step but asks a person to look. */
export const VERDICTS = ['pass', 'warn', 'fail'] as const;
export type Verdict = (typeof VERDICTS)[number];

/** The worst of several verdicts (fail > warn > pass). */
export function worstVerdict(verdicts: readonly Verdict[]): Verdict {
  if (verdicts.includes('fail')) return 'fail';
  if (verdicts.includes('warn')) return 'warn';
  return 'pass';
}
