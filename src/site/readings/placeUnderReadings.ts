/**
 * The place page's table of a new object under every reading of the catalog: each reading
 * derives it with the same core, settings and random stream as the catalog build.
 */
import { formatFixed } from '../text/formatValue.ts';
import type { DeriveSettings, ObjectInputs } from '../../core/derive/types.ts';
import type { Reading } from '../../core/readings/reading.ts';
import { rederiveBatch, type RederivedRow } from './rederiveBatch.ts';

/** The new object's rows under each reading, in the readings' order. */
export function placeUnderReadings(inputs: ObjectInputs, settings: DeriveSettings, readings: readonly Reading[]): { reading: Reading; row: RederivedRow }[] {
  return readings.map((reading) => ({ reading, row: rederiveBatch([inputs], settings, reading)[0]! }));
}

/** A table of those rows (values through textContent only). */
export function placeReadingsTable(doc: Document, rows: readonly { reading: Reading; row: RederivedRow }[]): HTMLElement {
  const section = doc.createElement('section');
  section.dataset.placeReadings = '';
  const h = doc.createElement('h3');
  h.textContent = 'Under every reading of the broad lines';
  const table = doc.createElement('table');
  table.className = 'data';
  const head = table.createTHead().insertRow();
  for (const t of ['Reading', 'log M_BH', 'log L_bol', 'log λ_Edd', 'P(λ > 1)', 'Δ local (dex)', 'Flags']) {
    const th = doc.createElement('th');
    th.scope = 'col';
    th.textContent = t;
    head.append(th);
  }
  const body = table.createTBody();
  const f = (x: number | null) => (x === null ? '—' : formatFixed(x, 2));
  for (const { reading, row } of rows) {
    const tr = body.insertRow();
    tr.dataset.readingValue = reading.id;
    const th = doc.createElement('th');
    th.scope = 'row';
    th.textContent = reading.label;
    tr.append(th);
    for (const v of [f(row.log_mbh), f(row.log_lbol), f(row.log_edd_ratio), f(row.p_super_eddington), f(row.delta_log_mbh_local), row.flags.split(',').join(', ')]) {
      const td = tr.insertCell();
      td.textContent = v;
    }
  }
  section.append(h, table);
  return section;
}
