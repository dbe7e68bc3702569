import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseDecimal, parseHorizon } from '../../src/reading/numbers.js';

describe('parseDecimal', () => {
  it('reads plain decimals, signs, fractions and exponents', () => {
    expect(parseDecimal('0')).toBe(0);
    expect(parseDecimal('-1.5')).toBe(-1.5);
    expect(parseDecimal('+2.')).toBe(2);
    expect(parseDecimal('.25')).toBe(0.25);
    expect(parseDecimal('1e3')).toBe(1000);
    expect(parseDecimal('-2.5E-2')).toBe(-0.025);
    expect(Object.is(parseDecimal('-0'), -0)).toBe(true);
  });

  it('rejects what Number() would quietly accept', () => {
    for (const text of [
      '',
      ' ',
      ' 1',
      '1 ',
      '0x10',
      '0b1',
      '0o7',
      'Infinity',
      '-Infinity',
      'NaN',
    ]) {
      expect(parseDecimal(text), JSON.stringify(text)).toBeNaN();
    }
    for (const text of ['1e400', '1,5', '1.2.3', '.', '-', '1e', 'abc']) {
      expect(parseDecimal(text), JSON.stringify(text)).toBeNaN();
    }
  });

  it('agrees bit for bit with Number() on decimal text (fast path included)', () => {
    const decimal = fc
      .tuple(
        fc.constantFrom('', '-', '+'),
        fc.stringMatching(/^[0-9]{1,12}$/),
        fc.option(fc.stringMatching(/^[0-9]{0,8}$/)),
        fc.option(fc.integer({ min: -30, max: 30 })),
      )
      .map(
        ([sign, int, frac, exp]) =>
          `${sign}${int}${frac === null ? '' : `.${frac}`}${exp === null ? '' : `e${exp}`}`,
      );
    fc.assert(
      fc.property(decimal, (text) => {
        expect(Object.is(parseDecimal(text), Number(text))).toBe(true);
      }),
      { numRuns: 2000 },
    );
    fc.assert(
      fc.property(fc.double({ noNaN: true, noDefaultInfinity: true }), (x) => {
        // String(-0) is "0", so compare with Number() of the same text rather than with x.
        expect(Object.is(parseDecimal(String(x)), Number(String(x)))).toBe(true);
      }),
    );
  });
});

describe('parseHorizon', () => {
  it('accepts whole numbers ≥ 1 and returns 0 for anything else', () => {
    expect(parseHorizon('1')).toBe(1);
    expect(parseHorizon('24')).toBe(24);
    expect(parseHorizon('3.0')).toBe(3);
    expect(parseHorizon('2147483647')).toBe(2147483647);
    for (const text of ['0', '-1', '1.5', '', 'h1', '2147483648', ' 1']) {
      expect(parseHorizon(text), JSON.stringify(text)).toBe(0);
    }
  });
});
