/**
 * Browser-only: the chart under the SQL workspace's result. It listens for the workspace's
 * `census-result` event (detail: the ResultSet and the SQL), offers the result's columns for
 * x, y, colour and size, log axes and the reference overlays, keeps the choice in the page
 * URL beside the query, and draws with resultChart. When the result has ids but not the
 * catalog's limit markers (flags, _is_limit columns), it reads them for those ids so limits
 * are drawn as arrows whatever the SELECT.
 */
import { chartSettings } from '../charts/chartSettings.ts';
import { mountChart } from '../charts/mountChart.ts';
import { queryCensus, TABLE } from '../db/duckdb.ts';
import type { ResultSet } from '../db/resultSet.ts';
import { sqlIdent } from '../db/sqlIdent.ts';
import { columnLabel } from '../text/columnLabels.ts';
import { isNumericType } from '../text/formatValue.ts';
import { limitSourceColumns } from './limitRule.ts';
import { resultChart } from './resultChart.ts';
import { chartSettingsFromSearch, fitSettings, hrefWithChartSettings, type ResultChartSettings } from './resultChartSettings.ts';
import { OVERLAY_TEXT, overlayFor } from './resultOverlays.ts';

/** The event the workspace dispatches on `document` after each successful query. */
export const RESULT_EVENT = 'census-result';
export interface ResultEventDetail {
  rs: ResultSet;
  sql: string;
}

/** `rs` with `extra`'s columns (keyed by id) appended, in `rs`'s row order. */
export function withColumnsById(rs: ResultSet, extra: ResultSet): ResultSet {
  const idAt = rs.names.indexOf('id');
  const exIdAt = extra.names.indexOf('id');
  const add = extra.names.map((n, i) => [n, i] as const).filter(([n]) => n !== 'id' && !rs.names.includes(n));
  const byId = new Map<unknown, number>();
  for (let r = 0; r < extra.numRows; r++) byId.set(extra.columns[exIdAt]![r], r);
  const columns = add.map(([, c]) => Array.from({ length: rs.numRows }, (_, r) => {
    const at = byId.get(rs.columns[idAt]![r]);
    return at === undefined ? null : extra.columns[c]![at];
  }));
  return {
    names: [...rs.names, ...add.map(([n]) => n)],
    types: [...rs.types, ...add.map(([, c]) => extra.types[c]!)],
    columns: [...rs.columns, ...columns],
    numRows: rs.numRows,
  };
}

export function mountResultChart(root: HTMLElement): void {
  const units = JSON.parse(root.dataset.units ?? '{}') as Record<string, string>;
  const catalogCols = JSON.parse(root.dataset.columns ?? '[]') as string[];
  const catalog = chartSettings(root.dataset.settings ? (JSON.parse(root.dataset.settings) as Record<string, unknown>) : undefined);
  const form = root.querySelector<HTMLFormElement>('[data-chart-form]')!;
  const mount = root.querySelector<HTMLElement>('[data-result-chart-mount]')!;
  const note = root.querySelector<HTMLElement>('[data-result-chart-note]')!;
  const select = (name: string) => form.querySelector<HTMLSelectElement>(`select[name="${name}"]`)!;
  const check = (name: string) => form.querySelector<HTMLInputElement>(`input[name="${name}"]`)!;
  const overlayLabel = root.querySelector<HTMLElement>('[data-overlay-label]')!;
  const label = (c: string) => {
    const l = columnLabel(c);
    const u = units[c];
    return `${l === c ? c : `${l} (${c})`}${u ? ` [${u}]` : ''}`;
  };
  let rs: ResultSet | null = null;
  let settings: ResultChartSettings | null = null;
  let asked: Partial<ResultChartSettings> | null = chartSettingsFromSearch(location.search);
  let unmount: (() => void) | null = null;
  let generation = 0;

  const fill = (sel: HTMLSelectElement, names: readonly string[], none: string | null, value: string) => {
    const opts: HTMLOptionElement[] = [];
    if (none !== null) opts.push(new Option(none, ''));
    for (const n of names) opts.push(new Option(columnLabel(n) === n ? n : `${n} — ${columnLabel(n)}`, n));
    sel.replaceChildren(...opts);
    sel.value = value;
  };

  const draw = () => {
    if (!rs || !settings) return;
    unmount?.();
    const overlay = overlayFor(settings.x, settings.y, settings.xLog, settings.yLog);
    overlayLabel.hidden = overlay === null;
    overlayLabel.querySelector('span')!.textContent = overlay ? `Show ${OVERLAY_TEXT[overlay]}` : '';
    const width = Math.max(300, Math.min(760, mount.clientWidth || root.clientWidth || 640));
    const chart = resultChart({ rs, settings, catalog, label, width, height: Math.round(Math.min(460, width * 0.7)) });
    unmount = mountChart(mount, chart.element as HTMLElement, { fileName: `census-${settings.y}-vs-${settings.x}`.replace(/[^A-Za-z0-9_-]+/g, '-'), label: `${settings.y} against ${settings.x}`, base: document.body.dataset.base ?? '/' });
    mount.dataset.placed = String(chart.placed);
    mount.dataset.skipped = String(chart.skipped);
  };

  const readForm = (): ResultChartSettings => ({
    x: select('x').value,
    y: select('y').value,
    colour: select('colour').value,
    size: select('size').value,
    xLog: check('xlog').checked,
    yLog: check('ylog').checked,
    overlays: check('overlays').checked,
  });

  const writeForm = (s: ResultChartSettings, numeric: string[], all: string[]) => {
    fill(select('x'), numeric, null, s.x);
    fill(select('y'), numeric, null, s.y);
    fill(select('colour'), all.filter((n) => n !== 'id'), 'none', s.colour);
    fill(select('size'), numeric, 'none', s.size);
    check('xlog').checked = s.xLog;
    check('ylog').checked = s.yLog;
    check('overlays').checked = s.overlays;
  };

  form.addEventListener('change', () => {
    settings = readForm();
    asked = settings;
    history.replaceState(null, '', hrefWithChartSettings(location.href, settings));
    draw();
  });

  document.addEventListener(RESULT_EVENT, (e) => {
    const detail = (e as CustomEvent<ResultEventDetail>).detail;
    const my = ++generation;
    void (async () => {
      let result = detail.rs;
      const numeric = result.names.filter((n, i) => isNumericType(result.types[i] ?? ''));
      if (numeric.length === 0) {
        root.dataset.state = 'empty';
        form.hidden = true;
        unmount?.();
        mount.replaceChildren();
        note.hidden = false;
        note.textContent = 'This result has no numeric column to chart.';
        return;
      }
      const next = fitSettings(asked, numeric, result.names);
      // limit markers the result lacks, read for its ids
      const missing = limitSourceColumns([next.x, next.y, ...numeric]).filter((c) => !result.names.includes(c) && catalogCols.includes(c));
      if (missing.length && result.names.includes('id') && result.numRows > 0) {
        try {
          const inner = detail.sql.replace(/;\s*$/, '');
          const extra = await queryCensus(`SELECT id, ${missing.map(sqlIdent).join(', ')} FROM ${TABLE} WHERE id IN (SELECT id FROM (\n${inner}\n) AS result)`);
          if (my !== generation) return;
          result = withColumnsById(result, extra);
        } catch {
          // not a plain SELECT: draw without limit markers
        }
      }
      rs = result;
      settings = next;
      form.hidden = false;
      note.hidden = true;
      root.dataset.state = 'drawn';
      writeForm(settings, numeric, detail.rs.names);
      draw();
    })();
  });
}
