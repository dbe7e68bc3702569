import { formatNumber, formatPValue } from '../core/formatNumber.js';
import { escapeMarkdown as esc } from './escapeMarkdown.js';
import { relativeChangeText } from './relativeChangeText.js';
import type { Report } from './reportModel.js';

/**
 * The several-candidates part of the comment: a ranking table (lowest mean loss first; the
 * baseline's row carries its set membership), then one line each on the SPA test and the model
 * confidence set. Empty for a two-model report. Names are escaped: they come from the files.
 */
export function renderCandidatesMarkdown(report: Report): string[] {
  const { candidates, spa, confidenceSet: set, selection } = report;
  if (candidates === undefined || spa === undefined || set === undefined) return [];
  const level = `${formatNumber(set.level * 100, 3)}%`;
  const changeLevel = `${formatNumber(report.settings.confidence * 100, 3)}%`;
  const direction = spa.hypothesis === 'none-better' ? 'better' : 'worse';
  const out = [
    `**Candidates** (${candidates.length}, ranked by mean loss; preferred: ${esc(selection?.preferred ?? '')})`,
    '',
    `| rank | model | mean loss | change against the baseline (${changeLevel}) | in the ${level} set | MCS p-value | SPA p-value (${direction}) | own verdict |`,
    '|---:|---|---:|---|:---:|---:|---:|---|',
  ];
  for (const c of [...candidates].sort((a, b) => a.rank - b.rank)) {
    const mark = c.name === selection?.preferred ? ' (preferred)' : '';
    out.push(
      `| ${c.rank} | ${esc(c.name)}${mark} | ${formatNumber(c.comparison.meanCandidateLoss)} | ${relativeChangeText(c.comparison)} | ${c.inConfidenceSet ? 'yes' : 'no'} | ${formatPValue(c.mcsPValue)} | ${formatPValue(c.spaPValue)} | ${c.comparison.verdict} |`,
    );
  }
  out.push(
    `| – | ${esc(set.baseline.name)} (baseline) | ${formatNumber(set.baseline.meanLoss)} | – | ${set.baseline.inConfidenceSet ? 'yes' : 'no'} | ${formatPValue(set.baseline.mcsPValue)} | – | – |`,
    '',
  );
  const hypothesis =
    spa.hypothesis === 'none-better'
      ? 'no candidate beats the baseline'
      : 'no candidate is worse than the baseline';
  out.push(
    `SPA test (Hansen 2005), H0 "${hypothesis}": statistic ${formatNumber(spa.statistic)}, p-values lower ${formatPValue(spa.pValueLower)}, consistent ${formatPValue(spa.pValueConsistent)}, upper ${formatPValue(spa.pValueUpper)}; White's reality check p ${formatPValue(spa.realityCheck.pValue)} (${spa.resamples} shared resamples, block length ${formatNumber(spa.expectedBlockLength)}).`,
    '',
    `Model confidence set (Hansen, Lunde & Nason 2011, ${set.statistic === 'range' ? 'range statistic T_R' : 'max statistic T_max'}): ${set.members.map(esc).join(', ')}. Eliminated in order: ${set.eliminationOrder
      .slice(0, -1)
      .map((name, j) => `${esc(name)} (p ${formatPValue(set.stepPValues[j])})`)
      .join(', ')}.`,
    '',
  );
  return out;
}
