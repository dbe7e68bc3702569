import { type KeyColumns, type KeyPart, partColumn } from './keyLayout.js';
import { sortByKey } from './keyOrder.js';

/** Key codes, one per row: 32-bit when they fit (the usual case), else exact doubles. */
export type KeyCodes = Uint32Array | Float64Array;

/**
 * One number per row that orders and matches rows as their whole key does: keys compare as
 * their codes compare, and equal keys have equal codes, across all the files given. Then sorting,
 * duplicate checks and joins compare one number per row instead of a key part by part.
 *
 * The code is the mixed-radix number of the part ids (series most significant) when the product
 * of the parts' cardinalities is below 2^53, so every code is exact (held in 32 bits up to 2^32);
 * otherwise (many origins × paths × …) it is the rank of the key among the distinct keys of all
 * the files, found by sorting them together (sortByKey).
 */
export function keyCodes(parts: readonly KeyPart[], keys: readonly KeyColumns[]): KeyCodes[] {
  let product = 1;
  for (const part of parts) product *= part.cardinality;
  if (product <= 2 ** 32) return mixedRadix(parts, keys, (n) => new Uint32Array(n));
  if (product <= Number.MAX_SAFE_INTEGER) {
    return mixedRadix(parts, keys, (n) => new Float64Array(n));
  }
  let total = 0;
  for (const k of keys) total += k.size;
  return denseRanks(parts, keys, total);
}

function mixedRadix(
  parts: readonly KeyPart[],
  keys: readonly KeyColumns[],
  allocate: (size: number) => KeyCodes,
): KeyCodes[] {
  // Parts with one id add nothing; the others are folded in two at a time, one pass per pair.
  const used = parts.filter((part) => part.cardinality > 1);
  return keys.map((k) => {
    const codes = allocate(k.size);
    for (let p = 0; p < used.length; p += 2) {
      const a = partColumn(k, used[p]!.name);
      const radixA = used[p]!.cardinality;
      const second = used[p + 1];
      if (second === undefined) {
        for (let i = 0; i < k.size; i++) codes[i] = codes[i]! * radixA + a[i]!;
        continue;
      }
      const b = partColumn(k, second.name);
      const radixB = second.cardinality;
      if (p === 0) for (let i = 0; i < k.size; i++) codes[i] = a[i]! * radixB + b[i]!;
      else {
        for (let i = 0; i < k.size; i++) codes[i] = (codes[i]! * radixA + a[i]!) * radixB + b[i]!;
      }
    }
    return codes;
  });
}

function denseRanks(
  parts: readonly KeyPart[],
  keys: readonly KeyColumns[],
  total: number,
): KeyCodes[] {
  // All files' rows in one list, part by part.
  const components = parts.map((part) => {
    const values = new Int32Array(total);
    let at = 0;
    for (const k of keys) {
      values.set(partColumn(k, part.name), at);
      at += k.size;
    }
    return { values, cardinality: part.cardinality };
  });
  const { order } = sortByKey(total, components);
  // At most `total` distinct keys: ranks fit in 32 bits.
  const rank = new Uint32Array(total);
  let current = -1;
  for (let i = 0; i < total; i++) {
    const row = order[i]!;
    if (i === 0 || !sameKey(components, order[i - 1]!, row)) current++;
    rank[row] = current;
  }
  let at = 0;
  return keys.map((k) => {
    const codes = rank.slice(at, at + k.size);
    at += k.size;
    return codes;
  });
}

function sameKey(
  components: readonly { readonly values: Int32Array }[],
  a: number,
  b: number,
): boolean {
  for (const { values } of components) if (values[a] !== values[b]) return false;
  return true;
}
