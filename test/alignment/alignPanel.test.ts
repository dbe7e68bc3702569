import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { alignPanel } from '../../src/alignment/alignPanel.js';
import { InputError } from '../../src/core/inputError.js';
import type { AlignedPanel } from '../../src/core/panel.js';
import type { ForecastTable } from '../../src/reading/forecastTable.js';
import { type FileRole, parseForecastText } from '../../src/reading/forecastTableReader.js';

function table(role: FileRole, path: string, text: string): ForecastTable {
  return parseForecastText(text, path, { role });
}

function align(b: string, c: string, a?: string): AlignedPanel {
  return alignPanel({
    baseline: table('baseline', 'base.csv', b),
    candidate: table('candidate', 'cand.csv', c),
    ...(a === undefined ? {} : { actuals: table('actuals', 'act.csv', a) }),
  });
}

function alignError(b: string, c: string, a?: string): InputError {
  try {
    align(b, c, a);
  } catch (error) {
    if (error instanceof InputError) return error;
    throw error;
  }
  throw new Error('expected an InputError');
}

/** Rows of the panel as readable tuples, in panel order (the path last, when there is one). */
function rows(panel: AlignedPanel): (string | number | null)[][] {
  return Array.from({ length: panel.size }, (_, i) => [
    panel.seriesNames[panel.series[i]!]!,
    panel.timestamps[panel.time[i]!]!,
    panel.horizon[i]!,
    panel.actual[i]!,
    panel.baseline.prediction?.[i] ?? null,
    panel.candidate.prediction?.[i] ?? null,
    ...(panel.path === null ? [] : [panel.paths[panel.path[i]!]!]),
  ]);
}

describe('alignPanel', () => {
  it('matches on the key, not on file order, and counts one-sided keys', () => {
    const panel = align(
      'series,timestamp,horizon,actual,prediction\n' +
        'B,2024-01-02,1,5,5.5\n' +
        'A,2024-01-01,1,1,1.5\n' +
        'A,2024-01-01,2,1,1.7\n' +
        'A,2024-01-03,1,9,9\n',
      'series,timestamp,horizon,actual,prediction\n' +
        'A,2024-01-01,2,1,1.2\n' +
        'A,2024-01-01,1,1,0.5\n' +
        'B,2024-01-02,1,5,6\n' +
        'C,2024-01-02,1,7,7\n' +
        'C,2024-01-03,1,7,7\n',
    );
    expect(rows(panel)).toEqual([
      ['A', '2024-01-01', 1, 1, 1.5, 0.5],
      ['A', '2024-01-01', 2, 1, 1.7, 1.2],
      ['B', '2024-01-02', 1, 5, 5.5, 6],
    ]);
    expect(panel.timestampKind).toBe('datetime');
    expect(panel.seriesNames).toEqual(['A', 'B']);
    expect(panel.timestamps).toEqual(['2024-01-01', '2024-01-02']);
    expect(panel.coverage).toMatchObject({
      rowsMatched: 3,
      baselineOnly: 1,
      candidateOnly: 2,
      withoutActual: 0,
      actualsUnused: 0,
      examples: {
        baselineOnly: ['series=A timestamp=2024-01-03 horizon=1'],
        candidateOnly: [
          'series=C timestamp=2024-01-02 horizon=1',
          'series=C timestamp=2024-01-03 horizon=1',
        ],
        withoutActual: [],
      },
    });
    expect(panel.coverage.files.map((f) => [f.role, f.path, f.rows])).toEqual([
      ['baseline', 'base.csv', 4],
      ['candidate', 'cand.csv', 5],
    ]);
    expect(panel.weight).toBeNull();
    expect(panel.origin).toBeNull();
    expect(panel.path).toBeNull();
    expect(panel.paths).toEqual([]);
  });

  it('treats a missing series column as one series and a missing horizon as 1', () => {
    const panel = align(
      'timestamp,actual,prediction\n3,1,2\n1,1,2\n',
      'timestamp,horizon,actual,prediction\n1,1,1,3\n3,2,1,3\n',
    );
    expect(panel.timestampKind).toBe('number');
    expect(rows(panel)).toEqual([['', '1', 1, 1, 2, 3]]);
    expect(panel.coverage.examples.baselineOnly).toEqual(['timestamp=3 horizon=1']);
  });

  it('matches labels that denote the same instant or number', () => {
    const panel = align(
      'timestamp,actual,prediction\n2024-01-01T00:00:00Z,1,2\n2024-01-01T06:00Z,1,2\n',
      'timestamp,actual,prediction\n2024-01-01,1,3\n2024-01-01T07:00+01:00,1,3\n',
    );
    expect(panel.size).toBe(2);
    expect(panel.timestamps).toEqual(['2024-01-01', '2024-01-01T06:00Z']);
    const numeric = align(
      'timestamp,actual,prediction\n1.0,1,2\n',
      'timestamp,actual,prediction\n1,1,2\n',
    );
    expect(numeric.timestamps).toEqual(['1']);
  });

  it('keys on origin too and orders origins like timestamps', () => {
    const b = 'timestamp,origin,actual,prediction\n5,4,1,1\n5,3,1,2\n6,4,2,2\n';
    const c = 'timestamp,origin,actual,prediction\n5,3,1,0\n5,4,1,0\n6,4,2,0\n';
    const panel = align(b, c);
    expect(panel.size).toBe(3);
    expect(panel.origins).toEqual(['3', '4']);
    expect(Array.from(panel.origin!)).toEqual([0, 1, 1]);
    expect(Array.from(panel.baseline.prediction!)).toEqual([2, 1, 2]);
    expect(panel.originKind).toBe('number');
  });

  it('keys on the backtest path too: the same history on two paths is two rows', () => {
    // Paths 10 and 2 over the same timestamps, written in different orders in the two files.
    const b =
      'timestamp,origin,path,actual,prediction\n' +
      '5,4,10,1,1.1\n5,4,2,1,1.2\n6,4,2,2,2.2\n6,4,10,2,2.1\n7,4,2,3,3.2\n';
    const c =
      'path,timestamp,origin,actual,prediction\n' +
      '2,6,4,2,0.22\n10,6,4,2,0.21\n2,5,4,1,0.12\n10,5,4,1,0.11\n10,7,4,3,0.31\n';
    const panel = align(b, c);
    expect(panel.paths).toEqual(['2', '10']);
    expect(rows(panel)).toEqual([
      ['', '5', 1, 1, 1.2, 0.12, '2'],
      ['', '5', 1, 1, 1.1, 0.11, '10'],
      ['', '6', 1, 2, 2.2, 0.22, '2'],
      ['', '6', 1, 2, 2.1, 0.21, '10'],
    ]);
    expect(Array.from(panel.path!)).toEqual([0, 1, 0, 1]);
    expect(panel.origins).toEqual(['4']);
    expect(panel.coverage).toMatchObject({
      rowsMatched: 4,
      baselineOnly: 1,
      candidateOnly: 1,
      examples: {
        baselineOnly: ['timestamp=7 horizon=1 origin=4 path=2'],
        candidateOnly: ['timestamp=7 horizon=1 origin=4 path=10'],
      },
    });
  });

  it('orders text paths in code-unit order, and matches path labels exactly', () => {
    const b =
      'series,timestamp,path,actual,prediction\nA,1,fold-b,1,1\nA,1,fold-a,1,2\nA,1,01,1,3\n';
    const c =
      'series,timestamp,path,actual,prediction\nA,1,fold-a,1,5\nA,1,fold-b,1,6\nA,1,1,1,7\n';
    const panel = align(b, c);
    expect(panel.paths).toEqual(['fold-a', 'fold-b']);
    expect(rows(panel)).toEqual([
      ['A', '1', 1, 1, 2, 5, 'fold-a'],
      ['A', '1', 1, 1, 1, 6, 'fold-b'],
    ]);
    expect(panel.coverage.examples).toMatchObject({
      baselineOnly: ['series=A timestamp=1 horizon=1 path=01'],
      candidateOnly: ['series=A timestamp=1 horizon=1 path=1'],
    });
  });

  it('attaches the actual of (series, timestamp) to every path', () => {
    const panel = align(
      'timestamp,path,prediction\n1,a,10\n1,b,11\n2,a,12\n',
      'timestamp,path,prediction\n2,a,13\n1,b,14\n1,a,15\n',
      'timestamp,path,actual\n1,ignored,100\n2,ignored,200\n',
    );
    expect(rows(panel)).toEqual([
      ['', '1', 1, 100, 10, 15, 'a'],
      ['', '1', 1, 100, 11, 14, 'b'],
      ['', '2', 1, 200, 12, 13, 'a'],
    ]);
    expect(panel.coverage.files[2]!.ignoredColumns).toEqual(['path']);
  });

  it('takes actuals from a separate file keyed on (series, timestamp)', () => {
    const panel = align(
      'series,timestamp,horizon,prediction\nA,1,1,10\nA,1,2,11\nA,2,1,12\nB,1,1,0\n',
      'series,timestamp,horizon,prediction\nA,1,1,9\nA,1,2,10\nA,2,1,13\nB,1,1,0\n',
      'series,timestamp,actual\nA,1,10.5\nA,2,12.5\nA,3,14\nC,1,0\n',
    );
    expect(rows(panel)).toEqual([
      ['A', '1', 1, 10.5, 10, 9],
      ['A', '1', 2, 10.5, 11, 10],
      ['A', '2', 1, 12.5, 12, 13],
    ]);
    expect(panel.coverage).toMatchObject({
      rowsMatched: 3,
      withoutActual: 1,
      actualsUnused: 2,
      examples: { withoutActual: ['series=B timestamp=1 horizon=1'] },
    });
    expect(panel.coverage.files.map((f) => f.role)).toEqual(['baseline', 'candidate', 'actuals']);
  });

  it('keeps only the quantile levels both models have, and says which', () => {
    const panel = align(
      'timestamp,actual,q0.1,q0.5,q0.9\n1,5,1,5,9\n',
      'timestamp,actual,q0.9,q0.50,q0.25\n1,5,8,4,2\n',
    );
    expect(panel.quantileLevels).toEqual({
      common: [0.5, 0.9],
      baselineOnly: [0.1],
      candidateOnly: [0.25],
    });
    expect(panel.baseline.quantiles.map((q) => [q.column, Array.from(q.values)])).toEqual([
      ['q0.5', [5]],
      ['q0.9', [9]],
    ]);
    expect(panel.candidate.quantiles.map((q) => [q.column, Array.from(q.values)])).toEqual([
      ['q0.50', [4]],
      ['q0.9', [8]],
    ]);
    expect(panel.baseline.prediction).toBeNull();
  });

  it('uses weights from the actuals file or from both predictions files', () => {
    const fromBoth = align(
      'timestamp,actual,prediction,weight\n1,1,1,2\n2,1,1,3\n',
      'timestamp,actual,prediction,weight\n2,1,1,3\n1,1,1,2\n',
    );
    expect(Array.from(fromBoth.weight!)).toEqual([2, 3]);
    const fromActuals = align(
      'timestamp,prediction\n1,1\n',
      'timestamp,prediction\n1,1\n',
      'timestamp,actual,weight\n1,1,4\n',
    );
    expect(Array.from(fromActuals.weight!)).toEqual([4]);
  });

  describe('bad input names the files, lines and values', () => {
    const header = 'series,timestamp,horizon,actual,prediction\n';
    it('a duplicated key names both lines', () => {
      const error = alignError(
        `${header}A,1,1,1,1\nB,1,1,1,1\nA,1,1,1,2\n`,
        `${header}A,1,1,1,1\n`,
      );
      expect(error.describe()).toBe(
        'base.csv:4: duplicated key series=A timestamp=1 horizon=1: lines 2 and 4 have the same key (value "series=A timestamp=1 horizon=1")',
      );
    });

    it('two labels for the same instant in one file are a duplicated key', () => {
      const error = alignError(
        'timestamp,actual,prediction\n2024-01-01,1,1\n2024-01-01T00:00Z,1,1\n',
        'timestamp,actual,prediction\n2024-01-01,1,1\n',
      );
      expect(error.describe()).toMatch(/^base\.csv:3: duplicated key .*lines 2 and 3/);
    });

    it('a duplicated (series, timestamp) in the actuals file', () => {
      const error = alignError(
        'timestamp,prediction\n1,1\n',
        'timestamp,prediction\n1,1\n',
        'timestamp,actual\n1,1\n1,2\n',
      );
      expect(error.describe()).toMatch(/^act\.csv:3: duplicated key timestamp=1: lines 2 and 3/);
    });

    it('an actual that differs between the predictions files', () => {
      const error = alignError(
        `${header}A,1,1,1.5,1\nA,2,1,2,1\n`,
        `${header}A,2,1,2,1\nA,1,1,1.25,1\n`,
      );
      expect(error.describe()).toBe(
        'cand.csv:3: the actual differs between files for series=A timestamp=1 horizon=1: 1.5 in base.csv line 2, 1.25 in cand.csv line 3 (column "actual", value "1.25")',
      );
    });

    it('an actual in a predictions file that differs from the actuals file', () => {
      const error = alignError(
        'timestamp,actual,prediction\n1,3,1\n',
        'timestamp,prediction\n1,1\n',
        'timestamp,actual\n1,4\n',
      );
      expect(error.describe()).toBe(
        'base.csv:2: the actual differs between files for timestamp=1 horizon=1: 4 in act.csv line 2, 3 in base.csv line 2 (column "actual", value "3")',
      );
    });

    it('no common keys', () => {
      const error = alignError(`${header}A,1,1,1,1\n`, `${header}A,1,2,1,1\n`);
      expect(error.describe()).toBe(
        'cand.csv: base.csv and cand.csv have no key (series, timestamp, horizon) in common: 1 baseline rows (e.g. series=A timestamp=1 horizon=1), 1 candidate rows (e.g. series=A timestamp=1 horizon=2)',
      );
    });

    it('no actual for any common key', () => {
      const error = alignError(
        'timestamp,prediction\n1,1\n',
        'timestamp,prediction\n1,1\n',
        'timestamp,actual\n2,1\n',
      );
      expect(error.describe()).toMatch(
        /^act\.csv: none of the 1 keys common to base\.csv and cand\.csv/,
      );
    });

    it('no actuals anywhere', () => {
      const error = alignError(
        'timestamp,prediction\n1,1\n',
        'timestamp,actual,prediction\n1,1,1\n',
      );
      expect(error.describe()).toMatch(
        /^base\.csv:1: no actual column and no separate actuals file/,
      );
    });

    it('a series column on one side only', () => {
      const error = alignError(`${header}A,1,1,1,1\n`, 'timestamp,actual,prediction\n1,1,1\n');
      expect(error.describe()).toBe(
        'cand.csv:1: this file has no series column but base.csv has one ("series"), so their keys cannot match (column "series")',
      );
    });

    it('an origin column on one side only', () => {
      const error = alignError(
        'timestamp,actual,prediction\n1,1,1\n',
        'timestamp,origin,actual,prediction\n1,0,1,1\n',
      );
      expect(error.describe()).toMatch(
        /^base\.csv:1: this file has no origin column but cand\.csv has one/,
      );
    });

    it('a path column on one side only', () => {
      const error = alignError(
        'timestamp,path,actual,prediction\n1,a,1,1\n',
        'timestamp,actual,prediction\n1,1,1\n',
      );
      expect(error.describe()).toBe(
        'cand.csv:1: this file has no path column but base.csv has one ("path"), so their keys cannot match (column "path")',
      );
      const other = alignError(
        'timestamp,actual,prediction\n1,1,1\n',
        'timestamp,path,actual,prediction\n1,a,1,1\n',
      );
      expect(other.location.file).toBe('base.csv');
    });

    it('a duplicated key within one path names the path', () => {
      const error = alignError(
        'timestamp,path,actual,prediction\n1,a,1,1\n1,b,1,1\n1,a,1,2\n',
        'timestamp,path,actual,prediction\n1,a,1,1\n',
      );
      expect(error.describe()).toBe(
        'base.csv:4: duplicated key timestamp=1 horizon=1 path=a: lines 2 and 4 have the same key (value "timestamp=1 horizon=1 path=a")',
      );
    });

    it('no common keys lists the path in the key', () => {
      const error = alignError(
        'timestamp,path,actual,prediction\n1,a,1,1\n',
        'timestamp,path,actual,prediction\n1,b,1,1\n',
      );
      expect(error.describe()).toBe(
        'cand.csv: base.csv and cand.csv have no key (series, timestamp, horizon, path) in common: 1 baseline rows (e.g. timestamp=1 horizon=1 path=a), 1 candidate rows (e.g. timestamp=1 horizon=1 path=b)',
      );
    });

    it('an actual that differs between paths of the two files names the path', () => {
      const error = alignError(
        'timestamp,path,actual,prediction\n1,a,1,1\n1,b,2,1\n',
        'timestamp,path,actual,prediction\n1,a,1,1\n1,b,3,1\n',
      );
      expect(error.describe()).toMatch(
        /^cand\.csv:3: the actual differs between files for timestamp=1 horizon=1 path=b:/,
      );
    });

    it('a weight column in one predictions file only', () => {
      const error = alignError(
        'timestamp,actual,prediction\n1,1,1\n',
        'timestamp,actual,prediction,weight\n1,1,1,9\n',
      );
      expect(error.describe()).toMatch(/^cand\.csv:1: only this file has a weight column/);
    });

    it('weights that differ', () => {
      const error = alignError(
        'timestamp,actual,prediction,weight\n1,1,1,1\n',
        'timestamp,actual,prediction,weight\n1,1,1,2\n',
      );
      expect(error.describe()).toMatch(/^cand\.csv:2: the weight differs between files/);
    });

    it('nothing in common to compare', () => {
      const error = alignError(
        'timestamp,actual,prediction\n1,1,1\n',
        'timestamp,actual,q0.5\n1,1,1\n',
      );
      expect(error.describe()).toBe(
        'cand.csv:1: nothing to compare: base.csv has point forecasts ("prediction"), cand.csv has quantiles q0.5',
      );
    });

    it('an invalid date', () => {
      const error = alignError(
        'timestamp,actual,prediction\n2024-01-01,1,1\n',
        'timestamp,actual,prediction\n2024-01-01,1,1\n2024-04-31,1,1\n',
      );
      expect(error.describe()).toBe(
        'cand.csv:3: not a valid ISO 8601 timestamp: day 31 does not exist in 2024-04 (column "timestamp", value "2024-04-31")',
      );
    });
  });
});

// ---- Properties: the panel does not depend on row order, extra columns or CSV spelling. ----

interface Row {
  series: string;
  time: string;
  horizon: number;
  /** Backtest path; the actual depends on (series, time) only, as on real paths. */
  path: string;
  actual: number;
  prediction: number;
}

const seriesNames = ['north', 'south, east', 'w"est', 'Zed', 'ä'];
const times = [
  '2024-01-01',
  '2024-01-02T00:00Z',
  '2024-01-03T12:30:00+02:00',
  '2024-01-10',
  '2023-12-31',
];
const pathNames = ['2', '10', '1.5'];

/** The full key of a test row. */
const rowKey = (r: Row | Omit<Row, 'actual'>): string =>
  `${r.series}|${r.time}|${r.horizon}|${r.path}`;

/** Random keyed rows (unique keys) with the actual a function of (series, time). */
const rowsArb = (name: string) =>
  fc
    .uniqueArray(
      fc.record({
        series: fc.constantFrom(...seriesNames),
        time: fc.constantFrom(...times),
        horizon: fc.integer({ min: 1, max: 3 }),
        path: fc.constantFrom(...pathNames),
        // -0 is written "0" and read back as 0, so generate +0 only.
        prediction: fc.double({ min: -100, max: 100, noNaN: true }).map((x) => (x === 0 ? 0 : x)),
      }),
      { selector: rowKey, minLength: 1, maxLength: 40 },
    )
    .map((rs) =>
      rs.map(
        (r): Row => ({ ...r, actual: seriesNames.indexOf(r.series) * 10 + times.indexOf(r.time) }),
      ),
    )
    .map((rs) => ({ name, rows: rs }));

interface Spelling {
  crlf: boolean;
  bom: boolean;
  quoteAll: boolean;
  extra: boolean;
  tsv: boolean;
}

function render(rows: readonly Row[], s: Spelling): string {
  const d = s.tsv ? '\t' : ',';
  const q = (v: string): string =>
    s.quoteAll || v.includes(d) || v.includes('"') ? `"${v.replaceAll('"', '""')}"` : v;
  const head = ['series', 'timestamp', 'horizon', 'path', 'actual', 'prediction'];
  const line = (cells: string[]): string =>
    (s.extra ? [q('note, "x"'), ...cells, q('42')] : cells).map(q).join(d);
  const eol = s.crlf ? '\r\n' : '\n';
  let text =
    (s.bom ? '\uFEFF' : '') + (s.extra ? ['comment', ...head, 'q0.5x'] : head).map(q).join(d) + eol;
  for (const r of rows) {
    text +=
      line([r.series, r.time, String(r.horizon), r.path, String(r.actual), String(r.prediction)]) +
      eol;
  }
  return text;
}

function panelOf(b: readonly Row[], c: readonly Row[], sb: Spelling, sc: Spelling): AlignedPanel {
  const read = (role: FileRole, rows: readonly Row[], s: Spelling) =>
    parseForecastText(render(rows, s), `${role}.csv`, {
      role,
      ...(s.tsv ? { format: 'tsv' } : {}),
    });
  return alignPanel({ baseline: read('baseline', b, sb), candidate: read('candidate', c, sc) });
}

/**
 * The panel without what legitimately depends on the file's spelling and row order: the file
 * summaries (other columns) and the provenance of each actual (its line number).
 */
function content(panel: AlignedPanel): unknown {
  const { coverage, actualSource: _lines, ...rest } = panel;
  const { files: _files, ...counts } = coverage;
  return { ...rest, coverage: counts };
}

const plain: Spelling = { crlf: false, bom: false, quoteAll: false, extra: false, tsv: false };
const spelling = fc.record({
  crlf: fc.boolean(),
  bom: fc.boolean(),
  quoteAll: fc.boolean(),
  extra: fc.boolean(),
  tsv: fc.boolean(),
});

/** Baseline and candidate with some keys in common: the candidate reuses a share of them. */
const pair = fc
  .tuple(rowsArb('b'), rowsArb('c'), fc.array(fc.boolean(), { minLength: 40, maxLength: 40 }))
  .map(([b, c, keep]) => {
    const shared = b.rows
      .filter((_, i) => keep[i])
      .map((r) => ({ ...r, prediction: r.prediction + 1 }));
    const keys = new Set(shared.map(rowKey));
    const own = c.rows.filter((r) => !keys.has(rowKey(r)));
    return { b: b.rows, c: [b.rows[0]!, ...shared.slice(1), ...own].filter(unique()) };
  });

function unique() {
  const seen = new Set<string>();
  return (r: Row) => {
    const key = rowKey(r);
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  };
}

describe('alignPanel properties', () => {
  it('shuffling the rows of either file gives the identical panel', () => {
    fc.assert(
      fc.property(
        pair.chain(({ b, c }) =>
          fc.tuple(
            fc.constant(b),
            fc.constant(c),
            fc.shuffledSubarray(b, { minLength: b.length }),
            fc.shuffledSubarray(c, { minLength: c.length }),
          ),
        ),
        ([b, c, bShuffled, cShuffled]) => {
          expect(content(panelOf(bShuffled, cShuffled, plain, plain))).toEqual(
            content(panelOf(b, c, plain, plain)),
          );
        },
      ),
      { numRuns: 200 },
    );
  });

  it('CRLF, a BOM, quoting, extra columns and TSV give the identical panel', () => {
    fc.assert(
      fc.property(pair, spelling, spelling, ({ b, c }, sb, sc) => {
        expect(content(panelOf(b, c, sb, sc))).toEqual(content(panelOf(b, c, plain, plain)));
      }),
      { numRuns: 200 },
    );
  });

  it('the panel holds exactly the common keys, each with both predictions', () => {
    fc.assert(
      fc.property(pair, ({ b, c }) => {
        const panel = panelOf(b, c, plain, plain);
        const key = (r: Row) => `${r.series}|${keyTime(r.time)}|${r.horizon}|${r.path}`;
        const cByKey = new Map(c.map((r) => [key(r), r]));
        const expected = b
          .filter((r) => cByKey.has(key(r)))
          .map((r) => [
            r.series,
            keyTime(r.time),
            r.horizon,
            r.actual,
            r.prediction,
            cByKey.get(key(r))!.prediction,
            r.path,
          ])
          .sort((x, y) => JSON.stringify(x).localeCompare(JSON.stringify(y)));
        const got = rows(panel)
          .map((r) => [r[0], keyTime(String(r[1])), ...r.slice(2)])
          .sort((x, y) => JSON.stringify(x).localeCompare(JSON.stringify(y)));
        expect(got).toEqual(expected);
        expect(panel.coverage.baselineOnly).toBe(b.length - expected.length);
        expect(panel.coverage.candidateOnly).toBe(c.length - expected.length);
      }),
      { numRuns: 200 },
    );
  });
});

/** The instant a test timestamp denotes (all test labels are distinct instants). */
function keyTime(label: string): number {
  const ms = Date.parse(label.length === 10 ? `${label}T00:00Z` : label);
  return ms;
}
