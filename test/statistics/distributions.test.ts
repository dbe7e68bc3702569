import { describe, expect, it } from 'vitest';
import * as distributions from '../../src/statistics/distributions.js';
import { expectClose } from '../helpers/tolerance.js';
import { loadDistributionReferences } from './referenceFixtures.js';

const reference = loadDistributionReferences();
const functions: Record<string, (...args: number[]) => number> = {
  standardNormalCdf: distributions.standardNormalCdf,
  standardNormalUpperTail: distributions.standardNormalUpperTail,
  standardNormalTwoSided: distributions.standardNormalTwoSided,
  standardNormalQuantile: distributions.standardNormalQuantile,
  studentTCdf: distributions.studentTCdf,
  studentTUpperTail: distributions.studentTUpperTail,
  studentTTwoSided: distributions.studentTTwoSided,
  studentTQuantile: distributions.studentTQuantile,
};

describe(`distributions agree with ${reference.source} (dm_distributions.json), 1e-9 relative`, () => {
  it('covers every wrapper', () => {
    expect(new Set(reference.values.map((v) => v.fn))).toEqual(new Set(Object.keys(functions)));
  });

  it.each(reference.values)('$call', ({ fn, call, args, value }) => {
    const f = functions[fn];
    expect(f, fn).toBeDefined();
    expectClose(f!(...args), value, { relative: 1e-9 }, `${fn}(${args.join(', ')}) vs R ${call}`);
  });
});
