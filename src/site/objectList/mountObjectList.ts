/**
 * Browser-only: the object list page. Reads one page of objects at a time from the catalog
 * with DuckDB-WASM (so a catalog of a million objects costs one page of DOM), searched by id
 * and every text column, filtered by flag, sorted by any column (header buttons for the shown
 * columns, a chooser for all of them), with the state in the URL. Every value is written with
 * textContent: catalog text is data, never markup.
 */
import { CensusDbError, queryCensus } from '../db/duckdb.ts';
import { bindDbStatus } from '../db/statusView.ts';
import { objectHrefHere } from '../objectLink.ts';
import { limitMark } from '../text/limitMark.ts';
import { formatValue, isNumericType } from '../text/formatValue.ts';
import { listSql, PAGE_SIZE, sortColumn, type ListSchema, type ListState } from './listQuery.ts';
import { listStateFromSearch, listStateSearch } from './listState.ts';

/** What the build writes on the list's root element (data-list). */
export interface ListConfig extends ListSchema {
  /** Columns shown in the table, in order. */
  shown: string[];
  /** Column → DuckDB type. */
  types: Record<string, string>;
  /** Column → unit text. */
  units: Record<string, string>;
  /** Column → readable label. */
  labels: Record<string, string>;
}

function el<K extends keyof HTMLElementTagNameMap>(tag: K, text?: string, className?: string): HTMLElementTagNameMap[K] {
  const e = document.createElement(tag);
  if (text !== undefined) e.textContent = text;
  if (className) e.className = className;
  return e;
}

export function mountObjectList(root: HTMLElement): void {
  const config = JSON.parse(root.dataset.list ?? '{}') as ListConfig;
  const form = root.querySelector<HTMLFormElement>('[data-list-form]')!;
  const search = form.querySelector<HTMLInputElement>('[name="q"]')!;
  const flag = form.querySelector<HTMLSelectElement>('[name="flag"]')!;
  const sort = form.querySelector<HTMLSelectElement>('[name="sort"]')!;
  const desc = form.querySelector<HTMLSelectElement>('[name="desc"]')!;
  const summary = root.querySelector<HTMLElement>('[data-list-summary]')!;
  const tableWrap = root.querySelector<HTMLElement>('[data-list-table]')!;
  const prev = root.querySelector<HTMLButtonElement>('[data-list-prev]')!;
  const next = root.querySelector<HTMLButtonElement>('[data-list-next]')!;
  const pageInfo = root.querySelector<HTMLElement>('[data-list-page]')!;
  bindDbStatus(document.querySelector<HTMLElement>('[data-db-status]'));

  let state: ListState = listStateFromSearch(location.search);
  let generation = 0;
  let total = 0;

  const syncForm = () => {
    search.value = state.q;
    flag.value = [...flag.options].some((o) => o.value === state.flag) ? state.flag : '';
    sort.value = sortColumn(state, config);
    desc.value = state.desc ? '1' : '0';
  };

  const head = (): HTMLTableSectionElement => {
    const thead = el('thead');
    const tr = el('tr');
    const active = sortColumn(state, config);
    for (const c of config.shown) {
      const th = el('th');
      th.scope = 'col';
      if (isNumericType(config.types[c] ?? '')) th.className = 'num';
      if (c === active) th.setAttribute('aria-sort', state.desc ? 'descending' : 'ascending');
      const b = el('button', config.labels[c] ?? c, 'sort-button');
      b.type = 'button';
      b.dataset.sort = c;
      b.title = `Sort by ${c}`;
      if (c === active) b.append(el('span', state.desc ? ' ↓' : ' ↑', 'sort-mark'));
      const name = el('code', c);
      const unit = config.units[c];
      th.append(b, el('br'), name, ...(unit ? [el('span', ` (${unit})`, 'unit')] : []));
      b.addEventListener('click', () => update({ sort: c, desc: c === active ? !state.desc : false, page: 0 }));
      tr.append(th);
    }
    thead.append(tr);
    return thead;
  };

  async function load(push: boolean): Promise<void> {
    const my = ++generation;
    if (push) history.replaceState(null, '', `${location.pathname}${listStateSearch(state)}${location.hash}`);
    syncForm();
    root.setAttribute('aria-busy', 'true');
    const sql = listSql(state, config, config.shown);
    try {
      const [rows, count] = await Promise.all([queryCensus(sql.rows), queryCensus(sql.count)]);
      if (my !== generation) return;
      total = Number(count.columns[0]?.[0] ?? 0);
      const pages = Math.max(1, Math.ceil(total / PAGE_SIZE));
      if (state.page >= pages && total > 0) {
        state = { ...state, page: pages - 1 };
        return load(true);
      }
      const table = el('table', undefined, 'data');
      table.dataset.objectList = '';
      table.append(head());
      const body = el('tbody');
      for (let r = 0; r < rows.numRows; r++) {
        const tr = el('tr');
        // The row by name, for the bounds: an upper-limit mass is shown '< 6.28', as everywhere else.
        const rec: Record<string, unknown> = {};
        rows.names.forEach((name, c) => (rec[name] = rows.columns[c]![r]));
        rows.names.forEach((name, c) => {
          const v = rows.columns[c]![r];
          const td = el('td', undefined, isNumericType(rows.types[c] ?? '') ? 'num' : name === 'flags' ? 'flags-cell' : undefined);
          if (name === 'id' && v !== null && v !== undefined) {
            const a = el('a', String(v));
            a.href = objectHrefHere(String(v));
            td.append(a);
          } else {
            const mark = v === null || v === undefined ? '' : limitMark(name, rec);
            td.textContent = `${mark ? `${mark} ` : ''}${formatValue(name, v)}`;
          }
          tr.append(td);
        });
        body.append(tr);
      }
      table.append(body);
      tableWrap.replaceChildren(table);
      const first = total ? state.page * PAGE_SIZE + 1 : 0;
      const last = Math.min(total, (state.page + 1) * PAGE_SIZE);
      summary.textContent =
        total === 0
          ? 'No object matches.'
          : `${total.toLocaleString('en')} ${total === 1 ? 'object matches' : 'objects match'}; showing ${first.toLocaleString('en')}–${last.toLocaleString('en')}, sorted by ${sortColumn(state, config)} ${state.desc ? 'descending' : 'ascending'}.`;
      summary.dataset.total = String(total);
      pageInfo.textContent = `Page ${state.page + 1} of ${pages.toLocaleString('en')}`;
      prev.disabled = state.page === 0;
      next.disabled = state.page + 1 >= pages;
    } catch (err) {
      if (my !== generation) return;
      summary.textContent = err instanceof CensusDbError ? err.message : `The list could not be read: ${String(err)}`;
    } finally {
      if (my === generation) root.removeAttribute('aria-busy');
    }
  }

  const update = (change: Partial<ListState>) => {
    state = { ...state, ...change };
    void load(true);
  };

  let typing: ReturnType<typeof setTimeout> | undefined;
  search.addEventListener('input', () => {
    clearTimeout(typing);
    typing = setTimeout(() => update({ q: search.value, page: 0 }), 250);
  });
  form.addEventListener('submit', (e) => {
    e.preventDefault();
    clearTimeout(typing);
    update({ q: search.value, page: 0 });
  });
  // a change of filter or sort takes the search box as it is now (a pending search is not lost,
  // and the box is not reset to the old search when the list redraws)
  const withSearch = (change: Partial<ListState>) => {
    clearTimeout(typing);
    update({ q: search.value, page: 0, ...change });
  };
  flag.addEventListener('change', () => withSearch({ flag: flag.value }));
  sort.addEventListener('change', () => withSearch({ sort: sort.value }));
  desc.addEventListener('change', () => withSearch({ desc: desc.value === '1' }));
  prev.addEventListener('click', () => update({ page: state.page - 1 }));
  next.addEventListener('click', () => update({ page: state.page + 1 }));
  window.addEventListener('popstate', () => {
    state = listStateFromSearch(location.search);
    void load(false);
  });
  void load(false);
}
