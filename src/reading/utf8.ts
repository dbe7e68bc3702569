/**
 * UTF-8 helpers for the byte-level reader: the length a byte range has as a JavaScript string,
 * decoding a range without a broken last character, and turning text chunks into UTF-8 bytes
 * when a chunk may end between the two halves of a surrogate pair.
 */

/** The byte array type the readers work on (a Node Buffer, so ranges decode natively). */
export type Bytes = Buffer;

/** A Buffer view of `bytes` (no copy). */
export function asBytes(bytes: Uint8Array): Bytes {
  return Buffer.isBuffer(bytes) ? bytes : Buffer.from(bytes.buffer, bytes.byteOffset, bytes.length);
}

/**
 * The number of UTF-16 code units the valid UTF-8 in `bytes[start, end)` decodes to: one per
 * byte that does not continue a character, one more for each four-byte character.
 */
export function utf16Length(bytes: Uint8Array, start: number, end: number): number {
  let units = 0;
  for (let i = start; i < end; i++) {
    const b = bytes[i]!;
    if ((b & 0xc0) !== 0x80) units += b >= 0xf0 ? 2 : 1;
  }
  return units;
}

/** Decodes `bytes[start, end)`, leaving out a character cut by `end`. */
export function decodeUtf8(bytes: Bytes, start: number, end: number): string {
  return bytes.toString('utf8', start, completeEnd(bytes, start, end));
}

/** `end`, moved back to the start of a multi-byte character the range would cut. */
function completeEnd(bytes: Uint8Array, start: number, end: number): number {
  let k = end;
  while (k > start && end - k < 3 && (bytes[k - 1]! & 0xc0) === 0x80) k--;
  if (k === start) return end;
  const lead = bytes[k - 1]!;
  const length = lead >= 0xf0 ? 4 : lead >= 0xe0 ? 3 : lead >= 0xc0 ? 2 : 1;
  return end - (k - 1) < length ? k - 1 : end;
}

/**
 * Encodes successive text chunks as UTF-8. A chunk that ends with the first half of a surrogate
 * pair keeps it for the next chunk, so the bytes are those of the whole text however it is cut.
 */
export class Utf8Encoder {
  private pending = '';

  encode(text: string): Bytes {
    let whole = this.pending.length > 0 ? this.pending + text : text;
    this.pending = '';
    const last = whole.charCodeAt(whole.length - 1);
    if (last >= 0xd800 && last <= 0xdbff) {
      this.pending = whole.slice(-1);
      whole = whole.slice(0, -1);
    }
    return Buffer.from(whole, 'utf8');
  }

  /** Bytes of a half pair left at the end (as U+FFFD, what UTF-8 can hold of it), or none. */
  flush(): Bytes {
    const rest = this.pending;
    this.pending = '';
    return Buffer.from(rest, 'utf8');
  }
}
