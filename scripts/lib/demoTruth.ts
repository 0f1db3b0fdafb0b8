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
import { fwhmForMass, intrinsicLuminosities, observeLines } from './demoPhysics.ts';
import { drawIntrinsic, type IntrinsicDraw } from './demoHosts.ts';
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
  /** True black-hole mass (log M_sun), about the intrinsic relation. */
  logMbh: number;
  /** The mass the line's virial calibration gives from the noise-free width and luminosity: logMbh plus the calibration's scatter. */
  logMbhVirial: number;
  logEddRatio: number;
  /** True log10 M*, M_sun (rounded to 0.01; the catalog writes it with a measurement error). */
  logMstar: number;
  /** True log M_BH minus the RV15 local relation at logMstar, dex. */
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

  // Selection: redraw the intrinsic object (host, black hole, Eddington ratio, virial mass) at this redshift until
  // the survey would detect it (or, for limits, would not): a draw from the population conditioned on detection.
  let draw: IntrinsicDraw | null = null;
  for (let tries = 0; tries < det.maxRedraws && draw === null; tries++) {
    const d = drawIntrinsic(rng, model, z, branch);
    const lum = intrinsicLuminosities(d.logMbh, d.logEddRatio);
    const obs = observeLines(lum, z, mu, ebv);
    const flux = (branch === 'halpha' ? obs.fluxHalphaCgs : obs.fluxHbetaCgs) / model.fluxUnitCgs;
    const fwhm = fwhmForMass(branch, d.logMbhVirial, lum);
    // Mg II objects have no modelled line flux: their continuum must be bright enough instead.
    const seen = branch === 'mgii' ? obs.lamL3000ErgS >= det.lamL3000Min : flux >= det.surveyLimit;
    const hbetaSeen = !hasBalmer || obs.fluxHbetaCgs / model.fluxUnitCgs >= det.snrMin * noiseFloor;
    const accepted = isLimit ? flux < det.limitSigma * noiseFloor : seen && hbetaSeen;
    if (accepted && fwhm >= det.fwhmMinKms) draw = d;
  }
  if (draw === null) throw new Error(`generate-demo: no detectable object at z = ${z} (${branch}) in ${det.maxRedraws} draws`);
  const { logMbh, logEddRatio, logMbhVirial } = draw;
  const r = RV15_AGN_LOCAL;
  const logMstar = round(draw.logMstar, 2);
  const deltaLogMbhLocal = logMbh - (r.alpha + r.beta * (logMstar - Math.log10(r.mstarPivotMsun)));

  const truth: DemoTruth = {
    id, z, branch, logMbh, logMbhVirial, logEddRatio, logMstar, deltaLogMbhLocal, lensed, mu, ebv,
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
