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

/**
 * The exact fast path of decimal parsing from bytes (Clinger 1990, "How to read floating point
 * numbers accurately", the first case): a value `[-+]digits[.digits][(e|E)[-+]digits]` whose
 * significant digits form an integer m < 2^53 and whose decimal exponent k satisfies |k| ≤ 22 is
 * m · 10^k or m / 10^−k with both operands exact doubles, so one correctly rounded IEEE operation
 * gives the double nearest the decimal: bit for bit what `Number()` of the same text gives. Zero
 * digits give ±0 whatever the exponent (as `Number()` does). `mark` is the decimal mark's byte
 * (46 for ".", 44 for ","). Returns NaN for everything else — other syntax, longer mantissas,
 * larger exponents — which the caller hands to the text parser (decimalFromBytes).
 */
export function fastDecimal(bytes: Uint8Array, start: number, end: number, mark: number): number {
  return storeDecimal(bytes, start, end, mark, ONE, 0) ? ONE[0]! : Number.NaN;
}

const ONE = new Float64Array(1);

/**
 * fastDecimal that stores the value at `out[at]` and returns whether the fast path applied (false
 * leaves `out[at]` as it was). A stored double is not boxed, so a row of numbers allocates nothing.
 */
export function storeDecimal(
  bytes: Uint8Array,
  start: number,
  end: number,
  mark: number,
  out: Float64Array,
  at: number,
): boolean {
  let i = start;
  if (i >= end) return false;
  let c = bytes[i]!;
  const negative = c === 45;
  if (negative || c === 43) i++;
  let mantissa = 0;
  let significant = 0;
  let digits = 0;
  let exponent = 0;
  let fraction = false;
  for (; i < end; i++) {
    c = bytes[i]!;
    const digit = c - 48;
    if (digit >= 0 && digit <= 9) {
      digits++;
      if (fraction) exponent--;
      if (significant === 0 && digit === 0) continue;
      if (significant >= 15) {
        if (mantissa > 900719925474099) return false;
        const next = mantissa * 10 + digit;
        if (next >= TWO_53) return false;
        mantissa = next;
      } else mantissa = mantissa * 10 + digit;
      significant++;
    } else if (c === mark && !fraction) {
      fraction = true;
    } else break;
  }
  if (digits === 0) return false;
  if (i < end) {
    if ((c | 0x20) !== 101) return false; // e or E
    i++;
    if (i >= end) return false;
    c = bytes[i]!;
    const negativeExponent = c === 45;
    if (negativeExponent || c === 43) i++;
    if (i >= end) return false;
    let written = 0;
    for (; i < end; i++) {
      const digit = bytes[i]! - 48;
      if (digit < 0 || digit > 9) return false;
      if (written < 1000) written = written * 10 + digit;
    }
    exponent += negativeExponent ? -written : written;
  }
  if (mantissa === 0) {
    out[at] = negative ? -0 : 0;
    return true;
  }
  let value: number;
  if (exponent === 0) value = mantissa;
  else if (exponent > 0 && exponent <= 22) value = mantissa * EXACT_POWERS[exponent]!;
  else if (exponent < 0 && exponent >= -22) value = mantissa / EXACT_POWERS[-exponent]!;
  else return false;
  out[at] = negative ? -value : value;
  return true;
}

/**
 * parseDecimal of the UTF-8 text `bytes[start, end)` (parseDecimalComma when `comma`), stored at
 * `out[at]`: the exact fast path when it applies, else the text parser on the decoded slice, so
 * the numbers and the set of accepted texts are those of the text parsers. Returns false (and
 * stores NaN) when the text is refused.
 */
export function storeDecimalFromBytes(
  bytes: Buffer,
  start: number,
  end: number,
  comma: boolean,
  out: Float64Array,
  at: number,
): boolean {
  if (storeDecimal(bytes, start, end, comma ? 44 : 46, out, at)) return true;
  const text = bytes.toString('utf8', start, end);
  const value = comma ? parseDecimalComma(text) : parseDecimal(text);
  out[at] = value;
  return !Number.isNaN(value);
}

/** storeDecimalFromBytes as a returned value (NaN when refused). */
export function decimalFromBytes(
  bytes: Buffer,
  start: number,
  end: number,
  comma: boolean,
): number {
  return storeDecimalFromBytes(bytes, start, end, comma, ONE, 0) ? ONE[0]! : Number.NaN;
}

/** A number written with a decimal comma ("3,25"); a point anywhere makes it NaN. */
export function parseDecimalComma(text: string): number {
  if (text.includes('.')) return Number.NaN;
  return parseDecimal(text.replace(',', '.'));
}

/** parseHorizon of the UTF-8 text `bytes[start, end)`. */
export function horizonFromBytes(bytes: Buffer, start: number, end: number): number {
  const n = end - start;
  if (n > 0 && n <= 9) {
    let value = 0;
    let i = start;
    for (; i < end; i++) {
      const digit = bytes[i]! - 48;
      if (digit < 0 || digit > 9) break;
      value = value * 10 + digit;
    }
    if (i === end) return value >= 1 ? value : 0;
  }
  return parseHorizon(bytes.toString('utf8', start, end));
}

const TWO_53 = 9007199254740992;
/** 10^0 … 10^22: the powers of ten that are exact doubles. */
const EXACT_POWERS = [
  1, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15, 1e16, 1e17,
  1e18, 1e19, 1e20, 1e21, 1e22,
];
