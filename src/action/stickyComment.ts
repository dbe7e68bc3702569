import {
  createIssueComment,
  findIssueComment,
  type GitHubClient,
  updateIssueComment,
} from './githubApi.js';
import type { RepositoryRef } from './runnerEnvironment.js';

/**
 * The hidden first line that identifies skillgate's comment for one named comparison, e.g.
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
 * A comment is ours only when the marker opens the body: text that merely quotes the marker
 * (renderMarkdown escapes `<` in input strings anyway) does not count.
 */
export function isStickyComment(body: string, marker: string): boolean {
  return body.startsWith(`${marker}\n`) || body === marker;
}

export function stickyBody(marker: string, markdown: string): string {
  return `${marker}\n${markdown}`;
}

export interface StickyResult {
  readonly action: 'created' | 'updated';
  readonly id: number;
  readonly url: string;
}

/**
 * Updates the pull request's comment carrying `marker` (searching all its comments, whoever
 * wrote them), or creates it when there is none. `body` must already start with the marker.
 */
export async function upsertStickyComment(
  client: GitHubClient,
  repository: RepositoryRef,
  issueNumber: number,
  marker: string,
  body: string,
): Promise<StickyResult> {
  const existing = await findIssueComment(client, repository, issueNumber, (b) =>
    isStickyComment(b, marker),
  );
  if (existing === null) {
    const created = await createIssueComment(client, repository, issueNumber, body);
    return { action: 'created', id: created.id, url: created.url };
  }
  const updated = await updateIssueComment(client, repository, existing.id, body);
  return { action: 'updated', id: updated.id, url: updated.url };
}
