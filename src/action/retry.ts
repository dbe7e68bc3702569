import type { GitHubClient } from './githubApi.js';

/**
 * Retries for REST calls: rate limits (403 or 429 carrying Retry-After, an exhausted
 * x-ratelimit-remaining, or GitHub's "secondary rate limit" message), server errors (5xx) and
 * requests that timed out are retried with exponential backoff, at most `maxRetries` times; a
 * wait longer than `maxWaitMs`, or past the total budget, is not attempted (the error surfaces
 * instead). Everything else (a 403 for missing permission, a 404, a 422) fails at once. Only
 * idempotent requests are retried here: a POST (creating a comment) is never repeated blindly,
 * see gateComment.ts. Sleep and clock are parameters so tests never wait.
 */
export interface RetryPolicy {
  readonly maxRetries: number;
  /** First backoff; doubled on each further retry. */
  readonly baseDelayMs: number;
  readonly maxWaitMs: number;
  readonly sleep: (ms: number) => Promise<void>;
  readonly now: () => number;
  readonly log: (message: string) => void;
}

export const realSleep = (ms: number): Promise<void> =>
  new Promise((resolve) => setTimeout(resolve, ms));

export function defaultRetryPolicy(log: (message: string) => void): RetryPolicy {
  return {
    maxRetries: 3,
    baseDelayMs: 1000,
    maxWaitMs: 60_000,
    sleep: realSleep,
    now: Date.now,
    log,
  };
}

/** Time limits of the API calls of one run: each request, and all of them together. */
export interface ApiTimeouts {
  readonly requestMs: number;
  readonly budgetMs: number;
}

/** Per request 30 s; all requests of one run, retries and waits included, 2 minutes. */
export const DEFAULT_API_TIMEOUTS: ApiTimeouts = { requestMs: 30_000, budgetMs: 120_000 };

/** A request that got no complete answer within its time limit. */
export class ApiTimeoutError extends Error {
  constructor(
    readonly request: string,
    readonly limitMs: number,
  ) {
    super(`GitHub did not answer ${request} within ${formatSeconds(limitMs)}`);
    this.name = 'ApiTimeoutError';
  }
}

/** The run's time for API calls is used up. */
export class ApiBudgetError extends Error {
  constructor(readonly budgetMs: number) {
    super(`the API calls took longer than their budget of ${formatSeconds(budgetMs)}`);
    this.name = 'ApiBudgetError';
  }
}

const formatSeconds = (ms: number): string =>
  ms >= 1000 ? `${Math.round(ms / 1000)} s` : `${ms} ms`;

interface HttpFailure {
  readonly status: number;
  readonly headers: Readonly<Record<string, string | number | undefined>>;
  readonly message: string;
}

function httpFailure(error: unknown): HttpFailure | null {
  if (typeof error !== 'object' || error === null) return null;
  const status = (error as { status?: unknown }).status;
  if (typeof status !== 'number') return null;
  const response = (error as { response?: { headers?: unknown; data?: unknown } }).response;
  const headers =
    typeof response?.headers === 'object' && response.headers !== null
      ? (response.headers as Record<string, string | number | undefined>)
      : {};
  const data = response?.data as { message?: unknown } | undefined;
  const message =
    typeof data?.message === 'string' ? data.message : error instanceof Error ? error.message : '';
  return { status, headers, message };
}

const header = (failure: HttpFailure, name: string): string | undefined => {
  const value = failure.headers[name] ?? failure.headers[name.toLowerCase()];
  return value === undefined ? undefined : String(value);
};

/**
 * True for GitHub's rate-limit refusals: 429, or 403 with Retry-After, an exhausted
 * x-ratelimit-remaining, or a message naming a (secondary) rate limit. Such a 403 says nothing
 * about the token's permissions.
 */
export function isRateLimited(error: unknown): boolean {
  const failure = httpFailure(error);
  if (failure === null) return false;
  if (failure.status === 429) return true;
  return (
    failure.status === 403 &&
    (header(failure, 'retry-after') !== undefined ||
      header(failure, 'x-ratelimit-remaining') === '0' ||
      /rate limit/i.test(failure.message))
  );
}

/**
 * How long to wait before retry number `attempt` (0-based) after `error`, or null when the
 * error is not worth retrying.
 */
export function retryDelay(error: unknown, attempt: number, policy: RetryPolicy): number | null {
  const backoff = policy.baseDelayMs * 2 ** attempt;
  if (error instanceof ApiTimeoutError) return backoff;
  const failure = httpFailure(error);
  if (failure === null) return null;
  const retryAfter = header(failure, 'retry-after');
  const remaining = header(failure, 'x-ratelimit-remaining');
  const reset = header(failure, 'x-ratelimit-reset');
  const rateLimited = isRateLimited(error);
  const serverError = failure.status >= 500 && failure.status <= 599;
  if (!rateLimited && !serverError) return null;

  // GitHub's advice for a secondary rate limit without Retry-After: wait at least a minute.
  let wait = rateLimited && retryAfter === undefined && remaining !== '0' ? 60_000 : backoff;
  if (retryAfter !== undefined && /^\d+$/.test(retryAfter.trim())) {
    wait = Number(retryAfter) * 1000;
  } else if (retryAfter !== undefined && !Number.isNaN(Date.parse(retryAfter))) {
    wait = Math.max(0, Date.parse(retryAfter) - policy.now());
  } else if (remaining === '0' && reset !== undefined && /^\d+$/.test(reset)) {
    wait = Math.max(0, Number(reset) * 1000 - policy.now()) + 1000;
  }
  return wait > policy.maxWaitMs ? null : wait;
}

/** Calls `call`, retrying as the policy allows; the last error is rethrown. */
export async function withRetries<T>(call: () => Promise<T>, policy: RetryPolicy): Promise<T> {
  for (let attempt = 0; ; attempt += 1) {
    try {
      return await call();
    } catch (error) {
      const wait = attempt < policy.maxRetries ? retryDelay(error, attempt, policy) : null;
      if (wait === null) throw error;
      const status = httpFailure(error)?.status;
      policy.log(
        `GitHub answered ${status}; retrying in ${Math.ceil(wait / 1000)} s (retry ${attempt + 1} of ${policy.maxRetries})`,
      );
      await policy.sleep(wait);
    }
  }
}

/**
 * Routes every request of the client (pagination included) through a time limit and, for
 * idempotent methods, through the retries of `policy`. Each attempt is aborted after
 * `timeouts.requestMs`; no attempt starts, and no wait is begun, past `timeouts.budgetMs` from
 * now. A POST gets the time limit but no retry.
 */
export function installRetries(
  client: GitHubClient,
  policy: RetryPolicy,
  timeouts: ApiTimeouts = DEFAULT_API_TIMEOUTS,
): GitHubClient {
  const deadline = policy.now() + timeouts.budgetMs;
  client.hook.wrap('request', async (request, options) => {
    const idempotent = String(options.method).toUpperCase() !== 'POST';
    const name = `${String(options.method).toUpperCase()} ${String(options.url)}`;
    for (let attempt = 0; ; attempt += 1) {
      const remaining = deadline - policy.now();
      if (remaining <= 0) throw new ApiBudgetError(timeouts.budgetMs);
      const limit = Math.min(timeouts.requestMs, remaining);
      const signal = AbortSignal.timeout(limit);
      // Set on `options` itself: an inner hook (the token's) is already bound to this object,
      // so a copy would not reach the request.
      options.request = { ...options.request, signal };
      try {
        return await request(options);
      } catch (error) {
        const failure = signal.aborted ? new ApiTimeoutError(name, limit) : error;
        if (!idempotent) throw failure;
        const wait = attempt < policy.maxRetries ? retryDelay(failure, attempt, policy) : null;
        if (wait === null || wait >= deadline - policy.now()) throw failure;
        policy.log(
          `${retryReason(failure)}; retrying in ${Math.ceil(wait / 1000)} s (retry ${attempt + 1} of ${policy.maxRetries})`,
        );
        await policy.sleep(wait);
      }
    }
  });
  return client;
}

/** The wait before re-trying a create after `error`, within the same limits as installRetries. */
export function createRetryWait(
  policy: RetryPolicy,
  timeouts: ApiTimeouts,
  start: number,
): (error: unknown, attempt: number) => number | null {
  const deadline = start + timeouts.budgetMs;
  return (error, attempt) => {
    const wait = attempt < policy.maxRetries ? retryDelay(error, attempt, policy) : null;
    return wait === null || wait >= deadline - policy.now() ? null : wait;
  };
}

function retryReason(error: unknown): string {
  if (error instanceof ApiTimeoutError) return error.message;
  return `GitHub answered ${httpFailure(error)?.status}`;
}
