/**
 * Makes text from an input file (series names, timestamps, file names) safe inside a Markdown
 * table cell on GitHub: it cannot end the cell (|), open HTML or a hidden comment (<, >, &),
 * format or link (\ ` * _ [ ] ~), start a new line, or notify anyone (@name gets a zero-width
 * space after the @, so GitHub does not see a mention). Example: escapeMarkdown('a|b @team') →
 * 'a\\|b @\u200Bteam'.
 */
export function escapeMarkdown(text: string): string {
  return text
    .replace(/[\r\n\t]+/g, ' ')
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/([\\`*_[\]~|#!])/g, '\\$1')
    .replace(/@/g, '@\u200B');
}
