import { describe, expect, it } from 'vitest';
import type { LossSeries } from '../../src/aggregation/lossSeries.js';
import { InputError } from '../../src/core/inputError.js';
import { describeSpan } from '../../src/stability/describeSpan.js';
import { lastPoints } from '../../src/stability/recentComparison.js';
import { parseRecentWindow, recentPoints } from '../../src/stability/recentWindow.js';

describe('parseRecentWindow / recentPoints', () => {
  it('reads N and P%, and takes ⌈P·n⌉ points', () => {
    expect(parseRecentWindow('', '--recent')).toBeNull();
    expect(parseRecentWindow('36', '--recent')).toEqual({ kind: 'points', points: 36 });
    const share = parseRecentWindow('15%', '--recent')!;
    expect(recentPoints(share, 240)).toBe(36);
    expect(recentPoints(share, 200)).toBe(30);
    expect(recentPoints(share, 1001)).toBe(151);
    expect(recentPoints({ kind: 'points', points: 500 }, 240)).toBe(240);
  });
  it('refuses anything else with the option named', () => {
    for (const bad of ['0%', '100%', '1', '-3', '12.5', 'x%', '15 %']) {
      expect(() => parseRecentWindow(bad, '--recent')).toThrow(InputError);
    }
  });
});

describe('lastPoints', () => {
  it('keeps the last points and counts their rows', () => {
    const series: LossSeries = {
      time: Int32Array.from([0, 2, 3, 5]),
      baseline: Float64Array.from([1, 2, 3, 4]),
      candidate: Float64Array.from([2, 3, 4, 5]),
      rows: Int32Array.from([4, 3, 2, 1]),
      rowCount: 10,
      maxHorizon: 2,
    };
    const tail = lastPoints(series, 2);
    expect(Array.from(tail.time)).toEqual([3, 5]);
    expect(Array.from(tail.candidate)).toEqual([4, 5]);
    expect(tail.rowCount).toBe(3);
    expect(tail.maxHorizon).toBe(2);
  });
});

describe('describeSpan', () => {
  it('speaks in days, weeks or months for dates, in time points otherwise', () => {
    expect(describeSpan('2026-09-24', '2026-10-29', 36, 'datetime')).toBe('5 weeks');
    expect(describeSpan('2026-09-14', '2026-10-25', 42, 'datetime')).toBe('6 weeks');
    expect(describeSpan('2026-10-20', '2026-10-29', 10, 'datetime')).toBe('10 days');
    expect(describeSpan('2026-01-01', '2026-06-30', 181, 'datetime')).toBe('6 months');
    expect(describeSpan('170', '200', 31, 'number')).toBe('31 time points');
  });
});
