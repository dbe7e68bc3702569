/**
 * Makes text from an input file (series names, timestamps, file names) safe inside a Markdown
 * table cell on GitHub: it cannot end the cell (|), open HTML or a hidden comment (<, >, &),
 * format or link (\ ` * _ [ ] ~), start a new line (CR, LF, tab, U+2028, U+2029 become a
 * space), notify anyone (@name gets a zero-width space after the @, so GitHub does not see a
 * mention), or link anywhere GitHub would link by itself: a bare URL (`https://…`, any
 * scheme) or `www.` address gets a zero-width space after `:` or `www`, and an issue or
 * pull-request reference (`#1`, `owner/repo#2`, `GH-3`) one after `#` or `GH-`. Bidirectional
 * embedding, override and isolate controls (U+202A–U+202E, U+2066–U+2069), which could make a
 * name read differently from what it is, and other control characters become U+FFFD, so they
 * show instead of acting. Example: escapeMarkdown('a|b @team #1') → 'a\\|b @\u200Bteam \\#\u200B1'.
 */
export function escapeMarkdown(text: string): string {
  return (
    text
      .replace(/[\r\n\t\u2028\u2029]+/g, ' ')
      // biome-ignore lint/suspicious/noControlCharactersInRegex: control characters are the target
      .replace(/[\u0000-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/g, '\uFFFD')
      .replace(/&/g, '&amp;')
      .replace(/</g, '&lt;')
      .replace(/>/g, '&gt;')
      .replace(/([\\`*_[\]~|#!])/g, '\\$1')
      .replace(/@/g, '@\u200B')
      .replace(/#/g, '#\u200B')
      .replace(/:(?=\/\/)/g, ':\u200B')
      .replace(/\b(www)\./gi, '$1\u200B.')
      .replace(/\b(GH)-(?=\d)/gi, '$1-\u200B')
  );
}
