import { commonBlockLength } from '../src/candidates/commonBlockLength.js';
import { sharedResampleDeviations } from '../src/candidates/sharedResampleDeviations.js';
import { superiorAbilityTest } from '../src/candidates/superiorAbilityTest.js';
import { createRandomSource, type RandomSource } from '../src/random/randomSource.js';
import { mean } from '../src/statistics/mean.js';
import { modelConfidenceSet } from '../src/statistics/modelConfidenceSet.js';
import { normalSampler } from './normalSampler.js';

/**
 * The several-candidates study behind docs/validation.md ("Several candidates"): a baseline and
 * k candidates whose forecast errors are AR(1), e_i,t = φ e_i,t−1 + σ_i ε_i,t with φ = 0.6, the
 * innovations equicorrelated ρ across models (ε_i = √ρ z_t + √(1 − ρ) u_i,t: all models forecast
 * one target and share its surprises), started from the stationary distribution; squared loss.
 * Equal accuracy: every σ_i = 1. Power: candidate 1 has σ = `betterScale` < 1.
 * Each replication runs the code the gate runs: one block length for all (commonBlockLength),
 * one shared draw (sharedResampleDeviations), the SPA test in both directions and the model
 * confidence set with both statistics.
 */
export interface CandidatesDesign {
  readonly n: number;
  readonly candidates: number;
  readonly phi: number;
  readonly correlation: number;
  /** σ of candidate 1 (1: all equal). */
  readonly betterScale: number;
  /** A fixed expected block length instead of the automatic one. */
  readonly blockLength?: number;
}

export interface CandidatesResult {
  readonly design: CandidatesDesign;
  readonly replications: number;
  /** Rejection rates at α of the SPA test (consistent, lower, upper) and the reality check. */
  readonly spaBetter: { lower: number; consistent: number; upper: number; realityCheck: number };
  readonly spaWorse: { lower: number; consistent: number; upper: number; realityCheck: number };
  /** Per MCS statistic: share with every model in the set, share with candidate 1 in it, mean size. */
  readonly mcs: Record<
    'range' | 'max',
    { allIn: number; firstIn: number; onlyFirst: number; size: number }
  >;
}

export function runCandidatesStudy(
  design: CandidatesDesign,
  options: {
    replications: number;
    firstReplication: number;
    resamples: number;
    seed: number;
    alpha: number;
    setAlpha: number;
  },
): CandidatesResult {
  const zero = () => ({ lower: 0, consistent: 0, upper: 0, realityCheck: 0 });
  const spaBetter = zero();
  const spaWorse = zero();
  const mcs = {
    range: { allIn: 0, firstIn: 0, onlyFirst: 0, size: 0 },
    max: { allIn: 0, firstIn: 0, onlyFirst: 0, size: 0 },
  };
  const m = design.candidates + 1;
  for (let r = options.firstReplication; r < options.firstReplication + options.replications; r++) {
    const losses = simulate(design, createRandomSource(options.seed, r));
    const baseline = losses[0]!;
    const candidates = losses.slice(1);
    const block = commonBlockLength(
      baseline,
      candidates,
      design.blockLength === undefined
        ? { kind: 'auto' }
        : { kind: 'fixed', length: design.blockLength },
    );
    const deviations = sharedResampleDeviations(losses, {
      expectedBlockLength: block,
      resamples: options.resamples,
      seed: 1729,
    });
    for (const [hypothesis, counts] of [
      ['none-better', spaBetter],
      ['none-worse', spaWorse],
    ] as const) {
      const t = superiorAbilityTest(baseline, candidates, deviations, block, hypothesis);
      if (t.spa.pValueLower <= options.alpha) counts.lower++;
      if (t.spa.pValueConsistent <= options.alpha) counts.consistent++;
      if (t.spa.pValueUpper <= options.alpha) counts.upper++;
      if (t.realityCheck.pValue <= options.alpha) counts.realityCheck++;
    }
    const means = losses.map(mean);
    for (const statistic of ['range', 'max'] as const) {
      const set = modelConfidenceSet({ means, deviations, statistic, alpha: options.setAlpha });
      const c = mcs[statistic];
      if (set.members.length === m) c.allIn++;
      if (set.members.includes(1)) c.firstIn++;
      if (set.members.length === 1 && set.members[0] === 1) c.onlyFirst++;
      c.size += set.members.length;
    }
  }
  const reps = options.replications;
  const scale = <T extends Record<string, number>>(x: T): T =>
    Object.fromEntries(Object.entries(x).map(([k, v]) => [k, v / reps])) as T;
  return {
    design,
    replications: reps,
    spaBetter: scale(spaBetter),
    spaWorse: scale(spaWorse),
    mcs: { range: scale(mcs.range), max: scale(mcs.max) },
  };
}

function simulate(design: CandidatesDesign, random: RandomSource): Float64Array[] {
  const { n, candidates, phi, correlation, betterScale } = design;
  const m = candidates + 1;
  const normal = normalSampler(random);
  const stationary = 1 / Math.sqrt(1 - phi * phi);
  const shared = Math.sqrt(correlation);
  const own = Math.sqrt(1 - correlation);
  const errors = new Float64Array(m);
  const losses = Array.from({ length: m }, () => new Float64Array(n));
  for (let t = 0; t < n; t++) {
    const z = normal();
    for (let i = 0; i < m; i++) {
      const innovation = shared * z + own * normal();
      errors[i] = t === 0 ? stationary * innovation : phi * errors[i]! + innovation;
      const e = (i === 1 ? betterScale : 1) * errors[i]!;
      losses[i]![t] = e * e;
    }
  }
  return losses;
}

/** Merges the results of parts of the replications (weighted by their counts). */
export function mergeCandidatesResults(parts: readonly CandidatesResult[]): CandidatesResult {
  const total = parts.reduce((s, p) => s + p.replications, 0);
  const avg = <T extends Record<string, number>>(pick: (p: CandidatesResult) => T): T => {
    const keys = Object.keys(pick(parts[0]!));
    return Object.fromEntries(
      keys.map((k) => [k, parts.reduce((s, p) => s + pick(p)[k]! * p.replications, 0) / total]),
    ) as T;
  };
  return {
    design: parts[0]!.design,
    replications: total,
    spaBetter: avg((p) => p.spaBetter),
    spaWorse: avg((p) => p.spaWorse),
    mcs: { range: avg((p) => p.mcs.range), max: avg((p) => p.mcs.max) },
  };
}

/** The "Several candidates" section of docs/validation.md. */
export function renderCandidatesSection(
  results: readonly CandidatesResult[],
  run: {
    replications: number;
    resamples: number;
    seconds: number;
    threads: number;
    seed: number;
    alpha: number;
    setAlpha: number;
  },
): string {
  const pct = (x: number) => `${(100 * x).toFixed(1)}%`;
  const se = (p: number) => (100 * 1.96 * Math.sqrt((p * (1 - p)) / run.replications)).toFixed(1);
  const first = results[0]!.design;
  const lines = [
    '## Several candidates: SPA test and model confidence set',
    '',
    'Generated by `npm run validate -- --candidates-only` (validation/candidatesStudy.ts); do not edit by hand.',
    '',
    `Design: a baseline and ${first.candidates} candidates (${first.candidates + 1} models), errors AR(1) with φ = ${first.phi},`,
    `innovations equicorrelated ρ = ${first.correlation} across models, squared loss. Size: all models equally accurate.`,
    'Power: candidate 1 has error scale σ < 1 (σ = 0.8: expected loss 64% of the others).',
    `${run.replications} replications per design (replication r: random stream r of seed ${run.seed}); ${run.resamples}`,
    'shared resamples per replication (seed 1729), one automatic block length for all models',
    `(average of the Politis–White choices). SPA and reality check one-sided at α = ${run.alpha}; model`,
    `confidence set at α = ${run.setAlpha} (a ${pct(1 - run.setAlpha)} set). Run on ${run.threads} worker threads in ${run.seconds.toFixed(0)} s.`,
    `Monte Carlo half-width (95%) of a ${pct(run.alpha)} rate: ±${se(run.alpha)} points; of a ${pct(1 - run.setAlpha)} rate: ±${se(run.setAlpha)} points.`,
    '',
    '### SPA test: rejection rates',
    '',
    '| n | candidate 1 σ | H0 | lower | consistent | upper | reality check |',
    '|---:|---:|---|---:|---:|---:|---:|',
  ];
  for (const r of results) {
    for (const [label, x] of [
      ['no candidate better', r.spaBetter],
      ['no candidate worse', r.spaWorse],
    ] as const) {
      lines.push(
        `| ${r.design.n} | ${r.design.betterScale} | ${label} | ${pct(x.lower)} | ${pct(x.consistent)} | ${pct(x.upper)} | ${pct(x.realityCheck)} |`,
      );
    }
  }
  lines.push(
    '',
    'With σ = 1 every rate is the size (H0 holds with equality for every candidate, the least',
    'favourable case); with σ < 1 the "no candidate better" row is the power and the "no candidate',
    'worse" row is the size under an interior null (the better candidate only makes H0 easier).',
    '',
    '### Model confidence set',
    '',
    '| n | candidate 1 σ | statistic | all models in the set | candidate 1 in the set | set = {candidate 1} | mean size |',
    '|---:|---:|---|---:|---:|---:|---:|',
  );
  for (const r of results) {
    for (const statistic of ['range', 'max'] as const) {
      const c = r.mcs[statistic];
      lines.push(
        `| ${r.design.n} | ${r.design.betterScale} | ${statistic === 'range' ? 'T_R' : 'T_max'} | ${pct(c.allIn)} | ${pct(c.firstIn)} | ${pct(c.onlyFirst)} | ${c.size.toFixed(2)} |`,
      );
    }
  }
  lines.push(
    '',
    'With σ = 1 "all models in the set" is the coverage (every model is among the best); with σ < 1',
    'the best model is candidate 1 alone, so "candidate 1 in the set" is the coverage and',
    '"set = {candidate 1}" the power.',
    '',
  );
  return `${lines.join('\n')}\n`;
}
