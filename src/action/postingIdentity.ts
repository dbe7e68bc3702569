import { authenticatedLogin, type GitHubClient } from './githubApi.js';

/**
 * The login GitHub shows as the author of comments written with the workflow's own token
 * (`${{ github.token }}`): the GitHub Actions app's bot user.
 */
export const WORKFLOW_TOKEN_LOGIN = 'github-actions[bot]';

/**
 * A GitHub login as the `comment-author` input accepts it: a user name (letters, digits and
 * single inner hyphens, at most 39 characters, as GitHub allows for user names), optionally
 * followed by `[bot]` as GitHub writes a GitHub App's bot user (`my-app[bot]`).
 */
const LOGIN = /^(?=.{1,39}(?:\[bot\])?$)[A-Za-z0-9](?:-?[A-Za-z0-9])*(?:\[bot\])?$/;

export function isLogin(text: string): boolean {
  return LOGIN.test(text);
}

/**
 * Who the action posts as, and how that was learnt:
 * - `input`: the `comment-author` input (trusted: it comes from the workflow file), for a GitHub
 *   App's own installation token, whose comments are written as `APP[bot]`;
 * - `token`: the login GitHub reports for the token (GET /user: a personal access token's user);
 * - `assumed`: GitHub answered that the token is not a user (an installation token), so the
 *   Actions bot user of the workflow's token is assumed; an App's token then writes as someone
 *   else, which `publishGateComment` notices after the first post.
 */
export interface PostingIdentity {
  readonly login: string;
  readonly source: 'input' | 'token' | 'assumed';
}

/** Only comments written by this identity are ever edited (see gateComment.ts). */
export async function postingIdentity(
  client: GitHubClient,
  configured: string | null,
): Promise<PostingIdentity> {
  if (configured !== null) return { login: configured, source: 'input' };
  const login = await authenticatedLogin(client);
  return login === null
    ? { login: WORKFLOW_TOKEN_LOGIN, source: 'assumed' }
    : { login, source: 'token' };
}

/** Logins compare without regard to letter case, as GitHub treats them. */
export function sameLogin(a: string, b: string): boolean {
  return a.toLowerCase() === b.toLowerCase();
}
