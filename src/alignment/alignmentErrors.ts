import { InputError } from '../core/inputError.js';
import type { ComparisonTables } from './keyDictionaries.js';
import type { KeyLayout } from './keyLayout.js';
import type { KeyMatch } from './mergeJoin.js';

/** The refusal of two predictions files that share no key, with an example from each side. */
export function noCommonKey(
  tables: ComparisonTables,
  layout: KeyLayout,
  match: KeyMatch,
): InputError {
  const { baseline, candidate } = tables;
  const { origin, path } = layout.dictionaries;
  const eg = (list: string[]): string => (list.length > 0 ? ` (e.g. ${list[0]})` : '');
  return new InputError(
    `${baseline.summary.path} and ${candidate.summary.path} have no key (series, timestamp, horizon${origin !== null ? ', origin' : ''}${path !== null ? ', path' : ''}) in common: ${baseline.size} baseline rows${eg(match.examples.baselineOnly)}, ${candidate.size} candidate rows${eg(match.examples.candidateOnly)}`,
    { file: candidate.summary.path },
  );
}

/** The refusal of an actuals file that has no actual for any matched key. */
export function noActualInCommon(tables: ComparisonTables, matched: number): InputError {
  const { baseline, candidate, actuals } = tables;
  return new InputError(
    `none of the ${matched} keys common to ${baseline.summary.path} and ${candidate.summary.path} has an actual value in this file`,
    { file: actuals!.summary.path },
  );
}
