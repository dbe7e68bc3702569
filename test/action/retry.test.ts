import { describe, expect, it } from 'vitest';
import type { GitHubClient } from '../../src/action/githubApi.js';
import {
  ApiBudgetError,
  ApiTimeoutError,
  createRetryWait,
  installRetries,
  isRateLimited,
  type RetryPolicy,
  retryDelay,
  withRetries,
} from '../../src/action/retry.js';

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

describe('rate limits', () => {
  const withMessage = (status: number, message: string, headers: Record<string, string> = {}) =>
    Object.assign(new Error(message), { status, response: { headers, data: { message } } });
  it('a 403 is a rate limit only with its headers or its message', () => {
    expect(isRateLimited(httpError(403))).toBe(false);
    expect(isRateLimited(withMessage(403, 'Resource not accessible by integration'))).toBe(false);
    expect(isRateLimited(httpError(403, { 'x-ratelimit-remaining': '0' }))).toBe(true);
    expect(isRateLimited(httpError(403, { 'retry-after': '5' }))).toBe(true);
    expect(isRateLimited(withMessage(403, 'You have exceeded a secondary rate limit.'))).toBe(true);
    expect(isRateLimited(httpError(429))).toBe(true);
    expect(isRateLimited(httpError(502))).toBe(false);
  });
  it('a secondary rate limit without Retry-After waits a minute, as GitHub advises', () => {
    expect(retryDelay(withMessage(403, 'secondary rate limit'), 0, policy)).toBe(60_000);
  });
  it('a timed-out request is retried with backoff', () => {
    expect(retryDelay(new ApiTimeoutError('GET /x', 30_000), 1, policy)).toBe(2000);
  });
});

/** A client whose only part is the request hook, as octokit calls it. */
function hookedClient() {
  let wrapped:
    | ((
        request: (o: unknown) => Promise<unknown>,
        options: Record<string, unknown>,
      ) => Promise<unknown>)
    | null = null;
  const client = {
    hook: {
      wrap: (_name: string, hook: typeof wrapped) => {
        wrapped = hook;
      },
    },
  } as unknown as GitHubClient;
  const call = (
    method: string,
    respond: (options: Record<string, unknown>) => Promise<unknown>,
  ) => {
    const options: Record<string, unknown> = {
      method,
      url: '/repos/{owner}/{repo}/x',
      request: {},
    };
    if (wrapped === null) throw new Error('no hook installed');
    return wrapped(() => respond(options), options);
  };
  return { client, call };
}

describe('installRetries', () => {
  it('retries a GET after a 502, never a POST', async () => {
    const { client, call } = hookedClient();
    installRetries(client, policy, { requestMs: 1000, budgetMs: 60_000 });
    let gets = 0;
    await expect(
      call('GET', async () => {
        gets += 1;
        if (gets === 1) throw httpError(502);
        return 'listed';
      }),
    ).resolves.toBe('listed');
    let posts = 0;
    await expect(
      call('POST', async () => {
        posts += 1;
        throw httpError(502);
      }),
    ).rejects.toMatchObject({ status: 502 });
    expect(posts).toBe(1);
  });

  it('aborts a request after requestMs and names it', async () => {
    const { client, call } = hookedClient();
    installRetries(client, { ...policy, maxRetries: 0 }, { requestMs: 50, budgetMs: 60_000 });
    const never = (options: Record<string, unknown>) =>
      new Promise((_, reject) => {
        const signal = (options.request as { signal: AbortSignal }).signal;
        signal.addEventListener('abort', () =>
          reject(Object.assign(new Error('aborted'), { status: 500 })),
        );
      });
    await expect(call('GET', never)).rejects.toBeInstanceOf(ApiTimeoutError);
  });

  it('starts nothing once the budget is spent', async () => {
    let clock = 0;
    const { client, call } = hookedClient();
    installRetries(client, { ...policy, now: () => clock }, { requestMs: 50, budgetMs: 1000 });
    clock = 1000;
    await expect(call('GET', async () => 'late')).rejects.toBeInstanceOf(ApiBudgetError);
  });

  it('a create is waited for only within the budget', () => {
    let clock = 0;
    const wait = createRetryWait(
      { ...policy, now: () => clock },
      { requestMs: 50, budgetMs: 1500 },
      0,
    );
    expect(wait(httpError(502), 0)).toBe(1000);
    clock = 1000;
    expect(wait(httpError(502), 0)).toBeNull();
    expect(wait(httpError(422), 0)).toBeNull();
  });
});
