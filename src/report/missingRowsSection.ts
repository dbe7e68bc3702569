import { percent, significant } from './cells.js';
import type { MissingRowsGroup } from './missingRows.js';
import { type ReportTable, table } from './reportTable.js';
import type { ReportView } from './reportView.js';

export interface MissingRowsSection {
  readonly title: string;
  readonly lines: readonly string[];
  readonly tables: readonly ReportTable[];
}

/** The rows the candidate lacks, by series and by horizon, with the baseline's loss on them. */
export function missingRowsSection(report: ReportView): MissingRowsSection | null {
  const count = report.inputs.rowsDropped.baseline;
  if (count === 0) return null;
  const m = report.inputs.missingRows ?? null;
  const title = `Rows the candidate lacks (${count})`;
  const examples = report.inputs.examples.baselineOnly;
  if (m === null) {
    return {
      title,
      lines: [
        `The candidate lacks ${count} rows that the baseline scored${examples.length > 0 ? `, e.g. ${examples.join('; ')}` : ''}.`,
      ],
      tables: [],
    };
  }
  const harder =
    m.meanBaselineLoss !== null && m.meanBaselineLossCommon !== null && m.meanBaselineLossCommon > 0
      ? ` (${percent(m.meanBaselineLoss / m.meanBaselineLossCommon - 1)} against its ${significant(m.meanBaselineLossCommon)} on the rows both scored)`
      : '';
  const lines = [
    `The candidate lacks ${m.rows} rows that the baseline scored, from ${m.first ?? 'n/a'} to ${m.last ?? 'n/a'}. The baseline's mean loss on them is ${significant(m.meanBaselineLoss)}${harder}: a model must not pass by skipping hard cases.`,
  ];
  if (m.rowsWithoutLoss > 0) {
    lines.push(
      `The baseline's loss is unknown on ${m.rowsWithoutLoss} of them (no actual value, or a loss that needs quantiles).`,
    );
  }
  if (examples.length > 0) lines.push(`Examples: ${examples.join('; ')}.`);
  const rows = (groups: readonly MissingRowsGroup[]) =>
    groups.map((g) => [
      g.key,
      String(g.rows),
      `${g.first ?? 'n/a'} to ${g.last ?? 'n/a'}`,
      significant(g.meanBaselineLoss),
    ]);
  const header = (what: string) => [what, 'rows lacking', 'time span', 'baseline loss on them'];
  const align = ['left', 'right', 'left', 'right'] as const;
  const tables = [table(header('series'), align, rows(m.bySeries))];
  if (m.byHorizon.length > 1 || report.inputs.horizons.length > 1)
    tables.push(table(header('horizon'), align, rows(m.byHorizon)));
  return { title, lines, tables };
}
