import { escapeMarkdown as esc } from './escapeMarkdown.js';

/**
 * A table as the renderers share it: plain-text cells (each renderer escapes them for its
 * medium) and the alignment of each column.
 */
export interface ReportTable {
  readonly header: readonly string[];
  readonly align: readonly ('left' | 'right')[];
  readonly rows: readonly (readonly string[])[];
}

export function table(
  header: readonly string[],
  align: readonly ('left' | 'right')[],
  rows: readonly (readonly string[])[],
): ReportTable {
  return { header, align, rows };
}

/** A GFM table with every cell escaped. */
export function markdownTable(t: ReportTable): string[] {
  const row = (cells: readonly string[]) => `| ${cells.map((c) => esc(c)).join(' | ')} |`;
  return [
    row(t.header),
    `|${t.align.map((a) => (a === 'right' ? '---:' : '---')).join('|')}|`,
    ...t.rows.map(row),
  ];
}
