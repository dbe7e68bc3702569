import { lossDifferential } from '../src/aggregation/lossSeries.js';
import { compareLossSeries } from '../src/comparison/compareLossSeries.js';
import { runDieboldMariano } from '../src/comparison/runDieboldMariano.js';
import { hypothesisFor } from '../src/decision/hypothesis.js';
import { createRandomSource } from '../src/random/randomSource.js';
import { resolveSettings } from '../src/settings/resolveSettings.js';
import type { SimulationDesign } from './simulateLossSeries.js';
import { simulateLossSeries } from './simulateLossSeries.js';

/** The procedures compared by the study of the number of ewc cosine terms (docs/validation.md). */
export const COSINE_TERMS_PROCEDURES = [
  'ewc, ν = 0.4 n^{2/3}',
  'ewc-ar1',
  'stationary bootstrap',
  'policy with ewc (ewc and bootstrap)',
  'policy with ewc-ar1 (ewc-ar1 and bootstrap)',
] as const;
export type CosineTermsProcedure = (typeof COSINE_TERMS_PROCEDURES)[number];

export interface CosineTermsStudyResult {
  readonly design: SimulationDesign;
  readonly replications: number;
  readonly rejectionRate: Readonly<Record<CosineTermsProcedure, number>>;
  /** Mean ν of each ewc variant over the replications. */
  readonly meanTerms: { readonly fixed: number; readonly ar1: number };
}

/**
 * Rejection rates ("candidate worse", one-sided α) of the gate with `--variance ewc` and with
 * `--variance ewc-ar1`, on `replications` simulated backtests of one design. Each replication runs
 * the ewc comparison once (ewc with the fixed ν and the stationary bootstrap, the gate's own
 * code and default settings otherwise: relative margin 0, no-regression, agreement both) and the ewc-ar1
 * Diebold–Mariano test on the same differential; the ewc-ar1 policy fails when that test and the
 * same bootstrap both reject, exactly what `--variance ewc-ar1` would decide (the bootstrap does
 * not depend on the variance setting). Replication r uses random stream r of `seed`.
 */
export function runCosineTermsStudy(
  design: SimulationDesign,
  options: { replications: number; firstReplication?: number; resamples: number; seed: number },
): CosineTermsStudyResult {
  const alpha = 0.05;
  const base = {
    baseline: 'simulated',
    candidate: 'simulated',
    resamples: String(options.resamples),
    alpha: String(alpha),
    'min-points': '1',
  };
  const settings = resolveSettings({ ...base, variance: 'ewc' }, (name) => name);
  const ar1Settings = resolveSettings({ ...base, variance: 'ewc-ar1' }, (name) => name);
  const hypothesis = hypothesisFor('no-regression', 0, 'relative');
  const counts = Object.fromEntries(COSINE_TERMS_PROCEDURES.map((p) => [p, 0])) as Record<
    CosineTermsProcedure,
    number
  >;
  let fixedTerms = 0;
  let ar1Terms = 0;
  const first = options.firstReplication ?? 0;
  for (let r = first; r < first + options.replications; r++) {
    const series = simulateLossSeries(design, createRandomSource(options.seed, r));
    const comparison = compareLossSeries(
      series,
      { loss: 'squared', horizon: 'all', series: 'all', timestamps: [] },
      hypothesis,
      settings,
    );
    const d = lossDifferential(series, hypothesis.baselineFactor - 1);
    const ar1 = runDieboldMariano(
      d,
      series.maxHorizon,
      hypothesis,
      ar1Settings,
      lossDifferential(series, 0),
    );
    const ar1Rejects = ar1.decisionPValue !== null && ar1.decisionPValue <= alpha;
    fixedTerms += comparison.dieboldMariano.degreesOfFreedom ?? 0;
    ar1Terms += ar1.degreesOfFreedom ?? 0;
    if (comparison.rejected.dieboldMariano) counts['ewc, ν = 0.4 n^{2/3}']++;
    if (ar1Rejects) counts['ewc-ar1']++;
    if (comparison.rejected.bootstrap) counts['stationary bootstrap']++;
    if (comparison.verdict === 'fail') counts['policy with ewc (ewc and bootstrap)']++;
    if (ar1Rejects && comparison.rejected.bootstrap) {
      counts['policy with ewc-ar1 (ewc-ar1 and bootstrap)']++;
    }
  }
  const reps = options.replications;
  return {
    design,
    replications: reps,
    rejectionRate: Object.fromEntries(
      COSINE_TERMS_PROCEDURES.map((p) => [p, counts[p] / reps]),
    ) as Record<CosineTermsProcedure, number>,
    meanTerms: { fixed: fixedTerms / reps, ar1: ar1Terms / reps },
  };
}
