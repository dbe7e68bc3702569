/**
 * Strict number parsing for input values. `Number(text)` alone is too lenient for data: it turns
 * "" and " " into 0, accepts hexadecimal ("0x1f"), binary and octal prefixes, surrounding
 * whitespace and "Infinity". Here a value is a decimal number with optional sign, fraction and
 * exponent, nothing else, and it must be finite.
 *
 * Example: parseDecimal("-1.5e3") === -1500; parseDecimal(" 1") and parseDecimal("0x10") are NaN.
 */
export function parseDecimal(text: string): number {
  const n = text.length;
  if (n === 0) return Number.NaN;
  // Fast path: [-+]digits[.digits] with at most 15 digits. The digits form an integer m < 2^53
  // and the value is m / 10^k with k ≤ 15; both are exact doubles and IEEE division rounds
  // correctly, so the result is bit for bit what Number(text) gives.
  if (n <= 17) {
    let i = 0;
    let c = text.charCodeAt(0);
    const negative = c === 45;
    if (negative || c === 43) i = 1;
    let mantissa = 0;
    let digits = 0;
    let scale = -1;
    for (; i < n; i++) {
      c = text.charCodeAt(i);
      if (c >= 48 && c <= 57) {
        mantissa = mantissa * 10 + (c - 48);
        digits++;
      } else if (c === 46 && scale < 0) {
        scale = i;
      } else break;
    }
    if (i === n && digits > 0 && digits <= 15) {
      const fraction = scale < 0 ? 0 : n - 1 - scale;
      const value = fraction === 0 ? mantissa : mantissa / POWERS_OF_TEN[fraction]!;
      return negative ? -value : value;
    }
  }
  const first = text.charCodeAt(0);
  // First character: digit, sign or '.'; rules out whitespace, "Infinity", "NaN".
  if (!(isDigit(first) || first === 45 /* - */ || first === 43 /* + */ || first === 46) /* . */)
    return Number.NaN;
  // Last character: digit or '.'; rules out trailing whitespace and "-Infinity".
  const last = text.charCodeAt(n - 1);
  if (!(isDigit(last) || last === 46)) return Number.NaN;
  // Radix prefixes 0x / 0b / 0o (Number() accepts them only without a sign).
  if (first === 48 && n > 2) {
    const second = text.charCodeAt(1) | 0x20;
    if (second === 120 || second === 98 || second === 111) return Number.NaN;
  }
  const value = +text;
  return Number.isFinite(value) ? value : Number.NaN;
}

const POWERS_OF_TEN = [
  1, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15,
];

function isDigit(code: number): boolean {
  return code >= 48 && code <= 57;
}

/**
 * A horizon: a whole number ≥ 1 that fits an Int32. Plain digits take a fast path; otherwise any
 * decimal that equals a whole number ("1.0", "2e0") is accepted. Returns 0 when invalid.
 */
export function parseHorizon(text: string): number {
  const n = text.length;
  if (n > 0 && n <= 9) {
    let value = 0;
    let i = 0;
    for (; i < n; i++) {
      const c = text.charCodeAt(i);
      if (c < 48 || c > 57) break;
      value = value * 10 + (c - 48);
    }
    if (i === n) return value >= 1 ? value : 0;
  }
  const value = parseDecimal(text);
  return Number.isInteger(value) && value >= 1 && value <= 2147483647 ? value : 0;
}
