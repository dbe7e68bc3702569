/**
 * Which pull request, if any, the comment belongs to, decided from the event alone (no API):
 *
 * - pull_request / pull_request_target: the event's pull request. A pull_request from a fork
 *   runs with a read-only token, so the plan says so instead of attempting a doomed write.
 * - push: the open pull request whose head is the pushed commit must be looked up; a tag push
 *   comments nowhere.
 * - workflow_run (the fork-safe poster): the pull request whose head is the triggering run's
 *   commit; an explicit number is only accepted once its head commit is checked to match.
 * - workflow_dispatch and anything else: the `pull-request` input, or no comment.
 */
export type CommentPlan =
  | { readonly kind: 'pull-request'; readonly number: number }
  | { readonly kind: 'read-only'; readonly number: number; readonly reason: string }
  | { readonly kind: 'commit'; readonly sha: string }
  | {
      readonly kind: 'workflow-run';
      readonly runId: string;
      readonly headSha: string;
      /** "owner:branch" of the triggering run's head, for GET /pulls?head=. */
      readonly head: string | null;
      readonly number: number | null;
    }
  | { readonly kind: 'none'; readonly reason: string };

export function planComment(
  eventName: string,
  payload: unknown,
  pullRequestInput: number | null,
  envSha: string | null,
): CommentPlan {
  const event = record(payload);
  switch (eventName) {
    case 'pull_request':
    case 'pull_request_target': {
      const pr = record(event.pull_request);
      const number = pullRequestInput ?? positiveInteger(pr.number);
      if (number === null)
        return { kind: 'none', reason: `the ${eventName} event has no pull-request number` };
      const headRepo = text(record(record(pr.head).repo).full_name);
      const baseRepo = text(record(record(pr.base).repo).full_name);
      if (eventName === 'pull_request' && headRepo !== baseRepo) {
        return {
          kind: 'read-only',
          number,
          reason: `pull request #${number} comes from a fork (${headRepo ?? 'a deleted repository'}), so this run's token is read-only`,
        };
      }
      return { kind: 'pull-request', number };
    }
    case 'workflow_run': {
      const run = record(event.workflow_run);
      const headSha = text(run.head_sha);
      const runId = run.id === undefined ? null : String(run.id);
      if (headSha === null || runId === null) {
        return { kind: 'none', reason: 'the workflow_run event lacks the head commit of the run' };
      }
      const owner = text(record(record(run.head_repository).owner).login);
      const branch = text(run.head_branch);
      const listed = Array.isArray(run.pull_requests)
        ? run.pull_requests.map((p) => positiveInteger(record(p).number)).find((n) => n !== null)
        : undefined;
      return {
        kind: 'workflow-run',
        runId,
        headSha,
        head: owner !== null && branch !== null ? `${owner}:${branch}` : null,
        number: pullRequestInput ?? listed ?? null,
      };
    }
    case 'push': {
      const ref = text(event.ref) ?? '';
      if (ref.startsWith('refs/tags/'))
        return { kind: 'none', reason: `a tag push (${ref}) belongs to no pull request` };
      if (pullRequestInput !== null) return { kind: 'pull-request', number: pullRequestInput };
      const sha = text(event.after) ?? envSha;
      if (sha === null || /^0+$/.test(sha))
        return { kind: 'none', reason: 'the push event names no commit' };
      return { kind: 'commit', sha };
    }
    default:
      if (pullRequestInput !== null) return { kind: 'pull-request', number: pullRequestInput };
      return {
        kind: 'none',
        reason: `no pull request to comment on for a ${eventName || 'local'} run (set the 'pull-request' input to pick one)`,
      };
  }
}

function record(value: unknown): Record<string, unknown> {
  return typeof value === 'object' && value !== null ? (value as Record<string, unknown>) : {};
}

function text(value: unknown): string | null {
  return typeof value === 'string' && value !== '' ? value : null;
}

function positiveInteger(value: unknown): number | null {
  return typeof value === 'number' && Number.isSafeInteger(value) && value > 0 ? value : null;
}
