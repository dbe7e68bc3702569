import type { AlignedPanel } from '../core/panel.js';
import type { ForecastTable } from '../reading/forecastTable.js';
import { type ActualsMatch, checkActualColumns, joinActuals, panelRows } from './actualsJoin.js';
import { agreedActualAndWeight } from './agreedValues.js';
import { noActualInCommon, noCommonKey } from './alignmentErrors.js';
import { compactKeys } from './compactKeys.js';
import { comparableForecasts } from './comparableForecasts.js';
import { gatherIntRows } from './gatherRows.js';
import { keyCodes } from './keyCodes.js';
import { keyDictionaries } from './keyDictionaries.js';
import { describeKey, keyColumns, keyLayout } from './keyLayout.js';
import { lackingRows } from './lackingRows.js';
import { mergeJoin } from './mergeJoin.js';
import { sortKeys } from './sortedKeys.js';
import type { TimeFormatName } from './timeFormat.js';

export interface AlignInput {
  readonly baseline: ForecastTable;
  readonly candidate: ForecastTable;
  /** A separate actuals file keyed on (series, timestamp). */
  readonly actuals?: ForecastTable;
}

export interface AlignHooks {
  /** Called as the steps finish, with the fraction of the work done (0..1); for long inputs. */
  readonly onProgress?: (fraction: number) => void;
  /** How timestamp and origin labels read (default auto: all numbers or all ISO 8601). */
  readonly timeFormat?: TimeFormatName;
}

/**
 * Matches baseline and candidate rows on the key (series, timestamp, horizon, origin, path) and
 * attaches the actual, never relying on file order. Origin and path are part of the key only when
 * the files have those columns (both predictions files alike, else an error); an actuals file is
 * keyed on (series, timestamp) alone. Pure: tables in, panel out, InputError on bad input.
 *
 * - Timestamps (and origins) are ordered by one kind decided over all files together (see
 *   orderLabels); the panel keeps, per time, the label as written (the smallest if several
 *   labels denote the same time).
 * - Duplicated keys within a file are errors naming both lines.
 * - Actuals come from the actuals file when there is one, else from both predictions files. Every
 *   file that carries an actual for a matched key must agree exactly (as parsed numbers).
 * - Weights come from the actuals file, or from both predictions files (which must agree); a
 *   weight column in only one predictions file is an error, so one model cannot set the weights.
 * - Only what both models provide is compared: the prediction when both have one, and the
 *   quantile levels they share (panel.quantileLevels says which were left out).
 * - Rows come out sorted by (series, timestamp, horizon, origin, path); ids are compact and
 *   sorted (series names in code-unit order, times in time order, paths numerically when all are
 *   numbers, else in code-unit order), so the panel does not depend on the order of rows in
 *   the files.
 *
 * The steps (docs/design.md, "Alignment"), each in its own module: global dictionaries of the
 * key parts (keyDictionaries), key columns of integer ids and one order-preserving code per row
 * (keyLayout, keyCodes), a radix sort and duplicate check per file (sortedKeys), the merge join
 * (mergeJoin), the actuals (actualsJoin, agreedValues), the comparable forecasts
 * (comparableForecasts) and the compaction of ids to the panel's labels (compactKeys). No step
 * builds an object or a string per row.
 */
export function alignPanel(input: AlignInput, hooks: AlignHooks = {}): AlignedPanel {
  const { baseline, candidate, actuals } = input;
  const progress = hooks.onProgress ?? (() => {});

  const layout = keyLayout(
    keyDictionaries(input, hooks.timeFormat ?? 'auto'),
    baseline.series !== null,
  );
  progress(0.1);

  const bKeys = keyColumns(layout, baseline, 'baseline');
  const cKeys = keyColumns(layout, candidate, 'candidate');
  const [bCodes, cCodes] = keyCodes(layout.prediction, [bKeys, cKeys]);
  progress(0.2);
  const bSorted = sortKeys(layout, layout.prediction, baseline, bKeys, bCodes!);
  progress(0.3);
  const cSorted = sortKeys(layout, layout.prediction, candidate, cKeys, cCodes!);
  progress(0.5);

  const match = mergeJoin(bSorted, cSorted, (side, row) => describeKey(layout, side.keys, row));
  if (match.matched === 0) throw noCommonKey(input, layout, match);
  progress(0.6);

  let actualsMatch: ActualsMatch | null = null;
  if (actuals !== undefined) {
    actualsMatch = joinActuals(layout, bSorted, match, actuals, (row) =>
      describeKey(layout, bKeys, row),
    );
  } else checkActualColumns(baseline, candidate);
  const rows = panelRows(match, actualsMatch);
  if (rows.size === 0) throw noActualInCommon(input, match.matched);
  progress(0.7);

  const { actual, weight } = agreedActualAndWeight({ baseline, candidate, actuals, rows }, (p) =>
    describeKey(layout, bKeys, rows.baseline[p]!),
  );
  progress(0.8);

  const forecasts = comparableForecasts(baseline, candidate, rows.baseline, rows.candidate);
  const keys = compactKeys(layout, bSorted, rows.baseline);
  progress(1);

  return {
    size: rows.size,
    ...keys,
    actual,
    actualSource:
      actuals === undefined
        ? { file: baseline.summary.path, lines: gatherIntRows(baseline.lines, rows.baseline) }
        : { file: actuals.summary.path, lines: gatherIntRows(actuals.lines, rows.actuals) },
    baseline: forecasts.baseline,
    candidate: forecasts.candidate,
    weight,
    quantileLevels: forecasts.quantileLevels,
    coverage: {
      files: (actuals === undefined ? [baseline, candidate] : [baseline, candidate, actuals]).map(
        (t) => t.summary,
      ),
      rowsMatched: rows.size,
      baselineOnly: match.baselineOnlyRows.length,
      candidateOnly: match.candidateOnly,
      withoutActual: actualsMatch?.withoutActual ?? 0,
      actualsUnused: actualsMatch?.unused ?? 0,
      examples: {
        ...match.examples,
        withoutActual: actualsMatch?.withoutActualExamples ?? [],
      },
      lacking: lackingRows(
        layout,
        match.baselineOnlyRows,
        baseline,
        bKeys,
        actuals === undefined || actualsMatch === null
          ? null
          : { table: actuals, keys: actualsMatch.keys },
      ),
    },
  };
}
