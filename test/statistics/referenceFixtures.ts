import { readdirSync, readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

/** The reference folder written by test/reference/generate.sh. */
export const FIXTURES = join(
  dirname(fileURLToPath(import.meta.url)),
  '..',
  'reference',
  'fixtures',
);

export interface HacReference {
  estimator: 'bartlett' | 'uniform';
  usedEstimator: 'bartlett' | 'uniform';
  lagRule: 'auto' | 'horizon' | 'fixed';
  lag: number;
  longRunVariance: number;
  variance: number;
  statistic: number;
  pValue: number;
  pValueTwoSided: number;
  smallSample: {
    statistic: number;
    pValue: number;
    pValueTwoSided: number;
    degreesOfFreedom: number;
  };
  source: string;
  uniformLongRunVariance?: number;
}

/** One case of dm_reference.R / dm_reference.py: a loss differential and what R/statsmodels say. */
export interface DieboldMarianoReference {
  generator: string;
  name: string;
  dataset: string;
  loss: 'squared' | 'absolute';
  horizon: number;
  margin: number;
  n: number;
  d: number[];
  mean: number;
  autocovariances: { values: number[]; source: string };
  autoLag: {
    pilotLag: number;
    s0: number;
    s1: number;
    bandwidth: number;
    lag: number;
    source: string;
  };
  hac: HacReference[];
  ewc: {
    degreesOfFreedom: number;
    longRunVariance: number;
    variance: number;
    statistic: number;
    pValue: number;
    pValueTwoSided: number;
    source: string;
  };
}

/** Every dm_*.json case with a loss differential, sorted by file name. */
export function loadDieboldMarianoReferences(): { file: string; ref: DieboldMarianoReference }[] {
  return readdirSync(FIXTURES)
    .filter((f) => f.startsWith('dm_') && f.endsWith('.json'))
    .sort()
    .map((file) => ({ file, ref: JSON.parse(readFileSync(join(FIXTURES, file), 'utf8')) }))
    .filter(({ ref }) => Array.isArray(ref.d));
}

export interface DistributionReference {
  fn: string;
  call: string;
  args: number[];
  value: number;
}

export function loadDistributionReferences(): { source: string; values: DistributionReference[] } {
  return JSON.parse(readFileSync(join(FIXTURES, 'dm_distributions.json'), 'utf8'));
}
