import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import {
  fluctuationCriticalValue,
  TABLE_MU,
} from '../../src/stability/fluctuationCriticalValues.js';

/**
 * The committed simulation of Table I (validation/fluctuation_table.py → validation/
 * fluctuationTable.json, 100,000 Brownian paths; comparison in docs/fluctuation-table.md).
 */
const simulation = JSON.parse(
  readFileSync(
    path.join(import.meta.dirname, '..', '..', 'validation', 'fluctuationTable.json'),
    'utf8',
  ),
);

describe('Table I of Giacomini & Rossi (2010) against the simulation', () => {
  for (const sides of ['one', 'two'] as const) {
    for (const alpha of [0.05, 0.1]) {
      it(`${sides}-sided α = ${alpha}: the published values match a grid of 500 steps within 0.04`, () => {
        const grid = simulation.sides[sides][String(alpha)].grid['500'];
        TABLE_MU.forEach((mu, i) => {
          const published = fluctuationCriticalValue(mu, alpha, sides)!;
          // 0.04 ≈ 6 of our standard errors (≤ 0.0065); the published table carries its own
          // Monte Carlo and grid error, unknown here.
          expect(Math.abs(grid.quantile[i] - published)).toBeLessThan(0.04);
        });
      });
    }
    it(`${sides}-sided α = 0.01 is the simulation's 500-step grid`, () => {
      const grid = simulation.sides[sides]['0.01'].grid['500'];
      TABLE_MU.forEach((mu, i) => {
        expect(fluctuationCriticalValue(mu, 0.01, sides)).toBe(grid.quantile[i]);
      });
    });
  }
  it('the continuous limit lies above every published value (a finer grid finds higher suprema)', () => {
    for (const sides of ['one', 'two'] as const) {
      for (const alpha of [0.05, 0.1]) {
        const limit = simulation.sides[sides][String(alpha)].continuousLimit.quantile;
        TABLE_MU.forEach((mu, i) => {
          expect(limit[i]).toBeGreaterThan(fluctuationCriticalValue(mu, alpha, sides)!);
        });
      }
    }
  });
});
