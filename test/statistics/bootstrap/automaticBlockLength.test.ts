import { describe, expect, it } from 'vitest';
import {
  type AutomaticBlockLength,
  automaticBlockLength,
} from '../../../src/statistics/bootstrap/automaticBlockLength.js';
import { flatTop } from '../../../src/statistics/bootstrap/flatTopWindow.js';
import { readFixture, readSeries } from './bootstrapFixtures.js';

type Reference = Omit<AutomaticBlockLength, 'notes'> & { series: string };

const integerFields = ['n', 'runLength', 'maxLag', 'maxBlockLength', 'bandwidth'] as const;
const realFields = [
  'criticalValue',
  'gHat',
  'spectralSum',
  'd',
  'unclamped',
  'blockLength',
] as const;

describe('automaticBlockLength (Politis & White 2004; Patton, Politis & White 2009)', () => {
  it('agrees with the independent numpy implementation to 1e-6 (relative) on open data and an AR(1)', async () => {
    // Source: test/reference/scripts/bootstrap_block_length.py on bootstrap_series.json.
    const fixture = await readFixture<{ cases: Reference[] }>('bootstrap_block_length.json');
    expect(fixture.cases.map((c) => c.series)).toEqual([
      'nile_diff',
      'lynx_log',
      'sunspot_year',
      'co2_diff',
      'ar1_phi06',
    ]);
    for (const expected of fixture.cases) {
      const actual = automaticBlockLength(await readSeries(expected.series));
      const where = `${expected.series} (bootstrap_block_length.py)`;
      for (const field of integerFields) {
        expect(actual[field], `${where}: ${field}`).toBe(expected[field]);
      }
      expect(actual.runFound, `${where}: runFound`).toBe(expected.runFound);
      expect(actual.firstSmallLag, `${where}: firstSmallLag`).toBe(expected.firstSmallLag);
      for (const field of realFields) {
        const e = expected[field] as number;
        const a = actual[field] as number;
        const relative = Math.abs(a - e) / Math.max(Math.abs(e), 1e-300);
        expect(
          relative <= 1e-6,
          `${where}: ${field} expected ${e}, actual ${a}, relative difference ${relative}`,
        ).toBe(true);
      }
    }
  });

  it('covers a found run, no run, and the clamp at 1 among the reference cases', async () => {
    const fixture = await readFixture<{ cases: Reference[] }>('bootstrap_block_length.json');
    expect(fixture.cases.some((c) => c.runFound)).toBe(true);
    expect(fixture.cases.some((c) => !c.runFound)).toBe(true);
    expect(fixture.cases.some((c) => (c.unclamped ?? 2) < 1 && c.blockLength === 1)).toBe(true);
  });

  it('states K_N, m_max, b_max and the critical value as docs/design.md does (n = 1000)', () => {
    const d = Float64Array.from({ length: 1000 }, (_, t) => Math.sin(t * 1.3));
    const r = automaticBlockLength(d);
    expect(r.runLength).toBe(5); // max(5, ⌈log10 1000⌉ = 3)
    expect(r.maxLag).toBe(32 + 5); // ⌈√1000⌉ = 32
    expect(r.maxBlockLength).toBe(95); // ⌈min(3√1000 = 94.87, 333.3)⌉
    expect(r.criticalValue).toBe(2 * Math.sqrt(3 / 1000));
  });

  it('gives b = 1 with a note for constant and one-point series', () => {
    for (const d of [new Float64Array(50).fill(2), Float64Array.of(4)]) {
      const r = automaticBlockLength(d);
      expect(r.blockLength).toBe(1);
      expect(r.unclamped).toBeNull();
      expect(r.notes.length).toBe(1);
    }
  });

  it('uses the flat-top window of Politis & Romano (1995)', () => {
    expect([0, 0.25, 0.5, 0.75, 1, 1.5, -0.75].map(flatTop)).toEqual([1, 1, 1, 0.5, 0, 0, 0.5]);
  });
});
