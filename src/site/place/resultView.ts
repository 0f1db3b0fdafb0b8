/**
 * Browser-only: builds the "Where it falls" block of the compare page from a placed object's
 * derived row and its report. Text goes in through textContent only (ids are arbitrary text).
 */
import { formatFixed, formatValue, MINUS, MISSING } from '../text/formatValue.ts';
import type { DerivedObject } from '../../core/derive/types.ts';
import type { LocalRelation } from '../../core/local/index.ts';
import { objectHref } from '../charts/mountChart.ts';
import { FLAG_DESCRIPTIONS } from '../../core/derive/flags.ts';
import { flagText } from '../text/flagText.ts';
import type { PlaceReport } from './placeReport.ts';
import { ordinalPercentile, type PercentileRank } from './ranks.ts';

type Child = Node | string;

function el(tag: string, attrs: Record<string, string> = {}, ...children: Child[]): HTMLElement {
  const e = document.createElement(tag);
  for (const [k, v] of Object.entries(attrs)) e.setAttribute(k, v);
  for (const c of children) e.append(c);
  return e;
}

const f2 = (v: number | null | undefined): string => (v === null || v === undefined || !Number.isFinite(v) ? MISSING : formatFixed(v, 2));
const signed = (v: number): string => (v >= 0 ? '+' : MINUS) + formatFixed(Math.abs(v), 2);

function rankText(r: PercentileRank, isLimit: boolean): string {
  if (r.percentile === null) return r.n === 0 ? 'no catalog objects to compare' : '—';
  const few = r.n < 5 ? ' (too few to say much)' : '';
  return `${isLimit ? 'at most the ' : ''}${ordinalPercentile(r.percentile)} percentile of ${r.n}${few}`;
}

/** The result block: derived values, ranks, neighbours and the offset from the local relation. */
export function resultView(
  object: { id: string; z: number; zSeed: number },
  d: DerivedObject,
  report: PlaceReport,
  relation: LocalRelation,
  base: string,
  notes: readonly string[],
): HTMLElement {
  const root = el('div', { class: 'place-result' });
  root.append(el('p', { class: 'lede' }, `${object.id} at z = ${formatValue('z', object.z)}`));

  const values = el('table', { class: 'data values' }, el('caption', { class: 'visually-hidden' }, 'Derived values of the new object'));
  values.append(el('thead', {}, el('tr', {}, el('th', { scope: 'col' }, 'Quantity'), el('th', { scope: 'col', class: 'num' }, 'Value'), el('th', { scope: 'col', class: 'num' }, '16–84 % interval'))));
  const tb = el('tbody');
  // A bound shows its sign and no interval.
  const row = (label: string, v: number | null, p: { p16: number; p84: number } | null, unit: string, mark: '<' | '>' | '') =>
    tb.append(
      el('tr', {},
        el('th', { scope: 'row' }, `${label} `, el('span', { class: 'unit' }, unit)),
        el('td', { class: 'num' }, v !== null && mark ? `${mark} ${f2(v)}` : f2(v)),
        el('td', { class: 'num' }, mark && v !== null ? (mark === '<' ? 'upper limit' : 'lower limit') : p ? `${f2(p.p16)} – ${f2(p.p84)}` : '—'),
      ),
    );
  const up = (b: boolean): '<' | '' => (b ? '<' : '');
  const eddMark = d.flags.includes('edd_ratio_lower_limit') ? '>' : up(d.isLimit.logEddRatio);
  row('Black-hole mass', d.logMbh, d.pct.logMbh, 'log M☉', up(d.isLimit.logMbh));
  row('Bolometric luminosity', d.logLbol, d.pct.logLbol, 'log erg s⁻¹', up(d.isLimit.logLbol));
  row('Eddington ratio', d.logEddRatio, d.pct.logEddRatio, 'log λ_Edd', eddMark);
  row('Required seed mass', d.logMseed, d.pct.logMseed, `log M☉ at z = ${object.zSeed}`, up(d.isLimit.logMseed));
  row('Offset from the local relation', d.deltaLogMbhLocal, d.pct.deltaLogMbhLocal, 'dex', up(d.isLimit.deltaLogMbhLocal));
  values.append(tb);
  root.append(el('div', { class: 'table-wrap' }, values));
  if (d.pSuperEddington !== null) root.append(el('p', { class: 'small' }, `Probability that it accretes above the Eddington limit: ${(100 * d.pSuperEddington).toFixed(0)} %.`));

  root.append(el('h3', {}, 'Percentile rank in the catalog'));
  const ranks = el('table', { class: 'data', id: 'place-ranks' }, el('caption', { class: 'visually-hidden' }, 'Percentile ranks'));
  const zw = report.zWindow ? `z ${formatFixed(report.zWindow[0], 2)}–${formatFixed(report.zWindow[1], 2)}` : 'its redshift range';
  ranks.append(el('thead', {}, el('tr', {}, el('th', { scope: 'col' }, 'Quantity'), el('th', { scope: 'col' }, 'Among all catalog objects'), el('th', { scope: 'col' }, `Among those at ${zw}`))));
  const rb = el('tbody');
  for (const r of report.ranks) {
    rb.append(el('tr', { 'data-quantity': r.column }, el('th', { scope: 'row' }, r.label), el('td', {}, rankText(r.all, r.isLimit)), el('td', {}, rankText(r.window, r.isLimit))));
  }
  ranks.append(rb);
  root.append(el('div', { class: 'table-wrap' }, ranks));
  root.append(el('p', { class: 'small muted' }, 'Catalog objects whose value is only an upper limit are left out of each rank; the count says how many were compared.'));

  root.append(el('h3', {}, 'Offset from the local relation'));
  if (d.deltaLogMbhLocal === null) {
    root.append(el('p', {}, `No offset: it needs a host ${relation.x === 'logSigma' ? 'velocity dispersion' : 'stellar mass'} and a black-hole mass.`));
  } else {
    const where = d.deltaLogMbhLocal >= 0 ? 'above' : 'below';
    const sigma = d.localOffsetSigma === null ? '' : ` (${Math.abs(d.localOffsetSigma).toFixed(1)}σ, counting the relation's ${relation.scatterDex} dex scatter and the measurement)`;
    root.append(el('p', { id: 'place-local' }, `${signed(d.deltaLogMbhLocal)} dex ${where} ${relation.label}${sigma}.`));
  }

  root.append(el('h3', {}, 'Nearest catalog objects'));
  if (!report.neighbours.length) {
    root.append(el('p', {}, 'None: neighbours need the redshift, black-hole mass and Eddington ratio.'));
  } else {
    root.append(el('p', { class: 'small muted' }, 'In redshift, log M_BH and log λ_Edd, each scaled by its spread over the catalog.'));
    const ol = el('ol', { id: 'place-neighbours' });
    for (const n of report.neighbours) {
      ol.append(el('li', {}, el('a', { href: objectHref(base, n.id) }, n.id), ` — z = ${formatValue('z', n.z)}, log M_BH = ${f2(n.logMbh)}, log λ_Edd = ${f2(n.logEddRatio)} (distance ${n.distance.toFixed(2)})`));
    }
    root.append(ol);
  }
  if (d.flags.length) {
    root.append(el('h3', {}, 'Flags'));
    const ul = el('ul', { class: 'flag-list' });
    for (const f of d.flags) ul.append(el('li', {}, el('code', {}, f), `: ${(FLAG_DESCRIPTIONS as Record<string, string>)[f] ?? flagText(f)}`));
    root.append(ul);
  }
  for (const n of notes) root.append(el('p', { class: 'small muted' }, n));
  return root;
}
