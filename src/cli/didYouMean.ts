/**
 * The known name closest to a mistyped one, when it is close enough to be a likely typo: edit
 * distance (Levenshtein 1966: insertions, deletions, substitutions) at most 2, or a third of the
 * name's length for long names. Null when nothing is that close.
 */
export function closestName(typed: string, known: readonly string[]): string | null {
  let best: string | null = null;
  let bestDistance = Number.POSITIVE_INFINITY;
  for (const name of known) {
    const d = editDistance(typed, name);
    if (d < bestDistance) {
      best = name;
      bestDistance = d;
    }
  }
  const allowed = Math.max(2, Math.floor(typed.length / 3));
  return bestDistance <= allowed ? best : null;
}

/** Levenshtein distance by the two-row dynamic programme, O(|a|·|b|). */
export function editDistance(a: string, b: string): number {
  let previous = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const current = [i];
    for (let j = 1; j <= b.length; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      current[j] = Math.min(previous[j]! + 1, current[j - 1]! + 1, previous[j - 1]! + cost);
    }
    previous = current;
  }
  return previous[b.length]!;
}
