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

export function sortByKey(size: number, components: readonly KeyComponent[]): Int32Array {
  let order = new Int32Array(size);
  for (let i = 0; i < size; i++) order[i] = i;
  // Files are often written in key order already: then the identity is the answer.
  let sorted = true;
  for (let i = 1; i < size && sorted; i++)
    sorted = compareKeys(components, i - 1, components, i) <= 0;
  if (sorted) return order;
  let next = new Int32Array(size);
  for (let c = components.length - 1; c >= 0; c--) {
    const { values, cardinality } = components[c]!;
    if (cardinality <= 1) continue;
    const starts = new Int32Array(cardinality + 1);
    for (let i = 0; i < size; i++) starts[values[i]! + 1]!++;
    for (let v = 0; v < cardinality; v++) starts[v + 1]! += starts[v]!;
    for (let i = 0; i < size; i++) {
      const row = order[i]!;
      next[starts[values[row]!]!++] = row;
    }
    const swap = order;
    order = next;
    next = swap;
  }
  return order;
}

/** Compares the keys of row a and row b on the first `depth` components. */
export function compareKeys(
  components: readonly KeyComponent[],
  a: number,
  other: readonly KeyComponent[],
  b: number,
  depth: number = components.length,
): number {
  for (let c = 0; c < depth; c++) {
    const d = components[c]!.values[a]! - other[c]!.values[b]!;
    if (d !== 0) return d;
  }
  return 0;
}
