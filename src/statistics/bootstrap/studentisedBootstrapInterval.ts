import {
  createRandomSource,
  type SequentialRandomSourceFactory,
} from '../../random/randomSource.js';
import { ewcLongRunVariance } from '../ewcLongRunVariance.js';
import { mean } from '../mean.js';
import { tailOrderStatistic, tailProbability } from './basicBootstrapInference.js';
import { forEachStationaryResample } from './eachStationaryResample.js';

/**
 * Studentised stationary-bootstrap interval for E[d] with the fixed-b (ewc) studentisation
 * recomputed in every resample (the fixed-b bootstrap of Gonçalves & Vogelsang 2011,
 * Econometric Theory 27, applied to the stationary bootstrap of Politis & Romano 1994):
 *
 *   t*_b = (d̄*_b − d̄) / √(ω̂*²_b / n),   interval [d̄ − t*_(B+1−k)·SE, d̄ − t*_(k)·SE],
 *
 * SE = √(ω̂²/n) from the data, ω̂*² the ewc estimate (same ν) of the resampled series, k = k(a) the
 * (B + 1)-order-statistic rule of `basicBootstrapInference` at a = (1 − level)/2. Same blocks and
 * random streams as `stationaryBootstrap` (resample b from stream ⌊b/256⌋).
 *
 * Cost O(B·n·ν): the ν cosine projections of each resample come from a ν × n table computed once
 * (the cosines are orthogonal to constants, so each resample is centred at d̄ only to keep
 * rounding small). Measured and rejected in docs/decisions/0011-intervals-from-the-tests.md; not used
 * by the gate.
 */
export function studentisedBootstrapInterval(
  d: Float64Array,
  options: {
    readonly resamples: number;
    readonly expectedBlockLength: number;
    readonly seed: number;
    readonly level: number;
    readonly degreesOfFreedom: number;
  },
  random: SequentialRandomSourceFactory = createRandomSource,
): { lower: number; upper: number } | null {
  const n = d.length;
  const { resamples, expectedBlockLength, seed, level, degreesOfFreedom: nu } = options;
  if (n < 3 || nu > n - 1) return null;
  const centre = mean(d);
  const omega = ewcLongRunVariance(d, nu).value;
  if (!(omega > 0)) return null;
  const se = Math.sqrt(omega / n);
  const table = new Float64Array(nu * n);
  const scale = Math.sqrt(2 / n);
  for (let j = 1; j <= nu; j++) {
    for (let t = 0; t < n; t++) {
      table[(j - 1) * n + t] = scale * Math.cos((Math.PI * j * (t + 0.5)) / n);
    }
  }
  const u = new Float64Array(n);
  const t = new Float64Array(resamples);
  forEachStationaryResample(n, expectedBlockLength, resamples, seed, random, (b, blocks) => {
    let k = 0;
    let sum = 0;
    for (let i = 0; i < blocks.count; i++) {
      let s = blocks.starts[i]!;
      for (let m = blocks.lengths[i]!; m > 0; m--) {
        const x = d[s]! - centre;
        u[k++] = x;
        sum += x;
        s = s + 1 === n ? 0 : s + 1;
      }
    }
    let squares = 0;
    for (let j = 0; j < nu; j++) {
      const row = j * n;
      let lambda = 0;
      for (let i = 0; i < n; i++) lambda += table[row + i]! * u[i]!;
      squares += lambda * lambda;
    }
    const seStar = Math.sqrt(squares / nu / n);
    t[b] =
      seStar > 0
        ? sum / n / seStar
        : sum === 0
          ? 0
          : sum > 0
            ? Number.POSITIVE_INFINITY
            : Number.NEGATIVE_INFINITY;
  });
  t.sort();
  const k = tailOrderStatistic(tailProbability(level) / 2, resamples);
  if (k < 1) return null;
  return { lower: centre - t[resamples - k]! * se, upper: centre - t[k - 1]! * se };
}
