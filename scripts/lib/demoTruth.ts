/**
 * Draws the true properties of one invented object (steps 1–10 of the model described in
 * demoPopulation.ts) and turns them into a catalog row.
 */
import type { DemoModel } from './demoPopulation.ts';
import type { DemoRow } from './demoRow.ts';
import {
  type Rng,
  logUniform,
  mulberry32,
  pickWeighted,
  rowSeed,
  standardNormal,
  truncatedExponential,
  truncatedNormal,
  uniform,
} from './demoRandom.ts';
import { fwhmForMass, intrinsicLuminosities, logMstarForOffset, observeLines } from './demoPhysics.ts';
import { RV15_AGN_LOCAL } from './demoRelations.ts';
import { DEMO_FIELDS, DEMO_PROGRAMS, DEMO_SURVEY } from './demoNames.ts';
import { pickNote } from './demoNotes.ts';
import { rowFromTruth } from './demoObserve.ts';

/** The model's true values for one object. */
export interface DemoTruth {
  id: string;
  /** Redshift, rounded to 1e-4 (as written). */
  z: number;
  /** Line the mass is measured from: Hα at z ≤ 7, Hβ to z = 9.8, Mg II above. */
  branch: 'halpha' | 'hbeta' | 'mgii';
  logMbh: number;
  logEddRatio: number;
  /** log10 M*, M_sun (rounded to 0.01, as written). */
  logMstar: number;
  /** log M_BH minus the RV15 local relation at logMstar, dex. */
  deltaLogMbhLocal: number;
  lensed: boolean;
  /** Magnification (1 when not lensed), rounded to 1e-3 (as written). */
  mu: number;
  /** Colour excess of the broad lines, mag (0 when dust-free). */
  ebv: number;
  hasHost: boolean;
  isLimit: boolean;
  hasBalmer: boolean;
  hasHbetaFwhm: boolean;
  /** Line-flux noise floor σ₀, in the written flux unit (1e-18 cgs). */
  noiseFloor: number;
  field: string;
  raDeg: number;
  decDeg: number;
  program: string;
  notes: string;
}

/** A catalog row together with the truth it was made from. */
export interface DemoObject {
  truth: DemoTruth;
  row: DemoRow;
}

const round = (x: number, decimals: number): number => Number(x.toFixed(decimals));

function drawRedshift(rng: Rng, m: DemoModel['redshift']): number {
  if (rng() >= m.tailFraction) return truncatedNormal(rng, m.bulkMean, m.bulkSd, m.min, m.bulkMax);
  // The tail starts just above the Hα edge: z = bulkMax exactly stays on the Hα branch.
  return m.bulkMax + 1e-4 + truncatedExponential(rng, m.tailScale, m.max - m.bulkMax - 1e-4);
}

function drawLogEddRatio(rng: Rng, m: DemoModel['logEddRatio']): number {
  const superEdd = rng() < m.superFraction;
  const [mean, sd] = superEdd ? [m.superMean, m.superSd] : [m.mean, m.sd];
  return truncatedNormal(rng, mean, sd, m.min, m.max);
}

/**
 * Draws the true properties of object `index` of a catalog.
 * @param model population parameters
 * @param rng the row's generator
 * @param index row index (sets the id)
 */
export function drawTruth(model: DemoModel, rng: Rng, index: number): DemoTruth {
  const f = model.fractions;
  const tail = model.redshift.tailFraction;
  const idNumber = index * model.idStep + 1 + Math.floor(rng() * model.idStep);
  const id = `${DEMO_SURVEY.idPrefix}-${String(idNumber).padStart(5, '0')}`;

  const z = round(drawRedshift(rng, model.redshift), 4);
  const branch = z <= model.redshift.bulkMax ? 'halpha' : z <= model.redshift.hbetaMax ? 'hbeta' : 'mgii';
  // Conditional probabilities chosen so that the catalog-wide fractions equal the targets.
  const lensed = rng() < f.lensed;
  const hasHost = rng() >= f.noHost;
  const isLimit = branch === 'halpha' && rng() < f.limit / (1 - tail);
  const hasBalmer = branch === 'halpha' && !isLimit && rng() < f.balmer / (1 - tail - f.limit);
  const hasHbetaFwhm = hasBalmer && rng() < f.hbetaFwhmAmongBalmer;

  const fieldIndex = lensed ? DEMO_FIELDS.findIndex((x) => x.lensingCluster) : pickWeighted(rng, DEMO_FIELDS.map((x) => x.weight));
  const field = DEMO_FIELDS[fieldIndex] ?? DEMO_FIELDS[0]!;
  const decDeg = round(field.decDeg + uniform(rng, -1, 1) * field.halfSideDeg, 6);
  const raDeg = round(field.raDeg + (uniform(rng, -1, 1) * field.halfSideDeg) / Math.cos((field.decDeg * Math.PI) / 180), 6);
  const program = lensed ? DEMO_PROGRAMS.lens : rng() < 0.6 ? DEMO_PROGRAMS.deep : DEMO_PROGRAMS.wide;

  const mu = lensed ? round(logUniform(rng, model.lensing.muMin, model.lensing.muMax), 3) : 1;
  const d = model.dust;
  const ebv = hasBalmer ? Math.min(d.ebvMax, d.ebvMin + Math.abs(d.ebvScale * standardNormal(rng))) : 0;
  const det = model.detection;
  const noiseFloor = uniform(rng, det.noiseFloorMin, det.noiseFloorMax);

  // Selection: redraw (M_BH, λ) until the detection line is seen (or, for limits, is not).
  let logMbh = 0;
  let logEddRatio = 0;
  for (let tries = 0; tries < det.maxRedraws; tries++) {
    logMbh = truncatedNormal(rng, model.logMbh.mean, model.logMbh.sd, model.logMbh.min, model.logMbh.max);
    logEddRatio = drawLogEddRatio(rng, model.logEddRatio);
    const lum = intrinsicLuminosities(logMbh, logEddRatio);
    const obs = observeLines(lum, z, mu, ebv);
    const flux = (branch === 'halpha' ? obs.fluxHalphaCgs : obs.fluxHbetaCgs) / model.fluxUnitCgs;
    const fwhm = fwhmForMass(branch, logMbh, lum);
    // Mg II objects have no modelled line flux: their continuum must be bright enough instead.
    const seen =
      branch === 'mgii'
        ? obs.lamL3000ErgS >= det.lamL3000Min
        : flux >= det.snrMin * noiseFloor && flux <= det.fluxMax;
    const hbetaSeen = !hasBalmer || obs.fluxHbetaCgs / model.fluxUnitCgs >= det.snrMin * noiseFloor;
    const accepted = isLimit ? flux < det.limitSigma * noiseFloor : seen && hbetaSeen;
    if (accepted && fwhm >= det.fwhmMinKms) break;
  }

  const h = model.hostOffset;
  const r = RV15_AGN_LOCAL;
  // δ bounds that keep log M* inside [logMstarMin, logMstarMax].
  const deltaLo = logMbh - r.alpha - r.beta * (h.logMstarMax - Math.log10(r.mstarPivotMsun));
  const deltaHi = logMbh - r.alpha - r.beta * (h.logMstarMin - Math.log10(r.mstarPivotMsun));
  const delta = truncatedNormal(rng, h.mean, h.sd, deltaLo, deltaHi);
  const logMstar = round(logMstarForOffset(logMbh, delta), 2);
  const deltaLogMbhLocal = logMbh - (r.alpha + r.beta * (logMstar - Math.log10(r.mstarPivotMsun)));

  const truth: DemoTruth = {
    id, z, branch, logMbh, logEddRatio, logMstar, deltaLogMbhLocal, lensed, mu, ebv,
    hasHost, isLimit, hasBalmer, hasHbetaFwhm, noiseFloor, field: field.name, raDeg, decDeg, program, notes: '',
  };
  truth.notes = pickNote(rng, truth);
  return truth;
}

/**
 * Object `index` of the catalog with seed `seed`: its truth and its row.
 * @param noiseFree write the true values instead of noisy measurements
 */
export function drawDemoObject(model: DemoModel, seed: number, index: number, noiseFree: boolean): DemoObject {
  const rng = mulberry32(rowSeed(seed, index));
  const truth = drawTruth(model, rng, index);
  return { truth, row: rowFromTruth(model, truth, rng, noiseFree) };
}
