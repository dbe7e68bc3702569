/**
 * Number formatting for humans: 4 significant digits, plain notation for moderate magnitudes,
 * exponent notation for very large or small ones, "n/a" for null. Reports keep full precision in
 * JSON; only renderers round.
 */
export function formatNumber(x: number | null | undefined, digits = 4): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return 'n/a';
  if (x === 0) return '0';
  const magnitude = Math.abs(x);
  if (magnitude >= 1e6 || magnitude < 1e-4) return x.toExponential(digits - 1);
  return String(Number(x.toPrecision(digits)));
}

/** A fraction as a signed percentage, e.g. 0.0312 → "+3.12%". */
export function formatSignedPercent(x: number | null | undefined): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return 'n/a';
  const text = formatNumber(x * 100, 3);
  return `${x > 0 ? '+' : ''}${text}%`;
}

/** A p-value: four decimals, with its ends as "< 0.0001" and "> 0.9999". */
export function formatPValue(p: number | null | undefined): string {
  if (p === null || p === undefined || !Number.isFinite(p)) return 'n/a';
  if (p < 0.0001) return '< 0.0001';
  if (p > 0.9999) return '> 0.9999';
  return p.toFixed(4);
}
