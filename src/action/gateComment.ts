import {
  createIssueComment,
  deleteIssueComment,
  type GitHubClient,
  type IssueComment,
  listIssueComments,
  updateIssueComment,
} from './githubApi.js';
import { sameLogin } from './postingIdentity.js';
import type { RepositoryRef } from './runnerEnvironment.js';

/**
 * The gate's own comment on a pull request: one per pull request and comparison name, written
 * by the identity the action posts as, and edited in place on every later run.
 *
 * The hidden first line identifies it for one named comparison, e.g.
 * `<!-- skillgate:gate=nightly%20load -->`. The name is percent-encoded byte by byte, keeping
 * only letters, digits, `.` and `_`, so it can never contain `-`, `>` or a line break: no
 * name can end the HTML comment early, and two names never give the same marker (the closing
 * ` -->` also keeps one marker from being a prefix of another).
 */
export function commentMarker(name: string): string {
  return `<!-- skillgate:gate=${encodeName(name)} -->`;
}

export function encodeName(name: string): string {
  let out = '';
  for (const byte of new TextEncoder().encode(name)) {
    const ch = String.fromCharCode(byte);
    out += /[A-Za-z0-9._]/.test(ch) ? ch : `%${byte.toString(16).toUpperCase().padStart(2, '0')}`;
  }
  return out;
}

/**
 * A body carries the gate's marker only when the marker opens it, alone on its line (ended by
 * LF, or by CRLF as a comment edited in the browser comes back). Text that merely quotes the
 * marker (renderMarkdown escapes `<` in input strings anyway) does not count. Who wrote the
 * comment is checked separately (`publishGateComment`).
 */
export function carriesMarker(body: string, marker: string): boolean {
  if (!body.startsWith(marker)) return false;
  const rest = body.slice(marker.length);
  return rest === '' || rest.startsWith('\n') || rest.startsWith('\r\n');
}

export function gateCommentBody(marker: string, markdown: string): string {
  return `${marker}\n${markdown}`;
}

export interface PublishResult {
  readonly action: 'created' | 'updated';
  readonly id: number;
  readonly url: string;
  /** Older comments of the gate's own that were removed (left by an interrupted or parallel run). */
  readonly removed: number;
}

export interface PublishOptions {
  /** The login the action posts as (see postingIdentity.ts): only its comments are edited. */
  readonly author: string;
  /**
   * The advice appended to the warning when a created comment's author is not `author`, given
   * that author (e.g. to set the comment-author input).
   */
  readonly authorFix?: (written: string) => string;
  /**
   * How long to wait before creating again after a failed create (attempt 0, 1, …), or null to
   * give up and rethrow. Only called for failures after which the create may or may not have
   * happened (a server error, a timeout, a rate limit).
   */
  readonly retryWait: (error: unknown, attempt: number) => number | null;
  readonly sleep: (ms: number) => Promise<void>;
  readonly info: (message: string) => void;
  readonly warning: (message: string) => void;
}

/**
 * Puts `body` (which must start with `marker`) into the gate's own comment on the pull request:
 *
 * 1. All the pull request's comments are listed; the gate's own are those that carry `marker`
 *    AND were written by `options.author`. A comment anyone else wrote is never edited, even if
 *    it carries the marker (it is counted in the log, so a squatter is visible).
 * 2. None: the comment is created (POST, which is not idempotent and so never retried blindly).
 *    When the create fails in a way that may have reached GitHub anyway (a 5xx, a timeout, a
 *    dropped connection), the comments are listed again and the create is repeated only if
 *    none of the gate's own has appeared.
 * 3. The newest of the gate's own comments (highest id: GitHub's comment ids increase) holds
 *    the report; any others (from a run that was interrupted, or ran at the same time) are
 *    deleted. Two runs racing on one pull request both converge on the newest comment.
 */
export async function publishGateComment(
  client: GitHubClient,
  repository: RepositoryRef,
  issueNumber: number,
  marker: string,
  body: string,
  options: PublishOptions,
): Promise<PublishResult> {
  const listOwn = async (): Promise<IssueComment[]> => {
    const marked = await listIssueComments(client, repository, issueNumber, (b) =>
      carriesMarker(b, marker),
    );
    const own = marked.filter((c) => sameLogin(c.author, options.author));
    const foreign = marked.length - own.length;
    if (foreign > 0) {
      options.info(
        `skillgate: ignored ${foreign} comment${foreign === 1 ? '' : 's'} carrying this gate's marker but not written by ${options.author}`,
      );
    }
    return own;
  };

  let own = await listOwn();
  let created: IssueComment | null = null;
  if (own.length === 0) {
    const outcome = await createOnce(client, repository, issueNumber, body, listOwn, options);
    if (outcome.kind === 'created') {
      created = outcome.comment;
      if (!sameLogin(created.author, options.author)) {
        const written = created.author || 'an unknown user';
        const fix =
          options.authorFix?.(written) ??
          "Use the workflow's token or a personal access token for github-token.";
        options.warning(
          `skillgate: the comment was written as ${written}, not as ${options.author}; later runs will not recognise it and will post again. ${fix}`,
        );
        return { action: 'created', id: created.id, url: created.url, removed: 0 };
      }
      // Another run may have created one at the same time: list again and converge.
      own = await listOwn();
      if (!own.some((c) => c.id === created?.id)) own = [...own, created];
    } else {
      own = outcome.own;
    }
  }

  const newest = own.reduce((a, b) => (b.id > a.id ? b : a));
  let kept: IssueComment = newest;
  if (created === null || newest.id !== created.id) {
    kept = await updateIssueComment(client, repository, newest.id, body);
  }
  const older = own.filter((c) => c.id !== newest.id);
  for (const comment of older) await deleteIssueComment(client, repository, comment.id);
  if (older.length > 0) {
    options.info(
      `skillgate: removed ${older.length} older comment${older.length === 1 ? '' : 's'} of this gate`,
    );
  }
  return {
    action: created !== null && newest.id === created.id ? 'created' : 'updated',
    id: kept.id,
    url: kept.url,
    removed: older.length,
  };
}

type CreateOutcome =
  | { readonly kind: 'created'; readonly comment: IssueComment }
  | { readonly kind: 'found'; readonly own: IssueComment[] };

async function createOnce(
  client: GitHubClient,
  repository: RepositoryRef,
  issueNumber: number,
  body: string,
  listOwn: () => Promise<IssueComment[]>,
  options: PublishOptions,
): Promise<CreateOutcome> {
  for (let attempt = 0; ; attempt += 1) {
    try {
      return {
        kind: 'created',
        comment: await createIssueComment(client, repository, issueNumber, body),
      };
    } catch (error) {
      const wait = options.retryWait(error, attempt);
      if (wait === null) throw error;
      options.info(
        `skillgate: creating the comment failed (${describeFailure(error)}); checking whether it was created before trying again`,
      );
      await options.sleep(wait);
      const own = await listOwn();
      if (own.length > 0) return { kind: 'found', own };
    }
  }
}

function describeFailure(error: unknown): string {
  const status = (error as { status?: unknown }).status;
  if (typeof status === 'number') return `GitHub answered ${status}`;
  return error instanceof Error ? error.message : String(error);
}
