import type { DeriveProgress } from '../derive/runDerive.ts';
import type { RejectionEntry } from '../derive/rejectionReport.ts';
import type { TextOut } from './cliIo.ts';
import { formatCount, formatDuration } from './formatting.ts';
import { terminalText } from '../../shared/text/terminalText.ts';

/** Row problems printed one by one before the rest are only counted. */
export const PROBLEMS_SHOWN = 20;

/** Shows a run's progress and its row problems on stderr. */
export interface ProgressReporter {
  progress(p: DeriveProgress): void;
  problem(entry: RejectionEntry): void;
  /** Prints a sentence of the run's on a line of its own (`dawn-census: …`), clearing the progress line first. */
  notice(text: string): void;
  /** Clears the progress line and prints how many problems were not shown. */
  finish(reportPath: string): void;
}

/** Options of {@link createProgressReporter}. */
export interface ProgressOptions {
  /** The catalog as named in messages (prefix of each problem line). */
  label: string;
  quiet: boolean;
  /** Clock, ms (tests inject one). */
  now?: () => number;
}

const BAR_WIDTH = 24;
const REDRAW_MS = 100;
const PLAIN_INTERVAL_MS = 10_000;

/**
 * On a terminal, one line redrawn in place: a bar, rows done, objects per second and the time
 * left. Elsewhere (a log file, CI), a plain line at every 10 % (every 10 s when the row count
 * is unknown). Nothing at all when quiet. Row problems are printed as they come, the first
 * {@link PROBLEMS_SHOWN}, then counted; their control characters are shown as escapes.
 */
export function createProgressReporter(err: TextOut, opts: ProgressOptions): ProgressReporter {
  const now = opts.now ?? (() => performance.now());
  const tty = err.isTTY === true;
  let lineShown = false;
  let lastDraw = -Infinity;
  let lastDecile = 0;
  let lastPlain = now();
  let problems = 0;

  const clearLine = (): void => {
    if (lineShown) err.write('\r\x1b[K');
    lineShown = false;
  };

  const ttyLine = (p: DeriveProgress): string => {
    const rate = p.elapsedMs > 0 ? (p.rowsDone / p.elapsedMs) * 1000 : 0;
    const parts: string[] = [];
    if (p.rowsTotal) {
      const frac = Math.min(1, p.rowsDone / p.rowsTotal);
      const filled = Math.round(frac * BAR_WIDTH);
      parts.push(`[${'█'.repeat(filled)}${'░'.repeat(BAR_WIDTH - filled)}] ${String(Math.floor(frac * 100)).padStart(3)}%`);
      parts.push(`${formatCount(p.rowsDone)}/${formatCount(p.rowsTotal)} objects`);
    } else parts.push(`${formatCount(p.rowsDone)} objects`);
    parts.push(`${formatCount(rate)} objects/s`);
    if (p.rowsTotal && rate > 0 && p.rowsDone < p.rowsTotal) parts.push(`ETA ${formatDuration(((p.rowsTotal - p.rowsDone) / rate) * 1000)}`);
    const line = `derive ${parts.join(' · ')}`;
    const width = err.columns ?? 80;
    return line.length >= width ? line.slice(0, Math.max(0, width - 1)) : line;
  };

  return {
    progress(p) {
      if (opts.quiet) return;
      const t = now();
      if (tty) {
        const done = p.rowsTotal !== undefined && p.rowsDone >= p.rowsTotal;
        if (!done && t - lastDraw < REDRAW_MS) return;
        lastDraw = t;
        err.write(`\r\x1b[K${ttyLine(p)}`);
        lineShown = true;
        return;
      }
      const rate = p.elapsedMs > 0 ? (p.rowsDone / p.elapsedMs) * 1000 : 0;
      if (p.rowsTotal) {
        const decile = Math.floor((p.rowsDone / p.rowsTotal) * 10);
        if (decile <= lastDecile) return;
        lastDecile = decile;
        err.write(`derive: ${decile * 10}% (${formatCount(p.rowsDone)} of ${formatCount(p.rowsTotal)} rows, ${formatCount(rate)} objects/s)\n`);
      } else if (t - lastPlain >= PLAIN_INTERVAL_MS) {
        lastPlain = t;
        err.write(`derive: ${formatCount(p.rowsDone)} rows (${formatCount(rate)} objects/s)\n`);
      }
    },
    problem(entry) {
      problems++;
      if (opts.quiet || problems > PROBLEMS_SHOWN) return;
      clearLine();
      err.write(`${terminalText(`${opts.label}: ${entry.message}`)}\n`);
    },
    notice(text) {
      if (opts.quiet) return;
      clearLine();
      err.write(`dawn-census: ${terminalText(text)}\n`);
    },
    finish(reportPath) {
      clearLine();
      if (!opts.quiet && problems > PROBLEMS_SHOWN) {
        err.write(`… and ${formatCount(problems - PROBLEMS_SHOWN)} more row problems (all are in ${reportPath})\n`);
      }
    },
  };
}
