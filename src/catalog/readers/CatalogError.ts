/**
 * A problem with the catalog file itself (unreadable, malformed, inconsistent). The message is a
 * single line that names the file and, where it applies, the line, column or HDU; the CLI prints
 * it and exits with status 2.
 */
export class CatalogError extends Error {
  override name = 'CatalogError';

  constructor(message: string) {
    // Keep the one-line promise even when a message embeds text from a library error.
    super(message.replace(/\s*[\r\n]+\s*/g, ' ').trim());
  }
}
