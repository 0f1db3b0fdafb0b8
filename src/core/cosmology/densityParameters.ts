import { C_CM_S, G_CGS, MPC_KM, SIGMA_SB_CGS, K_B_EV_K } from '../constants/index.ts';
import type { CosmologyParams } from './cosmologyParams.ts';
import { KOMATSU11_NEUTRINO_FIT, neutrinoOverPhotonDensity, type NeutrinoContent } from './neutrinoDensity.ts';

/** Density parameters today (over critical) derived from {@link CosmologyParams}, as astropy's FLRW computes them. */
export interface DensityParameters {
  readonly Om0: number;
  readonly Ode0: number;
  readonly Ok0: number;
  /** Photons, from Tcmb0. */
  readonly Ogamma0: number;
  /** Neutrinos (massless and massive) today. */
  readonly Onu0: number;
  /** Massive-neutrino content, or null when every neutrino is massless (Onu ∝ Ogamma at all z). */
  readonly massiveNeutrinos: NeutrinoContent | null;
}

/** Thrown for cosmological parameters that do not describe a usable model. */
export class CosmologyError extends Error {
  override name = 'CosmologyError';
}

function check(ok: boolean, message: string): void {
  if (!ok) throw new CosmologyError(message);
}

/**
 * Derives Ogamma0 (4σ_SB T⁴/c³ over ρ_crit = 3H0²/8πG), Onu0 (Komatsu et al. 2011 fit for
 * massive species, Neff split over floor(Neff) species), Ode0 (when flat) and Ok0, as astropy 5.2.1.
 * Throws {@link CosmologyError} naming the parameter that is out of range.
 */
export function densityParameters(params: CosmologyParams): DensityParameters {
  const { name, H0, Om0, Tcmb0, Neff } = params;
  const where = `cosmology "${name}"`;
  check(Number.isFinite(H0) && H0 > 0, `${where}: H0 must be a positive number of km/s/Mpc, got ${H0}`);
  check(Number.isFinite(Om0) && Om0 >= 0, `${where}: Om0 must be ≥ 0, got ${Om0}`);
  check(Number.isFinite(Tcmb0) && Tcmb0 >= 0, `${where}: Tcmb0 must be ≥ 0 K, got ${Tcmb0}`);
  check(Number.isFinite(Neff) && Neff >= 0, `${where}: Neff must be ≥ 0, got ${Neff}`);
  check(params.Ode0 === undefined || Number.isFinite(params.Ode0), `${where}: Ode0 must be a number, got ${params.Ode0}`);

  const h0PerS = H0 / MPC_KM;
  const rhoCrit = (3 * h0PerS * h0PerS) / (8 * Math.PI * G_CGS);
  // Integer powers by multiplication: Math.pow and ** differ in the last bit between engines (src/core/math/pow.ts).
  const Ogamma0 = ((4 * SIGMA_SB_CGS) / (C_CM_S * C_CM_S * C_CM_S)) * (Tcmb0 * Tcmb0 * Tcmb0 * Tcmb0) / rhoCrit;

  let massiveNeutrinos: NeutrinoContent | null = null;
  const masses = params.mNuEv ?? [];
  // As astropy: with no CMB temperature there are no relic neutrinos either, whatever their mass.
  if (Tcmb0 > 0 && Neff > 0 && masses.some((m) => m > 0)) {
    const nSpecies = Math.floor(Neff);
    check(nSpecies >= 1, `${where}: massive neutrinos need Neff ≥ 1, got ${Neff}`);
    check(
      masses.length === nSpecies,
      `${where}: mNuEv has ${masses.length} masses, expected floor(Neff) = ${nSpecies}`,
    );
    check(masses.every((m) => Number.isFinite(m) && m >= 0), `${where}: neutrino masses must be ≥ 0 eV`);
    const tnu0 = KOMATSU11_NEUTRINO_FIT.tnuOverTcmb * Tcmb0;
    const massive = masses.filter((m) => m > 0);
    massiveNeutrinos = {
      neffPerSpecies: Neff / nSpecies,
      nMassless: nSpecies - massive.length,
      nuY: massive.map((m) => m / (K_B_EV_K * tnu0)),
    };
  }
  const Onu0 = massiveNeutrinos
    ? Ogamma0 * neutrinoOverPhotonDensity(massiveNeutrinos, 1)
    : KOMATSU11_NEUTRINO_FIT.perSpeciesOverPhotons * Neff * Ogamma0;

  const flat = params.Ode0 === undefined;
  const Ode0 = flat ? 1 - Om0 - Ogamma0 - Onu0 : (params.Ode0 as number);
  // Flat models get exactly 0 (not a rounding residue) so the flat path is taken.
  const Ok0 = flat ? 0 : 1 - Om0 - Ode0 - Ogamma0 - Onu0;
  return { Om0, Ode0, Ok0, Ogamma0, Onu0, massiveNeutrinos };
}
