import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/inputError.js';
import { parseForecastText } from '../../src/reading/forecastTableReader.js';
import { RowKeySet } from '../../src/reading/rowKeySet.js';
import { firstInvalidUtf8 } from '../../src/reading/streamTextFile.js';
import { Tokenizer } from '../../src/reading/tokenizer.js';

function errorOf(f: () => unknown): InputError {
  try {
    f();
  } catch (error) {
    if (error instanceof InputError) return error;
    throw error;
  }
  throw new Error('expected an InputError');
}

describe('RowKeySet', () => {
  it('finds the first repeated key exactly where a naive scan does', () => {
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.integer({ min: 0, max: 20 }), fc.integer({ min: 0, max: 5 })), {
          maxLength: 3000,
        }),
        (keys) => {
          const a = Int32Array.from(keys, (k) => k[0]);
          const b = Int32Array.from(keys, (k) => k[1]);
          const set = new RowKeySet([() => a, () => b]);
          const seen = new Map<string, number>();
          for (let i = 0; i < keys.length; i++) {
            const naive = seen.get(`${a[i]},${b[i]}`) ?? -1;
            expect(set.add(i)).toBe(naive);
            if (naive >= 0) return;
            seen.set(`${a[i]},${b[i]}`, i);
          }
        },
      ),
      { numRuns: 200 },
    );
  });
});

describe('RowKeySet on sorted input', () => {
  it('finds repeats in files sorted either way, and after the order breaks', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 30 }),
        fc.integer({ min: 1, max: 30 }),
        fc.boolean(),
        fc.array(fc.nat(), { maxLength: 5 }),
        (series, times, timeFirst, extra) => {
          const keys: [number, number][] = [];
          for (let i = 0; i < series * times; i++) {
            keys.push(
              timeFirst ? [i % series, Math.floor(i / series)] : [Math.floor(i / times), i % times],
            );
          }
          // Append a few rows repeating earlier keys (or out of order): the first repeat is found.
          for (const e of extra) keys.push(keys[e % keys.length]!);
          const a = Int32Array.from(keys, (k) => k[0]);
          const b = Int32Array.from(keys, (k) => k[1]);
          const set = new RowKeySet([() => a, () => b]);
          let found = -1;
          for (let i = 0; i < keys.length && found < 0; i++) {
            const earlier = set.add(i);
            if (earlier >= 0) {
              expect(keys[earlier]).toEqual(keys[i]);
              expect(earlier).toBeLessThan(i);
              found = i;
            }
          }
          expect(found).toBe(extra.length > 0 ? series * times : -1);
        },
      ),
      { numRuns: 300 },
    );
  });
});

describe('line limit', () => {
  it('refuses a line longer than the limit, naming its line, and echoes at most ~200 characters', () => {
    const tokenizer = new Tokenizer(',', () => {}, 'f.csv', 1024);
    tokenizer.push('a,b\n');
    const error = errorOf(() => tokenizer.push(`${'x'.repeat(5000)}\n`));
    expect(error.describe()).toMatch(
      /^f\.csv:2: the line is longer than the limit of 1024 characters/,
    );
    expect(error.describe().length).toBeLessThan(600);
  });

  it('refuses as soon as an unfinished line passes the limit (no line break ever comes)', () => {
    const tokenizer = new Tokenizer(',', () => {}, 'f.csv', 1024);
    tokenizer.push('a,b\nc,d\n');
    expect(() => tokenizer.push('y'.repeat(2000))).toThrow(/f\.csv|longer than the limit/);
  });

  it('counts a quoted multi-line record as a whole', () => {
    const tokenizer = new Tokenizer(',', () => {}, 'f.csv', 1024);
    expect(() => tokenizer.push(`"${'z\n'.repeat(800)}"\n`)).toThrow(/longer than the limit/);
  });

  it('accepts a line at the limit', () => {
    const records: string[][] = [];
    const tokenizer = new Tokenizer(',', (f, n) => records.push(f.slice(0, n)), 'f.csv', 1024);
    tokenizer.push(`${'x'.repeat(1024)}\n`);
    expect(records[0]![0]!.length).toBe(1024);
  });
});

describe('duplicates found while reading', () => {
  it('names both lines at the second occurrence', () => {
    const error = errorOf(() =>
      parseForecastText(
        'series,timestamp,actual,prediction\na,1,1,1\nb,1,1,1\na,1,2,2\n',
        'f.csv',
        {
          role: 'baseline',
        },
      ),
    );
    expect(error.describe()).toBe(
      'f.csv:4: duplicated key series=a timestamp=1 horizon=1: lines 2 and 4 have the same key (value "series=a timestamp=1 horizon=1")',
    );
  });

  it('keys an actuals file on series and timestamp only', () => {
    expect(() =>
      parseForecastText('timestamp,actual\n1,1\n1,2\n', 'a.csv', { role: 'actuals' }),
    ).toThrow(/a\.csv|duplicated key timestamp=1: lines 2 and 3/);
  });
});

describe('dialects', () => {
  it('reads semicolons with decimal commas', () => {
    const table = parseForecastText('timestamp;actual;prediction\n1;1,5;-2,25\n', 'f.csv', {
      role: 'baseline',
      delimiter: ';',
      decimal: ',',
    });
    expect(Array.from(table.actual!.values)).toEqual([1.5]);
    expect(Array.from(table.prediction!.values)).toEqual([-2.25]);
  });

  it('refuses a decimal comma with the comma as separator', () => {
    expect(() =>
      parseForecastText('timestamp,actual\n', 'f.csv', { role: 'actuals', decimal: ',' }),
    ).toThrow(/decimal comma needs a field separator other than the comma/);
  });
});

describe('firstInvalidUtf8', () => {
  it('finds the first byte that breaks UTF-8', () => {
    expect(firstInvalidUtf8(Buffer.from('abc'))).toBe(3);
    expect(firstInvalidUtf8(Buffer.from([0x61, 0xe9, 0x62]))).toBe(1);
    expect(firstInvalidUtf8(Buffer.from([0xc3, 0xa9, 0xff]))).toBe(2);
    expect(firstInvalidUtf8(Buffer.from([0xe2, 0x82, 0x41]))).toBe(0);
    // A chunk that starts inside a character (its lead byte was in the last chunk).
    expect(firstInvalidUtf8(Buffer.from([0xa9, 0x61, 0xc0, 0x80]))).toBe(2);
  });
});
