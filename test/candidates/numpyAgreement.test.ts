import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { sharedResampleDeviations } from '../../src/candidates/sharedResampleDeviations.js';
import { superiorAbilityTest } from '../../src/candidates/superiorAbilityTest.js';
import { mean } from '../../src/statistics/mean.js';
import { modelConfidenceSet } from '../../src/statistics/modelConfidenceSet.js';
import { co2Losses } from './co2Losses.js';
import { deviationsFromIndices, stationaryIndexMatrix } from './indexMatrix.js';

// Check values: test/candidates/spa_mcs_numpy.py, an independent numpy implementation
// (/usr/bin/python3, Debian's numpy) of Hansen (2005), White (2000) and Hansen, Lunde & Nason
// (2011), fed the index matrix written out below. Data: six rolling-origin forecasts of R's co2
// (test/reference/scripts/candidates_co2_rolling.R), squared error, n = 348 months.
// Tolerance 1e-9 absolute on p-values and statistics (the two sides sum in different orders:
// prefix sums against direct sums over the indices, so they differ by rounding only).
const B = 999;
const BLOCK = 6;
const SEED = 20260401;
const ALPHA = 0.1;
const TOLERANCE = 1e-9;

const dir = mkdtempSync(path.join(tmpdir(), 'skillgate-spa-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const { names, losses } = co2Losses();
const n = losses[0]!.length;
const indices = stationaryIndexMatrix(n, BLOCK, B, SEED);
const fromIndices = losses.map((x) => deviationsFromIndices(x, indices, B));

function runNumpy(): {
  spa: Record<'better' | 'worse', Record<string, number | number[]>>;
  mcs: Record<
    'range' | 'max',
    { order: number[]; steps: number[]; pvalues: number[]; members: number[] }
  >;
} {
  const indicesFile = path.join(dir, 'indices.txt');
  const rows: string[] = [];
  for (let b = 0; b < B; b++) rows.push(Array.from(indices.subarray(b * n, (b + 1) * n)).join(' '));
  writeFileSync(indicesFile, `${rows.join('\n')}\n`);
  const input = path.join(dir, 'input.json');
  const output = path.join(dir, 'output.json');
  writeFileSync(
    input,
    JSON.stringify({
      losses: losses.map((x) => Array.from(x)),
      indices_file: indicesFile,
      block_length: BLOCK,
      alpha: ALPHA,
    }),
  );
  execFileSync('/usr/bin/python3', [
    path.join(import.meta.dirname, 'spa_mcs_numpy.py'),
    input,
    output,
  ]);
  return JSON.parse(readFileSync(output, 'utf8'));
}

describe('k candidates against numpy on the same bootstrap indices (co2, 6 models)', () => {
  const reference = runNumpy();

  it('the engine draws exactly the index matrix written out, for every model alike', () => {
    const shared = sharedResampleDeviations(losses, {
      expectedBlockLength: BLOCK,
      resamples: B,
      seed: SEED,
    });
    for (let i = 0; i < losses.length; i++) {
      for (let b = 0; b < B; b++) {
        expect(Math.abs(shared[i]![b]! - fromIndices[i]![b]!)).toBeLessThan(1e-10);
      }
    }
    expect(names).toEqual(['naive', 'seasonal-naive', 'mean', 'drift', 'ses', 'seasonal-drift']);
  });

  for (const hypothesis of ['none-better', 'none-worse'] as const) {
    it(`SPA (${hypothesis}): statistic, lower, consistent and upper p-values, reality check`, () => {
      const expected = reference.spa[hypothesis === 'none-better' ? 'better' : 'worse'];
      const got = superiorAbilityTest(losses[0]!, losses.slice(1), fromIndices, BLOCK, hypothesis);
      expect(Math.abs(got.spa.statistic - (expected.statistic as number))).toBeLessThan(TOLERANCE);
      expect(Math.abs(got.spa.pValueLower - (expected.p_lower as number))).toBeLessThan(TOLERANCE);
      expect(Math.abs(got.spa.pValueConsistent - (expected.p_consistent as number))).toBeLessThan(
        TOLERANCE,
      );
      expect(Math.abs(got.spa.pValueUpper - (expected.p_upper as number))).toBeLessThan(TOLERANCE);
      (expected.adjusted as number[]).forEach((p, k) => {
        expect(Math.abs(got.spa.adjustedPValues[k]! - p)).toBeLessThan(TOLERANCE);
      });
      expect(Math.abs(got.realityCheck.statistic - (expected.rc_statistic as number))).toBeLessThan(
        TOLERANCE * Math.max(1, Math.abs(expected.rc_statistic as number)),
      );
      expect(Math.abs(got.realityCheck.pValue - (expected.rc_p as number))).toBeLessThan(TOLERANCE);
    });
  }

  for (const statistic of ['range', 'max'] as const) {
    it(`MCS (${statistic}): elimination order, step and MCS p-values, members at 90%`, () => {
      const expected = reference.mcs[statistic];
      const got = modelConfidenceSet({
        means: losses.map(mean),
        deviations: fromIndices,
        statistic,
        alpha: ALPHA,
      });
      expect(got.eliminationOrder).toEqual(expected.order);
      expected.steps.forEach((p, j) => {
        expect(Math.abs(got.stepPValues[j]! - p)).toBeLessThan(TOLERANCE);
      });
      expected.pvalues.forEach((p, i) => {
        expect(Math.abs(got.pValues[i]! - p)).toBeLessThan(TOLERANCE);
      });
      expect(got.members).toEqual(expected.members);
    });
  }

  it('the case is informative: some p-values are neither 1 nor the smallest possible', () => {
    const all = [
      ...reference.mcs.range.pvalues,
      ...reference.mcs.max.pvalues,
      reference.spa.better.p_consistent as number,
    ];
    expect(all.some((p) => p > 1 / (B + 1) && p < 1)).toBe(true);
    console.log(JSON.stringify({ names, spa: reference.spa, mcs: reference.mcs }));
  });
});
