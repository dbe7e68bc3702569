import { describe, expect, it } from 'vitest';
import { neweyWestBandwidth, selectLag } from '../../src/statistics/neweyWestLag.js';
import { expectClose } from '../helpers/tolerance.js';

/** A deterministic AR(1)-like series by formula (no RNG): x_t = 0.6 x_{t−1} + sin(t²/7). */
function formulaSeries(n: number): Float64Array {
  const x = new Float64Array(n);
  let previous = 0;
  for (let t = 0; t < n; t++) {
    previous = 0.6 * previous + Math.sin((t * t) / 7);
    x[t] = previous;
  }
  return x;
}

describe('neweyWestBandwidth', () => {
  it('[1, 2, 3, 4]: m = 1, s0 = 1.875, s1 = 0.625, bandwidth 1.1447 (1/9)^{1/3} 4^{1/3} (by hand)', () => {
    // m = ⌊4 (0.04)^{2/9}⌋ = ⌊1.95⌋ = 1; σ_0 = 1.25, σ_1 = 0.3125
    const bw = neweyWestBandwidth(new Float64Array([1, 2, 3, 4]));
    expect(bw.pilotLag).toBe(1);
    expect(bw.s0).toBe(1.875);
    expect(bw.s1).toBe(0.625);
    expectClose(
      bw.bandwidth,
      1.1447 * (1 / 9) ** (1 / 3) * 4 ** (1 / 3),
      { relative: 1e-14 },
      'bandwidth',
    );
  });

  it('pilot lag m = ⌊4 (n/100)^{2/9}⌋: 4 at n = 100, 5 at n = 298 (hand arithmetic)', () => {
    expect(neweyWestBandwidth(formulaSeries(100)).pilotLag).toBe(4);
    expect(neweyWestBandwidth(formulaSeries(298)).pilotLag).toBe(5); // 4·2.98^{2/9} = 5.10
  });

  it('uses |s1/s0|: a negative ratio gives a positive bandwidth', () => {
    // x_t = e_t − 0.5 e_{t−1}, e_t = sin(t²/7): σ_1 < 0 < s0, so s1 < 0 < s0
    const e = (t: number) => Math.sin((t * t) / 7);
    const ma = Float64Array.from({ length: 50 }, (_, t) => e(t + 1) - 0.5 * e(t));
    const bw = neweyWestBandwidth(ma);
    expect(bw.s0).toBeGreaterThan(0);
    expect(bw.s1 / bw.s0).toBeLessThan(0);
    expectClose(
      bw.bandwidth,
      1.1447 * Math.abs(bw.s1 / bw.s0) ** (2 / 3) * 50 ** (1 / 3),
      { relative: 1e-12 },
      'bandwidth from |s1/s0|',
    );
  });
});

describe('selectLag', () => {
  const x = formulaSeries(60);

  it('horizon rule: h − 1', () => {
    expect(selectLag(x, { kind: 'horizon' }, 1)).toEqual({ lag: 0, rule: 'horizon', notes: [] });
    expect(selectLag(x, { kind: 'horizon' }, 5).lag).toBe(4);
  });

  it('auto rule: ⌊bandwidth⌋, with the pilot quantities reported', () => {
    const choice = selectLag(x, { kind: 'auto' }, 1);
    expect(choice.bandwidth).toEqual(neweyWestBandwidth(x));
    expect(choice.lag).toBe(Math.floor(choice.bandwidth!.bandwidth));
    expect(choice.notes).toEqual([]);
  });

  it('auto rule: raised to h − 1 when the bandwidth is smaller, with a note', () => {
    const floorLag = Math.floor(neweyWestBandwidth(x).bandwidth);
    const h = floorLag + 4;
    const choice = selectLag(x, { kind: 'auto' }, h);
    expect(choice.lag).toBe(h - 1);
    expect(choice.notes.join(' ')).toContain(`below h − 1 = ${h - 1}`);
  });

  it('every rule is capped at n − 1, with a note', () => {
    const short = formulaSeries(5);
    expect(selectLag(short, { kind: 'horizon' }, 9).lag).toBe(4);
    expect(selectLag(short, { kind: 'auto' }, 9).lag).toBe(4);
    const fixed = selectLag(short, { kind: 'fixed', lag: 7 }, 1);
    expect(fixed.lag).toBe(4);
    expect(fixed.notes.join(' ')).toContain('exceeds n − 1 = 4');
  });

  it('fixed rule: kept below h − 1, with a warning note', () => {
    const choice = selectLag(x, { kind: 'fixed', lag: 1 }, 4);
    expect(choice.lag).toBe(1);
    expect(choice.notes.join(' ')).toContain('below h − 1 = 3');
    expect(selectLag(x, { kind: 'fixed', lag: 3 }, 4).notes).toEqual([]);
  });

  it('rejects invalid horizons and lags', () => {
    expect(() => selectLag(x, { kind: 'horizon' }, 0)).toThrow(RangeError);
    expect(() => selectLag(x, { kind: 'horizon' }, 1.5)).toThrow(RangeError);
    expect(() => selectLag(x, { kind: 'fixed', lag: -1 }, 1)).toThrow(RangeError);
    expect(() => selectLag(x, { kind: 'fixed', lag: 2.5 }, 1)).toThrow(RangeError);
  });
});
