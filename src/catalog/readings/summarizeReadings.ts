import { duckdb } from '../duckdb/nodeApi.ts';
import { readingSummarySql, summaryFromRow, type ReadingSummary } from '../../core/readings/readingSummary.ts';
import { sqlString } from '../parquet/sqlLiteral.ts';

const { DuckDBInstance } = duckdb;

/**
 * The per-reading summary of a readings Parquet file, computed by the shared SQL
 * (src/core/readings/readingSummary.ts) in an in-memory DuckDB, single-threaded. Rows come back
 * in `order` (the run's reading order).
 * @param parquetPath - the readings file (may be a staged temporary name).
 * @param order - reading ids in display order.
 */
export async function summarizeReadings(parquetPath: string, order: readonly string[]): Promise<ReadingSummary[]> {
  const instance = await DuckDBInstance.create(':memory:', { threads: '1' });
  try {
    const con = await instance.connect();
    try {
      const reader = await con.runAndReadAll(readingSummarySql(`read_parquet(${sqlString(parquetPath)})`));
      const rows = reader.getRowObjectsJS().map((r) => summaryFromRow(r as Record<string, unknown>));
      return order.flatMap((id) => rows.filter((r) => r.reading === id));
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
 */
export async function summarizeReadingRows(query: (sql: string) => Promise<Record<string, unknown>[]>, order: readonly string[]): Promise<ReadingSummary[]> {
  const rows = (await query(readingSummarySql('rows'))).map((r) => summaryFromRow(r));
  return order.flatMap((id) => rows.filter((r) => r.reading === id));
}
