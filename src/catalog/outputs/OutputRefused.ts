/**
 * An output the run will not write: it is the input, a special file, a file this tool did not
 * write (without `--force`), or a path the config may not choose. The message is one line; the
 * CLI prints it after `dawn-census: ` and exits with status 64 (a choice on the command line or
 * in the config to change). Nothing has been written when it is thrown.
 */
export class OutputRefused extends Error {
  override name = 'OutputRefused';
}
