/**
 * The compare form's state and its translation into one object's inputs: the form's fields
 * become canonical columns (with the chosen units), which go through the catalog build's own
 * row checks (normalizeOne); every problem is attached to the field it concerns.
 */
import { LINES, type LineId, type ObjectInputs } from '../../core/derive/types.ts';
import type { Cell } from '../../catalog/readers/types.ts';
import { normalizeOne } from './normalizeOne.ts';
import { implausibleInputs } from './plausibility.ts';

/** The form's fields, as named in the page (element ids are `place-<field>`). */
export const FORM_FIELDS = [
  'id', 'z', 'line', 'fwhm', 'fwhm_err', 'strength_kind', 'strength', 'strength_err', 'strength_unit', 'is_limit',
  'mu', 'mu_err', 'log_mstar', 'log_mstar_err', 'balmer', 'balmer_err', 'av', 'av_err',
  'lam_l_5100', 'lam_l_5100_err', 'lam_l_3000', 'lam_l_3000_err', 'lam_l_1350', 'lam_l_1350_err',
  'fwhm_hbeta', 'fwhm_hbeta_err', 'flux_hbeta', 'flux_hbeta_err',
  'fwhm_mgii', 'fwhm_mgii_err', 'flux_mgii', 'flux_mgii_err',
  'fwhm_civ', 'fwhm_civ_err', 'flux_civ', 'flux_civ_err', 'other_flux_unit',
] as const;
export type FormField = (typeof FORM_FIELDS)[number];

/** The continuum luminosities the form takes (canonical columns `lam_l_<Å>`, in erg s⁻¹). */
export const CONTINUUM_FIELDS = ['lam_l_5100', 'lam_l_3000', 'lam_l_1350'] as const;

/** The lines the form takes besides the main one (canonical `fwhm_<line>` and `flux_<line>` columns). */
export const OTHER_LINES = ['hbeta', 'mgii', 'civ'] as const satisfies readonly LineId[];

/** Text fields of the other lines and the continuum, named as their canonical columns. */
type ExtraField = `${(typeof CONTINUUM_FIELDS)[number]}${'' | '_err'}` | `${'fwhm' | 'flux'}_${(typeof OTHER_LINES)[number]}${'' | '_err'}`;

/** The form's values as typed (text fields as text, the checkbox as a boolean). */
export interface PlaceFormState {
  id: string;
  z: string;
  line: LineId;
  fwhm: string;
  fwhm_err: string;
  strength_kind: 'flux' | 'lum';
  strength: string;
  strength_err: string;
  strength_unit: string;
  is_limit: boolean;
  mu: string;
  mu_err: string;
  log_mstar: string;
  log_mstar_err: string;
  balmer: string;
  balmer_err: string;
  av: string;
  av_err: string;
  /** Continuum λL_λ at 5100, 3000 and 1350 Å, erg s⁻¹, with their errors. */
  lam_l_5100: string;
  lam_l_5100_err: string;
  lam_l_3000: string;
  lam_l_3000_err: string;
  lam_l_1350: string;
  lam_l_1350_err: string;
  /** The other lines' FWHM (km s⁻¹) and flux (in `other_flux_unit`), with errors. */
  fwhm_hbeta: string;
  fwhm_hbeta_err: string;
  flux_hbeta: string;
  flux_hbeta_err: string;
  fwhm_mgii: string;
  fwhm_mgii_err: string;
  flux_mgii: string;
  flux_mgii_err: string;
  fwhm_civ: string;
  fwhm_civ_err: string;
  flux_civ: string;
  flux_civ_err: string;
  other_flux_unit: string;
}

/** Units offered for a line flux (VOUnit-style strings read by src/core/units). */
export const FLUX_UNITS: readonly { value: string; label: string }[] = [
  { value: 'erg s-1 cm-2', label: 'erg s⁻¹ cm⁻²' },
  { value: '1e-17 erg s-1 cm-2', label: '10⁻¹⁷ erg s⁻¹ cm⁻²' },
  { value: '1e-18 erg s-1 cm-2', label: '10⁻¹⁸ erg s⁻¹ cm⁻²' },
  { value: '1e-20 erg s-1 cm-2', label: '10⁻²⁰ erg s⁻¹ cm⁻²' },
  { value: 'W m-2', label: 'W m⁻²' },
];

/** Units offered for a line luminosity; 'log' means the value is log10 of erg s^-1 and its error is in dex. */
export const LUM_UNITS: readonly { value: string; label: string }[] = [
  { value: 'log', label: 'log₁₀ (erg s⁻¹), error in dex' },
  { value: 'erg s-1', label: 'erg s⁻¹' },
  { value: '1e42 erg s-1', label: '10⁴² erg s⁻¹' },
  { value: 'W', label: 'W' },
];

/** An empty form (Hα, flux in erg s⁻¹ cm⁻²). */
export function emptyForm(): PlaceFormState {
  return {
    id: '', z: '', line: 'halpha', fwhm: '', fwhm_err: '', strength_kind: 'flux', strength: '', strength_err: '', strength_unit: FLUX_UNITS[0]!.value,
    is_limit: false, mu: '', mu_err: '', log_mstar: '', log_mstar_err: '', balmer: '', balmer_err: '', av: '', av_err: '',
    lam_l_5100: '', lam_l_5100_err: '', lam_l_3000: '', lam_l_3000_err: '', lam_l_1350: '', lam_l_1350_err: '',
    fwhm_hbeta: '', fwhm_hbeta_err: '', flux_hbeta: '', flux_hbeta_err: '', fwhm_mgii: '', fwhm_mgii_err: '', flux_mgii: '', flux_mgii_err: '',
    fwhm_civ: '', fwhm_civ_err: '', flux_civ: '', flux_civ_err: '', other_flux_unit: FLUX_UNITS[0]!.value,
  };
}

/** What the form gives: the inputs when every field is valid, else a message per field. */
export interface FormResult {
  inputs: ObjectInputs | null;
  errors: Partial<Record<FormField, string>>;
  /** Remarks that do not stop the derivation (e.g. which dust correction is used). */
  notes: string[];
}

const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/** Converts the form into inputs, checking every field with the catalog build's rules. */
export function formToInputs(state: PlaceFormState): FormResult {
  const errors: Partial<Record<FormField, string>> = {};
  const notes: string[] = [];
  const line = LINES.includes(state.line) ? state.line : 'halpha';
  const header: string[] = [];
  const cells: Cell[] = [];
  const field = new Map<string, FormField>();
  const units: Record<string, string> = {};
  const put = (column: string, value: string, from: FormField) => {
    header.push(column);
    cells.push(value.trim() === '' ? null : value.trim());
    field.set(column, from);
  };
  put('id', state.id, 'id');
  put('z', state.z, 'z');
  put(`fwhm_${line}`, state.fwhm, 'fwhm');
  put(`fwhm_${line}_err`, state.fwhm_err, 'fwhm_err');
  const strength = `${state.strength_kind === 'lum' ? 'lum' : 'flux'}_${line}`;
  const err = state.is_limit ? '' : state.strength_err;
  if (state.strength_kind === 'lum' && state.strength_unit === 'log') {
    const v = state.strength.trim();
    const e = err.trim();
    if (v !== '' && !NUMBER.test(v)) errors.strength = `${v}: not a number`;
    else if (e !== '' && !NUMBER.test(e)) errors.strength_err = `${e}: not a number`;
    else if (e !== '' && Number(e) < 0) errors.strength_err = `${e} dex: must not be negative`;
    else if (v !== '') {
      const lin = 10 ** Number(v);
      put(strength, String(lin), 'strength');
      if (e !== '') {
        put(`${strength}_err_lo`, String(lin * (1 - 10 ** -Number(e))), 'strength_err');
        put(`${strength}_err_hi`, String(lin * (10 ** Number(e) - 1)), 'strength_err');
      }
    }
  } else {
    units[strength] = state.strength_unit;
    put(strength, state.strength, 'strength');
    put(`${strength}_err`, err, 'strength_err');
  }
  if (state.is_limit) put(`flux_${line}_is_limit`, 'true', 'is_limit');
  put('mu', state.mu, 'mu');
  put('mu_err', state.mu_err, 'mu_err');
  put('log_mstar', state.log_mstar, 'log_mstar');
  put('log_mstar_err', state.log_mstar_err, 'log_mstar_err');
  put('balmer_decrement', state.balmer, 'balmer');
  put('balmer_decrement_err', state.balmer_err, 'balmer_err');
  put('av', state.av, 'av');
  put('av_err', state.av_err, 'av_err');
  for (const c of CONTINUUM_FIELDS) {
    put(c, state[c], c);
    put(`${c}_err`, state[`${c}_err`], `${c}_err`);
  }
  const given = (f: ExtraField) => state[f].trim() !== '';
  let otherWidth = false;
  let otherStrength = CONTINUUM_FIELDS.some(given);
  for (const l of OTHER_LINES) {
    const fields = [`fwhm_${l}`, `fwhm_${l}_err`, `flux_${l}`, `flux_${l}_err`] as const;
    if (!fields.some(given)) continue;
    if (l === line) {
      // the main line's columns are already in the header: a second value would be read twice
      for (const f of fields) if (given(f)) errors[f] = 'this is the line chosen above: give it there';
      continue;
    }
    otherWidth ||= given(`fwhm_${l}`);
    otherStrength ||= given(`flux_${l}`);
    units[`flux_${l}`] = state.other_flux_unit;
    for (const f of fields) put(f, state[f], f);
  }

  if (state.fwhm.trim() === '' && !otherWidth) errors.fwhm = 'needed for the black-hole mass';
  if (state.strength.trim() === '' && !otherStrength) errors.strength = `needed for the black-hole mass (the line ${state.strength_kind === 'lum' ? 'luminosity' : 'flux'})`;
  const res = normalizeOne(header, cells, units);
  for (const p of [...res.problems, ...(res.inputs ? implausibleInputs(res.inputs) : [])]) {
    const f = field.get(p.column) ?? (p.column.startsWith('flux_') || p.column.startsWith('lum_') ? 'strength' : 'id');
    errors[f] ??= p.message;
  }
  if (state.av.trim() !== '' && state.balmer.trim() !== '') notes.push('A_V is given, so the Balmer decrement is not used for the dust correction.');
  if (state.is_limit && state.strength_err.trim() !== '') notes.push('The line is an upper limit, so its error is not used.');
  const ok = Object.keys(errors).length === 0 && res.inputs !== null;
  return { inputs: ok ? res.inputs : null, errors, notes };
}
