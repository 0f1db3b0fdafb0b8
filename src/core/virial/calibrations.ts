import type { LineId } from '../derive/types.ts';
import type { VirialCalibration } from './virialCalibration.ts';
import { log10 } from '../math/index.ts';

/** Ids of the virial calibrations this project ships. */
export type VirialCalibrationId = 'gh05_halpha' | 'rv15_halpha' | 'vp06_hbeta' | 'vp06_hbeta_line' | 'vo09_mgii' | 's11_mgii' | 'vp06_civ';

const RANGES_NOTE = 'Validity: approximate luminosity and FWHM span of the calibrating sample (from memory), not limits published as such.';

/**
 * The virial calibrations, keyed by id. Scatter values marked 'from memory' or 'common
 * practice' must be confirmed against the papers before they are quoted.
 */
export const CALIBRATIONS: Readonly<Record<VirialCalibrationId, VirialCalibration>> = {
  gh05_halpha: {
    id: 'gh05_halpha', line: 'halpha', label: 'Greene & Ho 2005, Hα',
    // Eq. 6 is printed as M = 2.0e6 (L_Hα/1e42)^0.55 (FWHM/1e3)^2.06; the zero point is its log.
    logEps: 0, a: log10(2.0e6), b: 0.55, c: 2.06, luminosity: 'line', logLpivot: 42,
    scatterDex: 0.4, // common practice for single-epoch masses; GH05 quote no intrinsic scatter for eq. 6
    scatterProvenance: 'common practice',
    reference: 'Greene & Ho 2005, ApJ 630, 122, eq. 6',
    massScale: 'gh05_f0.75',
    validity: { logL: [41, 44], fwhmKms: [800, 10000] },
    notes: RANGES_NOTE,
  },
  rv15_halpha: {
    id: 'rv15_halpha', line: 'halpha', label: 'Reines & Volonteri 2015, Hα (ε = 1.075)',
    logEps: log10(1.075), a: 6.57, b: 0.47, c: 2.06, luminosity: 'line', logLpivot: 42,
    scatterDex: 0.4, // common practice; RV15 discuss ~0.3–0.5 dex systematics (from memory)
    scatterProvenance: 'common practice',
    reference: 'Reines & Volonteri 2015, ApJ 813, 82, eq. 5 (ε = 1.075)',
    massScale: 'rv15_f4.3',
    validity: { logL: [40, 44], fwhmKms: [500, 10000] },
    notes: `With ε = 1 masses come out 0.031 dex lower. ${RANGES_NOTE}`,
  },
  vp06_hbeta: {
    id: 'vp06_hbeta', line: 'hbeta', label: 'Vestergaard & Peterson 2006, Hβ with λL5100',
    logEps: 0, a: 6.91, b: 0.5, c: 2, luminosity: 'l5100', logLpivot: 44,
    scatterDex: 0.43, // from memory (VP06 1σ scatter about the RM masses)
    scatterProvenance: 'from memory',
    reference: 'Vestergaard & Peterson 2006, ApJ 641, 689, eq. 5',
    massScale: 'vp06_f5.5',
    validity: { logL: [42.5, 46], fwhmKms: [1000, 10000] },
    notes:
      'Needs the continuum λL5100, not L(Hβ). With no continuum the derivation uses vp06_hbeta_line (by default) ' +
      `or, if configured, estimates λL5100 with logL5100FromLogLHbeta (Greene & Ho 2005 eq. 2, from memory) and flags it. ${RANGES_NOTE}`,
  },
  vp06_hbeta_line: {
    id: 'vp06_hbeta_line', line: 'hbeta', label: 'Vestergaard & Peterson 2006, Hβ with L(Hβ)',
    // log M = log[(FWHM/1000 km/s)^2 (L_Hβ/1e42 erg/s)^0.63] + 6.67. From memory: the search tool
    // (docs, pages, code) found no copy of the equation to confirm it (2026-12-02).
    logEps: 0, a: 6.67, b: 0.63, c: 2, luminosity: 'line', logLpivot: 42,
    scatterDex: 0.43, // from memory (VP06 1σ scatter about the RM masses)
    scatterProvenance: 'from memory',
    reference: 'Vestergaard & Peterson 2006, ApJ 641, 689, eq. 6 (coefficients from memory)',
    massScale: 'vp06_f5.5',
    validity: { logL: [40.5, 44], fwhmKms: [1000, 10000] },
    notes: `The line luminosity of broad Hβ itself: the default route for Hβ without a measured continuum. ${RANGES_NOTE}`,
  },
  vo09_mgii: {
    id: 'vo09_mgii', line: 'mgii', label: 'Vestergaard & Osmer 2009, Mg II with λL3000',
    logEps: 0, a: 6.86, b: 0.5, c: 2, luminosity: 'l3000', logLpivot: 44,
    scatterDex: 0.55, // from memory
    scatterProvenance: 'from memory',
    reference: 'Vestergaard & Osmer 2009, ApJ 699, 800, Mg II calibration with λL3000 (§3, eq. 1)',
    massScale: 'vp06_f5.5',
    validity: { logL: [43.5, 46.5], fwhmKms: [1000, 15000] },
    notes: `Equation location from memory. ${RANGES_NOTE}`,
  },
  s11_mgii: {
    id: 's11_mgii', line: 'mgii', label: 'Shen et al. 2011, Mg II with λL3000',
    logEps: 0, a: 6.74, b: 0.62, c: 2, luminosity: 'l3000', logLpivot: 44,
    scatterDex: 0.4, // common practice / from memory for SDSS single-epoch masses
    scatterProvenance: 'common practice',
    reference: 'Shen et al. 2011, ApJS 194, 45, §3.7, eq. 8 with (a, b) = (0.740, 0.62) for FWHM in km/s (Mg II fiducial calibration)',
    massScale: 'vp06_f5.5',
    validity: { logL: [44.5, 47], fwhmKms: [1000, 15000] },
    notes: `Equation location from memory. ${RANGES_NOTE}`,
  },
  vp06_civ: {
    id: 'vp06_civ', line: 'civ', label: 'Vestergaard & Peterson 2006, C IV with λL1350',
    logEps: 0, a: 6.66, b: 0.53, c: 2, luminosity: 'l1350', logLpivot: 44,
    scatterDex: 0.36, // from memory (VP06 1σ scatter about the RM masses)
    scatterProvenance: 'from memory',
    reference: 'Vestergaard & Peterson 2006, ApJ 641, 689, eq. 7',
    massScale: 'vp06_f5.5',
    validity: { logL: [43, 47], fwhmKms: [1000, 12000] },
    notes: RANGES_NOTE,
  },
};

const DEFAULTS: Readonly<Record<LineId, VirialCalibrationId>> = {
  halpha: 'rv15_halpha',
  hbeta: 'vp06_hbeta',
  mgii: 's11_mgii',
  civ: 'vp06_civ',
};

/**
 * A calibration by id; throws a one-line error naming the unknown id and the known ones.
 * @param id - calibration id, e.g. 'rv15_halpha'.
 */
export function getCalibration(id: string): VirialCalibration {
  const cal = (CALIBRATIONS as Record<string, VirialCalibration | undefined>)[id];
  if (!cal) throw new Error(`unknown virial calibration '${id}' (known: ${Object.keys(CALIBRATIONS).join(', ')})`);
  return cal;
}

/**
 * The default calibration of a line: Hα rv15_halpha, Hβ vp06_hbeta, Mg II s11_mgii, C IV vp06_civ
 * (the Mg II/C IV/Hβ choices are Shen et al. 2011's fiducial ones).
 * @param line - the broad line.
 */
export function defaultCalibrationFor(line: LineId): VirialCalibration {
  return CALIBRATIONS[DEFAULTS[line]];
}
