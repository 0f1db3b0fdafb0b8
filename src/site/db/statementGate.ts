/**
 * Which statements a visitor may run: the catalog is read-only and reads nothing but itself.
 * The SQL is split into statements and words by a small scanner that skips comments, string
 * literals and quoted identifiers, so `SELECT 'drop table'` is a SELECT. Returns a plain
 * message for the first statement that would change the catalog, reach another database or
 * file, or change the database's settings; null when every statement only reads.
 * DuckDB itself is locked as well (see duckdb.ts); this gate gives the plain message.
 */

/** Statements that only read. `(` starts a parenthesised query; FROM-first is DuckDB's shorthand. */
const READING = new Set(['SELECT', 'WITH', 'FROM', 'VALUES', 'TABLE', 'DESCRIBE', 'DESC', 'SHOW', 'SUMMARIZE', 'PIVOT', 'UNPIVOT', '(']);
const WRITING = new Set(['DROP', 'CREATE', 'INSERT', 'UPDATE', 'DELETE', 'ALTER', 'TRUNCATE', 'REPLACE', 'MERGE', 'COMMENT', 'UPSERT']);
const OUTSIDE = new Set(['ATTACH', 'DETACH', 'COPY', 'EXPORT', 'IMPORT', 'INSTALL', 'LOAD', 'USE', 'FORCE']);

/** The message for DROP, CREATE and other statements that would change the catalog. */
export const READ_ONLY_MESSAGE =
  'The catalog is read-only: DROP, CREATE, INSERT, UPDATE, DELETE and ALTER are not available here. ' +
  'To compute new columns, use SELECT (for example WITH t AS (SELECT …) SELECT … FROM t).';

/** The message for statements and functions that would reach another file, database or address. */
export const OUTSIDE_MESSAGE =
  'This site’s SQL reads only the census catalog: other files, databases and web addresses ' +
  '(read_csv, read_parquet, ATTACH, COPY, INSTALL, LOAD) are switched off, and nothing was fetched.';

interface Statement {
  /** Upper-case words and `(` at parenthesis depth 0, in order. */
  words: string[];
}

/** Splits `sql` into statements of depth-0 words (comments, strings and quoted names skipped). */
export function statementWords(sql: string): Statement[] {
  const out: Statement[] = [];
  let words: string[] = [];
  let depth = 0;
  let i = 0;
  const n = sql.length;
  while (i < n) {
    const c = sql[i]!;
    if (c === '-' && sql[i + 1] === '-') {
      while (i < n && sql[i] !== '\n') i++;
    } else if (c === '/' && sql[i + 1] === '*') {
      const end = sql.indexOf('*/', i + 2);
      i = end < 0 ? n : end + 2;
    } else if (c === "'" || c === '"' || c === '`') {
      i++;
      while (i < n) {
        if (sql[i] === c) {
          if (sql[i + 1] === c) i += 2;
          else break;
        } else i++;
      }
      i++;
      if (depth === 0) words.push(c === "'" ? '<string>' : '<name>');
    } else if (c === '$' && /^\$[A-Za-z_]*\$/.test(sql.slice(i))) {
      const tag = /^\$[A-Za-z_]*\$/.exec(sql.slice(i))![0];
      const end = sql.indexOf(tag, i + tag.length);
      i = end < 0 ? n : end + tag.length;
      if (depth === 0) words.push('<string>');
    } else if (c === ';') {
      if (words.length) out.push({ words });
      words = [];
      depth = 0;
      i++;
    } else if (c === '(') {
      if (depth === 0) words.push('(');
      depth++;
      i++;
    } else if (c === ')') {
      depth = Math.max(0, depth - 1);
      i++;
    } else if (/[A-Za-z_]/.test(c)) {
      let j = i + 1;
      while (j < n && /[A-Za-z0-9_$]/.test(sql[j]!)) j++;
      if (depth === 0) words.push(sql.slice(i, j).toUpperCase());
      i = j;
    } else i++;
  }
  if (words.length) out.push({ words });
  return out;
}

/** A plain message when `sql` contains a statement a visitor may not run, else null. */
export function statementProblem(sql: string): string | null {
  for (const { words } of statementWords(sql)) {
    let first = words[0]!;
    let k = 0;
    // EXPLAIN [ANALYZE] <statement>: judge the statement explained.
    while ((first === 'EXPLAIN' || first === 'ANALYZE' || first === 'ANALYSE') && k + 1 < words.length) first = words[++k]!;
    if (WRITING.has(first)) return READ_ONLY_MESSAGE;
    if (OUTSIDE.has(first)) return OUTSIDE_MESSAGE;
    if (!READING.has(first)) {
      return `Only queries that read the catalog run here (SELECT, WITH, DESCRIBE, SHOW, SUMMARIZE, EXPLAIN); “${first}” is not available: the database’s settings are fixed on this site.`;
    }
    // A WITH clause may lead into a data-changing statement: look at its depth-0 words.
    if (first === 'WITH' && words.slice(k).some((w) => WRITING.has(w) && w !== 'REPLACE')) return READ_ONLY_MESSAGE;
  }
  return null;
}
