import type { GitHubClient } from './githubApi.js';

/**
 * Retries for REST calls: rate limits (403 or 429 carrying Retry-After or an exhausted
 * x-ratelimit-remaining) and server errors (5xx) are retried with exponential backoff, at most
 * `maxRetries` times; a wait longer than `maxWaitMs` is not attempted (the error surfaces
 * instead). Everything else (a 403 for missing permission, a 404, a 422) fails at once. Sleep
 * and clock are parameters so tests never wait.
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

interface HttpFailure {
  readonly status: number;
  readonly headers: Readonly<Record<string, string | number | undefined>>;
}

function httpFailure(error: unknown): HttpFailure | null {
  if (typeof error !== 'object' || error === null) return null;
  const status = (error as { status?: unknown }).status;
  if (typeof status !== 'number') return null;
  const response = (error as { response?: { headers?: unknown } }).response;
  const headers =
    typeof response?.headers === 'object' && response.headers !== null
      ? (response.headers as Record<string, string | number | undefined>)
      : {};
  return { status, headers };
}

/**
 * How long to wait before retry number `attempt` (0-based) after `error`, or null when the
 * error is not worth retrying.
 */
export function retryDelay(error: unknown, attempt: number, policy: RetryPolicy): number | null {
  const failure = httpFailure(error);
  if (failure === null) return null;
  const header = (name: string): string | undefined => {
    const value = failure.headers[name] ?? failure.headers[name.toLowerCase()];
    return value === undefined ? undefined : String(value);
  };
  const retryAfter = header('retry-after');
  const remaining = header('x-ratelimit-remaining');
  const reset = header('x-ratelimit-reset');
  const rateLimited =
    (failure.status === 403 || failure.status === 429) &&
    (retryAfter !== undefined || remaining === '0' || failure.status === 429);
  const serverError = failure.status >= 500 && failure.status <= 599;
  if (!rateLimited && !serverError) return null;

  const backoff = policy.baseDelayMs * 2 ** attempt;
  let wait = backoff;
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

/** Routes every request of the client (pagination included) through withRetries. */
export function installRetries(client: GitHubClient, policy: RetryPolicy): GitHubClient {
  client.hook.wrap('request', (request, options) =>
    withRetries(async () => request(options), policy),
  );
  return client;
}
