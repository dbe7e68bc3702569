import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  carriesMarker,
  commentMarker,
  gateCommentBody,
  type PublishOptions,
  publishGateComment,
} from '../../src/action/gateComment.js';
import { WORKFLOW_TOKEN_LOGIN } from '../../src/action/postingIdentity.js';
import { type FakeComment, fakeClient } from './fakeClient.js';

const repo = { owner: 'acme', repo: 'models' };

describe('commentMarker', () => {
  it('is a single HTML comment whatever the name', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'grapheme', maxLength: 40 }), (name) => {
        const marker = commentMarker(name);
        const inner = marker.slice('<!--'.length, -'-->'.length);
        expect(marker.startsWith('<!-- skillgate:gate=')).toBe(true);
        expect(marker.endsWith(' -->')).toBe(true);
        expect(inner).not.toMatch(/[<>\r\n]/);
        expect(inner.slice(' skillgate:gate='.length, -1)).not.toContain('-');
      }),
    );
  });

  it('gives distinct names distinct markers, neither a prefix of the other', () => {
    fc.assert(
      fc.property(fc.string({ maxLength: 12 }), fc.string({ maxLength: 12 }), (a, b) => {
        fc.pre(a !== b);
        const ma = commentMarker(a);
        const mb = commentMarker(b);
        expect(ma).not.toBe(mb);
        expect(mb.startsWith(ma)).toBe(false);
      }),
    );
  });

  it('encodes a hostile name so it cannot close the comment', () => {
    expect(commentMarker('x --> <b>@team</b>')).toBe(
      '<!-- skillgate:gate=x%20%2D%2D%3E%20%3Cb%3E%40team%3C%2Fb%3E -->',
    );
    expect(commentMarker('')).toBe('<!-- skillgate:gate= -->');
  });
});

describe('carriesMarker', () => {
  const marker = commentMarker('nightly');
  it('only when the marker opens the body, alone on its line (LF or CRLF)', () => {
    expect(carriesMarker(`${marker}\n### report`, marker)).toBe(true);
    expect(carriesMarker(`${marker}\r\n### report edited in the browser`, marker)).toBe(true);
    expect(carriesMarker(marker, marker)).toBe(true);
    expect(carriesMarker(`quoting: ${marker}\n`, marker)).toBe(false);
    expect(carriesMarker(` ${marker}\n`, marker)).toBe(false);
    expect(carriesMarker(`${marker}x\n`, marker)).toBe(false);
    expect(carriesMarker(`${commentMarker('nightly2')}\n`, marker)).toBe(false);
    expect(carriesMarker(`${commentMarker('')}\n`, marker)).toBe(false);
  });
});

describe('publishGateComment', () => {
  const marker = commentMarker('nightly');
  const bot = WORKFLOW_TOKEN_LOGIN;
  const noise = (n: number): FakeComment[] =>
    Array.from({ length: n }, (_, i) => ({ id: i + 1, body: `bot note ${i}`, user: bot }));
  const notes: string[] = [];
  const options: PublishOptions = {
    author: bot,
    retryWait: () => null,
    sleep: async () => undefined,
    info: (m) => void notes.push(m),
    warning: (m) => void notes.push(`warning ${m}`),
  };
  const publish = (client: Parameters<typeof publishGateComment>[0], text: string) =>
    publishGateComment(client, repo, 7, marker, gateCommentBody(marker, text), options);

  it('creates the comment when none of its own carries the marker, then checks for a twin', async () => {
    const state = { comments: noise(3) };
    const { client, calls } = fakeClient(state);
    const result = await publish(client, 'first');
    expect(result.action).toBe('created');
    expect(calls).toEqual(['list page 1', 'create on 7', 'list page 1']);
    expect(state.comments).toHaveLength(4);
  });

  it('finds and updates its comment on a later page, without creating a second', async () => {
    const state = {
      comments: [...noise(250), { id: 9001, body: gateCommentBody(marker, 'old'), user: bot }],
    };
    const { client, calls } = fakeClient(state);
    const result = await publish(client, 'new');
    expect(result).toMatchObject({ action: 'updated', id: 9001, removed: 0 });
    expect(calls).toEqual(['list page 1', 'list page 2', 'list page 3', 'update 9001']);
    expect(state.comments.filter((c) => carriesMarker(c.body, marker))).toHaveLength(1);
    expect(state.comments.at(-1)?.body).toBe(gateCommentBody(marker, 'new'));
  });

  it('never edits a comment someone else wrote, even with the marker', async () => {
    const squatter = { id: 10, body: gateCommentBody(marker, 'PASS (forged)'), user: 'mallory' };
    const state = { comments: [squatter] };
    const { client, calls } = fakeClient(state);
    const result = await publish(client, 'real');
    expect(result.action).toBe('created');
    expect(calls).not.toContain('update 10');
    expect(state.comments[0]?.body).toBe(gateCommentBody(marker, 'PASS (forged)'));
    expect(notes.some((n) => n.includes('ignored 1 comment'))).toBe(true);
  });

  it('keeps the newest of several own comments and removes the others', async () => {
    const state = {
      comments: [
        { id: 20, body: gateCommentBody(marker, 'stale PASS'), user: bot },
        { id: 21, body: gateCommentBody(marker, 'newer'), user: bot },
      ],
    };
    const { client, calls } = fakeClient(state);
    const result = await publish(client, 'latest');
    expect(result).toMatchObject({ action: 'updated', id: 21, removed: 1 });
    expect(calls).toEqual(['list page 1', 'update 21', 'delete 20']);
    expect(state.comments).toEqual([
      { id: 21, body: gateCommentBody(marker, 'latest'), user: bot },
    ]);
  });

  it('leaves the comment of another named comparison alone', async () => {
    const other = commentMarker('gate b');
    const state = { comments: [{ id: 5, body: gateCommentBody(other, 'b'), user: bot }] };
    const { client } = fakeClient(state);
    const result = await publish(client, 'a');
    expect(result.action).toBe('created');
    expect(state.comments[0]?.body).toBe(gateCommentBody(other, 'b'));
  });
});
