/**
 * Characters that can change how text is shown rather than being shown: C0 controls (U+0000–
 * U+001F), DEL, C1 controls (U+0080–U+009F, which include the 8-bit CSI), and the Unicode
 * direction overrides and isolates (U+202A–U+202E, U+2066–U+2069) that can reorder a line.
 */
const CONTROL = /[\u0000-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/gu;

/**
 * Replaces every control character of `text` (see above) by a visible escape: `\x1B` for a
 * character below U+0100, `\u202E` above, except those listed in `keep` (e.g. '\t\n\r' where
 * the surrounding format carries them safely). Everything else is returned unchanged.
 */
export function escapeControls(text: string, keep = ''): string {
  return text.replace(CONTROL, (c) => {
    if (keep.includes(c)) return c;
    const code = c.charCodeAt(0);
    return code < 0x100 ? `\\x${code.toString(16).toUpperCase().padStart(2, '0')}` : `\\u${code.toString(16).toUpperCase().padStart(4, '0')}`;
  });
}
