const MASK_64 = (1n << 64n) - 1n;
const GOLDEN_GAMMA = 0x9e3779b97f4a7c15n;

/**
 * The first `count` outputs of SplitMix64 (Steele, Lea & Flood 2014, "Fast splittable
 * pseudorandom number generators", OOPSLA; the 64-bit finaliser constants of Vigna's reference
 * `splitmix64.c`) started at `seed`, each as two signed 32-bit words [high, low], flattened.
 *
 * Used only to turn a small integer seed into a well-mixed generator state, so seeds 0, 1, 2, …
 * give unrelated streams. Conventions: `seed` a non-negative safe integer; arithmetic mod 2^64.
 *
 * Example: `splitMix64Words(0, 1)` is `[-501176263, 2065550767]`, the words 0xe220a839 and
 * 0x7b1dcdaf of SplitMix64's first output from state 0.
 */
export function splitMix64Words(seed: number, count: number): number[] {
  let state = BigInt(seed) & MASK_64;
  const words: number[] = [];
  for (let i = 0; i < count; i++) {
    state = (state + GOLDEN_GAMMA) & MASK_64;
    let z = state;
    z = ((z ^ (z >> 30n)) * 0xbf58476d1ce4e5b9n) & MASK_64;
    z = ((z ^ (z >> 27n)) * 0x94d049bb133111ebn) & MASK_64;
    z = z ^ (z >> 31n);
    words.push(Number(BigInt.asIntN(32, z >> 32n)), Number(BigInt.asIntN(32, z)));
  }
  return words;
}
