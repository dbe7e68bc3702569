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
 * headers), and returns the first whose body satisfies `matches`, or null. At most `maxPages`
 * pages are read, so a runaway listing cannot loop forever.
 */
export async function findIssueComment(
  client: GitHubClient,
  repository: RepositoryRef,
  issueNumber: number,
  matches: (body: string) => boolean,
  maxPages = 500,
): Promise<IssueComment | null> {
  let pages = 0;
  const iterator = client.paginate.iterator(client.rest.issues.listComments, {
    ...repository,
    issue_number: issueNumber,
    per_page: COMMENTS_PER_PAGE,
  });
  for await (const page of iterator) {
    for (const comment of page.data) {
      const body = comment.body ?? '';
      if (matches(body)) return { id: comment.id, body, url: comment.html_url };
    }
    pages += 1;
    if (pages >= maxPages) break;
  }
  return null;
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
  return { id: data.id, body: data.body ?? '', url: data.html_url };
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
  return { id: data.id, body: data.body ?? '', url: data.html_url };
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
