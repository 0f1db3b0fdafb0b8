import { describe, expect, it } from 'vitest';
import { getCosmology } from '../../../src/core/cosmology/getCosmology.ts';
import { DEFAULT_SETTINGS } from '../../../src/core/derive/defaultSettings.ts';
import { createRng } from '../../../src/core/random/createRng.ts';
import { standardNormal } from '../../../src/core/random/standardNormal.ts';
import { CALIBRATIONS } from '../../../src/core/virial/calibrations.ts';
import { virialLogMass } from '../../../src/core/virial/virialCalibration.ts';
import { detectionProbability, forwardObservables, type ForwardRecipe } from '../../../src/core/population/detectionModel.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const cosmo = getCosmology('planck18');
const recipe: ForwardRecipe = { line: 'halpha', calibration: CALIBRATIONS.rv15_halpha, bc5100: 10.33, eddingtonPerMsun: DEFAULT_SETTINGS.eddingtonPerMsun };
const crit = { limit: { kind: 'constant' as const, fluxCgs: 3e-18 }, lamObsRangeAngstrom: [27000, 53000] as const, minFwhmKms: 1000 };
const erdf = { meanLog: -0.6, sigmaLog: 0.4, reference: 'test' };

describe('forwardObservables', () => {
  it('gives back the mass through the calibration: the chain run backwards inverts the forward derivation', () => {
    // The width it makes, put through the calibration with the line luminosity it makes, returns the virial mass.
    const z = 5;
    const dl = cosmo.luminosityDistanceMpc(z);
    const o = forwardObservables(recipe, 7.2, 7.5, -0.3, z, dl);
    const dlCm = dl * 3.0856775814913673e24;
    const logLine = o.logFlux + Math.log10(4 * Math.PI * dlCm * dlCm);
    expectClose(virialLogMass(CALIBRATIONS.rv15_halpha, logLine, o.logFwhm), 7.5, { atol: 1e-12, source: 'closed form: inverse of the calibration' });
  });
});

describe('detectionProbability', () => {
  it('equals the detected fraction of a brute-force simulation of the same chain', () => {
    // Monte Carlo: draw λ and the calibration scatter, make flux and width, count detections. 40,000 draws per mass:
    // binomial standard error ≤ 0.0025; tolerance 4σ = 0.01.
    const rng = createRng(99);
    const z = 5.5;
    const dl = cosmo.luminosityDistanceMpc(z);
    for (const m of [5.5, 6.2, 7, 8]) {
      let hit = 0;
      const n = 40000;
      for (let i = 0; i < n; i++) {
        const l = erdf.meanLog + erdf.sigmaLog * standardNormal(rng);
        const u = m + recipe.calibration.scatterDex * standardNormal(rng);
        const o = forwardObservables(recipe, m, u, l, z, dl);
        if (o.logFlux >= Math.log10(3e-18) && o.logFwhm >= 3) hit++;
      }
      expectClose(detectionProbability(cosmo, recipe, crit, erdf, m, z), hit / n, { atol: 0.01, source: 'seeded Monte Carlo of the same chain, 40,000 draws' });
    }
  });

  it('is zero where the line is outside the spectrograph', () => {
    expect(detectionProbability(cosmo, recipe, crit, erdf, 9, 8)).toBe(0);
  });
});
