import type { Verdict } from '../decision/verdict.js';
import { percent, significant } from './cells.js';
import type { ReportView } from './reportView.js';

/**
 * What decided the gate, as a kind the renderers can word and other parts of the engine can add
 * to:
 * - 'both-tests-agree': both tests found evidence for the alternative, or neither did;
 * - 'tests-split': one test found evidence and the other did not (agreement both → warn);
 * - 'one-test-decides': the settings (agreement either / dm / bootstrap) or a test that could
 *   not be computed leave the decision to one test;
 * - 'no-test': no test could be computed;
 * - 'identical-losses': the candidate's loss equals the baseline's on every row;
 * - 'too-little-data': fewer time points than --min-points;
 * - 'missing-rows': the candidate lacks rows the baseline scored (and allow-missing is off);
 * - 'worse-lately': the comparison on the most recent window fails under the policy;
 * - 'worse-in-a-stretch': the fluctuation test finds stretches where the candidate is worse;
 * - 'backtest-check-failed' / 'backtest-check-warned': a check of the backtest itself.
 */
export type DecidingReasonKind =
  | 'both-tests-agree'
  | 'tests-split'
  | 'one-test-decides'
  | 'no-test'
  | 'identical-losses'
  | 'too-little-data'
  | 'missing-rows'
  | 'worse-lately'
  | 'worse-in-a-stretch'
  | 'backtest-check-failed'
  | 'backtest-check-warned';

export interface DecidingReason {
  readonly kind: DecidingReasonKind;
  /** The verdict this finding alone leads to. */
  readonly verdict: Verdict;
  /** One sentence in plain words, without a final full stop. */
  readonly text: string;
}

const RANK: Record<Verdict, number> = { pass: 0, warn: 1, fail: 2 };

/**
 * Every finding that bears on the gate, the deciding one first: the finding whose verdict is the
 * gate's, preferring one that made the verdict worse than the overall comparison alone would
 * have (rows the candidate lacks, a failed check, a recent regression), since that is the part a
 * reviewer would otherwise miss.
 */
export function decidingReasons(report: ReportView): DecidingReason[] {
  const overall = report.comparisons[0];
  const found: DecidingReason[] = [];
  if (overall !== undefined) found.push(comparisonReason(report));

  const integrity = report.integrity;
  for (const check of integrity.checks) {
    if (check.status === 'ok') continue;
    found.push({
      kind: check.status === 'fail' ? 'backtest-check-failed' : 'backtest-check-warned',
      // With --backtest-checks report the findings are shown only.
      verdict: integrity.affectsVerdict ? check.status : 'pass',
      text: `the backtest check ${check.id} ${check.status === 'fail' ? 'failed' : 'warned'}: ${lowerFirst(
        check.summary,
      ).replace(/\.$/, '')}`,
    });
  }

  const missing = report.inputs.rowsDropped.baseline;
  if (missing > 0) {
    const m = report.inputs.missingRows ?? null;
    const hard =
      m === null || m.meanBaselineLoss === null || m.meanBaselineLossCommon === null
        ? ''
        : `; the baseline's mean loss on them is ${significant(m.meanBaselineLoss)}, against ${significant(m.meanBaselineLossCommon)} on the rows both scored`;
    found.push({
      kind: 'missing-rows',
      verdict: report.settings.allowMissing ? 'pass' : 'fail',
      text: `the candidate lacks ${missing} ${missing === 1 ? 'row' : 'rows'} that the baseline scored${
        report.settings.allowMissing ? ' (allowed by --allow-missing)' : ''
      }${hard}`,
    });
  }

  // The stability findings act on the gate as --stability-gate says (src/stability/stabilityFinding.ts).
  const gateEffect: Verdict =
    report.settings.stabilityGate === 'off' ? 'pass' : report.settings.stabilityGate;
  const recent = report.stability?.recent ?? null;
  if (recent !== null && recent.verdict === 'fail') {
    found.push({
      kind: 'worse-lately',
      verdict: gateEffect,
      text: `the candidate is worse in the most recent ${recent.n} time points (${recent.firstTimestamp ?? 'n/a'} to ${
        recent.lastTimestamp ?? 'n/a'
      }): mean loss ${percent(recent.relativeDifference)}`,
    });
  }
  const f = report.stability?.fluctuation ?? null;
  if (f?.rejected && f.worsePeriods.length > 0) {
    const spans = f.worsePeriods
      .slice(0, 3)
      .map((p) => `${p.start} to ${p.end}`)
      .join(', ');
    found.push({
      kind: 'worse-in-a-stretch',
      verdict: gateEffect,
      text: `the candidate is significantly worse over ${spans}${
        f.worsePeriods.length > 3 ? ` and ${f.worsePeriods.length - 3} more stretches` : ''
      } (fluctuation test, Giacomini & Rossi 2010)`,
    });
  }

  const gate = report.verdict;
  const overallVerdict = overall?.verdict ?? 'pass';
  const score = (r: DecidingReason, index: number): number =>
    (r.verdict === gate ? 100 : 0) +
    (r.verdict === gate && RANK[gate] > RANK[overallVerdict] && index > 0 ? 10 : 0) -
    index * 0.01;
  return found
    .map((r, i) => ({ r, s: score(r, i) }))
    .sort((a, b) => b.s - a.s)
    .map((x) => x.r);
}

function lowerFirst(text: string): string {
  return text.length === 0 ? text : text[0]!.toLowerCase() + text.slice(1);
}

/** Why the overall comparison came out as it did. */
function comparisonReason(report: ReportView): DecidingReason {
  const c = report.comparisons[0]!;
  const verdict = c.verdict;
  const alternative = report.policy.alternative;
  const { dieboldMariano: dm, bootstrap: bs } = c.rejected;
  const agreement = report.settings.agreement;
  if (c.n < report.settings.minPoints) {
    return {
      kind: 'too-little-data',
      verdict,
      text: `too little data: ${c.n} time points, fewer than the ${report.settings.minPoints} needed for a firm verdict`,
    };
  }
  if (c.dieboldMariano.state === 'identical' && c.bootstrap.state !== 'ok') {
    return {
      kind: 'identical-losses',
      verdict,
      text: "the candidate's loss equals the baseline's on every row",
    };
  }
  if (dm === null && bs === null) {
    return { kind: 'no-test', verdict, text: 'no test could be computed' };
  }
  if (agreement === 'both' && dm !== null && bs !== null) {
    if (dm !== bs) {
      return {
        kind: 'tests-split',
        verdict,
        text: `the tests split: ${dm ? 'Diebold–Mariano' : 'the bootstrap'} finds evidence that ${alternative}, ${
          dm ? 'the bootstrap' : 'Diebold–Mariano'
        } does not`,
      };
    }
    return {
      kind: 'both-tests-agree',
      verdict,
      text: dm
        ? `both tests find evidence that ${alternative}`
        : `neither test finds evidence that ${alternative}`,
    };
  }
  const which =
    agreement === 'dm' || bs === null
      ? 'Diebold–Mariano'
      : agreement === 'bootstrap' || dm === null
        ? 'the bootstrap'
        : 'either test';
  const rejected = agreement === 'either' ? dm === true || bs === true : (dm ?? bs) === true;
  const finds =
    agreement === 'either' && !rejected
      ? 'neither test finds'
      : `${which} ${rejected ? 'finds' : 'does not find'}`;
  return {
    kind: 'one-test-decides',
    verdict,
    text: `${finds} evidence that ${alternative}${
      agreement === 'both'
        ? ' (the other test could not be computed)'
        : ` (--agreement ${agreement})`
    }`,
  };
}
