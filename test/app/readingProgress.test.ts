import { describe, expect, it } from 'vitest';
import type { Progress } from '../../src/app/progress.js';
import { readingProgress } from '../../src/app/readingProgress.js';

describe('readingProgress', () => {
  it('reports one stage naming each role once, at the mean of the files’ fractions', () => {
    const seen: Progress[] = [];
    const progress = readingProgress(['candidate', 'candidate', 'baseline'], (p) => seen.push(p));
    progress.forFile(1)(50, 100);
    progress.forFile(0)(100, 100);
    progress.forFile(2)(0, 0);
    expect(seen.map((p) => p.stage)).toEqual([
      'reading candidate, baseline',
      'reading candidate, baseline',
      'reading candidate, baseline',
    ]);
    expect(seen.map((p) => p.fraction)).toEqual([0.5 / 3, 1.5 / 3, 2.5 / 3]);
  });

  it('never goes back whichever file reports, and ends at 1', () => {
    const fractions: number[] = [];
    const progress = readingProgress(['baseline', 'candidate'], (p) => fractions.push(p.fraction));
    for (let step = 1; step <= 4; step++) {
      progress.forFile(1)(step * 25, 100);
      progress.forFile(0)(step * 10, 40);
    }
    expect(fractions).toEqual([...fractions].sort((a, b) => a - b));
    expect(fractions.at(-1)).toBe(1);
  });
});
