import { formatNumber, formatPValue } from '../core/formatNumber.js';
import { relativeChangeText } from './relativeChangeText.js';
import type { Report } from './reportModel.js';

/**
 * The several-candidates ranking for the terminal: one aligned row per candidate (lowest mean loss
 * first) and the baseline, then the SPA p-values and the set. Empty for a two-model report.
 * Control characters are stripped from names (they come from the files).
 */
export function renderCandidatesTerminal(report: Report): string[] {
  const { candidates, spa, confidenceSet: set } = report;
  if (candidates === undefined || spa === undefined || set === undefined) return [];
  const header = ['rank', 'model', 'mean loss', 'change', 'in set', 'MCS p', 'SPA p', 'verdict'];
  const rows = [...candidates]
    .sort((a, b) => a.rank - b.rank)
    .map((c) => [
      String(c.rank),
      clean(c.name),
      formatNumber(c.comparison.meanCandidateLoss),
      relativeChangeText(c.comparison),
      c.inConfidenceSet ? 'yes' : 'no',
      formatPValue(c.mcsPValue),
      formatPValue(c.spaPValue),
      c.comparison.verdict,
    ]);
  rows.push([
    '-',
    `${clean(set.baseline.name)} (baseline)`,
    formatNumber(set.baseline.meanLoss),
    '-',
    set.baseline.inConfidenceSet ? 'yes' : 'no',
    formatPValue(set.baseline.mcsPValue),
    '-',
    '-',
  ]);
  const widths = header.map((h, j) => Math.max(h.length, ...rows.map((r) => r[j]!.length)));
  const line = (cells: string[]) =>
    cells
      .map((cell, j) => (j === 1 || j === 3 ? cell.padEnd(widths[j]!) : cell.padStart(widths[j]!)))
      .join('  ');
  return [
    '',
    line(header),
    ...rows.map(line),
    `SPA (${spa.hypothesis}): lower ${formatPValue(spa.pValueLower)}, consistent ${formatPValue(spa.pValueConsistent)}, upper ${formatPValue(spa.pValueUpper)}; reality check ${formatPValue(spa.realityCheck.pValue)}`,
    `${formatNumber(set.level * 100, 3)}% model confidence set (${set.statistic}): ${set.members.map(clean).join(', ')}`,
  ];
}

function clean(text: string): string {
  // biome-ignore lint/suspicious/noControlCharactersInRegex: stripping control characters is the point
  return text.replace(/[\u0000-\u001f\u007f-\u009f]/g, ' ');
}
