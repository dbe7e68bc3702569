import type { RandomSource } from '../src/random/randomSource.js';

/**
 * Standard normal draws by the Box–Muller transform (Box & Muller 1958) from the injected uniform
 * source: each pair of uniforms (u in (0, 1], v in [0, 1)) gives √(−2 ln u)·cos(2πv), returned
 * first, and √(−2 ln u)·sin(2πv), kept for the next call. The simulation studies of validation/
 * share it, so a design's draws depend only on its random stream.
 */
export function normalSampler(random: RandomSource): () => number {
  let spare: number | null = null;
  return () => {
    if (spare !== null) {
      const s = spare;
      spare = null;
      return s;
    }
    const u = 1 - random.nextDouble();
    const v = random.nextDouble();
    const r = Math.sqrt(-2 * Math.log(u));
    spare = r * Math.sin(2 * Math.PI * v);
    return r * Math.cos(2 * Math.PI * v);
  };
}
