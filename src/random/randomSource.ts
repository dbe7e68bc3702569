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
 * costs one jump per stream, so S streams cost O(S) jumps, not O(S²). Each `nextUint32` is the
 * low 32 bits of one 64-bit xoroshiro128+ output. The numbers depend on nothing but
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

type Generator = ReturnType<typeof xoroshiro128plusFromState>;

function sourceOf(generator: Generator): RandomSource {
  return {
    nextUint32: () => generator.next() >>> 0,
    nextDouble: () => {
      const a = generator.next() >>> 5;
      const b = generator.next() >>> 6;
      return (a * TWO_POW_26 + b) * TWO_POW_MINUS_53;
    },
  };
}
