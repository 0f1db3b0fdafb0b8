/**
 * Query results as files that keep their meaning: CSV after '#' lines recording the query,
 * the catalog's SHA-256 and each column's unit; ECSV (astropy's header: units, UCDs,
 * descriptions, the query in the table meta); VOTable with TABLEDATA. Columns the query
 * computed have no unit or UCD and say so.
 */
import { astropyHeaderLines } from '../../catalog/publish/astropyHeader.ts';
import type { TableDoc } from '../../catalog/publish/tableDoc.ts';
import { votableParts, xmlText } from '../../catalog/publish/votableXml.ts';
import type { ResultSet } from '../db/resultSet.ts';
import { boundsNoteLines } from '../text/boundsNote.ts';

/** What the page knows about the catalog (see src/site/build/queryContext.ts). */
export interface ResultContext {
  title: string;
  tool: string;
  catalogSha256: string;
  inputSha256: string;
  columns: Record<string, { unit?: string; ucd?: string; description: string }>;
}

type Kind = 'float' | 'int' | 'bool' | 'string';
/** Our kind of an Arrow type name as DuckDB-WASM reports it ('Float64', 'Int32', 'Bool', 'Utf8'…). */
const kindOf = (type: string): Kind => (/^Float|^Decimal/i.test(type) ? 'float' : /^U?Int/i.test(type) ? 'int' : /^Bool/i.test(type) ? 'bool' : 'string');

/** The result described as a table: catalog columns keep their docs; computed ones are marked. */
export function resultDoc(rs: ResultSet, sql: string, ctx: ResultContext): TableDoc {
  return {
    name: 'census_query',
    description: `Result of a query on ${ctx.title}`,
    meta: [
      ['query', sql],
      ...boundsNoteLines(rs.names).map((l, i): [string, string] => [i === 0 ? 'bounds' : `bounds_warning_${i}`, l]),
      ['catalog_sha256', ctx.catalogSha256],
      ['input_sha256', ctx.inputSha256],
      ['tool', ctx.tool],
    ],
    columns: rs.names.map((name, i) => {
      const d = ctx.columns[name];
      return { name, kind: kindOf(rs.types[i] ?? ''), group: 'derived' as const, ...(d?.unit ? { unit: d.unit } : {}), ...(d?.ucd ? { ucd: d.ucd } : {}), description: d?.description ?? 'Computed by the query (no unit recorded)' };
    }),
  };
}

const csvField = (v: unknown): string => {
  if (v === null || v === undefined) return '';
  const s = typeof v === 'number' ? (Number.isFinite(v) ? String(v) : '') : String(v);
  return /[",\r\n#]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
};
const rowIndex = (order: ArrayLike<number> | undefined, k: number): number => (order ? order[k]! : k);
const oneLine = (s: string): string => s.replace(/\s+/g, ' ').trim();

/**
 * CSV after '#' lines: the query, the catalog's SHA-256, the tool, the note on bounds (and a
 * warning for each column that can hold bounds whose `_is_limit` column the query left out), and
 * `name [unit]: description` for each column.
 */
export function resultCsvWithHeader(rs: ResultSet, sql: string, ctx: ResultContext, order?: ArrayLike<number>): string {
  const doc = resultDoc(rs, sql, ctx);
  const lines = [`# ${oneLine(ctx.title)}: query result`, `# query: ${oneLine(sql)}`, `# catalog SHA-256: ${ctx.catalogSha256}`, `# written by: ${ctx.tool}`];
  for (const l of boundsNoteLines(rs.names)) lines.push(`# ${l}`);
  for (const c of doc.columns) lines.push(`# ${c.name}${c.unit ? ` [${c.unit}]` : ''}: ${oneLine(c.description)}`);
  lines.push(rs.names.map(csvField).join(','));
  for (let k = 0; k < rs.numRows; k++) lines.push(rs.columns.map((col) => csvField(col[rowIndex(order, k)])).join(','));
  return lines.join('\r\n') + '\r\n';
}

/** ECSV 1.0 with astropy's header. */
export function resultEcsv(rs: ResultSet, sql: string, ctx: ResultContext, order?: ArrayLike<number>): string {
  const doc = resultDoc(rs, sql, ctx);
  const cell = (v: unknown, kind: Kind): string => {
    if (v === null || v === undefined || (typeof v === 'number' && !Number.isFinite(v))) return '';
    if (kind === 'bool') return v ? 'True' : 'False';
    if (kind === 'string') {
      const s = String(v);
      return /[",\s#]/.test(s) || s === '' ? `"${s.replace(/"/g, '""')}"` : s;
    }
    return String(v);
  };
  const lines = ['# %ECSV 1.0', '# ---', ...astropyHeaderLines(doc, ',').map((l) => `# ${l}`), rs.names.map((n) => cell(n, 'string')).join(',')];
  for (let k = 0; k < rs.numRows; k++) lines.push(rs.columns.map((col, c) => cell(col[rowIndex(order, k)], doc.columns[c]!.kind)).join(','));
  return lines.join('\n') + '\n';
}

/** VOTable 1.4 with TABLEDATA. */
export function resultVotable(rs: ResultSet, sql: string, ctx: ResultContext, order?: ArrayLike<number>): string {
  const doc = resultDoc(rs, sql, ctx);
  const { head, tail } = votableParts(doc);
  const td = (v: unknown, kind: Kind): string => {
    if (v === null || v === undefined || (typeof v === 'number' && Number.isNaN(v))) return '<TD/>';
    if (kind === 'bool') return `<TD>${v ? 'T' : 'F'}</TD>`;
    return `<TD>${xmlText(String(v))}</TD>`;
  };
  const rows: string[] = [];
  for (let k = 0; k < rs.numRows; k++) rows.push(`          <TR>${rs.columns.map((col, c) => td(col[rowIndex(order, k)], doc.columns[c]!.kind)).join('')}</TR>`);
  return `${head}      <DATA>\n        <TABLEDATA>\n${rows.join('\n')}${rows.length ? '\n' : ''}        </TABLEDATA>\n      </DATA>\n${tail}`;
}

/** Offers `text` as a file download. */
export function downloadText(text: string, fileName: string, type: string): void {
  const a = document.createElement('a');
  a.href = URL.createObjectURL(new Blob([text], { type }));
  a.download = fileName;
  document.body.append(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(a.href), 10_000);
}

/**
 * Adds "Download as ECSV" and "Download as VOTable" buttons after `after` (the CSV button),
 * enabled with it; `current` returns the shown result, its row order and its query.
 */
export function attachResultDownloads(after: HTMLButtonElement, ctx: ResultContext, current: () => { rs: ResultSet; sql: string; order?: ArrayLike<number> } | null): void {
  const make = (label: string, write: typeof resultEcsv, file: string, type: string): HTMLButtonElement => {
    const b = document.createElement('button');
    b.type = 'button';
    b.textContent = label;
    b.disabled = after.disabled;
    b.addEventListener('click', () => {
      const c = current();
      if (c) downloadText(write(c.rs, c.sql, ctx, c.order), file, type);
    });
    return b;
  };
  const ecsv = make('ECSV', resultEcsv, 'census-query.ecsv', 'text/plain;charset=utf-8');
  const vot = make('VOTable', resultVotable, 'census-query.vot', 'application/x-votable+xml');
  after.after(' ', ecsv, ' ', vot);
  // Follow the CSV button's enabled state.
  new MutationObserver(() => {
    ecsv.disabled = vot.disabled = after.disabled;
  }).observe(after, { attributes: true, attributeFilter: ['disabled'] });
}
