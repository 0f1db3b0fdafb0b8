import { duckdb } from '../duckdb/nodeApi.ts';
import { readingSummarySql, summaryFromRow, type ReadingSummary } from '../../core/readings/readingSummary.ts';
import { sqlString } from '../parquet/sqlLiteral.ts';


/**
 * The per-reading summary of a readings Parquet file, computed by the shared SQL
 * (src/core/readings/readingSummary.ts) in an in-memory DuckDB, single-threaded. Rows come back
 * in `order` (the run's reading order).
 * @param parquetPath - the readings file (may be a staged temporary name).
 * @param order - reading ids in display order.
 */
export async function summarizeReadings(parquetPath: string, order: readonly string[]): Promise<ReadingSummary[]> {
  const instance = await duckdb().DuckDBInstance.create(':memory:', { threads: '1' });
  try {
    const con = await instance.connect();
    try {
      const query = async (sql: string) => (await con.runAndReadAll(sql)).getRowObjectsJS() as Record<string, unknown>[];
      return await summarizeReadingRows(query, order, `read_parquet(${sqlString(parquetPath)})`);
    } finally {
      con.closeSync();
    }
  } finally {
    instance.closeSync();
  }
}

/**
 * The same summary from the readings writer's committed scratch table (the table `rows`), before
 * its Parquet file is written, so that file and the catalog can be written at the same time.
 * @param query - runs SQL on the scratch database (`ParquetWriter.queryRows`).
 * @param order - reading ids in display order.
 * @param source - the SQL source of the readings rows (the scratch table by default).
 */
export async function summarizeReadingRows(
  query: (sql: string) => Promise<Record<string, unknown>[]>,
  order: readonly string[],
  source = 'rows',
): Promise<ReadingSummary[]> {
  const rows = (await query(readingSummarySql(source))).map((r) => summaryFromRow(r));
  return order.flatMap((id) => rows.filter((r) => r.reading === id));
}
