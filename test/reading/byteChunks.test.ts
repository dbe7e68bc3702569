import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/inputError.js';
import type { ForecastTable } from '../../src/reading/forecastTable.js';
import {
  ForecastTableReader,
  type ParseOptions,
  parseForecastText,
} from '../../src/reading/forecastTableReader.js';

/** The table, or the message of the InputError that refuses the input. */
function outcome(read: () => ForecastTable): ForecastTable | string {
  try {
    return read();
  } catch (error) {
    if (error instanceof InputError) return error.describe();
    throw error;
  }
}

function readChunks(chunks: readonly Uint8Array[], options: ParseOptions): ForecastTable {
  const reader = new ForecastTableReader('f.csv', options);
  for (const chunk of chunks) reader.push(chunk);
  return reader.finish();
}

/** `bytes` cut at the given positions (anywhere: inside characters, quote pairs, CRLF). */
function cut(bytes: Buffer, cuts: readonly number[]): Buffer[] {
  const positions = [...new Set(cuts.map((c) => c % (bytes.length + 1)))].sort((a, b) => a - b);
  const chunks: Buffer[] = [];
  let previous = 0;
  for (const p of positions) {
    chunks.push(bytes.subarray(previous, p));
    previous = p;
  }
  chunks.push(bytes.subarray(previous));
  return chunks;
}

const label = fc.constantFrom('a', 'b', 'é', 'naïve €', '𝄞x', 'q"uote', 'two\nlines', 'c,d', '');
const number = fc.oneof(
  fc.constantFrom('1', '-0', '2.5', '1e3', '0.1', '12345678901234567890', '1e400', 'x', ''),
  fc.double({ noNaN: true, noDefaultInfinity: true }).map(String),
);
const row = fc.tuple(label, fc.constantFrom('2024-01-01', '2024-01-02', '3'), number, number);

/** A random forecast CSV: quoting where needed (or everywhere), LF or CRLF, blank lines, a BOM. */
const csv = fc
  .tuple(
    fc.array(row, { minLength: 0, maxLength: 12 }),
    fc.boolean(),
    fc.boolean(),
    fc.boolean(),
    fc.array(fc.nat(), { maxLength: 3 }),
  )
  .map(([rows, crlf, quoteAll, bom, blanks]) => {
    const eol = crlf ? '\r\n' : '\n';
    const quote = (v: string): string =>
      quoteAll || /[",\r\n]/.test(v) ? `"${v.replaceAll('"', '""')}"` : v;
    const lines = [
      'series,timestamp,actual,prediction',
      ...rows.map((r) => r.map(quote).join(',')),
    ];
    for (const b of blanks) lines.splice(1 + (b % lines.length), 0, '');
    return `${bom ? '\uFEFF' : ''}${lines.join(eol)}${eol}`;
  });

describe('reading from byte chunks', () => {
  it('gives the same table (or the same refusal) however the bytes are cut', () => {
    fc.assert(
      fc.property(csv, fc.array(fc.nat(), { maxLength: 8 }), (text, cuts) => {
        const options: ParseOptions = { role: 'baseline' };
        const whole = outcome(() => parseForecastText(text, 'f.csv', options));
        const bytes = Buffer.from(text, 'utf8');
        expect(outcome(() => readChunks(cut(bytes, cuts), options))).toEqual(whole);
        // One byte at a time: every boundary at once.
        if (bytes.length < 400) {
          const single = Array.from(bytes, (b) => Uint8Array.of(b));
          expect(outcome(() => readChunks(single, options))).toEqual(whole);
        }
      }),
      { numRuns: 400 },
    );
  });

  it('reads the keys and numbers the text holds', () => {
    const table = readChunks(
      cut(
        Buffer.from('series,timestamp,actual\n"naïve €",1,2.5\r\n𝄞,1,-0\n"naïve €",2,1e3\n'),
        [5, 27, 28, 40],
      ),
      { role: 'actuals' },
    );
    expect(table.series!.labels).toEqual(['naïve €', '𝄞']);
    expect(Array.from(table.series!.ids)).toEqual([0, 1, 0]);
    expect(Array.from(table.actual!.values)).toEqual([2.5, -0, 1000]);
    expect(Array.from(table.lines)).toEqual([2, 3, 4]);
  });
});
