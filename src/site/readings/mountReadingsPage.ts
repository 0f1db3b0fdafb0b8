/**
 * The Readings page's client: the reading switcher redraws the population charts and marks the
 * reading's row in the summary; the comparison draws each object's shift between two readings;
 * the URL carries the choices so a link reopens the same view.
 */
import { connection, CensusDbError } from '../db/duckdb.ts';
import { mountChart } from '../charts/mountChart.ts';
import { drawPopulation } from '../population/populationCharts.ts';
import { objectHrefHere } from '../objectLink.ts';
import { rowsUnderReading, shiftRows } from './readingRows.ts';
import { readingShiftChart } from './shiftChart.ts';
import { parseReadingsState, readingsStateQuery, type ReadingsPageState } from './readingsUrl.ts';

interface Option {
  id: string;
  label: string;
}

function note(mount: HTMLElement, text: string): void {
  const p = document.createElement('p');
  p.className = 'chart-note';
  p.textContent = text;
  mount.replaceChildren(p);
}

export async function mountReadingsPage(root: HTMLElement): Promise<void> {
  const base = document.body.dataset.base ?? '/';
  const options = JSON.parse(root.dataset.readings ?? '[]') as Option[];
  const have = JSON.parse(root.dataset.columns ?? '[]') as string[];
  const known = options.map((o) => o.id);
  const label = (id: string) => options.find((o) => o.id === id)?.label ?? id;
  const state: ReadingsPageState = parseReadingsState(location.search, known);
  const charts = root.querySelector<HTMLElement>('#reading-charts')!;
  const switcher = root.querySelector<HTMLSelectElement>('[data-reading-switch]')!;
  const selA = root.querySelector<HTMLSelectElement>('[data-compare-a]')!;
  const selB = root.querySelector<HTMLSelectElement>('[data-compare-b]')!;
  const shiftMount = root.querySelector<HTMLElement>('[data-shift-chart]')!;
  const status = root.querySelector<HTMLElement>('[data-reading-status]');
  const settings = charts.dataset.settings ? (JSON.parse(charts.dataset.settings) as Record<string, unknown>) : undefined;
  switcher.value = state.reading;
  selA.value = state.a;
  selB.value = state.b;

  const saveUrl = () => history.replaceState(null, '', `?${readingsStateQuery(state)}`);
  const markSummary = () => {
    for (const tr of root.querySelectorAll<HTMLElement>('[data-reading-row]')) {
      tr.classList.toggle('is-current', tr.dataset.readingRow === state.reading);
      if (tr.dataset.readingRow === state.reading) tr.setAttribute('aria-current', 'true');
      else tr.removeAttribute('aria-current');
    }
  };

  let drawing = 0;
  const drawCharts = async () => {
    const ticket = ++drawing;
    charts.dataset.reading = '';
    markSummary();
    if (status) status.textContent = `Drawing the population under “${label(state.reading)}”…`;
    const rows = await rowsUnderReading(state.reading, have);
    if (ticket !== drawing) return;
    await drawPopulation(charts, rows, { base, settings });
    if (ticket !== drawing) return;
    charts.dataset.reading = state.reading;
    if (status) status.textContent = `${rows.length} objects under “${label(state.reading)}”.`;
  };
  const drawShift = async () => {
    shiftMount.dataset.pair = '';
    const rows = await shiftRows(state.a, state.b);
    const width = Math.max(320, Math.min(760, Math.floor(shiftMount.clientWidth || 640)));
    const el = readingShiftChart(rows, { labelA: label(state.a), labelB: label(state.b), width, height: Math.round(width * 0.66) });
    mountChart(shiftMount, el, { fileName: `census-shift-${state.a}-${state.b}`, label: `Shift from ${label(state.a)} to ${label(state.b)}`, base, onOpen: (id) => location.assign(objectHrefHere(id)) });
    shiftMount.dataset.pair = `${state.a}>${state.b}`;
  };
  const guard = (mount: HTMLElement, p: Promise<void>) =>
    p.catch((err: unknown) => note(mount, err instanceof CensusDbError ? err.message : `This chart could not be drawn: ${String(err)}`));

  switcher.addEventListener('change', () => {
    state.reading = switcher.value;
    saveUrl();
    void guard(charts, drawCharts());
  });
  for (const sel of [selA, selB]) {
    sel.addEventListener('change', () => {
      state.a = selA.value;
      state.b = selB.value;
      saveUrl();
      void guard(shiftMount, drawShift());
    });
  }

  try {
    await connection();
  } catch (err) {
    const message = err instanceof CensusDbError ? err.message : String(err);
    for (const m of [...charts.querySelectorAll<HTMLElement>('[data-chart]'), shiftMount]) note(m, message);
    return;
  }
  await guard(charts, drawCharts());
  await guard(shiftMount, drawShift());
}
