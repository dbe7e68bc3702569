import { authenticatedLogin, type GitHubClient } from './githubApi.js';

/**
 * The login GitHub shows as the author of comments written with the workflow's own token
 * (`${{ github.token }}`): the GitHub Actions app's bot user.
 */
export const WORKFLOW_TOKEN_LOGIN = 'github-actions[bot]';

/**
 * Who the action posts as, so that only comments written by that identity are ever edited: the
 * login GitHub reports for the token (GET /user: a personal access token's user), or, when
 * GitHub answers that the token is not a user (the workflow's installation token), the Actions
 * bot user. A GitHub App's own installation token is also refused by GET /user; its comments
 * are then written as APP[bot], which this cannot learn; `checkAuthor` notices that case.
 */
export async function postingIdentity(client: GitHubClient): Promise<string> {
  return (await authenticatedLogin(client)) ?? WORKFLOW_TOKEN_LOGIN;
}

/** Logins compare without regard to letter case, as GitHub treats them. */
export function sameLogin(a: string, b: string): boolean {
  return a.toLowerCase() === b.toLowerCase();
}
