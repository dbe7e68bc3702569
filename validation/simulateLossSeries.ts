import type { LossSeries } from '../src/aggregation/lossSeries.js';
import type { RandomSource } from '../src/random/randomSource.js';
import { normalSampler } from './normalSampler.js';

/**
 * The simulation design of docs/design.md ("Why ewc is the default"): the forecast errors of both
 * models are AR(1) with φ = 0.6, e_t = φ e_{t−1} + σ ε_t, with innovations correlated ρ between
 * the models (they forecast the same target and share its surprises), started from the stationary
 * distribution. Equal accuracy: both σ = 1; the power alternative scales the candidate's error by
 * `candidateScale` (1.2: a 20% larger error scale). Losses are squared errors, one series, one row
 * per time point. Normal draws by the Box–Muller transform (Box & Muller 1958) from the injected
 * uniform source.
 */
export interface SimulationDesign {
  readonly n: number;
  readonly phi: number;
  readonly innovationCorrelation: number;
  readonly candidateScale: number;
  /**
   * 'normal' (default) or 't3': Student t with 3 degrees of freedom, z/√(χ²₃/3) with χ²₃ the sum
   * of three squared normals, scaled by 1/√3 to unit variance (heavy tails: E[e⁴] is infinite,
   * so the squared-loss differential has no finite variance).
   */
  readonly innovations?: 'normal' | 't3';
  /** When true, the innovation standard deviation of both models doubles from t = ⌊n/2⌋ on. */
  readonly varianceBreak?: boolean;
}

export function simulateLossSeries(design: SimulationDesign, random: RandomSource): LossSeries {
  const { n, phi, innovationCorrelation: rho, candidateScale } = design;
  const gaussian = normalSampler(random);
  const normal = design.innovations === 't3' ? studentT3Sampler(gaussian) : gaussian;
  const breakAt = design.varianceBreak === true ? Math.floor(n / 2) : n;
  const stationarySd = 1 / Math.sqrt(1 - phi * phi);
  const mix = Math.sqrt(1 - rho * rho);
  let eb = stationarySd * normal();
  let ec = stationarySd * (rho * (eb / stationarySd) + mix * normal());
  const baseline = new Float64Array(n);
  const candidate = new Float64Array(n);
  for (let t = 0; t < n; t++) {
    if (t > 0) {
      const scale = t >= breakAt ? 2 : 1;
      const zb = scale * normal();
      const zc = rho * zb + scale * mix * normal();
      eb = phi * eb + zb;
      ec = phi * ec + zc;
    }
    baseline[t] = eb * eb;
    const c = candidateScale * ec;
    candidate[t] = c * c;
  }
  const time = new Int32Array(n);
  for (let t = 0; t < n; t++) time[t] = t;
  return { time, baseline, candidate, rows: new Int32Array(n).fill(1), rowCount: n, maxHorizon: 1 };
}

/**
 * E[d_t] = (s² − 1)·σ²/(1 − φ²) for squared loss: the true mean the intervals should cover (for
 * the designs with a variance break, the mean over t differs, but is 0 under equal accuracy).
 */
export function trueMeanDifferential(design: SimulationDesign): number {
  return (design.candidateScale ** 2 - 1) / (1 - design.phi * design.phi);
}

/** Unit-variance Student t with 3 degrees of freedom from a normal sampler (see SimulationDesign). */
function studentT3Sampler(normal: () => number): () => number {
  return () => {
    const z = normal();
    const a = normal();
    const b = normal();
    const c = normal();
    return z / Math.sqrt(a * a + b * b + c * c); // = (z/√(χ²₃/3))/√3
  };
}
