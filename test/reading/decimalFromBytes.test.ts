import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  decimalFromBytes,
  fastDecimal,
  horizonFromBytes,
  parseDecimal,
  parseDecimalComma,
  parseHorizon,
} from '../../src/reading/numbers.js';

/** The text inside other bytes, as a field sits in a record. */
function field(text: string): { bytes: Buffer; start: number; end: number } {
  const bytes = Buffer.from(`ab,${text},cd`, 'utf8');
  return { bytes, start: 3, end: bytes.length - 3 };
}

const digits = (max: number) => fc.stringMatching(new RegExp(`^[0-9]{0,${max}}$`));

/** Decimal text of every shape the reader meets: signs, leading zeros, long mantissas, exponents. */
const decimalText = fc
  .tuple(
    fc.constantFrom('', '-', '+'),
    fc.constantFrom('', '0', '000'),
    digits(22),
    fc.constantFrom('', '.'),
    digits(22),
    fc.oneof(
      fc.constant(''),
      fc
        .tuple(
          fc.constantFrom('e', 'E'),
          fc.constantFrom('', '-', '+'),
          fc.oneof(
            fc.integer({ min: 0, max: 30 }),
            // Subnormals, underflow to zero, overflow to Infinity.
            fc.integer({ min: 290, max: 345 }),
            fc.integer({ min: 0, max: 99999 }),
          ),
        )
        .map(([e, sign, n]) => `${e}${sign}${n}`),
    ),
  )
  .map(([sign, zeros, int, point, fraction, exponent]) =>
    point === ''
      ? `${sign}${zeros}${int}${exponent}`
      : `${sign}${zeros}${int}.${fraction}${exponent}`,
  );

/** Doubles written the ways writers write them: shortest round trip, 17 digits, fixed, exponent. */
const writtenDouble = fc
  .tuple(
    fc.double({ noNaN: true, noDefaultInfinity: true }),
    fc.constantFrom('shortest', 'precision17', 'fixed3', 'exponential'),
  )
  .map(([x, style]) => {
    if (style === 'precision17') return x.toPrecision(17);
    if (style === 'fixed3' && Math.abs(x) < 1e21) return x.toFixed(3);
    if (style === 'exponential') return x.toExponential();
    return String(x);
  });

/** Near-decimals: any mix of the characters decimals are made of, and some that they are not. */
const junk = fc.string({
  unit: fc.constantFrom(...'0123456789+-.,eE x_\u00a0'.split('')),
  maxLength: 12,
});

describe('decimals read from bytes', () => {
  it('give bit for bit the double Number() gives, where the exact fast path applies', () => {
    let fast = 0;
    fc.assert(
      fc.property(fc.oneof(decimalText, writtenDouble), (text) => {
        const { bytes, start, end } = field(text);
        const value = fastDecimal(bytes, start, end, 46);
        if (Number.isNaN(value)) return;
        fast++;
        expect(Object.is(value, Number(text)), text).toBe(true);
      }),
      { numRuns: 20_000 },
    );
    // The fast path is the common case, not an exception the property never reaches.
    expect(fast).toBeGreaterThan(5_000);
  });

  it('accept and refuse exactly what the text parser does, with the same values', () => {
    fc.assert(
      fc.property(fc.oneof(decimalText, writtenDouble, junk), (text) => {
        const { bytes, start, end } = field(text);
        expect(
          Object.is(decimalFromBytes(bytes, start, end, false), parseDecimal(text)),
          text,
        ).toBe(true);
        expect(
          Object.is(decimalFromBytes(bytes, start, end, true), parseDecimalComma(text)),
          text,
        ).toBe(true);
      }),
      { numRuns: 20_000 },
    );
  });

  it('read a decimal comma as the point it stands for', () => {
    fc.assert(
      fc.property(decimalText, (text) => {
        const { bytes, start, end } = field(text.replace('.', ','));
        expect(Object.is(decimalFromBytes(bytes, start, end, true), parseDecimal(text)), text).toBe(
          true,
        );
      }),
      { numRuns: 5_000 },
    );
  });

  it('keep overflow refused and the edge cases as the text parser has them', () => {
    for (const text of ['1e309', '-1e400', '1.8e308', '99999999999999999999e300']) {
      const { bytes, start, end } = field(text);
      expect(decimalFromBytes(bytes, start, end, false), text).toBeNaN();
    }
    const cases: [string, number][] = [
      ['0', 0],
      ['-0', -0],
      ['-0.000e-999', -0],
      ['0e99999', 0],
      ['+.5', 0.5],
      ['5.', 5],
      ['5.e3', 5000],
      ['4.9e-324', 5e-324],
      ['2.2250738585072014e-308', 2.2250738585072014e-308],
      ['9007199254740993', 9007199254740992],
      ['0.1', 0.1],
      ['1e22', 1e22],
      ['1e23', 1e23],
    ];
    for (const [text, expected] of cases) {
      const { bytes, start, end } = field(text);
      expect(Object.is(decimalFromBytes(bytes, start, end, false), expected), text).toBe(true);
    }
    for (const text of ['', '.', '-', 'e5', '1e', '1e+', '1.2.3', ' 1', '1 ', '0x10', '1_0']) {
      const { bytes, start, end } = field(text);
      expect(decimalFromBytes(bytes, start, end, false), text).toBeNaN();
    }
  });
});

describe('horizons read from bytes', () => {
  it('agree with the text parser', () => {
    fc.assert(
      fc.property(fc.oneof(fc.stringMatching(/^[0-9]{0,11}$/), decimalText, junk), (text) => {
        const { bytes, start, end } = field(text);
        expect(horizonFromBytes(bytes, start, end), text).toBe(parseHorizon(text));
      }),
      { numRuns: 5_000 },
    );
  });
});
