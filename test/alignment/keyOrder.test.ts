import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { sortByKey } from '../../src/alignment/keyOrder.js';

/** Rows of a key with 1–3 components of cardinality 1–5, sometimes already in key order. */
const cases = fc
  .tuple(fc.array(fc.integer({ min: 1, max: 5 }), { minLength: 1, maxLength: 3 }), fc.boolean())
  .chain(([cardinalities, presorted]) =>
    fc
      .array(fc.tuple(...cardinalities.map((c) => fc.integer({ min: 0, max: c - 1 }))), {
        maxLength: 60,
      })
      .map((rows) => ({
        cardinalities,
        rows: presorted ? [...rows].sort(lexicographic) : rows,
      })),
  );

function lexicographic(a: readonly number[], b: readonly number[]): number {
  for (let k = 0; k < a.length; k++) if (a[k] !== b[k]) return a[k]! - b[k]!;
  return 0;
}

describe('sortByKey', () => {
  it('is the stable sort by key, and carries the codes along in key order', () => {
    fc.assert(
      fc.property(cases, ({ cardinalities, rows }) => {
        const components = cardinalities.map((cardinality, k) => ({
          values: Int32Array.from(rows, (r) => r[k]!),
          cardinality,
        }));
        // Mixed-radix codes, as keyCodes makes them.
        const codes = Uint32Array.from(rows, (r) =>
          r.reduce((code, id, k) => code * cardinalities[k]! + id, 0),
        );
        const expected = rows
          .map((_, i) => i)
          .sort((a, b) => lexicographic(rows[a]!, rows[b]!) || a - b);
        const withCodes = sortByKey(rows.length, components, codes);
        expect(Array.from(withCodes.order)).toEqual(expected);
        expect(Array.from(withCodes.sorted!)).toEqual(expected.map((i) => codes[i]));
        const alone = sortByKey(rows.length, components);
        expect(Array.from(alone.order)).toEqual(expected);
        expect(alone.sorted).toBeNull();
      }),
      { numRuns: 500 },
    );
  });
});
