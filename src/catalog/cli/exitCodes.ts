/** Exit statuses of the `dawn-census` command. */
export const EXIT = {
  /** Done (rows with input problems are flagged, not fatal). */
  ok: 0,
  /** An unexpected failure (a bug, or the system refused a write); nothing was replaced. */
  failure: 1,
  /** The catalog or the config is unusable as a whole; nothing was written. */
  catalog: 2,
  /** The command line is wrong, or an output may not be written (sysexits EX_USAGE). */
  usage: 64,
  /** Stopped by Ctrl-C (128 + SIGINT); nothing was written. */
  interrupted: 130,
  /** Stopped by SIGTERM (128 + SIGTERM); nothing was written. */
  terminated: 143,
} as const;
