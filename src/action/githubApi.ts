import type { getOctokit } from '@actions/github';
import type { RepositoryRef } from './runnerEnvironment.js';

/**
 * The REST calls the action makes, one small function each. Each takes the client as a
 * parameter, so tests hand in a fake; none keeps state between calls.
 */
export type GitHubClient = ReturnType<typeof getOctokit>;

export interface IssueComment {
  readonly id: number;
  readonly body: string;
  readonly url: string;
  /** Login of the comment's author ('' when GitHub gives none, e.g. a deleted account). */
  readonly author: string;
}

export interface PullRequestRef {
  readonly number: number;
  readonly state: string;
  readonly headSha: string;
}

/** Comments per page when listing: GitHub's maximum. */
export const COMMENTS_PER_PAGE = 100;

/**
 * Walks ALL comments of an issue or pull request, page by page (the client follows the Link
 * headers), and returns those whose body satisfies `matches`, oldest first. At most `maxPages`
 * pages are read, so a runaway listing cannot loop forever.
 */
export async function listIssueComments(
  client: GitHubClient,
  repository: RepositoryRef,
  issueNumber: number,
  matches: (body: string) => boolean,
  maxPages = 500,
): Promise<IssueComment[]> {
  let pages = 0;
  const found: IssueComment[] = [];
  const iterator = client.paginate.iterator(client.rest.issues.listComments, {
    ...repository,
    issue_number: issueNumber,
    per_page: COMMENTS_PER_PAGE,
  });
  for await (const page of iterator) {
    for (const comment of page.data) {
      const body = comment.body ?? '';
      if (matches(body)) found.push(toComment(comment));
    }
    pages += 1;
    if (pages >= maxPages) break;
  }
  return found;
}

function toComment(data: {
  id: number;
  body?: string | undefined;
  html_url: string;
  user?: { login?: string } | null;
}): IssueComment {
  return { id: data.id, body: data.body ?? '', url: data.html_url, author: data.user?.login ?? '' };
}

export async function createIssueComment(
  client: GitHubClient,
  repository: RepositoryRef,
  issueNumber: number,
  body: string,
): Promise<IssueComment> {
  const { data } = await client.rest.issues.createComment({
    ...repository,
    issue_number: issueNumber,
    body,
  });
  return toComment(data);
}

export async function updateIssueComment(
  client: GitHubClient,
  repository: RepositoryRef,
  commentId: number,
  body: string,
): Promise<IssueComment> {
  const { data } = await client.rest.issues.updateComment({
    ...repository,
    comment_id: commentId,
    body,
  });
  return toComment(data);
}

/** DELETE /repos/{owner}/{repo}/issues/comments/{comment_id}; a comment already gone is fine. */
export async function deleteIssueComment(
  client: GitHubClient,
  repository: RepositoryRef,
  commentId: number,
): Promise<void> {
  try {
    await client.rest.issues.deleteComment({ ...repository, comment_id: commentId });
  } catch (error) {
    if ((error as { status?: unknown }).status !== 404) throw error;
  }
}

/**
 * GET /user: the login the token acts as, or null when GitHub refuses to say (401, 403 or 404,
 * as it does for the workflow's installation token, which is not a user).
 */
export async function authenticatedLogin(client: GitHubClient): Promise<string | null> {
  try {
    const { data } = await client.rest.users.getAuthenticated();
    return data.login;
  } catch (error) {
    const status = (error as { status?: unknown }).status;
    if (status === 401 || status === 403 || status === 404) return null;
    throw error;
  }
}

/** GET /repos/{owner}/{repo}/commits/{sha}/pulls: the pull requests a commit belongs to. */
export async function pullRequestsOfCommit(
  client: GitHubClient,
  repository: RepositoryRef,
  sha: string,
): Promise<PullRequestRef[]> {
  const { data } = await client.rest.repos.listPullRequestsAssociatedWithCommit({
    ...repository,
    commit_sha: sha,
    per_page: 100,
  });
  return data.map((p) => ({ number: p.number, state: p.state, headSha: p.head.sha }));
}

/** GET /repos/{owner}/{repo}/pulls/{number}. */
export async function getPullRequest(
  client: GitHubClient,
  repository: RepositoryRef,
  number: number,
): Promise<PullRequestRef> {
  const { data } = await client.rest.pulls.get({ ...repository, pull_number: number });
  return { number: data.number, state: data.state, headSha: data.head.sha };
}

/** GET /repos/{owner}/{repo}/pulls?head=owner:branch: open pull requests from that branch. */
export async function openPullRequestsFromHead(
  client: GitHubClient,
  repository: RepositoryRef,
  head: string,
): Promise<PullRequestRef[]> {
  const { data } = await client.rest.pulls.list({
    ...repository,
    head,
    state: 'open',
    per_page: 100,
  });
  return data.map((p) => ({ number: p.number, state: p.state, headSha: p.head.sha }));
}
