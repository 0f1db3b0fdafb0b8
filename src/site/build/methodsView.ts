/**
 * What the methods page and the object pages' provenance say, read from the catalog's
 * metadata: the cosmology, each calibration in use with its formula, scatter and reference,
 * the bolometric method, the constants, the growth assumptions and the Monte Carlo settings.
 * The sidecar records the settings (DeriveSettings) and, beside them, the records behind each
 * id (src/catalog/metadata/settingsProvenance.ts); this reads either layout.
 */
import { BC_SHEN11, NETZER19 } from '../../core/bolometric/index.ts';
import { LOCAL_RELATIONS } from '../../core/local/index.ts';
import type { SiteMeta } from './siteMeta.ts';
import { unitText } from '../text/columnLabels.ts';
import { readerName, readerText, readerValue } from '../text/readerNames.ts';

type Rec = Record<string, unknown>;
const isRec = (v: unknown): v is Rec => typeof v === 'object' && v !== null && !Array.isArray(v);
const str = (v: unknown): string | undefined => (typeof v === 'string' && v !== '' ? v : typeof v === 'number' ? String(v) : undefined);

export interface NamedValue {
  name: string;
  value: string;
  unit?: string;
  reference?: string;
}

export interface CalibrationView {
  line: string;
  id: string;
  label?: string;
  formula?: string;
  scatter?: string;
  reference?: string;
  validity?: string;
  notes?: string;
}

export interface MethodsView {
  cosmology: { id: string; name?: string; params: NamedValue[]; reference?: string };
  calibrations: CalibrationView[];
  linePriority: string[];
  bolometric: { id: string; params: NamedValue[]; reference?: string; routes: { label: string; text: string; reference?: string; corrections: string[] }[] };
  eddington: NamedValue[];
  growth: { params: NamedValue[]; formula?: string; reference?: string };
  local: { id: string; label?: string; formula?: string; reference?: string; params: NamedValue[] };
  dust: { id: string; params: NamedValue[]; reference?: string };
  monteCarlo: NamedValue[];
  constants: NamedValue[];
  /** Every setting as recorded, for the full listing. */
  allSettings: NamedValue[];
}

const LINE_NAMES: Record<string, string> = { halpha: 'Broad Hα', hbeta: 'Broad Hβ', mgii: 'Mg II λ2798', civ: 'C IV λ1549' };
export const lineName = (l: string): string => LINE_NAMES[l] ?? l;

const LUM_SYMBOL: Record<string, string> = { line: 'L_line', l5100: 'λL_5100', l3000: 'λL_3000', l1350: 'λL_1350' };

/** 'log M_BH = a + b log(L/10^p) + c log(FWHM/1000 km/s)' from a calibration record's coefficients. */
export function calibrationFormula(c: Rec): string | undefined {
  const a = c.a, b = c.b, cc = c.c, pivot = c.logLpivot;
  if (typeof a !== 'number' || typeof b !== 'number' || typeof cc !== 'number') return undefined;
  const eps = typeof c.logEps === 'number' && c.logEps !== 0 ? `${c.logEps.toFixed(3)} + ` : '';
  const L = LUM_SYMBOL[String(c.luminosity)] ?? 'L';
  const p = typeof pivot === 'number' ? pivot : 42;
  return `log(M_BH/M☉) = ${eps}${a.toFixed(3)} + ${b} · log(${L} / 10^${p} erg s⁻¹) + ${cc} · log(FWHM / 1000 km s⁻¹)`;
}

const LOCAL_X: Record<string, string> = { logMstar: 'log(M*/M☉)', logMbulge: 'log(M_bulge/M☉)', logSigma: 'log(σ*/km s⁻¹)' };

/** 'log M_BH = a + b (x − pivot)' from a local relation record. */
export function localFormula(r: Rec): string | undefined {
  if (typeof r.a !== 'number' || typeof r.b !== 'number' || typeof r.pivot !== 'number') return undefined;
  const x = LOCAL_X[String(r.x)] ?? 'x';
  return `log(M_BH/M☉) = ${r.a.toFixed(3)} + ${r.b} · (${x} − ${Number(r.pivot.toFixed(3))})`;
}

function values(r: unknown, skip: string[] = []): NamedValue[] {
  if (!isRec(r)) return [];
  const out: NamedValue[] = [];
  for (const [k, v] of Object.entries(r)) {
    if (skip.includes(k)) continue;
    if (isRec(v) && 'value' in v) out.push({ name: readerName(k), value: readerValue(v.value), unit: unitText(str(v.unit)) || undefined, reference: str(v.reference) });
    else if (typeof v === 'number' || typeof v === 'string' || typeof v === 'boolean') out.push({ name: readerName(k), value: readerValue(v) });
    else if (Array.isArray(v) && v.every((x) => typeof x !== 'object')) out.push({ name: readerName(k), value: readerValue(v) });
  }
  return out;
}

/** What each bolometric method does, in words, and the record its correction comes from. */
export const BOLOMETRIC_METHODS: Record<string, { text: string; reference: string }> = {
  halpha_gh05_bc5100: {
    text: 'The broad Hα luminosity gives the 5100 Å continuum (Greene & Ho 2005, ApJ 630, 122, eq. 1, inverted), multiplied by a fixed bolometric correction BC5100.',
    reference: 'Greene & Ho 2005, ApJ 630, 122, eq. 1, with the bc5100 setting (9.26, Shen et al. 2011, by default)',
  },
  bc5100: { text: 'The measured 5100 Å continuum multiplied by a fixed bolometric correction BC5100.', reference: BC_SHEN11.l5100.reference },
  bc3000: { text: `The measured 3000 Å continuum multiplied by a fixed bolometric correction (${BC_SHEN11.l3000.bc}).`, reference: BC_SHEN11.l3000.reference },
  bc1350: { text: `The measured 1350 Å continuum multiplied by a fixed bolometric correction (${BC_SHEN11.l1350.bc}).`, reference: BC_SHEN11.l1350.reference },
  netzer19: { text: 'Luminosity-dependent bolometric corrections k = c (λL_λ / 10^42 erg s⁻¹)^d, from the first continuum present (5100, 3000, 1350 Å).', reference: NETZER19.l5100.reference },
  // Labels an object's lbol_method can carry besides the configured method ids.
  ...Object.fromEntries(
    (['l5100', 'l3000', 'l1350'] as const).map((band) => [
      `netzer19_${band}`,
      {
        text: `The ${band.slice(1)} Å continuum with the luminosity-dependent correction k = ${NETZER19[band].c} (λL_λ / 10^42 erg s⁻¹)^${NETZER19[band].d}.`,
        reference: NETZER19[band].reference,
      },
    ]),
  ),
  hbeta_gh05_bc5100: {
    text: 'No Hα or continuum: the broad Hβ luminosity gives the 5100 Å continuum (Greene & Ho 2005, ApJ 630, 122, eq. 2, inverted), multiplied by BC5100.',
    reference: 'Greene & Ho 2005, ApJ 630, 122, eq. 2 (coefficients from memory), with the bc5100 setting',
  },
};

/** The fixed corrections a route's records hold, by band, e.g. 'BC5100 = 10.33'. */
function routeCorrections(r: unknown): string[] {
  const recs = isRec(r) && Array.isArray(r.records) ? r.records : [];
  return recs.filter((x): x is Rec => isRec(x) && typeof x.bc === 'number' && typeof x.band === 'string').map((x) => `BC${String(x.band).replace(/^l/, '')} = ${readerValue(x.bc)}`);
}

/**
 * How an object's L_bol was made, for its page: what the route does and the reference the
 * catalog's build recorded for it, with the fixed correction this catalog used (e.g. BC5100 =
 * 10.33, Richards et al. 2006), not the tool's default. Falls back to the tool's own words for a
 * route the sidecar does not record.
 */
export function lbolRouteDescription(view: MethodsView, label: string): { text: string; reference?: string } | undefined {
  const route = view.bolometric.routes.find((r) => r.label === label);
  const known = BOLOMETRIC_METHODS[label];
  if (!route && !known) return undefined;
  const text = (known?.text ?? label).replace(/\.$/, '');
  const corrections = route?.corrections ?? [];
  // "… a fixed bolometric correction BC5100" names its value in place; other corrections go after.
  const inPlace = corrections.find((c) => text.endsWith(c.split(' = ')[0]!));
  // A value the words already give (the fixed BC3000 and BC1350) is not repeated.
  const rest = corrections.filter((c) => c !== inPlace && !text.includes(`(${c.split(' = ')[1]})`));
  const named = inPlace ? `${text.slice(0, text.length - inPlace.split(' = ')[0]!.length)}${inPlace}` : text;
  return { text: rest.length ? `${named} (${rest.join(', ')})` : named, reference: route?.reference ?? known?.reference };
}

/** The local relation's record: from the sidecar when it recorded one, else the tool's own record of that id. */
function localRecord(id: string, recorded: Rec): Rec {
  if (str(recorded.reference)) return recorded;
  const known = (LOCAL_RELATIONS as Record<string, unknown>)[id];
  return isRec(known) ? known : recorded;
}

export function methodsView(meta: SiteMeta): MethodsView {
  const raw = meta.raw;
  const prov: Rec = isRec(raw.provenance) ? raw.provenance : isRec(raw.settings) ? raw.settings : {};
  const s: Rec = isRec(prov.settings) ? prov.settings : prov;
  const id = (v: unknown): string => (isRec(v) ? str(v.id) ?? str(v.name) ?? '' : str(v) ?? '');

  const cosmoRec: Rec = isRec(prov.cosmology) ? prov.cosmology : isRec(s.cosmology) ? s.cosmology : {};
  const cosmology = {
    id: id(s.cosmology) || id(cosmoRec),
    name: str(cosmoRec.name),
    params: values(cosmoRec, ['id', 'name', 'reference', 'notes']),
    reference: str(cosmoRec.reference),
  };

  const calibrations: CalibrationView[] = [];
  const calRecs: Rec = isRec(prov.calibrations) ? prov.calibrations : {};
  const calIds: Rec = isRec(s.calibrations) ? s.calibrations : {};
  for (const line of new Set([...Object.keys(calIds), ...Object.keys(calRecs)])) {
    const r: Rec = isRec(calRecs[line]) ? (calRecs[line] as Rec) : isRec(calIds[line]) ? (calIds[line] as Rec) : { id: calIds[line] };
    const validity = isRec(r.validity)
      ? Object.entries(r.validity).map(([k, v]) => `${readerName(k)} ${Array.isArray(v) ? v.map(readerValue).join('–') : readerValue(v)}`).join('; ')
      : undefined;
    calibrations.push({
      line,
      id: id(r) || id(calIds[line]),
      label: str(r.label),
      formula: str(r.formula) ?? calibrationFormula(r),
      scatter: [r.scatterDex, r.scatter_dex, r.scatter].map((v) => (v === undefined ? undefined : readerValue(v))).find(Boolean),
      reference: str(r.reference),
      validity,
      notes: str(r.notes) === undefined ? undefined : readerText(str(r.notes)!),
    });
  }

  const bolRec: Rec = isRec(prov.bolometric) ? prov.bolometric : isRec(s.bolometric) ? s.bolometric : {};
  const edd: Rec = isRec(prov.eddington) ? prov.eddington : {};
  const growthRec: Rec = isRec(prov.growth) ? prov.growth : {};
  const localRec: Rec = localRecord(id(s.localRelation), isRec(prov.localRelation) ? prov.localRelation : isRec(s.localRelation) ? s.localRelation : {});
  const dustRec: Rec = isRec(prov.dustCurve) ? prov.dustCurve : isRec(s.dustCurve) ? s.dustCurve : {};
  const pick = (...keys: string[]): NamedValue[] =>
    keys.filter((k) => s[k] !== undefined && !isRec(s[k])).map((k) => ({ name: readerName(k), value: readerValue(s[k]) }));
  /** The first entry of each name (a setting and its record can both carry it, e.g. BC5100). */
  const unique = (items: NamedValue[]): NamedValue[] => items.filter((it, i) => items.findIndex((o) => o.name === it.name) === i);

  return {
    cosmology,
    calibrations,
    linePriority: Array.isArray(s.linePriority) ? s.linePriority.map(String) : [],
    bolometric: {
      id: id(s.bolometric) || id(bolRec),
      params: unique([...pick('bc5100'), ...values(bolRec, ['id', 'reference', 'method'])]),
      reference: str(bolRec.reference) ?? BOLOMETRIC_METHODS[id(s.bolometric) || id(bolRec)]?.reference,
      // Every label lbol_method can carry in this catalog, with the reference the build recorded for it.
      routes: isRec(bolRec.routes)
        ? Object.entries(bolRec.routes).map(([label, r]) => ({
            label,
            text: BOLOMETRIC_METHODS[label]?.text ?? label,
            reference: isRec(r) ? str(r.reference) : undefined,
            corrections: routeCorrections(r),
          }))
        : [],
    },
    eddington: [
      ...(s.eddingtonPerMsun !== undefined ? [{ name: 'L_Edd per solar mass', value: readerValue(s.eddingtonPerMsun), unit: 'erg s⁻¹', reference: str(edd.reference) }] : []),
    ],
    growth: {
      params: unique([...pick('efficiency', 'zSeed', 'lambdaSeed', 'dutyCycle', 'lightSeedMsun', 'heavySeedMsun'), ...values(growthRec, ['formula', 'form', 'reference'])]),
      formula: str(growthRec.formula) ?? str(growthRec.form),
      reference: str(growthRec.reference),
    },
    local: {
      id: id(s.localRelation) || id(localRec),
      label: str(localRec.label),
      formula: localFormula(localRec),
      reference: str(localRec.reference),
      params: values(localRec, ['id', 'reference', 'label', 'notes', 'x', 'a', 'b', 'pivot', 'scatterProvenance']),
    },
    dust: { id: id(s.dustCurve) || id(dustRec), params: unique([...pick('intrinsicBalmer'), ...values(dustRec, ['id', 'reference', 'name', 'label'])]), reference: str(dustRec.reference) },
    monteCarlo: pick('draws', 'seed'),
    constants: values(prov.constants ?? s.constants),
    allSettings: values(s),
  };
}
