import { InputError } from '../core/inputError.js';
import type { ForecastTable, LabelColumn } from '../reading/forecastTable.js';
import { checkCandidateName } from './candidateList.js';

/**
 * One long forecast file with a model column → one table per model, each as if read from its own
 * file (rows in file order, physical line numbers kept, so later errors still name the right
 * line). The file is read with the model column in the table's `path` slot (see
 * readCandidates.ts), so `table.path` holds the model labels; each part has no path column.
 * Labels of the other text columns are re-interned per part, so a part lists only its own.
 * Model names are checked (`checkCandidateName`): they come from the file and end up in comments.
 */
export function splitByModel(table: ForecastTable): Map<string, ForecastTable> {
  const models = table.path;
  if (models === null) throw new Error('splitByModel needs the model labels in the path slot');
  const rowsOf = new Map<number, number[]>();
  for (let i = 0; i < table.size; i++) {
    const id = models.ids[i]!;
    let rows = rowsOf.get(id);
    if (rows === undefined) {
      rows = [];
      rowsOf.set(id, rows);
    }
    rows.push(i);
  }
  const out = new Map<string, ForecastTable>();
  for (const [id, rows] of rowsOf) {
    const name = models.labels[id]!;
    try {
      checkCandidateName(name, `model column "${models.column}"`);
    } catch (error) {
      if (error instanceof InputError) {
        throw new InputError(error.message, {
          file: table.summary.path,
          line: models.firstLines[id]!,
          column: models.column,
          value: name,
        });
      }
      throw error;
    }
    out.set(name, subset(table, rows));
  }
  return out;
}

function subset(table: ForecastTable, rows: readonly number[]): ForecastTable {
  const n = rows.length;
  const lines = Int32Array.from(rows, (i) => table.lines[i]!);
  const pick = (values: Float64Array) => Float64Array.from(rows, (i) => values[i]!);
  const labels = (column: LabelColumn | null): LabelColumn | null => {
    if (column === null) return null;
    const remap = new Map<number, number>();
    const names: string[] = [];
    const firstLines: number[] = [];
    const ids = new Int32Array(n);
    rows.forEach((i, r) => {
      const old = column.ids[i]!;
      let id = remap.get(old);
      if (id === undefined) {
        id = names.length;
        remap.set(old, id);
        names.push(column.labels[old]!);
        firstLines.push(table.lines[i]!);
      }
      ids[r] = id;
    });
    return { column: column.column, ids, labels: names, firstLines: Int32Array.from(firstLines) };
  };
  return {
    summary: { ...table.summary, rows: n },
    size: n,
    lines,
    series: labels(table.series),
    timestamp: labels(table.timestamp)!,
    horizon:
      table.horizon === null
        ? null
        : {
            column: table.horizon.column,
            values: Int32Array.from(rows, (i) => table.horizon!.values[i]!),
          },
    origin: labels(table.origin),
    path: null,
    actual:
      table.actual === null
        ? null
        : { column: table.actual.column, values: pick(table.actual.values) },
    prediction:
      table.prediction === null
        ? null
        : { column: table.prediction.column, values: pick(table.prediction.values) },
    weight:
      table.weight === null
        ? null
        : { column: table.weight.column, values: pick(table.weight.values) },
    quantiles: table.quantiles.map((q) => ({ ...q, values: pick(q.values) })),
  };
}
