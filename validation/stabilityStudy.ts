import { hypothesisFor } from '../src/decision/hypothesis.js';
import { createRandomSource } from '../src/random/randomSource.js';
import { resolveSettings } from '../src/settings/resolveSettings.js';
import { assessStability } from '../src/stability/assessStability.js';
import { type SimulationDesign, simulateLossSeries } from './simulateLossSeries.js';

/**
 * A design of the stability study: the AR(1) designs of simulateLossSeries with equal accuracy,
 * and, for detection, a late regression: the candidate's loss multiplied by `lateFactor` (1.2:
 * 20% worse in expectation) over the last `lateShare` of the time points (0.15).
 */
export interface StabilityDesign extends SimulationDesign {
  readonly lateShare: number;
  readonly lateFactor: number;
}

export interface StabilityStudyResult {
  readonly design: StabilityDesign;
  readonly replications: number;
  /** Fluctuation test alone (no recent window), at α: rejected (a stretch significantly worse). */
  readonly fluctuationAlone: number;
  /** Recent window's comparison alone, at α: failed (both tests reject, default policy). */
  readonly recentAlone: number;
  /** With both checks (each at α/2, Bonferroni): the fluctuation test rejected. */
  readonly fluctuation: number;
  /** ... and its peak window ends inside the late stretch. */
  readonly fluctuationPeakLate: number;
  /** With both checks: the recent window's comparison failed. */
  readonly recent: number;
  /** With both checks: either flagged, i.e. the report says "not stable" and the gate warns. */
  readonly either: number;
}

/**
 * Runs simulated backtests of one design through the gate's own stability code
 * (assessStability with the default settings: μ = 0.2, one-sided, α = 0.05, recent 15%, ewc and
 * the stationary bootstrap agreeing on the recent window): each check alone at α, and both
 * together, each at α/2 (Bonferroni), with the combined flag. Replication r uses random stream r of
 * `seed`, so any split over threads gives the same counts.
 */
export function runStabilityStudy(
  design: StabilityDesign,
  options: { replications: number; firstReplication?: number; resamples: number; seed: number },
): StabilityStudyResult {
  const settings = resolveSettings(
    {
      baseline: 'simulated',
      candidate: 'simulated',
      resamples: String(options.resamples),
      recent: '15%',
      'min-points': '1',
    },
    (name) => name,
  );
  const fluctuationOnly = { ...settings, recent: null };
  const hypothesis = hypothesisFor('no-regression', 0, 'relative');
  const timestamps = Array.from({ length: design.n }, (_, t) => String(t + 1));
  const lateFrom = design.n - Math.round(design.lateShare * design.n);
  let fluctuation = 0;
  let peakLate = 0;
  let recent = 0;
  let either = 0;
  let fluctuationAlone = 0;
  let recentAlone = 0;
  const first = options.firstReplication ?? 0;
  for (let r = first; r < first + options.replications; r++) {
    const series = simulateLossSeries(design, createRandomSource(options.seed, r));
    const candidate = series.candidate as Float64Array;
    for (let t = lateFrom; t < design.n; t++) candidate[t]! *= design.lateFactor;
    const s = assessStability({ series, timestamps, kind: 'number', hypothesis, settings });
    const f = s.fluctuation?.rejected === true;
    const w = s.recent !== null && s.recent.verdict === 'fail';
    if (f) fluctuation++;
    if (f && Number(s.fluctuation!.peak.end) > lateFrom) peakLate++;
    if (w) recent++;
    if (f || w) either++;
    const alone = assessStability({
      series,
      timestamps,
      kind: 'number',
      hypothesis,
      settings: fluctuationOnly,
    });
    if (alone.fluctuation?.rejected) fluctuationAlone++;
    // The recent window alone at α: its p-values do not depend on α, so the decision at α is
    // both p-values ≤ α (agreement both, no-regression, min-points 1), as decideComparison does.
    const pDm = s.recent?.dieboldMariano.decisionPValue ?? null;
    const pBoot = s.recent?.bootstrap.decisionPValue ?? null;
    if (pDm !== null && pBoot !== null && pDm <= settings.alpha && pBoot <= settings.alpha) {
      recentAlone++;
    }
  }
  const reps = options.replications;
  return {
    design,
    replications: reps,
    fluctuationAlone: fluctuationAlone / reps,
    recentAlone: recentAlone / reps,
    fluctuation: fluctuation / reps,
    fluctuationPeakLate: peakLate / reps,
    recent: recent / reps,
    either: either / reps,
  };
}
