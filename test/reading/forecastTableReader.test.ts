import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/inputError.js';
import { type ParseOptions, parseForecastText } from '../../src/reading/forecastTableReader.js';

const base: ParseOptions = { role: 'baseline' };

function errorOf(text: string, options: ParseOptions = base, path = 'base.csv'): InputError {
  try {
    parseForecastText(text, path, options);
  } catch (error) {
    if (error instanceof InputError) return error;
    throw error;
  }
  throw new Error('expected an InputError');
}

describe('parseForecastText', () => {
  it('reads the default columns into typed, interned columns', () => {
    const table = parseForecastText(
      'series,timestamp,horizon,actual,prediction,q0.9,q0.1,weight,note\n' +
        'A,2024-01-01,1,10,11,12,8,1,x\n' +
        'B,2024-01-01,2,20,19,22,18,0.5,y\n' +
        'A,2024-01-02,1,30,29,31,27,2,z\n',
      'base.csv',
      base,
      'sha256:abc',
    );
    expect(table.size).toBe(3);
    expect(Array.from(table.lines)).toEqual([2, 3, 4]);
    expect(table.series?.labels).toEqual(['A', 'B']);
    expect(Array.from(table.series!.ids)).toEqual([0, 1, 0]);
    expect(table.timestamp.labels).toEqual(['2024-01-01', '2024-01-02']);
    expect(Array.from(table.timestamp.firstLines)).toEqual([2, 4]);
    expect(Array.from(table.horizon!.values)).toEqual([1, 2, 1]);
    expect(Array.from(table.actual!.values)).toEqual([10, 20, 30]);
    expect(Array.from(table.prediction!.values)).toEqual([11, 19, 29]);
    expect(Array.from(table.weight!.values)).toEqual([1, 0.5, 2]);
    expect(table.quantiles.map((q) => [q.level, q.column, Array.from(q.values)])).toEqual([
      [0.1, 'q0.1', [8, 18, 27]],
      [0.9, 'q0.9', [12, 22, 31]],
    ]);
    expect(table.origin).toBeNull();
    expect(table.path).toBeNull();
    expect(table.summary).toEqual({
      role: 'baseline',
      path: 'base.csv',
      rows: 3,
      sha256: 'sha256:abc',
      columns: [
        'series',
        'timestamp',
        'horizon',
        'actual',
        'prediction',
        'q0.9',
        'q0.1',
        'weight',
        'note',
      ],
      ignoredColumns: ['note'],
      blankLines: 0,
    });
  });

  it('follows a column mapping and a quantile prefix', () => {
    const table = parseForecastText('ds,y,yhat,p0.5\n1,2,3,4\n', 'b.csv', {
      role: 'candidate',
      columns: { timestamp: 'ds', actual: 'y', prediction: 'yhat', quantile: 'p' },
    });
    expect(table.timestamp.column).toBe('ds');
    expect(table.actual?.values[0]).toBe(2);
    expect(table.prediction?.values[0]).toBe(3);
    expect(table.quantiles[0]?.level).toBe(0.5);
    expect(table.summary.ignoredColumns).toEqual([]);
  });

  it('reads an actuals file on (series, timestamp) and ignores forecast columns there', () => {
    const table = parseForecastText(
      'series,timestamp,horizon,actual,prediction,q0.5\nA,1,1,5,6,7\n',
      'act.csv',
      { role: 'actuals' },
    );
    expect(table.horizon).toBeNull();
    expect(table.prediction).toBeNull();
    expect(table.quantiles).toEqual([]);
    expect(table.summary.ignoredColumns).toEqual(['horizon', 'prediction', 'q0.5']);
  });

  it('reads an optional path column as interned key labels, renamable by the mapping', () => {
    const table = parseForecastText(
      'timestamp,path,origin,prediction\n1,p1,0,2\n1,p2,0,3\n2,p1,1,4\n',
      'b.csv',
      base,
    );
    expect(table.path?.column).toBe('path');
    expect(table.path?.labels).toEqual(['p1', 'p2']);
    expect(Array.from(table.path!.ids)).toEqual([0, 1, 0]);
    expect(Array.from(table.path!.firstLines)).toEqual([2, 3]);
    expect(table.summary.ignoredColumns).toEqual([]);

    const mapped = parseForecastText('timestamp,fold,path,prediction\n1,7,x,2\n', 'b.csv', {
      role: 'candidate',
      columns: { path: 'fold' },
    });
    expect(mapped.path?.column).toBe('fold');
    expect(mapped.path?.labels).toEqual(['7']);
    expect(mapped.summary.ignoredColumns).toEqual(['path']);
  });

  it('ignores a path column in an actuals file and lists it as ignored', () => {
    const table = parseForecastText('timestamp,path,actual\n1,p1,5\n', 'act.csv', {
      role: 'actuals',
    });
    expect(table.path).toBeNull();
    expect(table.summary.ignoredColumns).toEqual(['path']);
  });

  it('treats q-columns that are not q<number> as ordinary extra columns', () => {
    const table = parseForecastText('timestamp,prediction,quality\n1,2,good\n', 'b.csv', base);
    expect(table.quantiles).toEqual([]);
    expect(table.summary.ignoredColumns).toEqual(['quality']);
  });

  it('reads TSV with the tab delimiter', () => {
    const table = parseForecastText('timestamp\tprediction\n1\t2.5\n', 'b.tsv', {
      role: 'baseline',
      format: 'tsv',
    });
    expect(table.prediction?.values[0]).toBe(2.5);
  });

  it('counts skipped blank lines and keeps physical line numbers', () => {
    const table = parseForecastText('timestamp,prediction\n\n1,2\n\n3,4\n\n', 'b.csv', base);
    expect(Array.from(table.lines)).toEqual([3, 5]);
    expect(table.summary.blankLines).toBe(3);
  });

  describe('bad input names the file, the line and the value', () => {
    const cases: [string, string, ParseOptions | undefined, string][] = [
      ['empty file', '', undefined, 'base.csv:1: the file is empty'],
      ['only blank lines', '\n\n', undefined, 'base.csv:1: the file is empty'],
      [
        'header only',
        'timestamp,prediction\n',
        undefined,
        'base.csv:2: the file has a header but no data rows',
      ],
      [
        'missing timestamp',
        'time,prediction\n1,2\n',
        undefined,
        'base.csv:1: missing the timestamp column "timestamp" (required); the header has "time", "prediction"',
      ],
      [
        'missing prediction and quantiles',
        'timestamp,actual\n1,2\n',
        undefined,
        'base.csv:1: missing the prediction column "prediction" (required unless quantile columns such as q0.5 are present)',
      ],
      [
        'missing actual when required',
        'timestamp,prediction\n1,2\n',
        { role: 'baseline', requireActual: true },
        'base.csv:1: missing the actual column "actual" (required when there is no separate actuals file)',
      ],
      [
        'missing actual in an actuals file',
        'timestamp,value\n1,2\n',
        { role: 'actuals' },
        'base.csv:1: missing the actual column "actual" (required in an actuals file)',
      ],
      [
        'a required column twice',
        'timestamp,prediction,timestamp\n1,2,3\n',
        undefined,
        'base.csv:1: the column "timestamp" appears twice in the header (fields 1 and 3)',
      ],
      [
        'too few fields',
        'timestamp,prediction\n1,2\n3\n',
        undefined,
        'base.csv:3: expected 2 fields as in the header, found 1 (value "3")',
      ],
      [
        'too many fields',
        'timestamp,prediction\n1,2,3\n',
        undefined,
        'base.csv:2: expected 2 fields as in the header, found 3 (value "1,2,3")',
      ],
      [
        'non-numeric prediction',
        'timestamp,prediction\n1,2\n2,abc\n',
        undefined,
        'base.csv:3: not a finite decimal number (column "prediction", value "abc")',
      ],
      [
        'NaN actual',
        'timestamp,prediction,actual\n1,2,NaN\n',
        undefined,
        'base.csv:2: not a finite decimal number (column "actual", value "NaN")',
      ],
      [
        'infinite quantile',
        'timestamp,q0.5\n1,Inf\n',
        undefined,
        'base.csv:2: not a finite decimal number (column "q0.5", value "Inf")',
      ],
      [
        'overflowing number',
        'timestamp,prediction\n1,1e999\n',
        undefined,
        'base.csv:2: not a finite decimal number (column "prediction", value "1e999")',
      ],
      [
        'empty prediction',
        'timestamp,prediction\n1,\n',
        undefined,
        'base.csv:2: empty value where a number is required (column "prediction", value "")',
      ],
      [
        'bad weight',
        'timestamp,prediction,weight\n1,2,x\n',
        undefined,
        'base.csv:2: not a finite decimal number (column "weight", value "x")',
      ],
      [
        'negative weight',
        'timestamp,prediction,weight\n1,2,-1\n',
        undefined,
        'base.csv:2: weights must be ≥ 0 (column "weight", value "-1")',
      ],
      [
        'horizon zero',
        'timestamp,horizon,prediction\n1,0,2\n',
        undefined,
        'base.csv:2: the horizon must be a whole number ≥ 1 (column "horizon", value "0")',
      ],
      [
        'fractional horizon',
        'timestamp,horizon,prediction\n1,1.5,2\n',
        undefined,
        'base.csv:2: the horizon must be a whole number ≥ 1 (column "horizon", value "1.5")',
      ],
      [
        'empty timestamp',
        'timestamp,prediction\n,2\n',
        undefined,
        'base.csv:2: empty value in a key column (column "timestamp", value "")',
      ],
      [
        'empty path',
        'timestamp,path,prediction\n1,a,2\n2,,3\n',
        undefined,
        'base.csv:3: empty value in a key column (column "path", value "")',
      ],
      [
        'a path column twice',
        'timestamp,path,prediction,path\n1,a,2,b\n',
        undefined,
        'base.csv:1: the column "path" appears twice in the header (fields 2 and 4)',
      ],
      [
        'quantile level 5',
        'timestamp,q5\n1,2\n',
        undefined,
        'base.csv:1: quantile level 5 is not strictly between 0 and 1 (write e.g. q0.1 for the 10% quantile) (column "q5", value "q5")',
      ],
      [
        'quantile level 0',
        'timestamp,q0\n1,2\n',
        undefined,
        'base.csv:1: quantile level 0 is not strictly between 0 and 1',
      ],
      [
        'quantile level twice',
        'timestamp,q0.1,q0.10\n1,2,3\n',
        undefined,
        'base.csv:1: quantile level 0.1 appears twice in the header (columns "q0.1" and "q0.10")',
      ],
      [
        'a line number after a quoted multi-line field',
        'timestamp,prediction,note\n1,2,"a\nb\nc"\n2,x,ok\n',
        undefined,
        'base.csv:5: not a finite decimal number (column "prediction", value "x")',
      ],
    ];
    it.each(cases)('%s', (_name, text, options, message) => {
      const error = errorOf(text, options ?? base);
      expect(error.describe().startsWith(message), error.describe()).toBe(true);
    });
  });

  it('does not depend on how the text is chunked', () => {
    const text =
      '\uFEFFseries,timestamp,actual,prediction\r\n"A, north",2024-01-01,1.5,2\r\n"B",2024-01-02,3,4\r\n';
    const whole = parseForecastText(text, 'b.csv', base);
    for (let cut = 0; cut <= text.length; cut++) {
      const split = parseForecastText([text.slice(0, cut), text.slice(cut)], 'b.csv', base);
      expect(split).toEqual(whole);
    }
    expect(whole.series?.labels).toEqual(['A, north', 'B']);
  });
});
