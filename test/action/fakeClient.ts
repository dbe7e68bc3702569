import type { GitHubClient } from '../../src/action/githubApi.js';

export interface FakeComment {
  id: number;
  body: string;
  user: string;
}

export interface FakePull {
  number: number;
  state: string;
  headSha: string;
  head?: string;
}

/**
 * An in-memory stand-in for the few REST methods the action calls, with pages of `per_page`
 * comments served through `paginate.iterator` as octokit does. Calls are recorded.
 */
export function fakeClient(
  state: { comments: FakeComment[]; pulls?: FakePull[]; commitPulls?: Record<string, FakePull[]> },
  options: { failWith?: { status: number } } = {},
) {
  const calls: string[] = [];
  let nextId = 1000;
  const fail = () => {
    if (options.failWith !== undefined) {
      throw Object.assign(new Error(`HTTP ${options.failWith.status}`), {
        status: options.failWith.status,
        response: { headers: {} },
      });
    }
  };
  const toApi = (c: FakeComment) => ({
    id: c.id,
    body: c.body,
    user: { login: c.user },
    html_url: `https://example.test/c/${c.id}`,
  });
  const listComments = async (params: { per_page: number; page?: number }) => {
    calls.push(`list page ${params.page ?? 1}`);
    fail();
    const page = params.page ?? 1;
    const start = (page - 1) * params.per_page;
    return { data: state.comments.slice(start, start + params.per_page).map(toApi) };
  };
  const client = {
    hook: { wrap: () => undefined },
    paginate: {
      iterator: async function* (method: typeof listComments, params: { per_page: number }) {
        for (let page = 1; page <= 1000; page += 1) {
          const result = await method({ ...params, page });
          yield result;
          if (result.data.length < params.per_page) return;
        }
      },
    },
    rest: {
      issues: {
        listComments,
        createComment: async (params: { issue_number: number; body: string }) => {
          calls.push(`create on ${params.issue_number}`);
          fail();
          const comment = { id: nextId++, body: params.body, user: 'github-actions[bot]' };
          state.comments.push(comment);
          return { data: toApi(comment) };
        },
        updateComment: async (params: { comment_id: number; body: string }) => {
          calls.push(`update ${params.comment_id}`);
          fail();
          const comment = state.comments.find((c) => c.id === params.comment_id);
          if (comment === undefined) throw Object.assign(new Error('Not Found'), { status: 404 });
          comment.body = params.body;
          return { data: toApi(comment) };
        },
        deleteComment: async (params: { comment_id: number }) => {
          calls.push(`delete ${params.comment_id}`);
          fail();
          const index = state.comments.findIndex((c) => c.id === params.comment_id);
          if (index < 0) throw Object.assign(new Error('Not Found'), { status: 404 });
          state.comments.splice(index, 1);
          return { data: undefined };
        },
      },
      users: {
        getAuthenticated: async () => {
          calls.push('get user');
          throw Object.assign(new Error('Resource not accessible by integration'), {
            status: 403,
            response: { headers: {} },
          });
        },
      },
      repos: {
        listPullRequestsAssociatedWithCommit: async (params: { commit_sha: string }) => {
          calls.push(`pulls of ${params.commit_sha}`);
          return { data: (state.commitPulls?.[params.commit_sha] ?? []).map(toPull) };
        },
      },
      pulls: {
        get: async (params: { pull_number: number }) => {
          calls.push(`get pull ${params.pull_number}`);
          const pull = state.pulls?.find((p) => p.number === params.pull_number);
          if (pull === undefined) throw Object.assign(new Error('Not Found'), { status: 404 });
          return { data: toPull(pull) };
        },
        list: async (params: { head: string }) => {
          calls.push(`list pulls ${params.head}`);
          return { data: (state.pulls ?? []).filter((p) => p.head === params.head).map(toPull) };
        },
      },
    },
  };
  return { client: client as unknown as GitHubClient, calls };
}

function toPull(p: FakePull) {
  return { number: p.number, state: p.state, head: { sha: p.headSha } };
}
