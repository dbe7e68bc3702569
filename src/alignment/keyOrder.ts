import type { KeyCodes } from './keyCodes.js';

/**
 * Orders rows by a composite key of small non-negative integers, most significant first, with a
 * least-significant-digit radix sort: one stable counting sort per key component, O(rows +
 * distinct values) each. Equal keys keep their input order, so duplicates come out adjacent and
 * in file order.
 */
export interface KeyComponent {
  /** Value per row, each in 0..cardinality−1. */
  readonly values: Int32Array;
  readonly cardinality: number;
}

/** Rows in key order, and (when the rows' key codes were given) the codes in that order. */
export interface KeyOrder {
  readonly order: Int32Array;
  /** codes[order[i]], carried along by the sort so later passes read them in order; or null. */
  readonly sorted: KeyCodes | null;
}

/**
 * The row order that sorts the key. `codes`, when given, are the rows' key codes (see keyCodes):
 * if they are already ascending (files are often written in key order) the identity is the
 * answer without sorting, and they come back in key order. A component on which the rows are
 * already in order (a file written time point by time point, for the timestamp) costs one check
 * and no pass.
 */
export function sortByKey(
  size: number,
  components: readonly KeyComponent[],
  codes: KeyCodes | null = null,
): KeyOrder {
  let order = new Int32Array(size);
  for (let i = 0; i < size; i++) order[i] = i;
  if (codes !== null && isAscending(codes)) return { order, sorted: codes };
  // The codes are read, never written: the sorted copies go to buffers of their own.
  let sorted = codes;
  let next = new Int32Array(size);
  let spare: KeyCodes | null = null;
  for (let c = components.length - 1; c >= 0; c--) {
    const { values, cardinality } = components[c]!;
    if (cardinality <= 1 || isAscendingIn(values, order)) continue; // the pass would not move a row
    const starts = new Int32Array(cardinality + 1);
    for (let i = 0; i < size; i++) starts[values[i]! + 1]!++;
    for (let v = 0; v < cardinality; v++) starts[v + 1]! += starts[v]!;
    if (sorted === null) {
      for (let i = 0; i < size; i++) {
        const row = order[i]!;
        next[starts[values[row]!]!++] = row;
      }
    } else {
      const target: KeyCodes =
        spare ?? (sorted instanceof Uint32Array ? new Uint32Array(size) : new Float64Array(size));
      for (let i = 0; i < size; i++) {
        const row = order[i]!;
        const at = starts[values[row]!]!++;
        next[at] = row;
        target[at] = sorted[i]!;
      }
      spare = sorted === codes ? null : sorted;
      sorted = target;
    }
    [order, next] = [next, order];
  }
  return { order, sorted };
}

function isAscending(codes: KeyCodes): boolean {
  for (let i = 1; i < codes.length; i++) if (codes[i - 1]! > codes[i]!) return false;
  return true;
}

/** Whether values[order[i]] never decreases: a stable sort by values would keep the order. */
function isAscendingIn(values: Int32Array, order: Int32Array): boolean {
  for (let i = 1; i < order.length; i++) {
    if (values[order[i - 1]!]! > values[order[i]!]!) return false;
  }
  return true;
}
