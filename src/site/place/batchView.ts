/**
 * Browser-only: the place page's table of pasted objects, one row per pasted data row (placed
 * or not), with where each falls, and a second table of each placed object under every
 * reading. Text goes in through textContent only (ids are arbitrary text).
 */
import type { Reading } from '../../core/readings/reading.ts';
import type { RederivedRow } from '../readings/rederiveBatch.ts';
import { formatFixed, formatValue, MISSING } from '../text/formatValue.ts';
import type { CatalogRow } from '../charts/types.ts';
import { num } from '../charts/rowValues.ts';
import { limitMark } from '../text/limitMark.ts';
import type { PlaceReport } from './placeReport.ts';
import { ordinalPercentile } from './ranks.ts';

/** One pasted data row as the table shows it: placed (with its derived row and report) or not (with its first problem). */
export type BatchEntry =
  | { row: number; id: string; placed: CatalogRow; report: PlaceReport }
  | { row: number; id: string; problem: string };

const f2 = (v: number | null | undefined): string => (v === null || v === undefined || !Number.isFinite(v) ? MISSING : formatFixed(v, 2));

function table(doc: Document, id: string, caption: string, head: readonly string[]): { table: HTMLTableElement; body: HTMLTableSectionElement } {
  const t = doc.createElement('table');
  t.className = 'data';
  t.id = id;
  const c = t.createCaption();
  c.className = 'visually-hidden';
  c.textContent = caption;
  const tr = t.createTHead().insertRow();
  for (const h of head) {
    const th = doc.createElement('th');
    th.scope = 'col';
    th.textContent = h;
    tr.append(th);
  }
  return { table: t, body: t.createTBody() };
}

function cells(tr: HTMLTableRowElement, values: readonly string[], numeric: readonly boolean[], idAt: number): void {
  values.forEach((v, i) => {
    const td = tr.insertCell();
    td.textContent = v;
    if (numeric[i]) td.className = 'num';
    else if (i === idAt) td.className = 'id';
  });
}

const wrap = (doc: Document, el: HTMLElement): HTMLElement => {
  const d = doc.createElement('div');
  d.className = 'table-wrap';
  d.append(el);
  return d;
};

/**
 * The cells of one placed object in the table of pasted objects: row, id, z, log M_BH, log L_bol,
 * log λ_Edd, offset from the local relation (each bound written with '<' or '>', as on the object
 * pages; a lower-limit λ_Edd is '>'), and the rank of M_BH in the catalog.
 */
export function placedCells(e: { row: number; id: string; placed: CatalogRow; report: PlaceReport }): string[] {
  const r = e.placed;
  const lim = (column: string): string => {
    const mark = limitMark(column, r);
    return mark ? `${mark} ` : '';
  };
  const mbhRank = e.report.ranks.find((q) => q.column === 'log_mbh');
  const rank = mbhRank && mbhRank.all.percentile !== null ? `${mbhRank.isLimit ? 'at most the ' : ''}${ordinalPercentile(mbhRank.all.percentile)} percentile of ${mbhRank.all.n}` : MISSING;
  return [
    String(e.row),
    e.id,
    formatValue('z', r.z),
    `${lim('log_mbh')}${f2(num(r.log_mbh))}`,
    `${lim('log_lbol')}${f2(num(r.log_lbol))}`,
    `${lim('log_edd_ratio')}${f2(num(r.log_edd_ratio))}`,
    `${lim('delta_log_mbh_local')}${f2(num(r.delta_log_mbh_local))}`,
    rank,
  ];
}

/** The table of pasted objects with the catalog's settings: row, id, z, M_BH, L_bol, λ_Edd, offset, rank of M_BH, or why the row was not placed. */
export function batchTable(doc: Document, entries: readonly BatchEntry[]): HTMLElement {
  const section = doc.createElement('section');
  section.dataset.placeBatch = '';
  const h = doc.createElement('h3');
  const placed = entries.filter((e) => 'placed' in e).length;
  h.textContent = `Pasted objects: ${placed} of ${entries.length} placed`;
  const { table: t, body } = table(doc, 'place-batch', 'Every pasted object with the catalog’s settings', [
    'Row', 'Id', 'z', 'log M_BH', 'log L_bol', 'log λ_Edd', 'Δ local (dex)', 'M_BH rank in the catalog',
  ]);
  const numeric = [true, false, true, true, true, true, true, false];
  for (const e of entries) {
    const tr = body.insertRow();
    tr.dataset.row = String(e.row);
    if ('problem' in e) {
      tr.dataset.placed = 'false';
      cells(tr, [String(e.row), e.id || MISSING], numeric, 1);
      const td = tr.insertCell();
      td.colSpan = 6;
      td.className = 'batch-problem';
      td.textContent = `not placed: ${e.problem}`;
      continue;
    }
    tr.dataset.placed = 'true';
    cells(tr, placedCells(e), numeric, 1);
  }
  section.append(h, wrap(doc, t));
  return section;
}

/**
 * The cells of one placed object under one reading: object, reading, log M_BH, log L_bol, log λ_Edd,
 * P(λ > 1), offset from the local relation and flags; bounds (from the row's flags) written with '<' or '>'.
 */
export function readingCells(id: string, reading: Pick<Reading, 'label'>, row: RederivedRow): string[] {
  const v = (column: 'log_mbh' | 'log_lbol' | 'log_edd_ratio' | 'delta_log_mbh_local'): string => {
    const mark = row[column] === null ? '' : limitMark(column, row as unknown as Record<string, unknown>);
    return `${mark ? `${mark} ` : ''}${f2(row[column])}`;
  };
  return [id, reading.label, v('log_mbh'), v('log_lbol'), v('log_edd_ratio'), f2(row.p_super_eddington), v('delta_log_mbh_local'), row.flags.split(',').filter(Boolean).join(', ')];
}

/** Each placed object under every reading: one row per object and reading, grouped by object. */
export function batchReadingsTable(doc: Document, rows: readonly { id: string; reading: Reading; row: RederivedRow }[]): HTMLElement {
  const section = doc.createElement('section');
  section.dataset.placeReadings = '';
  const h = doc.createElement('h3');
  h.textContent = 'Under every reading of the broad lines';
  const { table: t, body } = table(doc, 'place-batch-readings', 'Each pasted object under every reading', ['Object', 'Reading', 'log M_BH', 'log L_bol', 'log λ_Edd', 'P(λ > 1)', 'Δ local (dex)', 'Flags']);
  const numeric = [false, false, true, true, true, true, true, false];
  for (const { id, reading, row } of rows) {
    const tr = body.insertRow();
    tr.dataset.object = id;
    tr.dataset.readingValue = reading.id;
    cells(tr, readingCells(id, reading, row), numeric, 0);
  }
  section.append(h, wrap(doc, t));
  return section;
}
