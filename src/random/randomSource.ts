import { xoroshiro128plusFromState } from 'pure-rand/generator/xoroshiro128plus';
import { splitMix64Words } from './splitMix64.js';

/**
 * A seeded stream of uniform random numbers. Every random computation in skillgate takes one of
 * these as a parameter; nothing reads a global generator.
 */
export interface RandomSource {
  /** A uniform integer on 0..2^32 − 1 (one generator step). */
  nextUint32(): number;
  /**
   * A uniform double on [0, 1) with 53 random bits, built from two steps:
   * (a >>> 5) · 2^26 + (b >>> 6), divided by 2^53. The high bits of each step are kept, because
   * the lowest bits of xoroshiro128+ are its weakest (Blackman & Vigna 2021).
   */
  nextDouble(): number;
}

/** Builds the random source for a seed and a stream number; injected into the bootstraps. */
export type RandomSourceFactory = (seed: number, stream: number) => RandomSource;

const TWO_POW_26 = 67108864;
const TWO_POW_MINUS_53 = 1 / 9007199254740992;

/**
 * The project's random source: xoroshiro128+ (Blackman & Vigna 2021, "Scrambled linear
 * pseudorandom number generators", ACM TOMS 47(4)), as implemented by pure-rand, with its 128-bit
 * state filled by SplitMix64 (Steele, Lea & Flood 2014) from the seed, as the generator's authors
 * recommend; stream k is that generator advanced by k calls of the xoroshiro128+ jump function,
 * i.e. by k · 2^64 steps, so streams never overlap in practice.
 *
 * Conventions: `seed` is an integer 0 ≤ seed ≤ 2^53 − 1 (every such seed gives its own state);
 * `stream` an integer ≥ 0 (creating stream k costs k jumps, about 1.5 µs each, so the streams
 * 0..S−1 of one computation cost O(S²) jumps: 0.1 s for S = 400). Each `nextUint32` is the low
 * 32 bits of one 64-bit xoroshiro128+
 * output. The numbers depend on nothing but (seed, stream): same on every machine and platform.
 *
 * Example: `createRandomSource(42).nextUint32()` is always the same number (see the golden-value
 * test), and `createRandomSource(42, 1)` continues 2^64 steps further along the same sequence.
 */
export function createRandomSource(seed: number, stream = 0): RandomSource {
  if (!Number.isSafeInteger(seed) || seed < 0) {
    throw new RangeError(`seed must be an integer between 0 and 2^53 − 1, got ${seed}`);
  }
  if (!Number.isSafeInteger(stream) || stream < 0) {
    throw new RangeError(`stream must be a non-negative integer, got ${stream}`);
  }
  // pure-rand's state layout is [high word of s0, low word of s0, high word of s1, low word of s1].
  const [s0High, s0Low, s1High, s1Low] = splitMix64Words(seed, 2);
  const generator = xoroshiro128plusFromState([s0High!, s0Low!, s1High!, s1Low!]);
  for (let k = 0; k < stream; k++) generator.jump();
  return {
    nextUint32: () => generator.next() >>> 0,
    nextDouble: () => {
      const a = generator.next() >>> 5;
      const b = generator.next() >>> 6;
      return (a * TWO_POW_26 + b) * TWO_POW_MINUS_53;
    },
  };
}
