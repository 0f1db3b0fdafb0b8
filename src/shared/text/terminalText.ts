import { escapeControls } from './escapeControls.ts';

/**
 * Text from a catalog, a config or a file name made safe to print on one terminal line: every
 * control character, line breaks and tabs included, is shown as an escape (`\x1B`, `\x0A`,
 * `\u202E`), so a value cannot move the cursor, recolour the terminal, set its title or split
 * a one-line message. The caller adds the final line break.
 */
export function terminalText(text: string): string {
  return escapeControls(text);
}
