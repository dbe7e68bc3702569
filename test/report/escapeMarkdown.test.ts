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

describe('escapeMarkdown: what GitHub would link or reorder by itself', () => {
  it('bare URLs and www. addresses get a zero-width space, so they are not autolinked', () => {
    expect(escapeMarkdown('https://evil.example/x')).toBe('https:\u200B//evil.example/x');
    expect(escapeMarkdown('ftp://h')).toBe('ftp:\u200B//h');
    expect(escapeMarkdown('WWW.evil.example')).toBe('WWW\u200B.evil.example');
    expect(escapeMarkdown('awww.x')).toBe('awww.x');
  });
  it('issue and cross-repository references are broken after # and GH-', () => {
    expect(escapeMarkdown('#1')).toBe('\\#\u200B1');
    expect(escapeMarkdown('owner/repo#2')).toBe('owner/repo\\#\u200B2');
    expect(escapeMarkdown('GH-3 gh-4')).toBe('GH-\u200B3 gh-\u200B4');
    expect(escapeMarkdown('GHOST-3 north-ridge-1')).toBe('GHOST-3 north-ridge-1');
  });
  it('bidirectional controls and other control characters show as U+FFFD; U+2028/9 are spaces', () => {
    const bidi = [0x202a, 0x202b, 0x202c, 0x202d, 0x202e, 0x2066, 0x2067, 0x2068, 0x2069];
    for (const cp of bidi) expect(escapeMarkdown(`a${String.fromCodePoint(cp)}b`)).toBe('a\uFFFDb');
    expect(escapeMarkdown('a\u2028b\u2029c')).toBe('a b c');
    expect(escapeMarkdown('a\u0000b\u001bc\u0085d')).toBe('a\uFFFDb\uFFFDc\uFFFDd');
  });
});
