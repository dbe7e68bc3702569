/** values[rows[p]] for each p: a column reordered (and filtered) to the given rows. */
export function gatherRows(values: Float64Array, rows: Int32Array): Float64Array {
  const out = new Float64Array(rows.length);
  for (let p = 0; p < rows.length; p++) out[p] = values[rows[p]!]!;
  return out;
}

/** gatherRows for integer columns. */
export function gatherIntRows(values: Int32Array, rows: Int32Array): Int32Array {
  const out = new Int32Array(rows.length);
  for (let p = 0; p < rows.length; p++) out[p] = values[rows[p]!]!;
  return out;
}
