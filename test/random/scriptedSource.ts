import type { RandomSource } from '../../src/random/randomSource.js';

/** A RandomSource that replays given numbers, then fails loudly; counts what was drawn. */
export function scriptedSource(uint32: number[], doubles: number[] = []) {
  const drawn = { uint32: 0, doubles: 0 };
  const source: RandomSource = {
    nextUint32() {
      const x = uint32[drawn.uint32++];
      if (x === undefined) throw new Error('scripted source ran out of nextUint32 values');
      return x;
    },
    nextDouble() {
      const u = doubles[drawn.doubles++];
      if (u === undefined) throw new Error('scripted source ran out of nextDouble values');
      return u;
    },
  };
  return { source, drawn };
}
