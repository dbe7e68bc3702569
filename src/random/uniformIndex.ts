import type { RandomSource } from './randomSource.js';

const TWO_POW_32 = 4294967296;
/** Up to this n, x · n < 2^53 for every 32-bit x, so Lemire's product is exact in a double. */
const LEMIRE_LIMIT = 2097152; // 2^21

/**
 * A uniform integer on 0..n − 1, exactly uniform.
 *
 * For n ≤ 2^21: Lemire's multiply-and-reject method (Lemire 2019, "Fast random integer generation
 * in an interval", ACM TOMACS 29(1)): with x = `nextUint32`, m = x·n, the answer is
 * ⌊m / 2^32⌋ unless m mod 2^32 < 2^32 mod n, in which case x is drawn again (probability < n/2^32,
 * so almost always one step). The product is exact in a double since x·n < 2^53.
 * For 2^21 < n ≤ 2^32: bitmask rejection — the top ⌈log2 n⌉ bits of `nextUint32`, drawn again while
 * ≥ n (Devroye 1986, "Non-Uniform Random Variate Generation", ch. II); fewer than 2 steps on average.
 *
 * Conventions: n an integer, 1 ≤ n ≤ 2^32 (not checked: a hot path; callers check). n = 1 returns
 * 0 without drawing.
 *
 * Example: `uniformIndex(createRandomSource(42), 10)` is an integer in 0..9, always the same one.
 */
export function uniformIndex(random: RandomSource, n: number): number {
  if (n <= 1) return 0;
  if (n <= LEMIRE_LIMIT) {
    let m = random.nextUint32() * n;
    let high = Math.floor(m / TWO_POW_32);
    let low = m - high * TWO_POW_32;
    if (low < n) {
      const threshold = TWO_POW_32 % n;
      while (low < threshold) {
        m = random.nextUint32() * n;
        high = Math.floor(m / TWO_POW_32);
        low = m - high * TWO_POW_32;
      }
    }
    return high;
  }
  const shift = Math.clz32(n - 1);
  for (;;) {
    const candidate = shift === 0 ? random.nextUint32() : random.nextUint32() >>> shift;
    if (candidate < n) return candidate;
  }
}
