import type { LossSeries } from '../src/aggregation/lossSeries.js';
import type { RandomSource } from '../src/random/randomSource.js';

/**
 * The simulation design of DESIGN.md ("Why ewc is the default"): the forecast errors of both
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
}

export function simulateLossSeries(design: SimulationDesign, random: RandomSource): LossSeries {
  const { n, phi, innovationCorrelation: rho, candidateScale } = design;
  const normal = normalSampler(random);
  const stationarySd = 1 / Math.sqrt(1 - phi * phi);
  const mix = Math.sqrt(1 - rho * rho);
  let eb = stationarySd * normal();
  let ec = stationarySd * (rho * (eb / stationarySd) + mix * normal());
  const baseline = new Float64Array(n);
  const candidate = new Float64Array(n);
  for (let t = 0; t < n; t++) {
    if (t > 0) {
      const zb = normal();
      const zc = rho * zb + mix * normal();
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

/** E[d_t] = (s² − 1)·σ²/(1 − φ²) for squared loss: the true mean the intervals should cover. */
export function trueMeanDifferential(design: SimulationDesign): number {
  return (design.candidateScale ** 2 - 1) / (1 - design.phi * design.phi);
}

function normalSampler(random: RandomSource): () => number {
  let spare: number | null = null;
  return () => {
    if (spare !== null) {
      const s = spare;
      spare = null;
      return s;
    }
    const u = 1 - random.nextDouble();
    const v = random.nextDouble();
    const r = Math.sqrt(-2 * Math.log(u));
    spare = r * Math.sin(2 * Math.PI * v);
    return r * Math.cos(2 * Math.PI * v);
  };
}
