import type { Bytes } from './utf8.js';

/**
 * Interns key values (series, timestamps, origins, paths) straight from the bytes of a field: a
 * value seen before costs a hash of its bytes and one byte comparison, and no allocation; only a
 * new value is decoded to a string. Ids are dense, in order of first appearance, with the line
 * each value first appeared on.
 *
 * The table is open addressing with linear probing (load ≤ 1/2) over FNV-1a 32-bit hashes
 * (Fowler, Noll and Vo); the bytes of every distinct value are kept once, end to end, in one
 * growing array. Before hashing, the value of the previous call and the value first seen after it
 * are compared: in a file written series by series the series repeats row after row and the
 * timestamps come round in the order they were first seen (and the other way round in a file
 * written time point by time point), so most lookups of a sorted file are one comparison.
 */
export class ByteInterner {
  /** The decoded values, by id. */
  readonly labels: string[] = [];
  /** The physical line each value first appeared on, by id. */
  readonly firstLines: number[] = [];
  private bytes: Uint8Array = new Uint8Array(4096);
  private used = 0;
  private offsets: Int32Array = new Int32Array(256);
  private lengths: Int32Array = new Int32Array(256);
  private hashes: Int32Array = new Int32Array(256);
  private table: Int32Array = new Int32Array(1024);
  private mask = 1023;
  private last = -1;
  private encoded: Uint8Array = new Uint8Array(0);
  private readonly encoder = new TextEncoder();
  private lastText: string | null = null;
  private readonly textIds = new Map<string, number>();
  private lastTextId = -1;

  /** The id of `source[start, end)`, a new one (with `line` as its first line) if unseen. */
  id(source: Bytes, start: number, end: number, line: number): number {
    const length = end - start;
    const last = this.last;
    if (last >= 0 && this.lengths[last] === length && this.equal(last, source, start, length)) {
      return last;
    }
    const after = last + 1;
    if (
      after > 0 &&
      after < this.labels.length &&
      this.lengths[after] === length &&
      this.equal(after, source, start, length)
    ) {
      this.last = after;
      return after;
    }
    let h = 0x811c9dc5;
    for (let i = start; i < end; i++) h = Math.imul(h ^ source[i]!, 0x01000193);
    let slot = h & this.mask;
    for (;;) {
      const stored = this.table[slot]!;
      if (stored === 0) break;
      const id = stored - 1;
      if (
        this.hashes[id] === h &&
        this.lengths[id] === length &&
        this.equal(id, source, start, length)
      ) {
        this.last = id;
        return id;
      }
      slot = (slot + 1) & this.mask;
    }
    const id = this.add(source, start, end, h, line);
    this.table[slot] = id + 1;
    if (2 * this.labels.length > this.table.length) this.rehash();
    this.last = id;
    return id;
  }

  /**
   * The id of a value given as text (a Parquet field), by its UTF-8 bytes; texts seen before are
   * found by a map of their own (ids never change, so it stays right).
   */
  idOfText(text: string, line: number): number {
    if (text === this.lastText) return this.lastTextId;
    let id = this.textIds.get(text);
    if (id === undefined) {
      if (this.encoded.length < 3 * text.length) this.encoded = new Uint8Array(3 * text.length);
      const { written } = this.encoder.encodeInto(text, this.encoded);
      id = this.id(Buffer.from(this.encoded.buffer, 0, written), 0, written, line);
      this.textIds.set(this.labels[id]!, id);
    }
    this.lastText = text;
    this.lastTextId = id;
    return id;
  }

  private equal(id: number, source: Uint8Array, start: number, length: number): boolean {
    const bytes = this.bytes;
    const offset = this.offsets[id]!;
    // From the end: values that differ (dates, numbered names) mostly differ in their last bytes.
    for (let k = length - 1; k >= 0; k--) if (bytes[offset + k] !== source[start + k]) return false;
    return true;
  }

  private add(source: Bytes, start: number, end: number, hash: number, line: number): number {
    const id = this.labels.length;
    const length = end - start;
    if (this.used + length > this.bytes.length) {
      const next = new Uint8Array(Math.max(2 * this.bytes.length, this.used + length));
      next.set(this.bytes.subarray(0, this.used));
      this.bytes = next;
    }
    if (id === this.offsets.length) {
      this.offsets = grown(this.offsets);
      this.lengths = grown(this.lengths);
      this.hashes = grown(this.hashes);
    }
    this.bytes.set(source.subarray(start, end), this.used);
    this.offsets[id] = this.used;
    this.lengths[id] = length;
    this.hashes[id] = hash;
    this.used += length;
    this.labels.push(source.toString('utf8', start, end));
    this.firstLines.push(line);
    return id;
  }

  private rehash(): void {
    const table = new Int32Array(this.table.length * 2);
    const mask = table.length - 1;
    for (let id = 0; id < this.labels.length; id++) {
      let slot = this.hashes[id]! & mask;
      while (table[slot] !== 0) slot = (slot + 1) & mask;
      table[slot] = id + 1;
    }
    this.table = table;
    this.mask = mask;
  }
}

function grown(array: Int32Array): Int32Array {
  const next = new Int32Array(array.length * 2);
  next.set(array);
  return next;
}
