/**
 * Three invented objects for the "compare a new object" feature, made with the same forward
 * model as the catalog (noise-free values, recorded errors): an ordinary one, an extreme one
 * (very over-massive and super-Eddington, dusty) and one at z ≈ 9 measured in Hβ only.
 */
import type { DemoTruth } from './demoTruth.ts';
import type { DemoRow } from './demoRow.ts';
import { DEMO_MODEL } from './demoPopulation.ts';
import { DEMO_PROGRAMS } from './demoNames.ts';
import { RV15_AGN_LOCAL } from './demoRelations.ts';
import { mulberry32 } from './demoRandom.ts';
import { rowFromTruth } from './demoObserve.ts';

// The new objects are given at their virial masses (what the compare form recovers): no calibration scatter.
type Spec = Omit<DemoTruth, 'deltaLogMbhLocal' | 'logMbhVirial'>;

const base = {
  lensed: false,
  mu: 1,
  ebv: 0,
  hasHost: true,
  isLimit: false,
  hasBalmer: false,
  hasHbetaFwhm: false,
  noiseFloor: 0.2,
  program: DEMO_PROGRAMS.deep,
} as const;

const SPECS: readonly Spec[] = [
  {
    ...base,
    id: 'CDW-90001',
    z: 5.4172,
    branch: 'halpha',
    logMbh: 7.15,
    logEddRatio: -0.65,
    logMstar: 9.75,
    field: 'QUILLMERE',
    raDeg: 47.35221,
    decDeg: -21.80417,
    notes: 'ordinary: typical mass, sub-Eddington, about 1 dex above the local relation',
  },
  {
    ...base,
    id: 'CDW-90002',
    z: 6.0841,
    branch: 'halpha',
    logMbh: 7.9,
    logEddRatio: 0.45,
    logMstar: 8.3,
    ebv: 0.35,
    hasBalmer: true,
    hasHbetaFwhm: true,
    field: 'ASHFEN-DEEP',
    raDeg: 212.63107,
    decDeg: 38.38852,
    notes: 'extreme: super-Eddington, black hole over 3 dex above the local relation, dusty',
  },
  {
    ...base,
    id: 'CDW-90003',
    z: 9.0126,
    branch: 'hbeta',
    logMbh: 7.35,
    logEddRatio: -0.3,
    logMstar: 9.1,
    noiseFloor: 0.15,
    field: 'TALLOWGATE',
    raDeg: 128.84466,
    decDeg: 5.25013,
    notes: 'z ≈ 9: Hα beyond the red edge, mass from broad Hβ and λL5100',
  },
];

/** The truths of the three new objects. */
export function newObjectTruths(): DemoTruth[] {
  const r = RV15_AGN_LOCAL;
  return SPECS.map((s) => ({
    ...s,
    logMbhVirial: s.logMbh,
    deltaLogMbhLocal: s.logMbh - (r.alpha + r.beta * (s.logMstar - Math.log10(r.mstarPivotMsun))),
  }));
}

/** The rows of the three new objects (noise-free values with recorded errors). */
export function newObjectRows(): DemoRow[] {
  const rng = mulberry32(90001);
  return newObjectTruths().map((t) => rowFromTruth(DEMO_MODEL, t, rng, true));
}
