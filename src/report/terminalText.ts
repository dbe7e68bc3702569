/**
 * Text from an input file made safe for a terminal: C0 and C1 control characters (escape
 * sequences, carriage returns, bells) become spaces, so a hostile series name cannot move the
 * cursor or recolour the screen, and bidirectional embedding, override and isolate controls
 * (U+202A–U+202E, U+2066–U+2069) become U+FFFD, so a name cannot read differently from what it
 * is (as escapeMarkdown does for the comment).
 */
export function terminalText(text: string): string {
  return (
    text
      // biome-ignore lint/suspicious/noControlCharactersInRegex: stripping control characters is the point
      .replace(/[\u0000-\u001f\u007f-\u009f]/g, ' ')
      .replace(/[\u202a-\u202e\u2066-\u2069]/g, '\uFFFD')
  );
}
