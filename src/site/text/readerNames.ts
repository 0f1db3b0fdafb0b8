/**
 * Reader-facing names for the keys the catalog's metadata records (settings, cosmological
 * parameters, calibration and relation records, constants), and values rounded for reading.
 * The methods page shows these instead of the program's identifiers (tEddGyr, scatterDex,
 * fwhmKms, …); a key without a name here is spelt out in words rather than shown raw.
 */
import { formatGeneral, formatScientific, withMinus } from './formatValue.ts';

const NAMES: Record<string, string> = {
  // cosmology
  H0: 'Hubble constant H₀ (km s⁻¹ Mpc⁻¹)',
  Om0: 'Matter density Ω_m,0',
  Ob0: 'Baryon density Ω_b,0',
  Ode0: 'Dark-energy density Ω_Λ,0',
  Ok0: 'Curvature density Ω_k,0',
  Tcmb0: 'CMB temperature T₀ (K)',
  Neff: 'Effective number of neutrino species N_eff',
  mNuEv: 'Neutrino masses (eV)',
  // settings
  cosmology: 'Cosmology',
  calibrations: 'Virial calibrations',
  linePriority: 'Broad lines, in order of preference',
  bolometric: 'Bolometric method',
  bc5100: 'Bolometric correction at 5100 Å, BC5100',
  eddingtonPerMsun: 'Eddington luminosity per solar mass (erg s⁻¹)',
  lEddPerMsun: 'Eddington luminosity per solar mass (erg s⁻¹)',
  efficiency: 'Radiative efficiency ε',
  zSeed: 'Seeding redshift z_seed',
  lambdaSeed: 'Eddington ratio during growth λ',
  dutyCycle: 'Duty cycle',
  lightSeedMsun: 'Light seed mass (M☉)',
  heavySeedMsun: 'Heavy seed mass (M☉)',
  localRelation: 'Local black-hole–host relation',
  dustCurve: 'Dust attenuation curve',
  intrinsicBalmer: 'Intrinsic Balmer decrement Hα/Hβ',
  ratio: 'Ratio',
  draws: 'Monte Carlo draws per object',
  seed: 'Global random seed',
  // records
  tEddGyr: 'Eddington time t_Edd (Gyr)',
  form: 'Formula',
  scatterDex: 'Intrinsic scatter (dex)',
  scatterProvenance: 'Source of the scatter',
  logEps: 'log ε (virial factor)',
  logLpivot: 'Pivot luminosity, log (erg s⁻¹)',
  logL: 'log L (erg s⁻¹)',
  fwhmKms: 'FWHM (km s⁻¹)',
  luminosity: 'Luminosity used',
  rv: 'R_V',
  validityAngstrom: 'Valid wavelengths (Å)',
  scale: 'Scale',
  shortPoly: 'Polynomial, short wavelengths',
  longPoly: 'Polynomial, long wavelengths',
  breakMicron: 'Break between the pieces (µm)',
  pivot: 'Pivot',
  x: 'Host quantity',
  a: 'Intercept a',
  b: 'Slope b',
  c: 'Width exponent c',
  // constants
  speedOfLight: 'Speed of light c',
  gravitationalConstant: 'Gravitational constant G',
  protonMass: 'Proton mass m_p',
  thomsonCrossSection: 'Thomson cross-section σ_T',
  boltzmannEvPerK: 'Boltzmann constant k_B (eV/K)',
  solarMass: 'Solar mass M☉',
  solarLuminosity: 'Solar luminosity L☉',
  astronomicalUnit: 'Astronomical unit',
  julianYear: 'Julian year',
  parsec: 'Parsec',
  megaparsec: 'Megaparsec',
};

/** Program identifiers that turn up inside recorded notes, and their words. */
const IN_TEXT: Record<string, string> = {
  logL5100FromLogLHbeta: 'the Hβ–continuum relation',
  logL5100FromLogLHalpha: 'the Hα–continuum relation',
};

/** The reader-facing name of a recorded key: its name here, or the key spelt out in words. */
export function readerName(key: string): string {
  if (NAMES[key]) return NAMES[key]!;
  const words = key
    .replace(/_/g, ' ')
    .replace(/([a-z])([A-Z0-9])/g, '$1 $2')
    .toLowerCase()
    .trim();
  return words.charAt(0).toUpperCase() + words.slice(1);
}

/** Recorded prose with any program identifier in it replaced by words. */
export function readerText(text: string): string {
  return text.replace(/\b[a-z]+(?:[A-Z][a-z0-9]*)+\b/g, (id) => IN_TEXT[id] ?? readerName(id).toLowerCase());
}

/**
 * A recorded number for reading: as recorded when it has at most six significant digits
 * (published coefficients keep their digits), else rounded to four; powers of ten as ×10ⁿ
 * outside 10⁻³ … 10⁵.
 */
export function readerNumber(v: number): string {
  if (!Number.isFinite(v)) return String(v);
  const a = Math.abs(v);
  const short = Number(v.toPrecision(6)) === v;
  const r = short ? v : Number(v.toPrecision(4));
  if (a !== 0 && (a >= 1e5 || a < 1e-3)) {
    const digits = Math.max(0, Math.min(short ? 5 : 3, String(r.toExponential()).split('e')[0]!.replace(/[-.]/g, '').length - 1));
    return formatScientific(r, digits);
  }
  return Number.isInteger(r) ? formatGeneral(r) : withMinus(String(r));
}

/** A recorded value (number, text, list) for reading. */
export function readerValue(v: unknown): string {
  if (typeof v === 'number') return readerNumber(v);
  if (Array.isArray(v)) return v.map(readerValue).join(', ');
  if (typeof v === 'string') return readerText(v);
  return String(v);
}
