import { createRandomSource, type SequentialRandomSourceFactory } from '../random/randomSource.js';
import type { ResampleRunner } from '../statistics/bootstrap/resampleJob.js';
import { stationaryResampleDeviations } from '../statistics/bootstrap/stationaryBootstrap.js';
import { mean } from '../statistics/mean.js';

/**
 * The stationary-bootstrap deviations L̄*_b,i − L̄_i of several loss series on ONE draw of
 * resample indices (Politis & Romano 1994): resample b takes the same blocks for every series,
 * as the superior-predictive-ability test (Hansen 2005) and the model confidence set (Hansen,
 * Lunde & Nason 2011) require. The blocks depend only on (n, b, B, seed), so calling the
 * project's public `stationaryResampleDeviations` once per series with the same seed gives every
 * series the same indices; a comparison's own bootstrap with the same seed and block length
 * draws them too. Differences of series resample linearly: the deviation of L_i − L_j is the
 * difference of their deviations.
 *
 * Conventions: every series has the same length n ≥ 2; row i of the result belongs to series i.
 */
export function sharedResampleDeviations(
  series: readonly Float64Array[],
  options: {
    readonly expectedBlockLength: number;
    readonly resamples: number;
    readonly seed: number;
  },
  random: SequentialRandomSourceFactory = createRandomSource,
  runner?: ResampleRunner,
): Float64Array[] {
  const n = series[0]?.length ?? 0;
  return series.map((x) => {
    if (x.length !== n) throw new RangeError('shared resamples need series of one length');
    return stationaryResampleDeviations(
      x,
      mean(x),
      options.expectedBlockLength,
      options.resamples,
      options.seed,
      random,
      runner,
    );
  });
}
