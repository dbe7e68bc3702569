import { describe, expect, it } from 'vitest';
import { planComment } from '../../src/action/commentTarget.js';

const pr = (number: number, head: string | null, base = 'acme/models') => ({
  pull_request: {
    number,
    head: { repo: head === null ? null : { full_name: head } },
    base: { repo: { full_name: base } },
  },
});

describe('planComment', () => {
  it('pull_request from the same repository: comment on it', () => {
    expect(planComment('pull_request', pr(4, 'acme/models'), null, null)).toEqual({
      kind: 'pull-request',
      number: 4,
    });
  });
  it('pull_request from a fork (or a deleted fork): read-only', () => {
    expect(planComment('pull_request', pr(4, 'someone/models'), null, null).kind).toBe('read-only');
    expect(planComment('pull_request', pr(4, null), null, null).kind).toBe('read-only');
  });
  it('pull_request_target has a writable token even for forks', () => {
    expect(planComment('pull_request_target', pr(4, 'someone/models'), null, null)).toEqual({
      kind: 'pull-request',
      number: 4,
    });
  });
  it('push: look up the commit, from the payload or GITHUB_SHA; an explicit number wins', () => {
    expect(planComment('push', { after: 'abc' }, null, 'def')).toEqual({
      kind: 'commit',
      sha: 'abc',
    });
    expect(planComment('push', {}, null, 'def')).toEqual({ kind: 'commit', sha: 'def' });
    expect(planComment('push', { after: '0000000' }, null, null).kind).toBe('none');
    expect(planComment('push', { after: 'abc' }, 9, null)).toEqual({
      kind: 'pull-request',
      number: 9,
    });
  });
  it('workflow_dispatch: only with the pull-request input', () => {
    expect(planComment('workflow_dispatch', {}, null, null).kind).toBe('none');
    expect(planComment('workflow_dispatch', {}, 5, null)).toEqual({
      kind: 'pull-request',
      number: 5,
    });
  });
  it('workflow_run: the tested commit, its head branch and any listed number', () => {
    const event = {
      workflow_run: {
        id: 77,
        head_sha: 'f00',
        head_branch: 'tweak',
        head_repository: { owner: { login: 'someone' } },
        pull_requests: [],
      },
    };
    expect(planComment('workflow_run', event, null, null)).toEqual({
      kind: 'workflow-run',
      runId: '77',
      headSha: 'f00',
      head: 'someone:tweak',
      number: null,
    });
    expect(planComment('workflow_run', event, 3, null)).toMatchObject({ number: 3 });
    expect(planComment('workflow_run', {}, null, null).kind).toBe('none');
  });
});
