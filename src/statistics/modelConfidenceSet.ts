/**
 * The model confidence set of Hansen, Lunde & Nason (2011, "The model confidence set",
 * Econometrica 79(2)), with the bootstrap implementation of their Section 3 on resamples drawn
 * once for all models (stationary bootstrap, Politis & Romano 1994).
 *
 * Notation: models i = 1..m with mean losses L̄_i; ζ*_b,i = L̄*_b,i − L̄_i the deviation of
 * resample b (the same blocks for every model). For the models M still in the set:
 *
 * - range statistic T_R: var̂(d̄_ij) = B⁻¹ Σ_b (ζ*_b,i − ζ*_b,j)², t_ij = (L̄_i − L̄_j)/√var̂(d̄_ij),
 *   T_R = max_{i,j∈M} |t_ij|, T*_R,b = max_{i,j∈M} |ζ*_b,i − ζ*_b,j|/√var̂(d̄_ij); the model
 *   eliminated is argmax_i max_{j∈M} t_ij.
 * - max statistic T_max: L̄_· and ζ*_b,· the averages over M; d̄_i· = L̄_i − L̄_·,
 *   var̂(d̄_i·) = B⁻¹ Σ_b (ζ*_b,i − ζ*_b,·)², t_i· = d̄_i·/√var̂(d̄_i·), T_max = max_i t_i·,
 *   T*_max,b = max_i (ζ*_b,i − ζ*_b,·)/√var̂(d̄_i·); the model eliminated is argmax_i t_i·.
 *
 * The test of H0,M (all models in M equally accurate) has p-value P_M = (1 + #{T*_b ≥ T})/(B + 1)
 * (the project's bootstrap p-value, decision 0005; the paper writes B⁻¹ #{T*_b > T}); "≥" allows
 * a relative 10⁻¹⁰ for rounding (see `reaches`). The
 * procedure tests and eliminates until one model is left; the MCS p-value of the model eliminated
 * at step j is max_{i≤j} P_M_i, and the last model's is 1. So MCS p-values never decrease along
 * the elimination order. The set at level 1 − α is {i : p̂_i ≥ α} (the paper's definition).
 *
 * Conventions: variances divide by B (the paper's; the deviations are centred at the sample
 * means, not at their bootstrap average). A pair (or model, for T_max) whose variance is 0 has
 * identical losses to the others concerned and contributes 0 to the statistic and its resamples.
 * Ties in an argmax go to the model listed first: with continuous losses they have probability 0,
 * and outside ties the result does not depend on the order in which models are listed.
 */
export const CONFIDENCE_SET_STATISTICS = ['range', 'max'] as const;
export type ConfidenceSetStatistic = (typeof CONFIDENCE_SET_STATISTICS)[number];

export interface ModelConfidenceSetInput {
  /** L̄_i per model. */
  readonly means: readonly number[];
  /** ζ*_b,i per model: B deviations each, resample b on the same blocks for every model. */
  readonly deviations: readonly Float64Array[];
  readonly statistic: ConfidenceSetStatistic;
  /** α: the set at level 1 − α keeps the models whose MCS p-value is ≥ α. */
  readonly alpha: number;
}

export interface ModelConfidenceSetResult {
  /** Model indices in the order they were eliminated; the last is the one never eliminated. */
  readonly eliminationOrder: readonly number[];
  /** P_M of the test at each step of the order (the last step's is 1: nothing left to test). */
  readonly stepPValues: readonly number[];
  /** The MCS p-value of each model, by model index. */
  readonly pValues: readonly number[];
  /** Model indices in the set at level 1 − α, in model order. */
  readonly members: readonly number[];
  readonly level: number;
  readonly statistic: ConfidenceSetStatistic;
}

export function modelConfidenceSet(input: ModelConfidenceSetInput): ModelConfidenceSetResult {
  const { means, deviations, statistic, alpha } = input;
  const m = means.length;
  if (m === 0 || deviations.length !== m) {
    throw new RangeError('the model confidence set needs one mean and one resample row per model');
  }
  if (!(alpha > 0 && alpha < 1)) throw new RangeError(`alpha must lie in (0, 1), got ${alpha}`);
  const resamples = deviations[0]!.length;
  const alive: number[] = means.map((_, i) => i);
  const order: number[] = [];
  const stepPValues: number[] = [];
  const pValues = new Array<number>(m).fill(1);
  let running = 0;
  while (alive.length > 1) {
    const input = { alive, means, deviations, resamples };
    const step = statistic === 'range' ? rangeStep(input) : maxStep(input);
    const pValue = (1 + step.exceedances) / (resamples + 1);
    running = Math.max(running, pValue);
    order.push(step.eliminate);
    stepPValues.push(pValue);
    pValues[step.eliminate] = running;
    alive.splice(alive.indexOf(step.eliminate), 1);
  }
  order.push(alive[0]!);
  stepPValues.push(1);
  pValues[alive[0]!] = 1;
  return {
    eliminationOrder: order,
    stepPValues,
    pValues,
    members: pValues.flatMap((p, i) => (p >= alpha ? [i] : [])),
    level: 1 - alpha,
    statistic,
  };
}

/**
 * T*_b counts as reaching T when T*_b ≥ T·(1 − 10⁻¹⁰): a resample statistic equal to T in exact
 * arithmetic (common with discrete losses) must not be decided by the order of a floating-point
 * sum, which depends on the order the models are listed in.
 */
function reaches(resampled: number, observed: number): boolean {
  return resampled >= observed - Math.abs(observed) * 1e-10;
}

/** One elimination step's data: the models still in the set, all means and resample deviations. */
interface StepInput {
  readonly alive: readonly number[];
  readonly means: readonly number[];
  readonly deviations: readonly Float64Array[];
  readonly resamples: number;
}

interface Step {
  readonly eliminate: number;
  readonly exceedances: number;
}

function rangeStep({ alive, means, deviations, resamples }: StepInput): Step {
  const size = alive.length;
  const pairs: { i: number; j: number; scale: number }[] = [];
  const worst = new Array<number>(size).fill(Number.NEGATIVE_INFINITY);
  let observed = 0;
  for (let a = 0; a < size; a++) {
    for (let c = a + 1; c < size; c++) {
      const zi = deviations[alive[a]!]!;
      const zj = deviations[alive[c]!]!;
      const variance = meanSquaredDifference(zi, zj, resamples);
      const t = variance > 0 ? (means[alive[a]!]! - means[alive[c]!]!) / Math.sqrt(variance) : 0;
      if (t > worst[a]!) worst[a] = t;
      if (-t > worst[c]!) worst[c] = -t;
      if (Math.abs(t) > observed) observed = Math.abs(t);
      if (variance > 0) pairs.push({ i: alive[a]!, j: alive[c]!, scale: 1 / Math.sqrt(variance) });
    }
  }
  let exceedances = 0;
  for (let b = 0; b < resamples; b++) {
    let max = 0;
    for (const { i, j, scale } of pairs) {
      const t = Math.abs(deviations[i]![b]! - deviations[j]![b]!) * scale;
      if (t > max) max = t;
    }
    if (reaches(max, observed)) exceedances++;
  }
  return { eliminate: alive[argmax(worst)]!, exceedances };
}

function maxStep({ alive, means, deviations, resamples }: StepInput): Step {
  const size = alive.length;
  const average = new Float64Array(resamples);
  for (const i of alive) {
    const z = deviations[i]!;
    for (let b = 0; b < resamples; b++) average[b]! += z[b]!;
  }
  for (let b = 0; b < resamples; b++) average[b]! /= size;
  let meanOfMeans = 0;
  for (const i of alive) meanOfMeans += means[i]!;
  meanOfMeans /= size;
  const scales = new Float64Array(size);
  const t = new Array<number>(size);
  for (let a = 0; a < size; a++) {
    const z = deviations[alive[a]!]!;
    const variance = meanSquaredDifference(z, average, resamples);
    scales[a] = variance > 0 ? 1 / Math.sqrt(variance) : 0;
    t[a] = (means[alive[a]!]! - meanOfMeans) * scales[a]!;
  }
  const observed = Math.max(...t);
  let exceedances = 0;
  for (let b = 0; b < resamples; b++) {
    let max = Number.NEGATIVE_INFINITY;
    for (let a = 0; a < size; a++) {
      const x = (deviations[alive[a]!]![b]! - average[b]!) * scales[a]!;
      if (x > max) max = x;
    }
    if (reaches(max, observed)) exceedances++;
  }
  return { eliminate: alive[argmax(t)]!, exceedances };
}

/**
 * (1/B) Σ_b (z_b − w_b)² over the first B resamples: the bootstrap variance of a statistic whose
 * resample deviations are z − w (divide by B, as Hansen, Lunde & Nason 2011 do).
 */
function meanSquaredDifference(z: Float64Array, w: Float64Array, resamples: number): number {
  let sum = 0;
  for (let b = 0; b < resamples; b++) {
    const x = z[b]! - w[b]!;
    sum += x * x;
  }
  return sum / resamples;
}

/** Index of the largest value, the first on ties. */
function argmax(values: readonly number[]): number {
  let best = 0;
  for (let i = 1; i < values.length; i++) if (values[i]! > values[best]!) best = i;
  return best;
}
