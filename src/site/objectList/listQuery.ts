/**
 * The SQL behind the object list: one page of objects, searched, filtered by flag and sorted,
 * and the count of all matches. Pure, so it is tested without a browser. Column names come
 * only from the catalog's own list (anything else falls back to `id`); the reader's text is
 * only ever a quoted string literal.
 */
import { sqlIdent, sqlString } from '../db/sqlIdent.ts';

/** What the reader asked the list for (it is also what the page's URL carries). */
export interface ListState {
  /** Text searched for, case-insensitively, in the id and every text column ('' for none). */
  q: string;
  /** A flag code; FLAG_ANY for objects with any flag, FLAG_NONE for objects without; '' for all. */
  flag: string;
  /** Column sorted on. */
  sort: string;
  desc: boolean;
  /** Page number, from 0. */
  page: number;
}

/** The catalog's columns as the list needs them. */
export interface ListSchema {
  /** Every column name, in file order. */
  columns: readonly string[];
  /** Columns holding text (searched besides `id`). */
  textColumns: readonly string[];
}

export const FLAG_ANY = '*any';
export const FLAG_NONE = '*none';

/** Rows per page. */
export const PAGE_SIZE = 50;

export const DEFAULT_STATE: ListState = { q: '', flag: '', sort: 'id', desc: false, page: 0 };

function where(state: ListState, schema: ListSchema): string {
  const parts: string[] = [];
  const q = state.q.trim().toLowerCase();
  if (q) {
    const cols = ['id', ...schema.textColumns.filter((c) => c !== 'id')].filter((c) => schema.columns.includes(c));
    parts.push(`(${cols.map((c) => `contains(lower(CAST(${sqlIdent(c)} AS VARCHAR)), ${sqlString(q)})`).join(' OR ')})`);
  }
  if (state.flag && schema.columns.includes('flags')) {
    const flags = `coalesce(trim(${sqlIdent('flags')}), '')`;
    if (state.flag === FLAG_ANY) parts.push(`${flags} <> ''`);
    else if (state.flag === FLAG_NONE) parts.push(`${flags} = ''`);
    else parts.push(`list_contains(list_transform(string_split(${flags}, ','), f -> trim(f)), ${sqlString(state.flag)})`);
  }
  return parts.length ? ` WHERE ${parts.join(' AND ')}` : '';
}

/** The column actually sorted on: the asked one when the catalog has it, else `id`. */
export function sortColumn(state: ListState, schema: ListSchema): string {
  return schema.columns.includes(state.sort) ? state.sort : 'id';
}

/**
 * The two queries of one page: `rows` selects `shown` columns of page `state.page`
 * ({@link PAGE_SIZE} rows, missing values last, ties broken by id), `count` counts all matches.
 */
export function listSql(state: ListState, schema: ListSchema, shown: readonly string[], table = 'census'): { rows: string; count: string } {
  const w = where(state, schema);
  const sort = sortColumn(state, schema);
  const cols = shown.filter((c) => schema.columns.includes(c));
  const order = `${sqlIdent(sort)} ${state.desc ? 'DESC' : 'ASC'} NULLS LAST${sort === 'id' ? '' : ', "id" ASC'}`;
  const page = Math.max(0, Math.floor(state.page));
  return {
    rows: `SELECT ${cols.map(sqlIdent).join(', ')} FROM ${table}${w} ORDER BY ${order} LIMIT ${PAGE_SIZE} OFFSET ${page * PAGE_SIZE}`,
    count: `SELECT count(*)::DOUBLE AS n FROM ${table}${w}`,
  };
}
