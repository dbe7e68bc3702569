import { describe, expect, it } from 'vitest';
import { escapeMarkdown } from '../../src/report/escapeMarkdown.js';

describe('escapeMarkdown', () => {
  it('keeps table cells intact and notifies no one', () => {
    const hostile = 'zone|A <!-- skillgate --> @team <b>x</b>\nnext';
    const out = escapeMarkdown(hostile);
    expect(out).not.toMatch(/(^|[^\\])\|/);
    expect(out).not.toContain('<!--');
    expect(out).not.toContain('<b>');
    expect(out).not.toMatch(/@team/);
    expect(out).not.toContain('\n');
    expect(out).toBe('zone\\|A &lt;\\!-- skillgate --&gt; @\u200Bteam &lt;b&gt;x&lt;/b&gt; next');
  });
  it('leaves plain names alone', () => {
    expect(escapeMarkdown('north-ridge 2026-03-01')).toBe('north-ridge 2026-03-01');
  });
});
