/**
 * The in-browser object page (`object/?id=…`), for catalogs too large for one static page per
 * object and for any link by id: reads the object's row with DuckDB-WASM and lays it out like
 * the static pages (src/site/build/objectView.ts), writing every value with textContent.
 */
import { CensusDbError, queryCensus, TABLE } from '../db/duckdb.ts';
import { rowObjects } from '../db/resultSet.ts';
import { sqlString } from '../db/sqlIdent.ts';
import { bindDbStatus } from '../db/statusView.ts';
import { objectView, valueText, type ViewLine } from '../build/objectView.ts';
import type { CatalogRow } from '../build/loadCatalog.ts';
import type { ColumnMeta } from '../build/siteMeta.ts';
import { mountCatalogCharts } from '../population/mountCatalogCharts.ts';

function text(tag: string, content: string, className?: string): HTMLElement {
  const e = document.createElement(tag);
  e.textContent = content;
  if (className) e.className = className;
  return e;
}

function valueTable(lines: ViewLine[], spreadHeading: string): HTMLElement {
  const wrap = document.createElement('div');
  wrap.className = 'table-wrap';
  const table = document.createElement('table');
  table.className = 'data values';
  const head = document.createElement('tr');
  const heads: [string, string | undefined][] = [['Quantity', undefined], ['Column', 'col-name'], ['Value', 'num'], ...(spreadHeading ? [[spreadHeading, 'num'] as [string, string]] : []), ['Unit', undefined]];
  for (const [h, cls] of heads) {
    const th = text('th', h, cls);
    th.setAttribute('scope', 'col');
    head.append(th);
  }
  table.createTHead().append(head);
  const body = table.createTBody();
  for (const l of lines) {
    const tr = document.createElement('tr');
    tr.dataset.column = l.column;
    const th = text('th', l.label);
    th.setAttribute('scope', 'row');
    th.title = l.description;
    th.append(text('code', l.column, 'col-under'));
    const code = document.createElement('td');
    code.className = 'col-name';
    code.append(text('code', l.column));
    // The same words as the page built at build time (ValueTable.astro): "<" or ">" and which bound.
    const { text: shown, note } = valueText(l);
    const value = text('td', shown, l.numeric ? 'num' : undefined);
    if (note) value.append(text('span', ` (${note})`, 'muted small'));
    tr.append(th, code, value);
    if (spreadHeading) tr.append(text('td', l.spread, 'num'));
    tr.append(text('td', l.unit));
    body.append(tr);
  }
  wrap.append(table);
  return wrap;
}

/**
 * The page for no id or an id the catalog does not have: says so, links the list of every
 * object, and hides the population charts (they would wait for an object that never comes).
 */
function notInCatalog(heading: HTMLElement, body: HTMLElement, charts: HTMLElement, id: string | null): void {
  heading.textContent = 'Not in the catalog';
  const base = document.body.dataset.base ?? '/';
  const p = document.createElement('p');
  p.className = 'status';
  p.dataset.notFound = '';
  p.textContent = id === null ? 'No object was named (the link has no ?id=…), so there is nothing to show: ' : `The object “${id}” is not in the catalog: `;
  const a = document.createElement('a');
  a.href = `${base}objects/`;
  a.textContent = 'find it in the list of every object';
  p.append(a, document.createTextNode('.'));
  body.replaceChildren(p);
  const section = charts.closest('section');
  if (section) section.hidden = true;
  else charts.hidden = true;
}

/** The rejected inputs of an invalid row, read from the build's data/rejections.json. */
async function rejectedInputs(id: string): Promise<HTMLElement> {
  const section = document.createElement('section');
  section.dataset.rejected = '';
  section.append(text('h2', 'Rejected inputs'));
  let list: { column: string; value: string; reason: string; message: string }[] = [];
  try {
    const res = await fetch(`${document.body.dataset.base ?? '/'}data/rejections.json`);
    if (res.ok) list = ((await res.json()) as Record<string, typeof list>)[id] ?? [];
  } catch {
    // shown as "no detail" below
  }
  if (!list.length) {
    section.append(text('p', 'This row failed validation, but the build recorded no detail for it.'));
    return section;
  }
  section.append(text('p', 'These input values failed validation, so no quantity was derived for this object:'));
  const wrap = document.createElement('div');
  wrap.className = 'table-wrap';
  const table = document.createElement('table');
  table.className = 'data';
  const head = document.createElement('tr');
  for (const h of ['Column', 'Value given', 'Why it was rejected']) head.append(text('th', h));
  table.createTHead().append(head);
  const body = table.createTBody();
  for (const r of list) {
    const tr = document.createElement('tr');
    const code = document.createElement('td');
    code.append(text('code', r.column));
    tr.append(code, text('td', r.value === '' ? '(empty)' : r.value), text('td', r.reason || r.message));
    body.append(tr);
  }
  wrap.append(table);
  section.append(wrap);
  return section;
}

export async function startObjectViewer(root: HTMLElement): Promise<void> {
  bindDbStatus(document.querySelector<HTMLElement>('[data-db-status]'));
  const heading = root.querySelector<HTMLElement>('h1')!;
  const body = root.querySelector<HTMLElement>('[data-object-body]')!;
  const charts = document.querySelector<HTMLElement>('[data-population="manual"]')!;
  const id = new URLSearchParams(location.search).get('id');
  if (!id) {
    notInCatalog(heading, body, charts, null);
    return;
  }
  heading.textContent = id;
  document.title = `${id} · ${document.title}`;
  try {
    const rs = await queryCensus(`SELECT * FROM ${TABLE} WHERE id = ${sqlString(id)} LIMIT 1`);
    const [row] = rowObjects(rs) as CatalogRow[];
    if (!row) {
      notInCatalog(heading, body, charts, id);
      return;
    }
    const columns = JSON.parse(root.dataset.columns ?? '{}') as Record<string, ColumnMeta>;
    const view = objectView(row, rs.names, { columns });
    const z = view.inputs.find((l) => l.column === 'z');
    const parts: HTMLElement[] = [text('p', `Redshift ${z?.value ?? '—'}${view.flags.length ? ` · ${view.flags.length} ${view.flags.length === 1 ? 'flag' : 'flags'}` : ''}`, 'lede')];
    const pos = view.position;
    if (pos) parts.push(text('p', `RA ${pos.raHms} (${pos.raDeg}°) · Dec ${pos.decDms} (${pos.decDeg}°)`, 'object-position'));
    const grid = document.createElement('div');
    grid.className = 'two-col';
    const left = document.createElement('section');
    left.append(text('h2', 'Derived values'), text('p', 'Nominal values; the interval is the 16th–84th percentile of the Monte Carlo draws.', 'small muted'), valueTable(view.derived, '16–84 % interval'));
    const right = document.createElement('section');
    right.append(text('h2', 'Inputs'), valueTable(view.inputs, '1σ error'));
    if (view.other.length) right.append(text('h3', 'Other columns'), valueTable(view.other, ''));
    grid.append(left, right);
    parts.push(grid);
    if (view.flags.some((f) => f.code === 'invalid_input')) parts.push(await rejectedInputs(id));
    parts.push(text('h2', 'Flags'));
    if (view.flags.length === 0) parts.push(text('p', 'No flags: every quantity was derived without a special condition.'));
    else {
      const ul = document.createElement('ul');
      ul.className = 'flag-list';
      for (const f of view.flags) {
        const li = document.createElement('li');
        li.append(text('code', f.code), document.createTextNode(`: ${f.text}`));
        ul.append(li);
      }
      parts.push(ul);
    }
    const prov = document.createElement('dl');
    prov.className = 'defs';
    for (const [k, c] of [['Black-hole mass from', 'mbh_method'], ['Bolometric luminosity from', 'lbol_method']] as const) {
      prov.append(text('dt', k), text('dd', typeof row[c] === 'string' && row[c] ? String(row[c]) : 'not derived'));
    }
    parts.push(text('h2', 'How these numbers were made'), prov);
    body.replaceChildren(...parts);
    charts.dataset.highlight = id;
    charts.dataset.population = 'catalog';
    await mountCatalogCharts(charts);
  } catch (err) {
    body.replaceChildren(text('p', err instanceof CensusDbError ? err.message : String(err), 'status'));
  }
}
