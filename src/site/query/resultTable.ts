/**
 * The result table of the SQL workspace: headers with units that sort on click (buttons,
 * so the keyboard works), one page of rows in the DOM at a time however large the result,
 * numbers formatted for reading, and ids linking to object pages. Every value is written
 * with textContent: catalog text is data, never markup.
 */
import type { ResultSet } from '../db/resultSet.ts';
import { objectHrefHere } from '../objectLink.ts';
import { formatValue, isNumericType } from '../text/formatValue.ts';
import { LIMIT_COLUMN, limitMark } from '../text/limitMark.ts';
import { sortOrder, type SortDirection } from './sortOrder.ts';

export interface ResultTableOptions {
  /** Column name → unit text shown in the header. */
  units: Record<string, string>;
  /** The site's base path, e.g. '/' or '/census/'. */
  base: string;
  /** Rows per page (default 50). */
  pageSize?: number;
}

export class ResultTable {
  private rs: ResultSet | null = null;
  private order: ArrayLike<number> | null = null;
  private sort: { column: number; direction: SortDirection } | null = null;
  private page = 0;
  private readonly pageSize: number;
  private readonly table: HTMLTableElement;
  private readonly pager: HTMLElement;
  private readonly info: HTMLElement;
  private readonly prev: HTMLButtonElement;
  private readonly next: HTMLButtonElement;

  constructor(
    private readonly root: HTMLElement,
    private readonly options: ResultTableOptions,
  ) {
    this.pageSize = options.pageSize ?? 50;
    const wrap = el('div', 'table-wrap');
    this.table = el('table', 'data') as HTMLTableElement;
    this.table.dataset.results = '';
    wrap.append(this.table);
    this.pager = el('div', 'pager');
    this.prev = button('← Previous', () => this.go(this.page - 1));
    this.next = button('Next →', () => this.go(this.page + 1));
    this.info = el('span', 'pager-info');
    this.info.setAttribute('aria-live', 'polite');
    this.pager.append(this.prev, this.info, this.next);
    root.replaceChildren(wrap, this.pager);
    this.pager.hidden = true;
  }

  /** Shows `rs` from its first page, unsorted. */
  setResult(rs: ResultSet): void {
    this.rs = rs;
    this.order = null;
    this.sort = null;
    this.page = 0;
    this.renderHead();
    this.renderBody();
  }

  /** Row indices in the order shown (for the CSV export). */
  rowOrder(): ArrayLike<number> | undefined {
    return this.order ?? undefined;
  }

  private pages(): number {
    return Math.max(1, Math.ceil((this.rs?.numRows ?? 0) / this.pageSize));
  }

  private go(page: number): void {
    this.page = Math.min(Math.max(0, page), this.pages() - 1);
    this.renderBody();
  }

  private toggleSort(column: number): void {
    const rs = this.rs!;
    const direction: SortDirection = this.sort?.column === column && this.sort.direction === 'ascending' ? 'descending' : 'ascending';
    this.sort = { column, direction };
    this.order = sortOrder(rs.columns[column]!, direction);
    this.page = 0;
    for (const [i, th] of Array.from(this.table.querySelectorAll('thead th')).entries()) {
      th.setAttribute('aria-sort', i === column ? direction : 'none');
    }
    this.renderBody();
  }

  private renderHead(): void {
    const rs = this.rs!;
    const thead = document.createElement('thead');
    const tr = document.createElement('tr');
    rs.names.forEach((name, c) => {
      const th = document.createElement('th');
      th.scope = 'col';
      th.setAttribute('aria-sort', 'none');
      if (isNumericType(rs.types[c]!)) th.className = 'num';
      const b = button('', () => this.toggleSort(c));
      b.className = 'sort';
      b.title = `Sort by ${name}`;
      const label = document.createElement('span');
      label.textContent = name;
      b.append(label);
      const unit = this.options.units[name];
      if (unit) {
        const u = el('span', 'unit');
        u.textContent = `(${unit})`;
        b.append(u);
      }
      b.append(el('span', 'arrow'));
      th.append(b);
      tr.append(th);
    });
    thead.append(tr);
    this.table.replaceChildren(thead, document.createElement('tbody'));
  }

  private renderBody(): void {
    const rs = this.rs!;
    const tbody = document.createElement('tbody');
    const numeric = rs.types.map(isNumericType);
    const idCol = rs.names.findIndex((n) => n.toLowerCase() === 'id');
    const flagsCol = rs.names.findIndex((n) => n.toLowerCase() === 'flags');
    // a bound is written with '<' or '>' when the result holds its _is_limit column or the flags
    const limitSources = rs.names.map((name) => {
      const marker = LIMIT_COLUMN[name] ?? (name === 'log_edd_ratio' ? 'log_edd_ratio_is_limit' : undefined);
      const m = marker ? rs.names.indexOf(marker) : -1;
      const f = rs.names.indexOf('flags');
      return marker && (m >= 0 || f >= 0) ? { marker, m, f } : null;
    });
    const from = this.page * this.pageSize;
    const to = Math.min(rs.numRows, from + this.pageSize);
    for (let k = from; k < to; k++) {
      const r = this.order ? this.order[k]! : k;
      const tr = document.createElement('tr');
      for (let c = 0; c < rs.names.length; c++) {
        const td = document.createElement('td');
        const v = rs.columns[c]![r];
        if (numeric[c]) td.className = 'num';
        if (c === idCol && v !== null && v !== undefined) {
          const a = document.createElement('a');
          a.href = objectHrefHere(String(v));
          a.textContent = String(v);
          td.className = 'id-cell';
          td.append(a);
        } else {
          const src = limitSources[c];
          const mark = src && v !== null && v !== undefined
            ? limitMark(rs.names[c]!, { ...(src.m >= 0 ? { [src.marker]: rs.columns[src.m]![r] } : {}), ...(src.f >= 0 ? { flags: rs.columns[src.f]![r] } : {}) })
            : '';
          td.textContent = `${mark ? `${mark} ` : ''}${formatValue(rs.names[c]!, v)}`;
          if (c === flagsCol) td.classList.add('flags-cell');
          if (v === null || v === undefined) td.classList.add('null');
        }
        tr.append(td);
      }
      tbody.append(tr);
    }
    this.table.querySelector('tbody')!.replaceWith(tbody);
    const n = rs.numRows;
    this.pager.hidden = n <= this.pageSize;
    this.prev.disabled = this.page === 0;
    this.next.disabled = this.page >= this.pages() - 1;
    this.info.textContent = n === 0 ? 'No rows' : `Rows ${from + 1}–${to} of ${n.toLocaleString('en')}`;
  }
}

function el(tag: string, className: string): HTMLElement {
  const e = document.createElement(tag);
  e.className = className;
  return e;
}

function button(text: string, onClick: () => void): HTMLButtonElement {
  const b = document.createElement('button');
  b.type = 'button';
  b.textContent = text;
  b.addEventListener('click', onClick);
  return b;
}
