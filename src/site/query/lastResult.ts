/**
 * The workspace's last result, shared with whatever draws or uses it (the result table, the
 * charts, a chart builder): subscribers are called with every new result, and with `stale`
 * set when a later query failed (the result then no longer answers the SQL in the editor).
 */
import type { ResultSet } from '../db/resultSet.ts';

export interface WorkspaceResult {
  /** The SQL that produced the result. */
  sql: string;
  result: ResultSet;
  /** The query returned more rows than the result holds (see ROW_CAP). */
  truncated: boolean;
  /** A later query failed: this result belongs to earlier SQL. */
  stale: boolean;
}

let last: WorkspaceResult | null = null;
const listeners = new Set<(r: WorkspaceResult | null) => void>();

/** The last result, or null before the first query. */
export function lastResult(): WorkspaceResult | null {
  return last;
}

/** Calls `listener` now (with the current result) and on every change. Returns an unsubscribe function. */
export function onResult(listener: (r: WorkspaceResult | null) => void): () => void {
  listeners.add(listener);
  listener(last);
  return () => listeners.delete(listener);
}

/** Publishes a new result (or marks the current one stale with `markStale`). */
export function publishResult(r: WorkspaceResult | null): void {
  last = r;
  for (const l of listeners) l(r);
}

/** Marks the last result as belonging to earlier SQL (a later query failed). */
export function markStale(): void {
  if (last && !last.stale) publishResult({ ...last, stale: true });
}
