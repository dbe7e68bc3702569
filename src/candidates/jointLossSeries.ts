import type { LossSeries } from '../aggregation/lossSeries.js';
import { InputError } from '../core/inputError.js';

/** One candidate's overall loss series against the baseline, with its panel's time labels. */
export interface PairSeries {
  readonly name: string;
  readonly file: string;
  readonly series: LossSeries;
  readonly timestamps: readonly string[];
}

/** Every model's loss at the same time points: what the joint tests resample. */
export interface JointLossSeries {
  readonly timestamps: readonly string[];
  readonly baseline: Float64Array;
  /** One series per candidate, in the order given. */
  readonly candidates: readonly Float64Array[];
}

/**
 * Puts the candidates' loss series side by side. The joint tests need every model scored on the
 * same rows: each candidate's comparison must cover the same time points (same labels, same
 * order) with the same baseline loss at each — which holds when every candidate has forecasts
 * for the same keys. Anything else is refused with the first difference named, never patched by
 * dropping points (that would change what each candidate's own comparison reports).
 */
export function jointLossSeries(pairs: readonly PairSeries[]): JointLossSeries {
  const first = pairs[0];
  if (first === undefined) throw new Error('joint loss series need at least one candidate');
  const labels = (p: PairSeries) => Array.from(p.series.time, (t) => p.timestamps[t]!);
  const reference = labels(first);
  for (const pair of pairs.slice(1)) {
    const own = labels(pair);
    const at = firstDifference(reference, own, first.series.baseline, pair.series.baseline);
    if (at !== null) {
      const where =
        at < Math.min(reference.length, own.length)
          ? `at timestamp ${JSON.stringify(reference[at])} / ${JSON.stringify(own[at])} (point ${at + 1})`
          : `in length (${reference.length} against ${own.length} time points)`;
      throw new InputError(
        `candidates "${first.name}" and "${pair.name}" are not scored on the same rows against the baseline: they differ ${where}. The joint tests (superior predictive ability, model confidence set) need every candidate to forecast the same keys`,
        { file: pair.file },
      );
    }
  }
  return {
    timestamps: reference,
    baseline: first.series.baseline,
    candidates: pairs.map((p) => p.series.candidate),
  };
}

function firstDifference(
  a: readonly string[],
  b: readonly string[],
  baseA: Float64Array,
  baseB: Float64Array,
): number | null {
  const n = Math.min(a.length, b.length);
  for (let i = 0; i < n; i++) {
    if (a[i] !== b[i] || !Object.is(baseA[i], baseB[i])) return i;
  }
  return a.length === b.length ? null : n;
}
