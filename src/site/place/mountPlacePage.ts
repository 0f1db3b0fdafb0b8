/**
 * Browser-only: wires the compare page. Reads the catalog's settings embedded by the build,
 * loads the population from DuckDB-WASM, draws the charts, and on "Place" derives the new
 * object with the science core (same settings, RNG seeded from the catalog seed and the id),
 * then shows where it falls and redraws the charts with it.
 */
import { deriveObject } from '../../core/derive/deriveObject.ts';
import { showUnderReadings } from '../readings/showUnderReadings.ts';
import type { DerivedObject, DeriveSettings, LineId, ObjectInputs } from '../../core/derive/types.ts';
import { getLocalRelation } from '../../core/local/index.ts';
import { createRng, seedFor } from '../../core/random/index.ts';
import { CensusDbError, queryCensus, TABLE } from '../db/duckdb.ts';
import { rowObjects } from '../db/resultSet.ts';
import { sqlIdent } from '../db/sqlIdent.ts';
import { bindDbStatus } from '../db/statusView.ts';
import { catalogColumns } from '../population/catalogColumns.ts';
import { chartSettings, eddingtonRatioDistribution, fwhmVsLineLuminosity, lbolVsMass, massVsRedshift, massVsStellarMass, type CatalogRow } from '../charts/index.ts';
import { mountChart } from '../charts/mountChart.ts';
import { derivedRow } from './derivedRow.ts';
import { FORM_FIELDS, FLUX_UNITS, LUM_UNITS, emptyForm, formToInputs, type FormField, type PlaceFormState } from './placeForm.ts';
import { pastedRows } from './pastedRow.ts';
import type { MappedColumn } from './columnMap.ts';
import { batchReadingsTable, batchTable, type BatchEntry } from './batchView.ts';
import { rederiveBatch } from '../readings/rederiveBatch.ts';
import type { Reading } from '../../core/readings/reading.ts';
import { placeReport } from './placeReport.ts';
import { resultView } from './resultView.ts';

/** Catalog columns the page reads (those the catalog has). */
export const PLACE_COLUMNS = [
  'id', 'z', 'log_mstar', 'log_mstar_err', 'log_mbh', 'log_mbh_p16', 'log_mbh_p84', 'log_lbol', 'log_lbol_p16', 'log_lbol_p84',
  'log_edd_ratio', 'log_edd_ratio_p16', 'log_edd_ratio_p84', 'fwhm_halpha', 'fwhm_halpha_err', 'log_lum_halpha', 'fwhm_hbeta',
  'fwhm_hbeta_err', 'log_lum_hbeta', 'flux_halpha_is_limit', 'flags',
];

const CHARTS: Record<string, { label: string; draw: (rows: CatalogRow[], o: { settings: DeriveSettings; extra: CatalogRow[]; width: number }) => SVGSVGElement | HTMLElement }> = {
  'mbh-mstar': { label: 'Black-hole mass against host stellar mass', draw: (r, o) => massVsStellarMass(r, { ...o, settings: chartSettings(o.settings as unknown as Record<string, unknown>) }) },
  'mbh-z': { label: 'Black-hole mass against redshift', draw: (r, o) => massVsRedshift(r, { ...o, settings: chartSettings(o.settings as unknown as Record<string, unknown>) }) },
  'lbol-mbh': { label: 'Bolometric luminosity against black-hole mass', draw: (r, o) => lbolVsMass(r, o) },
  edd: { label: 'Distribution of Eddington ratios', draw: (r, o) => eddingtonRatioDistribution(r, o) },
  'fwhm-lum': { label: 'Line width against line luminosity', draw: (r, o) => fwhmVsLineLuminosity(r, o) },
};

function readForm(form: HTMLFormElement): PlaceFormState {
  const s = emptyForm();
  const data = new FormData(form);
  for (const f of FORM_FIELDS) {
    if (f === 'is_limit') s.is_limit = data.get('is_limit') !== null;
    else if (f === 'line') s.line = String(data.get('line') ?? 'halpha') as LineId;
    else if (f === 'strength_kind') s.strength_kind = data.get('strength_kind') === 'lum' ? 'lum' : 'flux';
    else (s as unknown as Record<string, string>)[f] = String(data.get(f) ?? '');
  }
  return s;
}

function showFieldErrors(doc: Document, errors: Partial<Record<FormField, string>>): HTMLElement | null {
  let first: HTMLElement | null = null;
  for (const f of FORM_FIELDS) {
    const msg = doc.getElementById(`place-${f}-msg`);
    const input = doc.getElementById(`place-${f}`);
    const text = errors[f] ?? '';
    if (msg) msg.textContent = text;
    if (input) {
      if (text) input.setAttribute('aria-invalid', 'true');
      else input.removeAttribute('aria-invalid');
      if (text && !first) first = input;
    }
  }
  return first;
}

/** Wires the page in `doc` (see src/pages/place/index.astro). */
export function mountPlacePage(doc: Document): void {
  const base = doc.body.dataset.base ?? import.meta.env.BASE_URL;
  const settings = JSON.parse(doc.getElementById('place-settings')?.textContent ?? '{}') as DeriveSettings;
  const relation = getLocalRelation(settings.localRelation);
  const form = doc.getElementById('place-form') as HTMLFormElement;
  const formMsg = doc.getElementById('place-form-msg')!;
  const csv = doc.getElementById('place-csv') as HTMLTextAreaElement;
  const csvMsg = doc.getElementById('place-csv-msg')!;
  const csvUnit = doc.getElementById('place-csv-unit') as HTMLSelectElement;
  const result = doc.getElementById('place-result')!;
  const resultBody = doc.getElementById('place-result-body')!;
  const batchBody = doc.getElementById('place-batch-body')!;
  const columnMap = JSON.parse(doc.getElementById('place-column-map-data')?.textContent ?? '[]') as MappedColumn[];
  const unitSelect = doc.getElementById('place-strength_unit') as HTMLSelectElement;
  bindDbStatus(doc.querySelector<HTMLElement>('[data-db-status]'));

  // the unit list follows the choice of flux or luminosity
  for (const radio of doc.querySelectorAll<HTMLInputElement>('input[name="strength_kind"]')) {
    radio.addEventListener('change', () => {
      const units = radio.value === 'lum' ? LUM_UNITS : FLUX_UNITS;
      unitSelect.replaceChildren(...units.map((u) => new Option(u.label, u.value)));
    });
  }

  const population: Promise<CatalogRow[]> = catalogColumns().then(async (have) => {
    const cols = PLACE_COLUMNS.filter((c) => have.includes(c));
    const rs = await queryCensus(`SELECT ${cols.map(sqlIdent).join(', ')} FROM ${TABLE}`);
    return rowObjects(rs).filter((r) => r.id !== null && r.id !== undefined).map((r) => ({ ...r, id: String(r.id) }) as CatalogRow);
  });

  const drawCharts = (rows: CatalogRow[], extra: CatalogRow[]) => {
    for (const mount of doc.querySelectorAll<HTMLElement>('[data-place-chart]')) {
      const key = mount.dataset.placeChart!;
      const spec = CHARTS[key];
      if (!spec) continue;
      try {
        const width = Math.max(360, Math.min(640, Math.floor(mount.clientWidth || 600)));
        mountChart(mount, spec.draw(rows, { settings, extra, width }), { fileName: `place-${key}`, label: spec.label, base });
        mount.dataset.drawn = String(rows.length + extra.length);
      } catch (err) {
        const p = doc.createElement('p');
        p.className = 'chart-note';
        p.textContent = `This chart could not be drawn: ${err instanceof Error ? err.message : String(err)}`;
        mount.replaceChildren(p);
      }
    }
  };
  const dbFailed = (err: unknown) => {
    const message = err instanceof CensusDbError ? err.message : `The catalog could not be loaded: ${String(err)}`;
    for (const mount of doc.querySelectorAll<HTMLElement>('[data-place-chart]')) {
      const p = doc.createElement('p');
      p.className = 'chart-note';
      p.textContent = message;
      mount.replaceChildren(p);
    }
    return message;
  };
  population.then((rows) => drawCharts(rows, []), dbFailed);

  const place = async (inputs: ObjectInputs, notes: string[]) => {
    let derived;
    try {
      derived = deriveObject(inputs, settings, createRng(seedFor(settings.seed, inputs.id)));
    } catch (err) {
      formMsg.textContent = `The object could not be derived: ${err instanceof Error ? err.message : String(err)}`;
      return;
    }
    const row = derivedRow(inputs, derived);
    let rows: CatalogRow[] = [];
    try {
      rows = await population;
    } catch (err) {
      notes = [...notes, `Without the catalog (${dbFailed(err)}) the object cannot be ranked.`];
    }
    batchBody.replaceChildren();
    resultBody.replaceChildren(resultView({ id: inputs.id, z: inputs.z, zSeed: settings.zSeed }, derived, placeReport(row, rows), relation, base, notes));
    showUnderReadings(doc, inputs, settings);
    result.hidden = false;
    result.dataset.placed = inputs.id;
    drawCharts(rows, [row]);
    result.focus();
  };

  form.addEventListener('submit', (e) => {
    e.preventDefault();
    formMsg.textContent = '';
    const r = formToInputs(readForm(form));
    const first = showFieldErrors(doc, r.errors);
    if (!r.inputs) {
      formMsg.textContent = `Please correct the ${Object.keys(r.errors).length === 1 ? 'field' : 'fields'} marked above.`;
      first?.focus();
      return;
    }
    void place(r.inputs, r.notes);
  });

  /** Places every pasted row that could be read; the others are listed with their problem. */
  const placeMany = async (entries: { row: number; id: string; inputs: ObjectInputs | null; problems: string[] }[], notes: string[]) => {
    let rows: CatalogRow[] = [];
    try {
      rows = await population;
    } catch (err) {
      notes = [...notes, `Without the catalog (${dbFailed(err)}) the objects cannot be ranked.`];
    }
    const shown: BatchEntry[] = [];
    const placed: { inputs: ObjectInputs; row: CatalogRow; derived: DerivedObject }[] = [];
    const failed: string[] = [];
    for (const e of entries) {
      if (!e.inputs) {
        shown.push({ row: e.row, id: e.id, problem: e.problems.join('; ') });
        continue;
      }
      try {
        const d = deriveObject(e.inputs, settings, createRng(seedFor(settings.seed, e.inputs.id)));
        const row = derivedRow(e.inputs, d);
        placed.push({ inputs: e.inputs, row, derived: d });
        shown.push({ row: e.row, id: e.id, placed: row, report: placeReport(row, rows) });
      } catch (err) {
        const why = `row ${e.row} (id ${e.id}): could not be derived: ${err instanceof Error ? err.message : String(err)}`;
        failed.push(why);
        shown.push({ row: e.row, id: e.id, problem: why });
      }
    }
    if (failed.length) appendList(csvMsg, failed);
    batchBody.replaceChildren(batchTable(doc, shown));
    const readingsMount = doc.getElementById('place-readings-body');
    const readings = JSON.parse(doc.getElementById('place-readings')?.textContent ?? '[]') as Reading[];
    if (placed.length === 1) {
      // one object: its full account, as for the form
      const only = placed[0]!;
      resultBody.replaceChildren(resultView({ id: only.inputs.id, z: only.inputs.z, zSeed: settings.zSeed }, only.derived, placeReport(only.row, rows), relation, base, notes));
      showUnderReadings(doc, only.inputs, settings);
    } else {
      resultBody.replaceChildren(...notes.map((n) => {
        const p = doc.createElement('p');
        p.className = 'small muted';
        p.textContent = n;
        return p;
      }));
      if (readingsMount) {
        readingsMount.replaceChildren();
        if (readings.length && placed.length) {
          try {
            const all = placed.map((p) => p.inputs);
            const byReading = readings.map((reading) => ({ reading, rows: rederiveBatch(all, settings, reading) }));
            readingsMount.append(batchReadingsTable(doc, placed.flatMap((p, i) => byReading.map(({ reading, rows: rr }) => ({ id: p.inputs.id, reading, row: rr[i]! })))));
          } catch (err) {
            readingsMount.textContent = `The objects could not be derived under the readings: ${err instanceof Error ? err.message : String(err)}`;
          }
        }
      }
    }
    result.hidden = false;
    result.dataset.placed = placed.map((p) => p.inputs.id).join(',');
    drawCharts(rows, placed.map((p) => p.row));
    result.focus();
  };

  const appendList = (mount: HTMLElement, lines: readonly string[]) => {
    const ul = doc.createElement('ul');
    ul.id = 'place-batch-msgs';
    for (const line of lines) {
      const li = doc.createElement('li');
      li.textContent = line;
      ul.append(li);
    }
    mount.append(ul);
  };

  doc.getElementById('place-csv-go')!.addEventListener('click', () => {
    const r = pastedRows(csv.value, csvUnit.value || undefined, columnMap);
    csvMsg.replaceChildren();
    const rowProblems = r.rows.flatMap((row) => row.problems);
    if (r.problems.length || rowProblems.length) appendList(csvMsg, [...r.problems, ...rowProblems]);
    if (!r.rows.some((row) => row.inputs)) {
      csv.setAttribute('aria-invalid', 'true');
      csv.focus();
      return;
    }
    if (rowProblems.length) csv.setAttribute('aria-invalid', 'true');
    else csv.removeAttribute('aria-invalid');
    const ignored = r.ignored.length ? [`Columns left out (not inputs of the derivation): ${r.ignored.join(', ')}.`] : [];
    void placeMany(r.rows, [...r.notes, ...ignored]);
  });
}
