/**
 * A set of row keys built while a file is read, to find a repeated key at its second occurrence
 * (rather than after the whole file is in memory: a small gzip file can inflate to gigabytes of
 * one row repeated). A key is a tuple of small integers (interned label ids, the horizon) held in
 * the reader's own columns; the set stores only row indices, in an open-addressing hash table
 * (linear probing, load ≤ 1/2), so it costs 8 bytes per row at most and no objects.
 */
export class RowKeySet {
  private table: Int32Array = new Int32Array(1024);
  private mask = 1023;
  private size = 0;
  private readonly columns: readonly (() => Int32Array)[];

  /** `columns` return the reader's current arrays (they are replaced as the reader grows). */
  constructor(columns: readonly (() => Int32Array)[]) {
    this.columns = columns;
  }

  /** Adds row `row` (its key already written to the columns); returns an earlier row with the same key, or −1. */
  add(row: number): number {
    const cols = this.columns.map((c) => c());
    let slot = hashRow(cols, row) & this.mask;
    const table = this.table;
    for (;;) {
      const stored = table[slot]!;
      if (stored === 0) break;
      const other = stored - 1;
      if (sameKey(cols, row, other)) return other;
      slot = (slot + 1) & this.mask;
    }
    table[slot] = row + 1;
    this.size++;
    if (this.size * 2 > this.table.length) this.grow(cols);
    return -1;
  }

  private grow(cols: readonly Int32Array[]): void {
    const next = new Int32Array(this.table.length * 2);
    const mask = next.length - 1;
    for (const stored of this.table) {
      if (stored === 0) continue;
      let slot = hashRow(cols, stored - 1) & mask;
      while (next[slot] !== 0) slot = (slot + 1) & mask;
      next[slot] = stored;
    }
    this.table = next;
    this.mask = mask;
  }
}

function sameKey(cols: readonly Int32Array[], a: number, b: number): boolean {
  for (const c of cols) if (c[a] !== c[b]) return false;
  return true;
}

/** A 32-bit mix of the key's components (multiply–xorshift, as in MurmurHash3's finaliser). */
function hashRow(cols: readonly Int32Array[], row: number): number {
  let h = 0x9e3779b9;
  for (const c of cols) {
    h = Math.imul(h ^ c[row]!, 0x85ebca6b);
    h ^= h >>> 13;
  }
  h = Math.imul(h, 0xc2b2ae35);
  return (h ^ (h >>> 16)) >>> 0;
}
