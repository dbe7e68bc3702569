/**
 * A set of row keys built while a file is read, to find a repeated key at its second occurrence
 * (rather than after the whole file is in memory: a small gzip file can inflate to gigabytes of
 * one row repeated). A key is a tuple of up to five small integers (interned label ids, the
 * horizon) held in the reader's own columns; the set stores only row indices, in an
 * open-addressing hash table (linear probing, load ≤ 1/2), so it costs at most 8 bytes per row
 * and no objects. The five columns are fixed fields and the hash is unrolled (a column the key
 * does not use repeats the first one).
 *
 * Most files are written in key order, and there no key can repeat: while each row's key is
 * strictly greater than the previous row's — comparing the columns in the given order, or with
 * the first two swapped (files sorted by time, then series) — nothing is hashed. At the first row
 * that breaks both orders, the rows so far are put in the table at once and every later row is
 * looked up, so the answer is the same as hashing from the start, and sorted files skip the
 * random memory accesses of the table (the cost of hashing every row was measured at nearly
 * doubling the reading time of a two-million-row file).
 */
export class RowKeySet {
  private table: Int32Array = new Int32Array(1024);
  private mask = 1023;
  private size = 0;
  private readonly columns: readonly (() => Int32Array)[];
  private c0: Int32Array = EMPTY;
  private c1: Int32Array = EMPTY;
  private c2: Int32Array = EMPTY;
  private c3: Int32Array = EMPTY;
  private c4: Int32Array = EMPTY;
  /** Rows so far strictly increasing in column order, or with the first two columns swapped. */
  private ascending = true;
  private ascendingSwapped = true;
  private hashing = false;

  /**
   * `columns` (one to five) return the reader's current arrays; call refresh() whenever the
   * reader replaces them (it grows them by copying).
   */
  constructor(columns: readonly (() => Int32Array)[]) {
    if (columns.length < 1 || columns.length > 5) throw new Error('a key has 1 to 5 columns');
    this.columns = columns;
    this.refresh();
  }

  /** Takes the reader's current arrays again (after they grew). */
  refresh(): void {
    const cols = this.columns.map((c) => c());
    const first = cols[0]!;
    this.c0 = first;
    this.c1 = cols[1] ?? first;
    this.c2 = cols[2] ?? first;
    this.c3 = cols[3] ?? first;
    this.c4 = cols[4] ?? first;
  }

  /** Adds row `row` (its key already written to the columns); returns an earlier row with the same key, or −1. */
  add(row: number): number {
    if (!this.hashing) {
      if (row === 0) return -1;
      if (this.ascending) this.ascending = this.compare(row - 1, row, false) < 0;
      if (this.ascendingSwapped) this.ascendingSwapped = this.compare(row - 1, row, true) < 0;
      if (this.ascending || this.ascendingSwapped) return -1;
      this.hashing = true;
      for (let r = 0; r < row; r++) this.insert(r);
    }
    return this.insert(row);
  }

  /** Sign of key(a) − key(b), lexicographic in column order (or with c0 and c1 swapped). */
  private compare(a: number, b: number, swapped: boolean): number {
    const first = swapped ? this.c1 : this.c0;
    const second = swapped ? this.c0 : this.c1;
    return (
      first[a]! - first[b]! ||
      second[a]! - second[b]! ||
      this.c2[a]! - this.c2[b]! ||
      this.c3[a]! - this.c3[b]! ||
      this.c4[a]! - this.c4[b]!
    );
  }

  private insert(row: number): number {
    const mask = this.mask;
    const table = this.table;
    let slot = this.hash(row) & mask;
    for (;;) {
      const stored = table[slot]!;
      if (stored === 0) break;
      if (this.same(row, stored - 1)) return stored - 1;
      slot = (slot + 1) & mask;
    }
    table[slot] = row + 1;
    this.size++;
    if (this.size * 2 > table.length) this.grow();
    return -1;
  }

  private same(a: number, b: number): boolean {
    return (
      this.c0[a] === this.c0[b] &&
      this.c1[a] === this.c1[b] &&
      this.c2[a] === this.c2[b] &&
      this.c3[a] === this.c3[b] &&
      this.c4[a] === this.c4[b]
    );
  }

  /** A 32-bit mix of the key (multiply–xorshift steps, as in MurmurHash3's finaliser). */
  private hash(row: number): number {
    let h = Math.imul(this.c0[row]! ^ 0x9e3779b9, 0x85ebca6b);
    h = Math.imul(h ^ (h >>> 15) ^ this.c1[row]!, 0xc2b2ae35);
    h = Math.imul(h ^ (h >>> 13) ^ this.c2[row]!, 0x85ebca6b);
    h = Math.imul(h ^ (h >>> 15) ^ this.c3[row]!, 0xc2b2ae35);
    h = Math.imul(h ^ (h >>> 13) ^ this.c4[row]!, 0x27d4eb2f);
    return (h ^ (h >>> 16)) >>> 0;
  }

  private grow(): void {
    const old = this.table;
    const next = new Int32Array(old.length * 2);
    const mask = next.length - 1;
    for (let i = 0; i < old.length; i++) {
      const stored = old[i]!;
      if (stored === 0) continue;
      let slot = this.hash(stored - 1) & mask;
      while (next[slot] !== 0) slot = (slot + 1) & mask;
      next[slot] = stored;
    }
    this.table = next;
    this.mask = mask;
  }
}

const EMPTY = new Int32Array(0);
