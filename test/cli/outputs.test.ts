import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { closestName, editDistance } from '../../src/cli/didYouMean.js';
import { jsonPieces } from '../../src/cli/outputs.js';
import { sampleReport } from '../action/sampleReport.js';

describe('jsonPieces', () => {
  it('gives exactly the bytes of JSON.stringify(value, null, 2)', () => {
    fc.assert(
      fc.property(fc.dictionary(fc.string(), fc.jsonValue()), (value) => {
        expect([...jsonPieces(value)].join('')).toBe(JSON.stringify(value, null, 2));
      }),
      { numRuns: 300 },
    );
  });

  it('drops undefined fields and writes undefined array items as null, as JSON.stringify does', () => {
    const value = { a: undefined, b: [1, undefined, { c: undefined }], d: [] };
    expect([...jsonPieces(value)].join('')).toBe(JSON.stringify(value, null, 2));
  });

  it('writes a report as JSON.stringify does', () => {
    const report = sampleReport() as unknown as Record<string, unknown>;
    expect([...jsonPieces(report)].join('')).toBe(JSON.stringify(report, null, 2));
  });
});

describe('did you mean', () => {
  const names = ['baseline', 'candidate', 'margin', 'margin-kind', 'json', 'markdown'];

  it('suggests the option one or two edits away', () => {
    expect(closestName('basline', names)).toBe('baseline');
    expect(closestName('margn', names)).toBe('margin');
    expect(closestName('jsn', names)).toBe('json');
    expect(closestName('marginkind', names)).toBe('margin-kind');
  });

  it('suggests nothing when no name is close', () => {
    expect(closestName('frobnicate', names)).toBeNull();
  });

  it('computes Levenshtein distances (textbook examples)', () => {
    // kitten → sitting is 3 (Levenshtein's classic example, from memory).
    expect(editDistance('kitten', 'sitting')).toBe(3);
    expect(editDistance('', 'abc')).toBe(3);
    expect(editDistance('flaw', 'lawn')).toBe(2);
  });
});
