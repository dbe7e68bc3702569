import {
  CHECK_IDS,
  type CheckFinding,
  type CheckMode,
  type CheckNotRun,
  type CheckStatus,
  FAILING_CHECKS,
  type IntegrityCheck,
  type IntegrityReport,
} from './checkResult.js';

/**
 * Gives each finding its status under the mode: a clean check is 'ok'; a finding of look-ahead
 * or of rows outside their fold's test window is 'fail' under 'enforce' (the default), every
 * other finding 'warn'; under 'warn' and 'report' every finding is 'warn', and under 'report'
 * the outcome does not enter the verdict.
 */
export function applyCheckPolicy(
  findings: readonly CheckFinding[],
  notRun: readonly CheckNotRun[],
  mode: CheckMode,
  frequency: IntegrityReport['frequency'],
): IntegrityReport {
  const checks: IntegrityCheck[] = findings.map((f) => ({
    id: f.id,
    status: statusOf(f, mode),
    count: f.count,
    examples: f.examples,
    summary: f.summary,
  }));
  const outcome: CheckStatus = checks.some((c) => c.status === 'fail')
    ? 'fail'
    : checks.some((c) => c.status === 'warn')
      ? 'warn'
      : 'ok';
  return { mode, outcome, affectsVerdict: mode !== 'report', frequency, checks, notRun };
}

function statusOf(f: CheckFinding, mode: CheckMode): CheckStatus {
  if (f.count === 0) return 'ok';
  return mode === 'enforce' && FAILING_CHECKS.includes(f.id) ? 'fail' : 'warn';
}

/** The report when no check can run (a pre-aggregated loss file). */
export function noChecks(mode: CheckMode, reason: string): IntegrityReport {
  return {
    mode,
    outcome: 'ok',
    affectsVerdict: mode !== 'report',
    frequency: null,
    checks: [],
    notRun: CHECK_IDS.map((id) => ({ id, reason })),
  };
}
