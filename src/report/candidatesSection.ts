import { formatNumber, formatPValue } from '../core/formatNumber.js';
import { relativeChangeText } from './relativeChangeText.js';
import type { Report } from './reportModel.js';
import { type ReportTable, table } from './reportTable.js';

/**
 * The several-candidates part of the report as every renderer shows it: a heading line, the
 * ranking table (lowest mean loss first, then the baseline's row with its set membership) and
 * one sentence each on the SPA test and the model confidence set. Cells and sentences are plain
 * text; each renderer escapes them for its medium (names come from the files). Null for a
 * two-model report.
 */
export interface CandidatesSection {
  readonly heading: string;
  readonly ranking: ReportTable;
  /** The same columns' short names, for a terminal's width. */
  readonly shortHeader: readonly string[];
  readonly spaSentence: string;
  readonly setSentence: string;
}

export function candidatesSection(report: Report): CandidatesSection | null {
  const { candidates, spa, confidenceSet: set, selection } = report;
  if (candidates === undefined || spa === undefined || set === undefined) return null;
  const level = `${formatNumber(set.level * 100, 3)}%`;
  const changeLevel = `${formatNumber(report.settings.confidence * 100, 3)}%`;
  const direction = spa.hypothesis === 'none-better' ? 'better' : 'worse';
  const rows = [...candidates]
    .sort((a, b) => a.rank - b.rank)
    .map((c) => [
      String(c.rank),
      c.name === selection?.preferred ? `${c.name} (preferred)` : c.name,
      formatNumber(c.comparison.meanCandidateLoss),
      relativeChangeText(c.comparison),
      c.inConfidenceSet ? 'yes' : 'no',
      formatPValue(c.mcsPValue),
      formatPValue(c.spaPValue),
      c.comparison.verdict,
    ]);
  rows.push([
    '–',
    `${set.baseline.name} (baseline)`,
    formatNumber(set.baseline.meanLoss),
    '–',
    set.baseline.inConfidenceSet ? 'yes' : 'no',
    formatPValue(set.baseline.mcsPValue),
    '–',
    '–',
  ]);
  const ranking = table(
    [
      'rank',
      'model',
      'mean loss',
      `change against the baseline (${changeLevel})`,
      `in the ${level} set`,
      'MCS p-value',
      `SPA p-value (${direction})`,
      'own verdict',
    ],
    ['right', 'left', 'right', 'left', 'left', 'right', 'right', 'left'],
    rows,
  );
  const hypothesis =
    spa.hypothesis === 'none-better'
      ? 'no candidate beats the baseline'
      : 'no candidate is worse than the baseline';
  const eliminated = set.eliminationOrder
    .slice(0, -1)
    .map((name, j) => `${name} (p ${formatPValue(set.stepPValues[j])})`)
    .join(', ');
  return {
    heading: `Candidates (${candidates.length}, ranked by mean loss; preferred: ${selection === undefined ? 'none' : `${selection.preferred}, ${selection.preferredBy === 'option' ? 'named by --preferred' : 'the lowest mean loss'}`})`,
    ranking,
    shortHeader: ['rank', 'model', 'mean loss', 'change', 'in set', 'MCS p', 'SPA p', 'verdict'],
    spaSentence: `SPA test (Hansen 2005), H0 "${hypothesis}": statistic ${formatNumber(spa.statistic)}, p-values lower ${formatPValue(spa.pValueLower)}, consistent ${formatPValue(spa.pValueConsistent)}, upper ${formatPValue(spa.pValueUpper)}; White's reality check p ${formatPValue(spa.realityCheck.pValue)} (${spa.resamples} shared resamples, block length ${formatNumber(spa.expectedBlockLength)}${selection === undefined ? '' : `, ${selection.timePoints} time points`}).`,
    setSentence: `Model confidence set at ${level} (Hansen, Lunde & Nason 2011, ${set.statistic === 'range' ? 'range statistic T_R' : 'max statistic T_max'}): ${set.members.join(', ')}.${eliminated === '' ? '' : ` Eliminated in order: ${eliminated}.`}`,
  };
}
