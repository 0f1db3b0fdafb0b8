import { describe, expect, it } from 'vitest';
import { getCosmology } from '../../../src/core/cosmology/getCosmology.ts';
import { DEFAULT_SETTINGS } from '../../../src/core/derive/defaultSettings.ts';
import { createRng } from '../../../src/core/random/createRng.ts';
import { standardNormal } from '../../../src/core/random/standardNormal.ts';
import { CALIBRATIONS } from '../../../src/core/virial/calibrations.ts';
import { virialLogMass } from '../../../src/core/virial/virialCalibration.ts';
import { criteriaMoments, detectionLinear, detectionProbability, forwardObservables, type ForwardRecipe } from '../../../src/core/population/detectionModel.ts';
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

describe('forwardObservables against the published chain', () => {
  // log M_BH = 8, log λ = −1, z = 5: L_bol = 0.1 × 1.26e38 × 1e8 erg/s (Shen et al. 2011's L_Edd), λL5100 = L_bol / 10.33,
  // L(Hα) = 5.25e42 (λL5100/1e44)^1.157 (Greene & Ho 2005 eq. 1), L(Hβ) = 1.425e42 (λL5100/1e44)^1.133 (eq. 2, from
  // memory, as the code's record), D_L = 47677.760421995015 Mpc (astropy 5.2.1 Planck18); the logs computed with numpy
  // 1.24.2 and astropy 5.2.1. Tolerance 1e-12 dex (the same arithmetic in another order).
  const dl = 47677.760421995015;

  it('gives the Hα flux of Greene & Ho 2005 eq. 1 at the luminosity distance', () => {
    const o = forwardObservables(recipe, 8, 8, -1, 5, dl);
    expectClose(o.logFlux, -16.614568696358326, { atol: 1e-12, source: 'closed form, Greene & Ho 2005 eq. 1; computed with numpy 1.24.2 and astropy 5.2.1' });
  });

  it('gives the Hβ flux of Greene & Ho 2005 eq. 2 and the width of Vestergaard & Peterson 2006 eq. 5 on λL5100', () => {
    // VP06 eq. 5: log M = log[(FWHM/1000 km/s)² (λL5100/1e44)^0.5] + 6.91, solved for FWHM at log M_vir = 8.2.
    const hb: ForwardRecipe = { ...recipe, line: 'hbeta', calibration: CALIBRATIONS.vp06_hbeta };
    const o = forwardObservables(hb, 8, 8.2, -1, 5, dl);
    expectClose(o.logFlux, -17.182983620786107, { atol: 1e-12, source: 'closed form, Greene & Ho 2005 eq. 2; computed with numpy 1.24.2 and astropy 5.2.1' });
    expectClose(o.logFwhm, 3.623432444100514, { atol: 1e-12, source: 'closed form, Vestergaard & Peterson 2006 eq. 5; computed with numpy 1.24.2' });
  });

  it('refuses a line or a calibration luminosity the selection model does not cover', () => {
    expect(() => forwardObservables({ ...recipe, line: 'mgii' }, 8, 8, -1, 5, dl)).toThrow('the selection model covers Hα and Hβ detections, not mgii');
    expect(() => forwardObservables({ ...recipe, calibration: CALIBRATIONS.vo09_mgii }, 8, 8, -1, 5, dl)).toThrow('the selection model needs a calibration on the line or λL5100, not vo09_mgii');
  });
});

describe('detectionLinear and criteriaMoments', () => {
  it('reads a tabulated limit at the line\'s observed wavelength', () => {
    // Closed form: at z = 5 Hα is at 6564.61 × 6 = 39387.66 Å, where the table from (20000 Å, 1e-18) to (60000 Å, 5e-18)
    // gives 1e-18 + 4e-18 × 19387.66/40000; a0 is log F(0, 0, 0) − log F_lim, so it differs from a constant
    // 1e-18 limit's by −log10 of the ratio.
    const table = { ...crit, limit: { kind: 'table' as const, lamObsAngstrom: [20000, 60000], fluxCgs: [1e-18, 5e-18] } };
    const flat = { ...crit, limit: { kind: 'constant' as const, fluxCgs: 1e-18 } };
    const ratio = 1 + (4 * (6564.61 * 6 - 20000)) / 40000;
    expectClose(detectionLinear(cosmo, recipe, table, 5).a0 - detectionLinear(cosmo, recipe, flat, 5).a0, -Math.log10(ratio), { atol: 1e-12, source: 'closed form: linear interpolation of the table at λ_rest (1 + z)' });
  });

  it('gives the moments of two linear combinations of correlated normals', () => {
    // Closed form: A = a0 + aM M + aL ℓ, B = b0 + bM M + bU u + bL ℓ with ℓ ~ N(−1, 1) independent of (M, u):
    // E A = 1 − 2 = −1, var A = 1 + 4 = 5; E B = 3 + 10 − 7 = 6, var B = 9 + 25·4 + 2·3·5·0.5 + 49 = 173;
    // cov(A, B) = aM (bM vM + bU cMU) + aL bL σ² = 3 + 2.5 + 14 = 19.5.
    const lin = { possible: true, a0: 0, aM: 1, aL: 2, b0: 0, bM: 3, bU: 5, bL: 7, noWidthCut: false };
    const mo = criteriaMoments(lin, { meanLog: -1, sigmaLog: 1, reference: 'test' }, { mM: 1, mU: 2, vM: 1, vU: 4, cMU: 0.5 });
    expectClose(mo.hA, -1 / Math.sqrt(5), { rtol: 1e-14, source: 'closed form' });
    expectClose(mo.hB, 6 / Math.sqrt(173), { rtol: 1e-14, source: 'closed form' });
    expectClose(mo.rho, 19.5 / Math.sqrt(5 * 173), { rtol: 1e-14, source: 'closed form' });
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
    // Below the window too: 27000 Å is Hα at z = 3.113.
    expect(detectionProbability(cosmo, recipe, crit, erdf, 9, 3)).toBe(0);
  });
});
