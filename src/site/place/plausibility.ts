import { LINES, type ObjectInputs } from '../../core/derive/types.ts';
import type { InputProblem } from './normalizeOne.ts';

/**
 * Brightest broad-line flux taken as real, erg s^-1 cm^-2. Broad lines of AGN at z > 1 are far
 * fainter (≲ 1e-13); a larger value almost always means the flux is in other units, e.g.
 * 1e-18 erg s^-1 cm^-2 (common practice, no source).
 */
export const MAX_PLAUSIBLE_FLUX_CGS = 1e-10;

/**
 * Faintest broad-line flux taken as real, erg s^-1 cm^-2: the deepest spectra reach ~1e-19; a
 * smaller value is usually a flux in W m^-2 (1e-3 of cgs) or scaled twice (common practice, no source).
 */
export const MIN_PLAUSIBLE_FLUX_CGS = 1e-22;

/** Brightest broad-line luminosity taken as real, erg s^-1: the most luminous quasars' broad lines stay below ~1e46 (common practice, no source). */
export const MAX_PLAUSIBLE_LUM_ERG_S = 1e47;

/** Faintest broad-line luminosity taken as real, erg s^-1: smaller values are usually logs typed as linear (common practice, no source). */
export const MIN_PLAUSIBLE_LUM_ERG_S = 1e30;

/**
 * Values that pass the build's checks but are almost certainly in the wrong units, each with a
 * message that says which unit was probably meant.
 */
export function implausibleInputs(inputs: ObjectInputs): InputProblem[] {
  const out: InputProblem[] = [];
  for (const line of LINES) {
    const li = inputs.lines[line];
    const f = li?.fluxCgs?.value;
    if (f !== undefined && f > MAX_PLAUSIBLE_FLUX_CGS) {
      out.push({
        column: `flux_${line}`,
        message: `${f} erg s-1 cm-2 is brighter than any broad line at high redshift: is it in units of 1e-18 (or 1e-17) erg s-1 cm-2? Choose the flux unit.`,
      });
    }
    if (f !== undefined && f < MIN_PLAUSIBLE_FLUX_CGS) {
      out.push({
        column: `flux_${line}`,
        message: `${f} erg s-1 cm-2 is fainter than any broad line a spectrum can detect: is it in W m-2, or already scaled? Choose the flux unit.`,
      });
    }
    const l = li?.lumErgS?.value;
    if (l !== undefined && l < MIN_PLAUSIBLE_LUM_ERG_S) {
      out.push({ column: `lum_${line}`, message: `${l} erg s-1 is far too faint for a broad line: is it log10 of the luminosity? Choose the log unit.` });
    }
    if (l !== undefined && l > MAX_PLAUSIBLE_LUM_ERG_S) {
      out.push({ column: `lum_${line}`, message: `${l} erg s-1 is brighter than any broad line: is it in units of 1e-7 (W) or scaled twice? Choose the luminosity unit.` });
    }
  }
  for (const [column, m] of [['lam_l_5100', inputs.lamL5100], ['lam_l_3000', inputs.lamL3000], ['lam_l_1350', inputs.lamL1350]] as const) {
    const v = m?.value;
    if (v !== undefined && v < MIN_PLAUSIBLE_LUM_ERG_S) out.push({ column, message: `${v} erg s-1 is far too faint for an AGN continuum: is it log10 of the luminosity? Give λL_λ in erg s-1 (e.g. 1.4e44).` });
  }
  return out;
}
