import { join } from 'node:path';
import type { Cell, ColumnInfo, TableChunk, TableSource } from '../../../src/catalog/readers/types.ts';

/**
 * A tiny in-memory TableSource for tests: columns as [info, cells] pairs. Its path is
 * `<cwd>/catalog.csv`, so messages name it `catalog.csv`.
 */
export function memorySource(cols: [ColumnInfo | string, Cell[]][], name = 'catalog.csv'): TableSource {
  const columns: ColumnInfo[] = cols.map(([info, cells]) =>
    typeof info === 'string' ? { name: info, kind: guessKind(cells) } : info,
  );
  const data = cols.map(([, cells]) => cells);
  const nRows = data[0]?.length ?? 0;
  return {
    path: join(process.cwd(), name),
    format: 'csv',
    columns,
    nRows,
    meta: {},
    async *chunks(chunkRows = 10000): AsyncIterable<TableChunk> {
      for (let off = 0; off < nRows; off += chunkRows) {
        const n = Math.min(chunkRows, nRows - off);
        yield { rowOffset: off, nRows: n, columns: data.map((c) => c.slice(off, off + n)) };
      }
    },
    keepAsText(index: number) {
      columns[index]!.kind = 'string';
      data[index] = data[index]!.map((c) => (c === null || typeof c === 'string' ? c : String(c)));
    },
    async close() {},
  };
}

function guessKind(cells: Cell[]): ColumnInfo['kind'] {
  const c = cells.find((x) => x !== null);
  return typeof c === 'number' ? 'float' : typeof c === 'boolean' ? 'bool' : 'string';
}

/** All chunks of a source, concatenated into one chunk (rowOffset 0). */
export async function allRows(src: TableSource, chunkRows?: number): Promise<TableChunk[]> {
  const out: TableChunk[] = [];
  for await (const ch of src.chunks(chunkRows)) out.push(ch);
  return out;
}
