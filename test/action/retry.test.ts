import { describe, expect, it } from 'vitest';
import { type RetryPolicy, retryDelay, withRetries } from '../../src/action/retry.js';

const waits: number[] = [];
const policy: RetryPolicy = {
  maxRetries: 3,
  baseDelayMs: 1000,
  maxWaitMs: 60_000,
  sleep: async (ms) => {
    waits.push(ms);
  },
  now: () => 1_700_000_000_000,
  log: () => undefined,
};
const httpError = (status: number, headers: Record<string, string> = {}) =>
  Object.assign(new Error(`HTTP ${status}`), { status, response: { headers } });

describe('retryDelay', () => {
  it('retries server errors with exponential backoff', () => {
    expect([0, 1, 2].map((a) => retryDelay(httpError(502), a, policy))).toEqual([1000, 2000, 4000]);
  });
  it('honours Retry-After (seconds) on 429, 403 and 5xx', () => {
    expect(retryDelay(httpError(429, { 'retry-after': '7' }), 0, policy)).toBe(7000);
    expect(retryDelay(httpError(403, { 'retry-after': '3' }), 0, policy)).toBe(3000);
    expect(retryDelay(httpError(503, { 'retry-after': '0' }), 2, policy)).toBe(0);
  });
  it('waits for x-ratelimit-reset when the primary limit is exhausted', () => {
    const reset = String(1_700_000_000 + 20);
    expect(
      retryDelay(
        httpError(403, { 'x-ratelimit-remaining': '0', 'x-ratelimit-reset': reset }),
        0,
        policy,
      ),
    ).toBe(21_000);
  });
  it('does not retry a permission 403, a 404 or a 422, nor waits beyond the bound', () => {
    expect(retryDelay(httpError(403), 0, policy)).toBeNull();
    expect(retryDelay(httpError(404), 0, policy)).toBeNull();
    expect(retryDelay(httpError(422), 0, policy)).toBeNull();
    expect(retryDelay(httpError(429, { 'retry-after': '3600' }), 0, policy)).toBeNull();
    expect(retryDelay(new Error('no status'), 0, policy)).toBeNull();
  });
});

describe('withRetries', () => {
  it('gives up after maxRetries and rethrows the last error', async () => {
    waits.length = 0;
    let calls = 0;
    await expect(
      withRetries(async () => {
        calls += 1;
        throw httpError(500);
      }, policy),
    ).rejects.toMatchObject({ status: 500 });
    expect(calls).toBe(4);
    expect(waits).toEqual([1000, 2000, 4000]);
  });
  it('returns the first success', async () => {
    waits.length = 0;
    let calls = 0;
    const value = await withRetries(async () => {
      calls += 1;
      if (calls < 3) throw httpError(429, { 'retry-after': '1' });
      return 'ok';
    }, policy);
    expect(value).toBe('ok');
    expect(waits).toEqual([1000, 1000]);
  });
});
