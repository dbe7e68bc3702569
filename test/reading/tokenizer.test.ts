import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/inputError.js';
import { Tokenizer } from '../../src/reading/tokenizer.js';

interface Rec {
  fields: string[];
  line: number;
}

function tokenize(
  chunks: string[],
  delimiter: ',' | '\t' = ',',
): { records: Rec[]; blank: number } {
  const records: Rec[] = [];
  const t = new Tokenizer(
    delimiter,
    (fields, count, line) => records.push({ fields: fields.slice(0, count), line }),
    'x.csv',
  );
  for (const chunk of chunks) t.push(chunk);
  t.end();
  return { records, blank: t.blankLines };
}

function tokenizeError(text: string): InputError {
  try {
    tokenize([text]);
  } catch (error) {
    if (error instanceof InputError) return error;
    throw error;
  }
  throw new Error('expected an InputError');
}

describe('Tokenizer', () => {
  it('splits plain records on LF and CRLF, with or without a final line break', () => {
    expect(tokenize(['a,b\nc,d\n']).records).toEqual([
      { fields: ['a', 'b'], line: 1 },
      { fields: ['c', 'd'], line: 2 },
    ]);
    expect(tokenize(['a,b\r\nc,d']).records).toEqual([
      { fields: ['a', 'b'], line: 1 },
      { fields: ['c', 'd'], line: 2 },
    ]);
  });

  it('keeps empty fields and a lone CR as data', () => {
    expect(tokenize([',a,\n']).records[0]!.fields).toEqual(['', 'a', '']);
    expect(tokenize(['a\rb,c\n']).records[0]!.fields).toEqual(['a\rb', 'c']);
  });

  it('reads quoted fields with escaped quotes, delimiters and line breaks', () => {
    const { records } = tokenize(['x,"a ""q"", b"\n"multi\nline\r\nfield",z\r\nlast,1\n']);
    expect(records).toEqual([
      { fields: ['x', 'a "q", b'], line: 1 },
      { fields: ['multi\nline\r\nfield', 'z'], line: 2 },
      { fields: ['last', '1'], line: 5 },
    ]);
  });

  it('treats a quote inside an unquoted field as an ordinary character', () => {
    expect(tokenize(['5" screen,2\n']).records[0]!.fields).toEqual(['5" screen', '2']);
  });

  it('skips a byte-order mark at the start only', () => {
    expect(tokenize(['\uFEFFa,b\n']).records[0]!.fields).toEqual(['a', 'b']);
    expect(tokenize(['', '\uFEFFa,b\n']).records[0]!.fields).toEqual(['a', 'b']);
    expect(tokenize(['a,\uFEFFb\n']).records[0]!.fields).toEqual(['a', '\uFEFFb']);
  });

  it('skips and counts blank lines, keeping physical line numbers', () => {
    const { records, blank } = tokenize(['a,b\n\r\n\nc,d\n\n']);
    expect(records).toEqual([
      { fields: ['a', 'b'], line: 1 },
      { fields: ['c', 'd'], line: 4 },
    ]);
    expect(blank).toBe(3);
  });

  it('splits on tabs for TSV and then treats commas as data', () => {
    expect(tokenize(['a,1\tb\n'], '\t').records[0]!.fields).toEqual(['a,1', 'b']);
  });

  it('names the starting line of a quoted field that is never closed', () => {
    const error = tokenizeError('a,b\nc,"open\nstill open\n');
    expect(error.describe()).toMatch(/^x\.csv:2: a quoted field is not closed/);
  });

  it('names the physical line of a stray character after a closing quote', () => {
    const error = tokenizeError('a,b\n"one\ntwo"x,c\n');
    expect(error.location.line).toBe(3);
    expect(error.describe()).toContain('x.csv:3: unexpected character after a closing quote');
  });

  // Random tables of awkward fields, written with random quoting and line endings, split into
  // random chunks: the records and lines must be exactly the table's.
  const field = fc.oneof(
    fc.string({ maxLength: 6 }),
    fc.constantFrom('', '"', '""', ',', '\n', '\r\n', '\r', 'a"b', ' x ', '\uFEFF', 'é€𝄞'),
  );
  const table = fc.integer({ min: 1, max: 4 }).chain((width) =>
    fc.array(fc.array(field, { minLength: width, maxLength: width }), {
      minLength: 1,
      maxLength: 8,
    }),
  );

  it('gives the same records however the text is chunked, quoted or line-ended', () => {
    fc.assert(
      fc.property(
        table,
        fc.boolean(),
        fc.boolean(),
        fc.array(fc.nat(), { maxLength: 6 }),
        (rows, crlf, quoteAll, cuts) => {
          const eol = crlf ? '\r\n' : '\n';
          // A record that is a single empty field would be a blank line: quote those.
          const encode = (value: string, alone: boolean): string =>
            quoteAll || alone || /[",\r\n]/.test(value) || value.startsWith('\uFEFF')
              ? `"${value.replaceAll('"', '""')}"`
              : value;
          let text = '';
          const expected: Rec[] = [];
          let line = 1;
          for (const row of rows) {
            expected.push({ fields: row, line });
            text += row.map((v) => encode(v, row.length === 1 && v === '')).join(',') + eol;
            line += 1 + row.join(',').split('\n').length - 1;
          }
          const positions = [...new Set(cuts.map((c) => c % (text.length + 1)))].sort(
            (a, b) => a - b,
          );
          const chunks: string[] = [];
          let previous = 0;
          for (const p of positions) {
            chunks.push(text.slice(previous, p));
            previous = p;
          }
          chunks.push(text.slice(previous));
          expect(tokenize(chunks).records).toEqual(expected);
        },
      ),
      { numRuns: 500 },
    );
  });
});
