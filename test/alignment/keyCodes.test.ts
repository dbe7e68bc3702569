import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { alignPanel } from '../../src/alignment/alignPanel.js';
import { keyCodes } from '../../src/alignment/keyCodes.js';
import type { KeyColumns, KeyPart, KeyPartName } from '../../src/alignment/keyLayout.js';
import { parseForecastText } from '../../src/reading/forecastTableReader.js';

const NAMES: readonly KeyPartName[] = ['series', 'timestamp', 'horizon', 'origin', 'path'];

/** Key columns for rows given as tuples of part ids. */
function columns(rows: readonly number[][]): KeyColumns {
  const part = (k: number) => Int32Array.from(rows, (r) => r[k]!);
  return {
    size: rows.length,
    series: part(0),
    timestamp: part(1),
    horizon: part(2),
    origin: part(3),
    path: part(4),
  };
}

function lexicographic(a: readonly number[], b: readonly number[]): number {
  for (let k = 0; k < a.length; k++) if (a[k] !== b[k]) return a[k]! - b[k]!;
  return 0;
}

/**
 * Two key sets over five parts whose cardinalities are small (codes are mixed-radix numbers) or
 * many (their product is beyond 2^53: codes are ranks of the distinct keys).
 */
const keySets = fc
  .tuple(fc.boolean(), fc.array(fc.integer({ min: 1, max: 4 }), { minLength: 5, maxLength: 5 }))
  .chain(([huge, small]) => {
    // 2^11 ids per part: 2^55 combinations.
    const cardinalities = huge ? [2 ** 11, 2 ** 11, 2 ** 11, 2 ** 11, 2 ** 11] : small;
    // Few distinct ids per part, so keys often tie, including the largest ids.
    const row = fc.tuple(
      ...cardinalities.map((c) =>
        fc.constantFrom(...new Set([0, 1, c - 2, c - 1].filter((v) => v >= 0 && v < c))),
      ),
    );
    return fc.tuple(
      fc.constant(cardinalities),
      fc.array(row, { maxLength: 30 }),
      fc.array(row, { maxLength: 30 }),
    );
  });

describe('keyCodes', () => {
  it('codes compare as the keys do, part by part, across both files', () => {
    fc.assert(
      fc.property(keySets, ([cardinalities, a, b]) => {
        const parts: KeyPart[] = NAMES.map((name, k) => ({
          name,
          cardinality: cardinalities[k]!,
          label: String,
        }));
        const [codesA, codesB] = keyCodes(parts, [columns(a), columns(b)]);
        const all = [
          ...a.map((key, i) => ({ key, code: codesA![i]! })),
          ...b.map((key, i) => ({ key, code: codesB![i]! })),
        ];
        const wrong = [];
        for (const x of all) {
          for (const y of all) {
            if (Math.sign(x.code - y.code) !== Math.sign(lexicographic(x.key, y.key))) {
              wrong.push([x, y]);
            }
          }
        }
        expect(wrong.slice(0, 1)).toEqual([]);
      }),
      { numRuns: 300 },
    );
  });
});

describe('alignPanel with keys beyond 2^53 combinations', () => {
  // Every row has its own series, timestamp, horizon, origin and path: 1,800+ distinct values of
  // each, so the key has more than 1800^5 ≈ 1.9 · 10^16 > 2^53 combinations.
  const n = 1800;
  const text = (rows: number[], shift: number) =>
    'series,timestamp,horizon,origin,path,actual,prediction\n' +
    rows.map((i) => `s${i},${i + 1000},${i + 1},${i},p${i},${i % 7},${(i % 7) + shift}\n`).join('');
  const ids = Array.from({ length: n }, (_, i) => i);
  const own = Array.from({ length: 50 }, (_, i) => n + i);
  const baseline = parseForecastText(text(ids, 0.5), 'base.csv', { role: 'baseline' });
  const candidateRows = [...ids.filter((i) => i % 3 !== 0), ...own];
  const candidate = parseForecastText(text(candidateRows, -0.25), 'cand.csv', {
    role: 'candidate',
  });
  const reversed = parseForecastText(text([...candidateRows].reverse(), -0.25), 'cand.csv', {
    role: 'candidate',
  });

  it('matches exactly the common keys, in key order, whatever the row order', () => {
    const panel = alignPanel({ baseline, candidate });
    const common = ids.filter((i) => i % 3 !== 0);
    expect(panel.size).toBe(common.length);
    expect(panel.coverage.baselineOnly).toBe(n - common.length);
    expect(panel.coverage.candidateOnly).toBe(own.length);
    // Series names in code-unit order: s1, s10, s100, …
    const expected = common.map((i) => `s${i}`).sort();
    expect(Array.from(panel.series, (s) => panel.seriesNames[s])).toEqual(expected);
    for (let p = 0; p < panel.size; p++) {
      const i = Number(panel.seriesNames[panel.series[p]!]!.slice(1));
      expect(panel.horizon[p]).toBe(i + 1);
      expect(panel.paths[panel.path![p]!]).toBe(`p${i}`);
      expect(panel.candidate.prediction![p]).toBe((i % 7) - 0.25);
    }
    const again = alignPanel({ baseline, candidate: reversed });
    expect(again.series).toEqual(panel.series);
    expect(again.candidate.prediction).toEqual(panel.candidate.prediction);
  });
});
