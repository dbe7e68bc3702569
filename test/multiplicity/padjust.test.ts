import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { benjaminiHochbergAdjust } from '../../src/multiplicity/benjaminiHochbergAdjust.js';
import { holmAdjust } from '../../src/multiplicity/holmAdjust.js';
import { expectClose } from '../helpers/tolerance.js';

const adjustments = [
  ['holm', holmAdjust],
  ['bh', benjaminiHochbergAdjust],
] as const;

describe('worked examples (by hand from the formulas in the doc comments)', () => {
  it('Holm: m = 3, sorted 0.01, 0.03, 0.04 → 3·0.01, 2·0.03, max(0.06, 1·0.04)', () => {
    const got = holmAdjust([0.01, 0.04, null, 0.03]);
    expect(got[2]).toBeNull();
    [0.03, 0.06, null, 0.06].forEach((e, i) => {
      if (e !== null)
        expectClose(got[i]!, e, { relative: 1e-15, absolute: 1e-15 }, `holm position ${i + 1}`);
    });
  });
  it('BH: m = 3, sorted 0.01, 0.03, 0.04 → 3·0.01, min(1.5·0.03, 0.04), 1·0.04', () => {
    const got = benjaminiHochbergAdjust([0.01, 0.04, null, 0.03]);
    expect(got[2]).toBeNull();
    [0.03, 0.04, null, 0.04].forEach((e, i) => {
      if (e !== null)
        expectClose(got[i]!, e, { relative: 1e-15, absolute: 1e-15 }, `bh position ${i + 1}`);
    });
  });
  it('caps at 1', () => {
    expect(holmAdjust([0.6, 0.7])).toEqual([1, 1]);
    // sorted 0.9, 0.95, 1: 3·0.9, 1.5·0.95 and 1·1, then the running minimum from the top: all 1.
    expect(benjaminiHochbergAdjust([0.9, 1, 0.95])).toEqual([1, 1, 1]);
    // 2·0.4 = 0.8 stays below 1·0.9.
    expect(benjaminiHochbergAdjust([0.4, 0.9])).toEqual([0.8, 0.9]);
  });
  it.each(adjustments)('%s: empty, all-null and single families', (_, adjust) => {
    expect(adjust([])).toEqual([]);
    expect(adjust([null, null])).toEqual([null, null]);
    expect(adjust([null, 0.2])).toEqual([null, 0.2]);
  });
  it.each(adjustments)(
    '%s: rejects p-values outside [0, 1] and NaN, naming the position',
    (_, adjust) => {
      expect(() => adjust([0.1, 1.5])).toThrow(/p-value 2 is 1.5/);
      expect(() => adjust([-0.1])).toThrow(RangeError);
      expect(() => adjust([0.2, Number.NaN])).toThrow(/p-value 2 is NaN/);
    },
  );
});

// p-values with nulls, and many ties (drawn from a small set) half of the time.
const pValue = fc.oneof(
  fc.double({ min: 0, max: 1, noNaN: true }),
  fc.constantFrom(0, 1e-300, 0.01, 0.05, 0.5, 1),
);
const family = fc.array(fc.option(pValue, { nil: null, freq: 5 }), { maxLength: 40 });

describe.each(adjustments)('%s, properties', (name, adjust) => {
  it('keeps nulls in place, never goes below the raw p-value nor above 1', () => {
    fc.assert(
      fc.property(family, (p) => {
        const q = adjust(p);
        expect(q.length).toBe(p.length);
        p.forEach((raw, i) => {
          const context = `${name} input ${JSON.stringify(p)} → ${JSON.stringify(q)} at ${i}`;
          if (raw === null) {
            expect(q[i], context).toBeNull();
            return;
          }
          expect(q[i], context).toBeGreaterThanOrEqual(raw);
          expect(q[i], context).toBeLessThanOrEqual(1);
        });
      }),
    );
  });
  it('is monotone in the raw p-values: p_i ≤ p_j implies p̃_i ≤ p̃_j (ties equal)', () => {
    fc.assert(
      fc.property(family, (p) => {
        const q = adjust(p);
        for (let i = 0; i < p.length; i++) {
          for (let j = 0; j < p.length; j++) {
            const pi = p[i];
            const pj = p[j];
            if (pi === null || pj === null || pi === undefined || pj === undefined) continue;
            const context = `${name} input ${JSON.stringify(p)} → ${JSON.stringify(q)}; ${i}, ${j}`;
            if (pi <= pj) expect(q[i]!, context).toBeLessThanOrEqual(q[j]!);
          }
        }
      }),
    );
  });
  it('is permutation equivariant: adjusting a shuffled family shuffles the result', () => {
    fc.assert(
      fc.property(
        family.chain((p) =>
          fc.tuple(
            fc.constant(p),
            fc.shuffledSubarray(
              p.map((_, i) => i),
              { minLength: p.length },
            ),
          ),
        ),
        ([p, perm]) => {
          const q = adjust(p);
          const shuffled = adjust(perm.map((k) => p[k]!));
          expect(shuffled, `${name} input ${JSON.stringify(p)}, permutation ${perm}`).toEqual(
            perm.map((k) => q[k]),
          );
        },
      ),
    );
  });
  it('ignores nulls: the non-null results equal the adjustment of the non-null p-values', () => {
    fc.assert(
      fc.property(family, (p) => {
        const q = adjust(p).filter((v) => v !== null);
        expect(q).toEqual(adjust(p.filter((v) => v !== null)));
      }),
    );
  });
});

describe('Holm against Benjamini–Hochberg', () => {
  it('BH never exceeds Holm, and both equal the raw p-value for a single test', () => {
    fc.assert(
      fc.property(family, (p) => {
        const holm = holmAdjust(p);
        const bh = benjaminiHochbergAdjust(p);
        bh.forEach((v, i) => {
          if (v !== null)
            expect(v, `input ${JSON.stringify(p)} at ${i}`).toBeLessThanOrEqual(holm[i]!);
        });
      }),
    );
    fc.assert(
      fc.property(pValue, (p) => {
        expect(holmAdjust([p])).toEqual([p]);
        expect(benjaminiHochbergAdjust([p])).toEqual([p]);
      }),
    );
  });
});
