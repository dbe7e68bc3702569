import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  commentMarker,
  isStickyComment,
  stickyBody,
  upsertStickyComment,
} from '../../src/action/stickyComment.js';
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

describe('isStickyComment', () => {
  const marker = commentMarker('nightly');
  it('matches only at the very start of the body', () => {
    expect(isStickyComment(`${marker}\n### report`, marker)).toBe(true);
    expect(isStickyComment(`quoting: ${marker}\n`, marker)).toBe(false);
    expect(isStickyComment(` ${marker}\n`, marker)).toBe(false);
    expect(isStickyComment(`${commentMarker('nightly2')}\n`, marker)).toBe(false);
    expect(isStickyComment(`${commentMarker('')}\n`, marker)).toBe(false);
  });
});

describe('upsertStickyComment', () => {
  const marker = commentMarker('gate a');
  const noise = (n: number): FakeComment[] =>
    Array.from({ length: n }, (_, i) => ({ id: i + 1, body: `bot note ${i}`, user: 'bot' }));

  it('creates the comment when none carries the marker', async () => {
    const state = { comments: noise(3) };
    const { client, calls } = fakeClient(state);
    const result = await upsertStickyComment(client, repo, 7, marker, stickyBody(marker, 'first'));
    expect(result.action).toBe('created');
    expect(calls).toEqual(['list page 1', 'create on 7']);
    expect(state.comments).toHaveLength(4);
  });

  it('finds and updates the comment on a later page, without creating a second', async () => {
    const state = {
      comments: [...noise(250), { id: 9001, body: stickyBody(marker, 'old'), user: 'bot' }],
    };
    const { client, calls } = fakeClient(state);
    const result = await upsertStickyComment(client, repo, 7, marker, stickyBody(marker, 'new'));
    expect(result).toMatchObject({ action: 'updated', id: 9001 });
    expect(calls).toEqual(['list page 1', 'list page 2', 'list page 3', 'update 9001']);
    expect(state.comments.filter((c) => isStickyComment(c.body, marker))).toHaveLength(1);
    expect(state.comments.at(-1)?.body).toBe(stickyBody(marker, 'new'));
  });

  it('leaves the comment of another named comparison alone', async () => {
    const other = commentMarker('gate b');
    const state = { comments: [{ id: 5, body: stickyBody(other, 'b'), user: 'bot' }] };
    const { client } = fakeClient(state);
    const result = await upsertStickyComment(client, repo, 7, marker, stickyBody(marker, 'a'));
    expect(result.action).toBe('created');
    expect(state.comments[0]?.body).toBe(stickyBody(other, 'b'));
  });
});
