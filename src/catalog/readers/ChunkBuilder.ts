import type { Cell, TableChunk } from './types.ts';

/**
 * Collects rows cell by cell into column arrays and cuts them into {@link TableChunk}s of exactly
 * `chunkRows` rows (the last one may be shorter). Readers push into `cols[i]`, call
 * {@link rowDone} once per row, and drain {@link takeReady} between reads.
 */
export class ChunkBuilder {
  /** Column arrays of the chunk being filled. */
  cols: Cell[][];
  private nInChunk = 0;
  private offset = 0;
  private ready: TableChunk[] = [];

  private readonly nCols: number;
  private readonly chunkRows: number;

  constructor(nCols: number, chunkRows: number) {
    this.nCols = nCols;
    this.chunkRows = chunkRows;
    this.cols = emptyColumns(nCols);
  }

  /** Marks the current row complete (every `cols[i]` got exactly one cell). */
  rowDone(): void {
    if (++this.nInChunk === this.chunkRows) this.cut();
  }

  /** Chunks completed so far (emptied by the call). */
  takeReady(): TableChunk[] {
    const r = this.ready;
    this.ready = [];
    return r;
  }

  /** Completes the last, partial chunk and returns every chunk not yet taken. */
  finish(): TableChunk[] {
    if (this.nInChunk > 0) this.cut();
    return this.takeReady();
  }

  private cut(): void {
    this.ready.push({ rowOffset: this.offset, nRows: this.nInChunk, columns: this.cols });
    this.offset += this.nInChunk;
    this.nInChunk = 0;
    this.cols = emptyColumns(this.nCols);
  }
}

/** Default rows per chunk. */
export const DEFAULT_CHUNK_ROWS = 10_000;

/** Checks the `chunkRows` argument of `TableSource.chunks`. */
export function checkChunkRows(chunkRows: number | undefined): number {
  const n = chunkRows ?? DEFAULT_CHUNK_ROWS;
  if (!Number.isInteger(n) || n < 1) throw new RangeError(`chunkRows must be a positive integer, got ${n}`);
  return n;
}

function emptyColumns(n: number): Cell[][] {
  const cols: Cell[][] = [];
  for (let i = 0; i < n; i++) cols.push([]);
  return cols;
}
