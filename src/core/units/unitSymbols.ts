import { L_SUN_ERG_S, M_SUN_G, PC_CM, YR_S, AU_CM } from '../constants/index.ts';
import { dim, type Dimension } from './dimension.ts';

/** One unit symbol: its size in cgs, its dimension, and whether SI prefixes may be put before it. */
export interface UnitSymbol {
  readonly cgs: number;
  readonly dimension: Dimension;
  readonly prefixable: boolean;
}

const LENGTH = dim({ length: 1 });
const MASS = dim({ mass: 1 });
const TIME = dim({ time: 1 });
const POWER = dim({ mass: 1, length: 2, time: -3 });
const ENERGY = dim({ mass: 1, length: 2, time: -2 });

const u = (cgs: number, dimension: Dimension, prefixable: boolean): UnitSymbol => ({ cgs, dimension, prefixable });
const angstrom = u(1e-8, LENGTH, false);
const solLum = u(L_SUN_ERG_S, POWER, false);
const solMass = u(M_SUN_G, MASS, false);
/** Angles are measured in degrees along the angle axis. */
const ANGLE = dim({ angle: 1 });

/**
 * Unit symbols accepted in catalog unit strings: the IVOA VOUnits 1.0 (2014) names that the
 * derived quantities need, plus common spellings (Msun, Lsun, Å, A for ångström — there is no
 * electric current among our quantities). Sizes: SI definitions, IAU 2015 B3 nominal solar
 * values, IAU 2012 B2 au, IAU 2015 B2 parsec, Julian year. Angles are sized in degrees
 * (`deg`, `rad`, `arcmin`, `arcsec`, `mas`, and astropy's `hourangle` = 15 deg).
 */
export const UNIT_SYMBOLS: Readonly<Record<string, UnitSymbol>> = {
  m: u(100, LENGTH, true),
  g: u(1, MASS, true),
  s: u(1, TIME, true),
  W: u(1e7, POWER, true),
  J: u(1e7, ENERGY, true),
  erg: u(1, ENERGY, true),
  Jy: u(1e-23, dim({ mass: 1, time: -2 }), true),
  Hz: u(1, dim({ time: -1 }), true),
  pc: u(PC_CM, LENGTH, true),
  au: u(AU_CM, LENGTH, false),
  AU: u(AU_CM, LENGTH, false),
  yr: u(YR_S, TIME, true),
  a: u(YR_S, TIME, true),
  Angstrom: angstrom,
  angstrom: angstrom,
  AA: angstrom,
  A: angstrom,
  Å: angstrom,
  Lsun: solLum,
  solLum,
  L_sun: solLum,
  Lsol: solLum,
  Msun: solMass,
  solMass,
  M_sun: solMass,
  Msol: solMass,
  mag: u(1, dim({ mag: 1 }), true),
  deg: u(1, ANGLE, false),
  rad: u(180 / Math.PI, ANGLE, false),
  arcmin: u(1 / 60, ANGLE, false),
  arcsec: u(1 / 3600, ANGLE, true),
  mas: u(1 / 3.6e6, ANGLE, false),
  hourangle: u(15, ANGLE, false),
};

/** SI prefixes (VOUnits 1.0 §2.4); 'u', 'µ' (micro sign) and 'μ' (Greek mu) all mean 1e-6. */
export const SI_PREFIXES: Readonly<Record<string, number>> = {
  y: 1e-24, z: 1e-21, a: 1e-18, f: 1e-15, p: 1e-12, n: 1e-9, u: 1e-6, µ: 1e-6, μ: 1e-6, m: 1e-3, c: 1e-2, d: 1e-1,
  da: 1e1, h: 1e2, k: 1e3, M: 1e6, G: 1e9, T: 1e12, P: 1e15, E: 1e18, Z: 1e21, Y: 1e24,
};

/** Resolves a symbol, an exact name first and then prefix + prefixable name ("km", "Mpc", "mW"). */
export function lookupSymbol(symbol: string): UnitSymbol | undefined {
  const exact = Object.hasOwn(UNIT_SYMBOLS, symbol) ? UNIT_SYMBOLS[symbol] : undefined;
  if (exact) return exact;
  for (const len of [2, 1]) {
    const prefix = symbol.slice(0, len);
    const base = symbol.slice(len);
    if (!base || !Object.hasOwn(SI_PREFIXES, prefix) || !Object.hasOwn(UNIT_SYMBOLS, base)) continue;
    const sym = UNIT_SYMBOLS[base] as UnitSymbol;
    if (sym.prefixable) return { ...sym, cgs: sym.cgs * (SI_PREFIXES[prefix] as number) };
  }
  return undefined;
}
