/**
 * A set of real numbers as a sorted list of disjoint pieces, each an interval whose ends may be
 * unbounded (null). The inverted tests of the gate give such sets: usually one bounded piece, a
 * ray or the whole line when the baseline's mean loss is not distinguishable from 0 (Fieller
 * 1954), and in rare cases two pieces. Ends are reported closed; whether a test rejects exactly
 * at an end is a matter of ties (measure zero for continuous references).
 */
export interface IntervalPiece {
  /** null: unbounded below. */
  readonly lower: number | null;
  /** null: unbounded above. */
  readonly upper: number | null;
}

export type IntervalSet = readonly IntervalPiece[];

const lo = (p: IntervalPiece): number => p.lower ?? Number.NEGATIVE_INFINITY;
const hi = (p: IntervalPiece): number => p.upper ?? Number.POSITIVE_INFINITY;
const piece = (lower: number, upper: number): IntervalPiece => ({
  lower: lower === Number.NEGATIVE_INFINITY ? null : lower,
  upper: upper === Number.POSITIVE_INFINITY ? null : upper,
});

/** Sorts and merges overlapping or touching pieces. */
export function normaliseSet(pieces: readonly IntervalPiece[]): IntervalSet {
  const sorted = pieces.filter((p) => lo(p) <= hi(p)).sort((a, b) => lo(a) - lo(b));
  const out: { lower: number; upper: number }[] = [];
  for (const p of sorted) {
    const last = out[out.length - 1];
    if (last !== undefined && lo(p) <= last.upper) last.upper = Math.max(last.upper, hi(p));
    else out.push({ lower: lo(p), upper: hi(p) });
  }
  return out.map((p) => piece(p.lower, p.upper));
}

export function unionOfSets(a: IntervalSet, b: IntervalSet): IntervalSet {
  return normaliseSet([...a, ...b]);
}

export function intersectionOfSets(a: IntervalSet, b: IntervalSet): IntervalSet {
  const out: IntervalPiece[] = [];
  for (const p of a) {
    for (const q of b) {
      const lower = Math.max(lo(p), lo(q));
      const upper = Math.min(hi(p), hi(q));
      if (lower <= upper) out.push(piece(lower, upper));
    }
  }
  return normaliseSet(out);
}

/** x ↦ x + shift applied to every end (unbounded ends stay unbounded). */
export function shiftSet(set: IntervalSet, shift: number): IntervalSet {
  return set.map((p) => ({
    lower: p.lower === null ? null : p.lower + shift,
    upper: p.upper === null ? null : p.upper + shift,
  }));
}

export function setContains(set: IntervalSet, x: number): boolean {
  return set.some((p) => lo(p) <= x && x <= hi(p));
}

/** The smallest interval holding the set (its convex hull); null for the empty set. */
export function hullOfSet(set: IntervalSet): IntervalPiece | null {
  const first = set[0];
  const last = set[set.length - 1];
  if (first === undefined || last === undefined) return null;
  return { lower: first.lower, upper: last.upper };
}

/** The complement on the real line (ends kept closed on both sides: a boundary of measure 0). */
export function complementOfSet(set: IntervalSet): IntervalSet {
  const out: IntervalPiece[] = [];
  let from = Number.NEGATIVE_INFINITY;
  for (const p of normaliseSet(set)) {
    if (lo(p) > from) out.push(piece(from, lo(p)));
    from = hi(p);
  }
  if (from < Number.POSITIVE_INFINITY) out.push(piece(from, Number.POSITIVE_INFINITY));
  return out;
}
