/** The gate's three outcomes. `warn` passes the step but asks a person to look. */
export type Verdict = 'pass' | 'warn' | 'fail';

/** The worst of several verdicts (fail > warn > pass). */
export function worstVerdict(verdicts: readonly Verdict[]): Verdict {
  if (verdicts.includes('fail')) return 'fail';
  if (verdicts.includes('warn')) return 'warn';
  return 'pass';
}
