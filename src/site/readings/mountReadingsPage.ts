/**
 * The Readings page's client: the reading switcher redraws the population charts and marks the
 * reading's row in the summary; the comparison draws each object's shift between two readings;
 * the URL carries the choices so a link reopens the same view.
 */
import { connection, CensusDbError } from '../db/duckdb.ts';
import { mountChart } from '../charts/mountChart.ts';
import { drawChart, drawPopulation, nextPaint, NARROW_ABOVE } from '../population/populationCharts.ts';
import { objectHrefHere } from '../objectLink.ts';
import { rowsUnderReading, shiftRows } from './readingRows.ts';
import { readingShiftChart } from './shiftChart.ts';
import { parseReadingsState, readingsStateQuery, type CustomReadingParams, type ReadingsPageState } from './readingsUrl.ts';
import { CUSTOM_READING_ID, customReading } from './customReading.ts';
import { startPopulation, type Population } from './rederivePopulation.ts';
import { READINGS_INPUTS_PATH } from './readingsInputsFile.ts';
import { builtInReading } from '../../core/readings/builtInReadings.ts';
import type { RederivedRow } from './rederiveBatch.ts';
import { summarizeRows } from './summarizeRows.ts';
import { chartsToRedraw, sameColumns, SHIFT_COLUMNS } from './changedCharts.ts';
import { SUMMARY_FRACTIONS, SUMMARY_MEDIANS, summaryRowCells } from './summaryCells.ts';
import { placeSettings } from '../place/placeSettings.ts';
import type { ChartRow } from '../population/populationCharts.ts';
import type { ShiftRow } from './shiftChart.ts';
import type { ReadingSummary } from '../../core/readings/readingSummary.ts';

/** A reading of the reader's kind that exercises every setting of the form, derived for a few objects at the workers' warm-up. */
const WARM_CUSTOM = customReading({ deflation: 1.5, l5100Ratio: 4, dust: 'none', efficiency: 0.2 });

/** Up to this many objects the workers are started and fed when the page has drawn, not at the form's first focus (a few MB of inputs). */
const WARM_ON_LOAD_MAX = 20_000;

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
  const label = (id: string) => options.find((o) => o.id === id)?.label ?? (id === CUSTOM_READING_ID ? 'Your reading' : id);
  const state: ReadingsPageState = parseReadingsState(location.search, known);
  const charts = root.querySelector<HTMLElement>('#reading-charts')!;
  const switcher = root.querySelector<HTMLSelectElement>('[data-reading-switch]')!;
  const selA = root.querySelector<HTMLSelectElement>('[data-compare-a]')!;
  const selB = root.querySelector<HTMLSelectElement>('[data-compare-b]')!;
  const shiftMount = root.querySelector<HTMLElement>('[data-shift-chart]')!;
  const status = root.querySelector<HTMLElement>('[data-reading-status]');
  const objects = Number(charts.dataset.objects ?? 0);
  // Large catalogs: density charts from their columns only, and a sample of the shifts (src/site/readings/readingRows.ts).
  const large = objects > NARROW_ABOVE;
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

  // The reader's rows the charts, and the comparison, show now (null: a published reading): a new
  // reading of the reader's keeps every drawing whose values it leaves unchanged (changedCharts.ts).
  let chartsShow: RederivedRow[] | null = null;
  let shiftShows: { pair: string; rows: RederivedRow[] } | null = null;
  let drawing = 0;
  const drawCharts = async () => {
    const ticket = ++drawing;
    charts.dataset.reading = '';
    markSummary();
    if (status) status.textContent = `Drawing the population under “${label(state.reading)}”…`;
    let count: number;
    if (state.reading === CUSTOM_READING_ID) {
      // The reader's reading is redrawn in one go (one layout and paint for all charts).
      const next = custom ?? [];
      const mounts = [...charts.querySelectorAll<HTMLElement>('[data-chart]')];
      const redraw = new Set(chartsToRedraw(mounts.map((m) => m.dataset.chart ?? ''), chartsShow, next));
      const rows = redraw.size ? customChartRows() : [];
      for (const mount of mounts) if (redraw.has(mount.dataset.chart ?? '')) drawChart(mount, rows, { base, settings });
      chartsShow = next;
      charts.dataset.kept = String(mounts.length - redraw.size);
      count = next.length;
    } else {
      // A published reading chart by chart.
      chartsShow = null;
      const rows = await rowsUnderReading(state.reading, have, large);
      if (ticket !== drawing) return;
      await drawPopulation(charts, rows, { base, settings });
      count = rows.length;
    }
    if (ticket !== drawing) return;
    charts.dataset.reading = state.reading;
    if (status) status.textContent = `${count} objects under “${label(state.reading)}”.`;
  };
  const drawShift = async () => {
    // Read before anything is drawn: read after the charts, it would lay the page out once more.
    const width = Math.max(320, Math.min(760, Math.floor(shiftMount.clientWidth || 640)));
    shiftMount.dataset.pair = '';
    const pair = `${state.a}>${state.b}`;
    const withCustom = state.a === CUSTOM_READING_ID || state.b === CUSTOM_READING_ID;
    if (withCustom && custom && shiftShows?.pair === pair && sameColumns(shiftShows.rows, custom, SHIFT_COLUMNS)) {
      shiftShows.rows = custom;
      shiftMount.dataset.pair = pair;
      return;
    }
    shiftShows = null;
    let rows: ShiftRow[];
    if (withCustom) rows = await customShift(state.a, state.b);
    else {
      rows = await shiftRows(state.a, state.b, large);
      // Both readings' values, kept for a later comparison with the reader's reading.
      const values = rows;
      if (!published.has(state.a)) published.set(state.a, Promise.resolve(new Map(values.map((r) => [r.id, { mbh: r.mbhA, edd: r.eddA }]))));
      if (!published.has(state.b)) published.set(state.b, Promise.resolve(new Map(values.map((r) => [r.id, { mbh: r.mbhB, edd: r.eddB }]))));
    }
    const el = readingShiftChart(rows, { labelA: label(state.a), labelB: label(state.b), width, height: Math.round(width * 0.66), ...(large && rows.length < objects ? { sampleOf: objects } : {}) });
    mountChart(shiftMount, el, { fileName: `census-shift-${state.a}-${state.b}`, label: `Shift from ${label(state.a)} to ${label(state.b)}`, base, onOpen: (id) => location.assign(objectHrefHere(id)) });
    shiftMount.dataset.pair = pair;
    if (withCustom && custom) shiftShows = { pair, rows: custom };
  };
  const guard = (mount: HTMLElement, p: Promise<void>) =>
    p.catch((err: unknown) => note(mount, err instanceof CensusDbError ? err.message : `This chart could not be drawn: ${String(err)}`));

  // The reader's own reading: derived in web workers from the catalog's inputs.
  const form = root.querySelector<HTMLFormElement>('[data-custom-form]');
  const customStatus = root.querySelector<HTMLElement>('[data-custom-status]');
  let population: Population | null = null;
  let custom: RederivedRow[] | null = null;
  const deriveSettings = () => placeSettings(JSON.parse(root.dataset.metaSettings ?? '{}') as Record<string, unknown>).settings;
  // Workers started and fed the inputs ahead of the reader's first submit (after the first drawing, or on the form's first focus).
  const warmUp = () =>
    startPopulation(`${base}${READINGS_INPUTS_PATH}`, { settings: deriveSettings(), readings: [builtInReading('small_bolometric')!, WARM_CUSTOM] }).then((p) => {
      if (root.dataset.liveReady !== 'true') performance.mark('census:live:ready');
      root.dataset.liveReady = 'true';
      return p;
    });
  const customChartRows = (): ChartRow[] => {
    if (!population || !custom) return [];
    const { z, logMstar } = population;
    return custom.map((r, i) => ({ ...r, z: z[i], log_mstar: Number.isNaN(logMstar[i]) ? null : logMstar[i] }) as ChartRow);
  };
  // A published reading's values, queried once per reading (a reader may submit many custom readings).
  const published = new Map<string, Promise<Map<string, { mbh: number | null; edd: number | null }>>>();
  const valuesOf = async (reading: string): Promise<Map<string, { mbh: number | null; edd: number | null }>> => {
    if (reading === CUSTOM_READING_ID) return new Map((custom ?? []).map((r) => [r.id, { mbh: r.log_mbh, edd: r.log_edd_ratio }]));
    let values = published.get(reading);
    if (!values) {
      values = shiftRows(reading, reading, large).then((rows) => new Map(rows.map((r) => [r.id, { mbh: r.mbhA, edd: r.eddA }])));
      published.set(reading, values);
      values.catch(() => published.delete(reading));
    }
    return values;
  };
  const customShift = async (a: string, b: string): Promise<ShiftRow[]> => {
    const [va, vb] = await Promise.all([valuesOf(a), valuesOf(b)]);
    return [...va].flatMap(([id, x]) => {
      const y = vb.get(id);
      return y ? [{ id, mbhA: x.mbh, eddA: x.edd, mbhB: y.mbh, eddB: y.edd }] : [];
    });
  };
  const addCustomOption = () => {
    for (const sel of [switcher, selA, selB]) {
      if (!sel.querySelector(`option[value="${CUSTOM_READING_ID}"]`)) sel.append(new Option('Your reading', CUSTOM_READING_ID));
    }
  };
  const showCustomSummary = (s: ReadingSummary) => {
    const table = root.querySelector<HTMLTableElement>('[data-readings-summary]');
    const body = table?.querySelector('tbody');
    if (!table || !body) return;
    body.querySelector(`[data-reading-row="${CUSTOM_READING_ID}"]`)?.remove();
    const standard = table.dataset.standard ? (JSON.parse(table.dataset.standard) as ReadingSummary) : undefined;
    const cells = summaryRowCells(s, standard);
    // The same cells as the build's rows (src/components/ReadingsSummary.astro).
    const el = (tag: string, text: string, className?: string) => {
      const e = document.createElement(tag);
      if (className) e.className = className;
      e.textContent = text;
      return e;
    };
    const td = (key: string, ...parts: Node[]) => {
      const cell = document.createElement('td');
      cell.className = 'num';
      cell.dataset.summary = key;
      cell.append(...parts);
      return cell;
    };
    const tr = document.createElement('tr');
    tr.dataset.readingRow = CUSTOM_READING_ID;
    const th = document.createElement('th');
    th.scope = 'row';
    th.append('Your reading ', el('code', CUSTOM_READING_ID, 'small'));
    const objectsCell = el('td', String(s.objects), 'num');
    tr.append(th, objectsCell);
    for (const k of SUMMARY_FRACTIONS) {
      const f = cells.fractions[k];
      const parts: Node[] = [el('strong', f.value), document.createTextNode(' '), el('span', f.count, 'small muted'), document.createElement('br'), el('span', f.interval, 'small muted')];
      if (f.shift) parts.push(document.createElement('br'));
      parts.push(el('span', f.shift, 'small'));
      tr.append(td(k, ...parts));
    }
    for (const k of SUMMARY_MEDIANS) tr.append(td(k, document.createTextNode(cells.medians[k].value), document.createElement('br'), el('span', cells.medians[k].shift, 'small')));
    body.append(tr);
  };
  /** Derives the reader's reading; `follow`: the charts and the comparison switch to it (from the reading shown until now). */
  const deriveCustom = async (params: CustomReadingParams, follow: boolean) => {
    performance.mark('census:custom:start');
    let reading;
    try {
      reading = customReading(params);
    } catch (err) {
      if (customStatus) customStatus.textContent = err instanceof Error ? err.message : String(err);
      return;
    }
    if (follow) {
      if (state.reading !== CUSTOM_READING_ID) state.a = state.reading;
      state.reading = CUSTOM_READING_ID;
      state.b = CUSTOM_READING_ID;
    }
    if (customStatus) customStatus.textContent = 'Deriving the population under your reading…';
    population = await warmUp();
    performance.mark('census:custom:inputs');
    const settings = deriveSettings();
    const { rows, ms } = await population.derive(settings, reading);
    performance.mark('census:custom:derived');
    custom = rows;
    state.custom = params;
    // The rows themselves, for scripts and the end-to-end tests that compare them with the CLI's.
    (window as unknown as { censusCustomReading?: RederivedRow[] }).censusCustomReading = rows;
    showCustomSummary(summarizeRows(CUSTOM_READING_ID, rows));
    addCustomOption();
    root.dataset.customDerived = String(rows.length);
    if (customStatus) customStatus.textContent = `${rows.length} objects derived under your reading in ${Math.round(ms)} ms (${settings.draws} draws each).`;
    saveUrl();
    if (state.reading === CUSTOM_READING_ID || state.a === CUSTOM_READING_ID || state.b === CUSTOM_READING_ID) {
      switcher.value = state.reading;
      selA.value = state.a;
      selB.value = state.b;
    }
    // The headline numbers are painted first; the charts and the comparison follow.
    await nextPaint();
    performance.mark('census:custom:summary');
    await Promise.all([guard(shiftMount, drawShift()), guard(charts, drawCharts())]);
    await nextPaint();
    performance.mark('census:custom:drawn');
  };
  const formParams = (): CustomReadingParams => {
    const data = new FormData(form!);
    const opt = (k: string) => {
      const v = String(data.get(k) ?? '').trim();
      return v === '' ? null : Number(v);
    };
    return { deflation: opt('deflation') ?? 1, l5100Ratio: opt('l5100'), dust: data.get('dust') === 'none' ? 'none' : 'standard', efficiency: opt('eff') };
  };
  form?.addEventListener('submit', (e) => {
    e.preventDefault();
    void deriveCustom(formParams(), true).catch((err: unknown) => {
      if (customStatus) customStatus.textContent = `Your reading could not be derived: ${err instanceof Error ? err.message : String(err)}`;
    });
  });
  if (form && state.custom) {
    (form.elements.namedItem('deflation') as HTMLInputElement).value = String(state.custom.deflation);
    (form.elements.namedItem('l5100') as HTMLInputElement).value = state.custom.l5100Ratio === null ? '' : String(state.custom.l5100Ratio);
    (form.elements.namedItem('dust') as HTMLSelectElement).value = state.custom.dust;
    (form.elements.namedItem('eff') as HTMLInputElement).value = state.custom.efficiency === null ? '' : String(state.custom.efficiency);
  }

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

  // Small populations are loaded into the workers as soon as the page is drawn; large ones when the reader turns to the form.
  const warmSoon = () => void warmUp().catch(() => undefined);
  const liveObjects = Number(root.dataset.liveObjects ?? 0);
  form?.addEventListener('focusin', warmSoon, { once: true });
  if (state.custom) warmSoon();
  try {
    await connection();
  } catch (err) {
    const message = err instanceof CensusDbError ? err.message : String(err);
    for (const m of [...charts.querySelectorAll<HTMLElement>('[data-chart]'), shiftMount]) note(m, message);
    return;
  }
  const wantsCustom = [state.reading, state.a, state.b].includes(CUSTOM_READING_ID);
  if (state.custom && wantsCustom) {
    await deriveCustom(state.custom, false).catch((err: unknown) => {
      if (customStatus) customStatus.textContent = `Your reading could not be derived: ${String(err)}`;
    });
    if (custom) return;
  }
  if (wantsCustom) {
    state.reading = state.reading === CUSTOM_READING_ID ? (known[0] ?? 'standard') : state.reading;
    state.a = state.a === CUSTOM_READING_ID ? (known[0] ?? 'standard') : state.a;
    state.b = state.b === CUSTOM_READING_ID ? (known[1] ?? state.a) : state.b;
    switcher.value = state.reading;
    selA.value = state.a;
    selB.value = state.b;
  }
  await guard(charts, drawCharts());
  await guard(shiftMount, drawShift());
  if (form && liveObjects > 0 && liveObjects <= WARM_ON_LOAD_MAX) warmSoon();
  if (state.custom && !wantsCustom) void deriveCustom(state.custom, false).catch(() => undefined);
}
