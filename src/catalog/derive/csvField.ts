/**
 * One CSV field (RFC 4180): quoted when it holds a comma, quote, line break or leading or
 * trailing blank, with quotes doubled; null and undefined are the empty field.
 */
export function csvField(value: unknown): string {
  if (value === null || value === undefined) return '';
  const text = typeof value === 'string' ? value : String(value);
  return /[",\r\n]|^\s|\s$/.test(text) ? `"${text.replaceAll('"', '""')}"` : text;
}
