/** A mistake on the command line: the CLI prints the one-line message and exits with status 64. */
export class UsageError extends Error {
  override name = 'UsageError';
}
