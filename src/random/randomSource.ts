import { xoroshiro128plusFromState } from 'pure-rand/generator/xoroshiro128plus';
import { splitMix64Words } from './splitMix64.js';

/**
 * A seeded stream of uniform random numbers. Every random computation in skillgate takes one of
 * these as a parameter; nothing reads a global generator.
 */
export interface RandomSource {
  /** A uniform integer on 0..2^32 − 1 (one 32-bit word). */
  nextUint32(): number;
  /**
   * A uniform double on [0, 1) with 53 random bits, built from two words:
   * (a >>> 5) · 2^26 + (b >>> 6), divided by 2^53. The high bits of each word are kept, because
   * the lowest bits of xoroshiro128+ are its weakest (Blackman & Vigna 2021).
   */
  nextDouble(): number;
}

/** Builds the random source for a seed and a stream number; injected into the bootstraps. */
export type RandomSourceFactory = (seed: number, stream: number) => RandomSource;

const TWO_POW_26 = 67108864;
const TWO_POW_MINUS_53 = 1 / 9007199254740992;

/**
 * Streams first, first + 1, first + 2, … of one seed, handed out in that order: the way the
 * bootstraps walk their work units. `next()` returns the next stream's source.
 */
export interface RandomStreams {
  next(): RandomSource;
}

/**
 * A factory may also say how to walk its streams in order more cheaply than one call per stream
 * (the project's factory jumps once from stream k to k + 1 instead of k + 1 times from stream 0).
 * Whatever the walk, stream k must be exactly `factory(seed, k)`.
 */
export type SequentialRandomSourceFactory = RandomSourceFactory & {
  readonly sequence?: (seed: number, first: number) => RandomStreams;
};

/**
 * Streams first, first + 1, … of `factory` for `seed`: through the factory's own `sequence` when it
 * has one, else one `factory(seed, k)` call per stream. Stream k is `factory(seed, k)` either way.
 */
export function randomStreams(
  factory: SequentialRandomSourceFactory,
  seed: number,
  first: number,
): RandomStreams {
  if (factory.sequence !== undefined) return factory.sequence(seed, first);
  let stream = first;
  return { next: () => factory(seed, stream++) };
}

/**
 * The project's random source: xoroshiro128+ (Blackman & Vigna 2021, "Scrambled linear
 * pseudorandom number generators", ACM TOMS 47(4)), as implemented by pure-rand, with its 128-bit
 * state filled by SplitMix64 (Steele, Lea & Flood 2014) from the seed, as the generator's authors
 * recommend; stream k is that generator advanced by k calls of the xoroshiro128+ jump function,
 * i.e. by k · 2^64 steps, so streams never overlap in practice.
 *
 * Conventions: `seed` is an integer 0 ≤ seed ≤ 2^53 − 1 (every such seed gives its own state);
 * `stream` an integer ≥ 0. Creating stream k on its own costs k jumps (about 1.5 µs each);
 * walking streams in order with `createRandomStreams` (or `randomStreams(createRandomSource, …)`)
 * costs one jump per stream, so S streams cost O(S) jumps, not O(S²). Every 64-bit xoroshiro128+
 * output gives two `nextUint32` words, its high half then its low half (`Xoroshiro128PlusSource`).
 * The numbers depend on nothing but
 * (seed, stream): same on every machine and platform.
 *
 * Example: `createRandomSource(42).nextUint32()` is always the same number (see the golden-value
 * test), and `createRandomSource(42, 1)` continues 2^64 steps further along the same sequence.
 */
export function createRandomSource(seed: number, stream = 0): RandomSource {
  return createRandomStreams(seed, stream).next();
}
createRandomSource.sequence = createRandomStreams;

/**
 * Streams first, first + 1, … of `createRandomSource(seed, ·)`: the generator is advanced to stream
 * `first` once (first jumps), and each later stream is one jump from the one before.
 *
 * Example: `createRandomStreams(7, 3)` yields sources equal to `createRandomSource(7, 3)`,
 * `createRandomSource(7, 4)`, … (checked by a property test).
 */
export function createRandomStreams(seed: number, first = 0): RandomStreams {
  if (!Number.isSafeInteger(seed) || seed < 0) {
    throw new RangeError(`seed must be an integer between 0 and 2^53 − 1, got ${seed}`);
  }
  if (!Number.isSafeInteger(first) || first < 0) {
    throw new RangeError(`stream must be a non-negative integer, got ${first}`);
  }
  // pure-rand's state layout is [high word of s0, low word of s0, high word of s1, low word of s1].
  const [s0High, s0Low, s1High, s1Low] = splitMix64Words(seed, 2);
  const cursor = xoroshiro128plusFromState([s0High!, s0Low!, s1High!, s1Low!]);
  for (let k = 0; k < first; k++) cursor.jump();
  let started = false;
  return {
    next: () => {
      if (started) cursor.jump();
      started = true;
      return sourceOf(cursor.clone());
    },
  };
}

const TWO_POW_32 = 4294967296;

/**
 * The project's random source as a plain class over the xoroshiro128+ state, so that hot loops
 * (the stationary bootstrap's kernel, `resampleDeviationsInline`) can run the same generator
 * inlined, with the state in local variables, and hand it back here afterwards.
 *
 * Words: each 64-bit output x_k = s0 + s1 (mod 2^64) gives two 32-bit words, its high half first,
 * then its low half: word 2k is ⌊x_k / 2^32⌋, word 2k + 1 is x_k mod 2^32. `nextUint32` returns
 * the next word; `nextDouble` builds a double from the next two words a, b as
 * ((a >>> 5)·2^26 + (b >>> 6))/2^53. Using both halves of every output halves the generator's
 * work per word; the high half is xoroshiro128+'s best, and of the low half the block bootstrap
 * uses the top bits (Lemire's product, the alias column), never the weak lowest bits alone
 * (Blackman & Vigna 2021, §10: only the lowest bits fail linearity tests).
 *
 * State layout as pure-rand's: s01/s00 are the high/low words of s0, s11/s10 those of s1
 * (signed 32-bit integers); `pending` holds the low word of the last output (as a signed 32-bit
 * integer, so it never needs a heap number) while `hasPending`.
 */
export class Xoroshiro128PlusSource implements RandomSource {
  s01: number;
  s00: number;
  s11: number;
  s10: number;
  pending = 0;
  hasPending = false;

  constructor(state: readonly number[]) {
    this.s01 = state[0]! | 0;
    this.s00 = state[1]! | 0;
    this.s11 = state[2]! | 0;
    this.s10 = state[3]! | 0;
  }

  nextUint32(): number {
    if (this.hasPending) {
      this.hasPending = false;
      return this.pending >>> 0;
    }
    const s00 = this.s00;
    const s01 = this.s01;
    const s10 = this.s10;
    const s11 = this.s11;
    const low = (s00 >>> 0) + (s10 >>> 0);
    const carry = low >= TWO_POW_32 ? 1 : 0;
    this.pending = low | 0;
    this.hasPending = true;
    const high = (s01 + s11 + carry) >>> 0;
    const a0 = s10 ^ s00;
    const a1 = s11 ^ s01;
    this.s00 = (s00 << 24) ^ (s01 >>> 8) ^ a0 ^ (a0 << 16);
    this.s01 = (s01 << 24) ^ (s00 >>> 8) ^ a1 ^ ((a1 << 16) | (a0 >>> 16));
    this.s10 = (a1 << 5) ^ (a0 >>> 27);
    this.s11 = (a0 << 5) ^ (a1 >>> 27);
    return high;
  }

  nextDouble(): number {
    const a = this.nextUint32() >>> 5;
    const b = this.nextUint32() >>> 6;
    return (a * TWO_POW_26 + b) * TWO_POW_MINUS_53;
  }
}

function sourceOf(generator: ReturnType<typeof xoroshiro128plusFromState>): RandomSource {
  return new Xoroshiro128PlusSource(generator.getState());
}
