import type { Reading } from './reading.ts';
import { GREENE25_L5100_RATIO, YANAGISAWA26_LINE_FACTORS } from '../bolometric/smallCorrections.ts';

const RUSAKOV25 = 'Rusakov et al. 2025, Nature (ionized-cocoon reading: broad Balmer wings from electron scattering in dense ionized gas)';
const BRAZZINI25 =
  'Brazzini et al. 2025, MNRAS Letters 544, L167, arXiv:2507.08929 (abstract: scattering would make masses up to two orders of magnitude smaller; a counterexample where it does not dominate)';
const TORRALBA25 = 'Torralba et al. 2025, arXiv:2510.00103 (abstract: broad Hα:Hβ:Hγ ≈ 10.4 : 1 : 0.14 from collisional excitation, not case B)';
const NAIDU25 = 'Naidu et al. 2025, arXiv:2503.16596 (abstract: a dust-free dense-gas envelope; masses may be over-estimated by orders of magnitude)';

/**
 * Width deflation where no core width is measured: 10, the upper end of the scattering premise
 * (masses "up to two orders of magnitude smaller", Brazzini et al. 2025 abstract, on Rusakov et
 * al. 2025): log M falls by 2·log10(10) = 2 dex for FWHM exponent 2, 2.06 dex for the Hα ones.
 */
export const SCATTERING_DEFLATION = {
  factor: 10,
  range: [1, 10] as const,
  source: `${BRAZZINI25}; ${RUSAKOV25}`,
};

/** Today's derivation: the run's settings, unchanged. */
export const STANDARD_READING: Reading = {
  id: 'standard',
  label: 'Standard',
  premise: 'Broad lines are virial and their widths measure the broad-line region; quasar bolometric corrections; Balmer decrements above case B are dust.',
  references: ['The run\'s settings: see the virial calibrations, bolometric method and dust curve of this catalog'],
  calibrations: {},
  width: { mode: 'measured' },
  bolometric: { mode: 'standard' },
  dust: 'standard',
  growth: {},
};

/** Electron-scattering wings: the virial width is the core's. */
export const SCATTERING_CORE_READING: Reading = {
  id: 'scattering_core',
  label: 'Scattering core',
  premise: 'The broad wings are electron scattering in dense ionized gas, so only the narrower core width traces the black hole\'s gravity.',
  references: [RUSAKOV25, BRAZZINI25],
  calibrations: {},
  width: { mode: 'core', fallbackDeflation: SCATTERING_DEFLATION.factor, deflationSource: SCATTERING_DEFLATION.source },
  bolometric: { mode: 'standard' },
  dust: 'standard',
  growth: {},
};

/** A dense gas envelope: collisional Balmer ratios and small bolometric corrections. */
export const DENSE_GAS_READING: Reading = {
  id: 'dense_gas',
  label: 'Dense gas envelope',
  premise: 'A dense, dust-free gas envelope makes the Balmer ratios collisional rather than reddened and the sources far less luminous per unit broad-line flux.',
  references: [TORRALBA25, NAIDU25, YANAGISAWA26_LINE_FACTORS.reference],
  calibrations: {},
  width: { mode: 'measured' },
  bolometric: { mode: 'line_factors', halpha: YANAGISAWA26_LINE_FACTORS.halpha, hbeta: YANAGISAWA26_LINE_FACTORS.hbeta, source: YANAGISAWA26_LINE_FACTORS.reference },
  dust: 'none',
  growth: {},
};

/** Standard masses with the bolometric correction measured for these sources. */
export const SMALL_BOLOMETRIC_READING: Reading = {
  id: 'small_bolometric',
  label: 'Small bolometric correction',
  premise: 'Masses as standard, but the sources emit far less in total than a quasar of the same optical luminosity (L_bol/L5100 = 5).',
  references: [GREENE25_L5100_RATIO.reference],
  calibrations: {},
  width: { mode: 'measured' },
  bolometric: { mode: 'l5100_ratio', ratio: GREENE25_L5100_RATIO.ratio, source: GREENE25_L5100_RATIO.reference },
  dust: 'standard',
  growth: {},
};

/** The readings every catalog is derived under unless its config says otherwise, in display order. */
export const BUILT_IN_READINGS: readonly Reading[] = [STANDARD_READING, SCATTERING_CORE_READING, DENSE_GAS_READING, SMALL_BOLOMETRIC_READING];

/** A built-in reading by id, or undefined. */
export function builtInReading(id: string): Reading | undefined {
  return BUILT_IN_READINGS.find((r) => r.id === id);
}
