/**
 * A table as the renderers share it: plain-text cells (each renderer escapes them for its
 * medium), the alignment of each column and an optional caption.
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
