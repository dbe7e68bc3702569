import type { LossSeries } from '../src/aggregation/lossSeries.js';
import type { RandomSource } from '../src/random/randomSource.js';
import { normalSampler } from './normalSampler.js';

/**
 * Designs of the interval-coverage study (docs/validation.md, "Coverage"): both models' forecast
 * errors are AR(1), e_t = φ e_{t−1} + σ_t ε_t, with innovations correlated ρ between the models,
 * squared loss, one series. Variants beyond the validation designs (φ = 0.6, ρ ∈ {0.5, 0.8}):
 * stronger dependence (φ = 0.9), heavy tails (ε Student t with 3 degrees of freedom scaled to
 * unit variance, so the losses have no finite variance), and a variance that doubles halfway
 * (σ_t² = 1 in the first half, 2 in the second). The candidate's error is the baseline-like error
 * scaled by `candidateScale`, so the true relative change is candidateScale² − 1 in every design.
 * Normal draws by Box & Muller (1958); t(3) as z / √(χ²₃/3).
 */
export interface CoverageDesign {
  readonly label: string;
  readonly n: number;
  readonly phi: number;
  readonly innovationCorrelation: number;
  readonly candidateScale: number;
  readonly innovations: 'normal' | 't3';
  readonly varianceBreak: boolean;
}

export function simulateCoverageSeries(design: CoverageDesign, random: RandomSource): LossSeries {
  const { n, phi, innovationCorrelation: rho, candidateScale } = design;
  const normal = normalSampler(random);
  const draw =
    design.innovations === 'normal'
      ? normal
      : () => {
          const z = normal();
          const a = normal();
          const b = normal();
          const c = normal();
          return z / Math.sqrt((a * a + b * b + c * c) / 3) / Math.sqrt(3);
        };
  const mix = Math.sqrt(1 - rho * rho);
  const sd = (t: number) => (design.varianceBreak && t >= n / 2 ? Math.SQRT2 : 1);
  const stationary = 1 / Math.sqrt(1 - phi * phi);
  const z0 = draw();
  let eb = stationary * z0;
  let ec = stationary * (rho * z0 + mix * draw());
  const baseline = new Float64Array(n);
  const candidate = new Float64Array(n);
  for (let t = 0; t < n; t++) {
    if (t > 0) {
      const zb = draw();
      const zc = rho * zb + mix * draw();
      eb = phi * eb + sd(t) * zb;
      ec = phi * ec + sd(t) * zc;
    }
    baseline[t] = eb * eb;
    const c = candidateScale * ec;
    candidate[t] = c * c;
  }
  const time = Int32Array.from({ length: n }, (_, t) => t);
  return { time, baseline, candidate, rows: new Int32Array(n).fill(1), rowCount: n, maxHorizon: 1 };
}

/**
 * The estimands: E[L_c − L_b] and E[L_c]/E[L_b] − 1 averaged over the n time points, from the
 * exact error variances v_t = φ² v_{t−1} + σ_t² (v_0 = 1/(1 − φ²)).
 */
export function coverageTruth(design: CoverageDesign): { difference: number; relative: number } {
  const { n, phi, candidateScale: s } = design;
  let v = 1 / (1 - phi * phi);
  let sum = 0;
  for (let t = 0; t < n; t++) {
    if (t > 0) v = phi * phi * v + (design.varianceBreak && t >= n / 2 ? 2 : 1);
    sum += v;
  }
  const meanLoss = sum / n;
  return { difference: (s * s - 1) * meanLoss, relative: s * s - 1 };
}

/** The study's designs at one n: the validation designs, then the three harder variants. */
export function coverageDesigns(n: number): CoverageDesign[] {
  const base = { n, phi: 0.6, innovationCorrelation: 0.5, innovations: 'normal' as const };
  const designs: CoverageDesign[] = [];
  for (const candidateScale of [1, 1.2]) {
    const tag = candidateScale === 1 ? 'equal' : 'scale 1.2';
    designs.push(
      { ...base, label: `φ 0.6, ρ 0.5, ${tag}`, candidateScale, varianceBreak: false },
      {
        ...base,
        label: `φ 0.6, ρ 0.8, ${tag}`,
        innovationCorrelation: 0.8,
        candidateScale,
        varianceBreak: false,
      },
      { ...base, label: `φ 0.9, ρ 0.5, ${tag}`, phi: 0.9, candidateScale, varianceBreak: false },
      {
        ...base,
        label: `t(3) tails, ${tag}`,
        innovations: 't3',
        candidateScale,
        varianceBreak: false,
      },
      { ...base, label: `variance doubles, ${tag}`, candidateScale, varianceBreak: true },
    );
  }
  return designs;
}
