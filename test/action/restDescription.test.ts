import { describe, expect, it } from 'vitest';
import type { RecordedRequest } from './fakeGitHubServer.js';
import { checkRequest } from './restDescription.js';

const request = (
  method: string,
  path: string,
  query = '',
  body: unknown = undefined,
): RecordedRequest => ({
  method,
  path,
  query: new URLSearchParams(query),
  authorization: 'token t',
  body,
});

describe('checkRequest against the REST description', () => {
  it('accepts the requests the action makes', () => {
    expect(
      checkRequest(request('GET', '/repos/a/b/issues/7/comments', 'per_page=100&page=2')),
    ).toEqual([]);
    expect(
      checkRequest(request('POST', '/repos/a/b/issues/7/comments', '', { body: 'x' })),
    ).toEqual([]);
    expect(
      checkRequest(request('PATCH', '/repos/a/b/issues/comments/9', '', { body: 'x' })),
    ).toEqual([]);
    expect(checkRequest(request('DELETE', '/repos/a/b/issues/comments/9'))).toEqual([]);
    expect(checkRequest(request('GET', '/user'))).toEqual([]);
    expect(
      checkRequest(request('GET', '/repos/a/b/pulls', 'head=o:x&state=open&per_page=100')),
    ).toEqual([]);
  });

  it('names what is wrong: path, method, query, body', () => {
    expect(checkRequest(request('GET', '/repos/a/b/issue/7/comments'))).toEqual([
      'GET /repos/a/b/issue/7/comments: no such path in the REST description',
    ]);
    expect(checkRequest(request('PUT', '/repos/a/b/issues/comments/9'))[0]).toContain('has no PUT');
    expect(checkRequest(request('GET', '/repos/a/b/issues/x/comments'))[0]).toContain(
      'issue_number must be an integer',
    );
    expect(checkRequest(request('GET', '/repos/a/b/issues/7/comments', 'sort=desc'))[0]).toContain(
      'query parameter sort is not declared',
    );
    expect(checkRequest(request('GET', '/repos/a/b/pulls', 'state=merged'))[0]).toContain(
      'is not one of its values',
    );
    expect(
      checkRequest(request('POST', '/repos/a/b/issues/7/comments', '', { text: 'x' })),
    ).toEqual([
      'POST /repos/a/b/issues/7/comments: body field text is not in issues/create-comment',
      'POST /repos/a/b/issues/7/comments: required body field body is missing',
    ]);
    expect(
      checkRequest(request('PATCH', '/repos/a/b/issues/comments/9', '', { body: 3 }))[0],
    ).toContain('body field body must be string');
  });
});
