import { createWriteStream } from 'node:fs';
import type { WriteStream } from 'node:fs';
import { csvCell } from '../../shared/text/csvCell.ts';

/** Columns of the rejection report, in order. */
export const REJECTION_HEADER = ['row', 'id', 'column', 'value', 'reason', 'message'] as const;

/** One line of the rejection report: a problem found in one row. */
export interface RejectionEntry {
  row: number;
  id: string | null;
  column: string;
  value: unknown;
  reason: string;
  message: string;
}

/**
 * Streams the rejection report (CSV: row, id, column, value, reason, message) to `path`. The
 * header is written even when no row has a problem, so a reader knows the rows were checked.
 * Cells go through `csvCell`: a value starting like a formula gets a leading `'` and control
 * characters are escaped, since the report is made to be opened in a spreadsheet.
 */
export class RejectionReport {
  private readonly stream: WriteStream;
  private failure: Error | null = null;
  /** Entries written so far. */
  count = 0;

  constructor(path: string) {
    this.stream = createWriteStream(path, { encoding: 'utf8' });
    this.stream.on('error', (e) => {
      this.failure ??= e;
    });
    this.stream.write(`${REJECTION_HEADER.join(',')}\n`);
  }

  /** Appends one entry (buffered; `flushed` waits for the buffer to drain). */
  add(e: RejectionEntry): void {
    this.count++;
    this.stream.write(`${[e.row, e.id, e.column, e.value, e.reason, e.message].map(csvCell).join(',')}\n`);
  }

  /** Resolves once buffered entries are handed to the OS (call now and then to bound memory). */
  async flushed(): Promise<void> {
    if (this.failure) throw this.failure;
    if (this.stream.writableNeedDrain) await new Promise<void>((resolve) => this.stream.once('drain', resolve));
  }

  /** Finishes the file; throws the first write error. */
  async close(): Promise<void> {
    await new Promise<void>((resolve, reject) => {
      this.stream.end(() => resolve());
      this.stream.once('error', reject);
    });
    if (this.failure) throw this.failure;
  }

  /** Closes the file without reporting errors (the run is being abandoned). */
  async abandon(): Promise<void> {
    await new Promise<void>((resolve) => {
      if (this.stream.closed) resolve();
      else {
        this.stream.once('close', () => resolve());
        this.stream.once('error', () => resolve());
        this.stream.destroy();
      }
    });
  }
}
