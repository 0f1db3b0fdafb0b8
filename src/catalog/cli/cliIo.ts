/** A stream the CLI writes text to. */
export interface TextOut {
  write(text: string): unknown;
  /** True for a terminal: progress is drawn as one updating line. */
  isTTY?: boolean;
  /** Terminal width, characters. */
  columns?: number;
}

/** Where the CLI writes: results and help to `stdout`, progress, problems and errors to `stderr`. */
export interface CliIo {
  stdout: TextOut;
  stderr: TextOut;
}

/** The process's own stdout and stderr. */
export function processIo(): CliIo {
  return { stdout: process.stdout, stderr: process.stderr };
}
