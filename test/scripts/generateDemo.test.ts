import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import {
  DEMO_DEFAULTS,
  DEMO_MODEL,
  generateDemoCatalog,
  headerComments,
  iterateDemoObjects,
  newObjectRows,
  toCsv,
  type DemoRow,
} from '../../scripts/generate-demo.ts';
import { newObjectTruths } from '../../scripts/lib/demoNewObjects.ts';
import { luminosityFromFlux } from '../../scripts/lib/demoCosmology.ts';
import { expectClose } from '../helpers/expectClose.ts';

const dataDemo = (name: string): string => fileURLToPath(new URL(`../../data-demo/${name}`, import.meta.url));

/** Binomial tolerance: 4σ of a fraction p over n rows, so a correct generator fails about once in 15 000 runs. */
const fourSigma = (p: number, n: number): number => 4 * Math.sqrt((p * (1 - p)) / n);
const fraction = (rows: DemoRow[], test: (r: DemoRow) => boolean): number => rows.filter(test).length / rows.length;

// Independent re-implementations of the published mass formulas (not the generator's inverses).
// Reines & Volonteri 2015 Hα (published-checks.md): log M = log 1.075 + 6.57 + 0.47 log(L/1e42) + 2.06 log(FWHM/1e3).
const rv15Halpha = (lHalpha: number, fwhm: number): number => Math.log10(1.075) + 6.57 + 0.47 * Math.log10(lHalpha / 1e42) + 2.06 * Math.log10(fwhm / 1e3);
// Vestergaard & Peterson 2006 Hβ (published-checks.md): log M = 6.91 + 0.5 log(λL5100/1e44) + 2 log(FWHM/1e3).
const vp06Hbeta = (l5100: number, fwhm: number): number => 6.91 + 0.5 * Math.log10(l5100 / 1e44) + 2 * Math.log10(fwhm / 1e3);
// Shen et al. 2011 Mg II (published-checks.md): log M = 6.74 + 0.62 log(λL3000/1e44) + 2 log(FWHM/1e3).
const s11Mgii = (l3000: number, fwhm: number): number => 6.74 + 0.62 * Math.log10(l3000 / 1e44) + 2 * Math.log10(fwhm / 1e3);
// Calzetti et al. 2000 k(Hα) = 3.3259, k(Hβ) = 4.5978; case B Hα/Hβ = 2.86 (published-checks.md, computed at air wavelengths).
const K_HA = 3.3259;
const K_HB = 4.5978;
const dustCorrection = (decrement: number | null): number => {
  if (decrement === null) return 1;
  const ebv = (2.5 / (K_HB - K_HA)) * Math.log10(decrement / 2.86);
  return 10 ** (0.4 * K_HA * ebv);
};
// RV15 local AGN relation (published-checks.md): log M = 7.45 + 1.05 log(M*/1e11).
const rv15Local = (logMstar: number): number => 7.45 + 1.05 * (logMstar - 11);

describe('generateDemoCatalog', () => {
  it('gives the same rows twice for the same seed and different rows for another seed', () => {
    const a = generateDemoCatalog({ n: 300, seed: 11 });
    expect(generateDemoCatalog({ n: 300, seed: 11 })).toEqual(a);
    const b = generateDemoCatalog({ n: 300, seed: 12 });
    const sameZ = a.filter((r, i) => r.z === b[i]?.z).length;
    // Redshifts carry 4 decimals over z 4–11: two independent draws agree rarely (common practice, no source).
    expect(sameZ).toBeLessThan(5);
  });

  it('produces the requested number of rows, and row k does not depend on n', () => {
    for (const n of [0, 1, 37, 400]) expect(generateDemoCatalog({ n, seed: 3 })).toHaveLength(n);
    const small = generateDemoCatalog({ n: 37, seed: 3 });
    expect(generateDemoCatalog({ n: 400, seed: 3 }).slice(0, 37)).toEqual(small);
  });

  it('rejects a non-integer n or seed with a message naming it', () => {
    expect(() => generateDemoCatalog({ n: 2.5, seed: 1 })).toThrow(/n must be a non-negative integer, got 2.5/);
    expect(() => generateDemoCatalog({ n: 10, seed: 0.5 })).toThrow(/seed must be an integer, got 0.5/);
  });

  describe('on 4000 rows', () => {
    const n = 4000;
    const rows = generateDemoCatalog({ n, seed: 2024 });
    const f = DEMO_MODEL.fractions;

    it('has about 10 % Hα flux upper limits, each a limit without an error', () => {
      // Target from the brief (common practice, no source); 4σ binomial tolerance for n.
      const limits = rows.filter((r) => r.flux_halpha_is_limit === true);
      expect(Math.abs(limits.length / n - f.limit)).toBeLessThan(fourSigma(f.limit, n));
      for (const r of limits) {
        expect(r.flux_halpha_err).toBeNull();
        expect(r.flux_halpha).toBeGreaterThan(0);
      }
    });

    it('has about 20 % of objects without a host mass', () => {
      // Target from the brief (common practice, no source); 4σ binomial tolerance for n.
      const noHost = fraction(rows, (r) => r.log_mstar === null);
      expect(Math.abs(noHost - f.noHost)).toBeLessThan(fourSigma(f.noHost, n));
    });

    it('has about 8 % lensed objects with μ between 1.5 and about 10 and an error', () => {
      // Target from the brief (common practice, no source); 4σ binomial tolerance for n.
      const lensed = rows.filter((r) => r.mu !== null);
      expect(Math.abs(lensed.length / n - f.lensed)).toBeLessThan(fourSigma(f.lensed, n));
      for (const r of lensed) {
        // μ is drawn in 1.5–10; the written value carries 10–30 % noise and is kept ≥ 1.05.
        expect(r.mu!).toBeGreaterThanOrEqual(1.05);
        expect(r.mu!).toBeLessThan(20);
        expect(r.mu_err).toBeGreaterThan(0);
        expect(r.field).toBe('HEARTHSTONE-CL');
      }
    });

    it('has about 15 % broad Balmer decrements, only where Hα and Hβ are both measured', () => {
      // Target from the brief (common practice, no source); 4σ binomial tolerance for n.
      const withDecrement = rows.filter((r) => r.balmer_decrement !== null);
      expect(Math.abs(withDecrement.length / n - f.balmer)).toBeLessThan(fourSigma(f.balmer, n));
      for (const r of withDecrement) {
        expect(r.flux_halpha_is_limit).toBe(false);
        expect(r.flux_hbeta).not.toBeNull();
        expect(r.z).toBeLessThanOrEqual(7);
      }
    });

    it('measures Hα to z = 7, Hβ with λL5100 to z = 9.8 and Mg II with λL3000 above', () => {
      // Coverage of the invented 0.9–5.3 µm spectrograph (documented in demoPopulation.ts).
      for (const r of rows) {
        const line = r.fwhm_halpha !== null ? 'halpha' : r.fwhm_hbeta !== null && r.lam_l_5100 !== null ? 'hbeta' : 'mgii';
        if (r.z <= 7) expect(line, r.id).toBe('halpha');
        else if (r.z <= 9.8) expect(line, r.id).toBe('hbeta');
        else expect([line, r.fwhm_mgii !== null, r.lam_l_3000 !== null], r.id).toEqual(['mgii', true, true]);
        if (r.z > 7) expect(r.flux_halpha, r.id).toBeNull();
      }
      expect(Math.min(...rows.map((r) => r.z))).toBeGreaterThanOrEqual(4);
      expect(Math.max(...rows.map((r) => r.z))).toBeGreaterThan(9.8);
      expect(Math.max(...rows.map((r) => r.z))).toBeLessThanOrEqual(11);
      // About 12 % above z = 7 (model parameter); 4σ binomial tolerance.
      const tail = DEMO_MODEL.redshift.tailFraction;
      expect(Math.abs(fraction(rows, (r) => r.z > 7) - tail)).toBeLessThan(fourSigma(tail, n));
    });

    it('keeps detected broad Hα fluxes in the range of deep near-infrared spectroscopy', () => {
      // Typical broad Hα fluxes 1e-18 to 1e-16 erg/s/cm2 (the brief; common practice, no source).
      const fluxes = rows.filter((r) => r.flux_halpha_is_limit === false).map((r) => r.flux_halpha!).sort((a, b) => a - b);
      const median = fluxes[Math.floor(fluxes.length / 2)]!;
      expect(median).toBeGreaterThan(1);
      expect(median).toBeLessThan(100);
      expect(fluxes[Math.floor(fluxes.length * 0.95)]!).toBeLessThan(300);
    });

    it('gives every row a unique id of the form CDW-#####', () => {
      const ids = rows.map((r) => r.id);
      expect(new Set(ids).size).toBe(n);
      for (const id of ids) expect(id).toMatch(/^CDW-\d{5,}$/);
    });
  });

  describe('noise-free, on 2000 rows', () => {
    const objects = [...iterateDemoObjects({ n: 2000, seed: 77, noiseFree: true })];

    // Tolerance: the written values are rounded (FWHM to 1 km/s at ≥ ~700 km/s: ≤ 7e-4 × 2.06/2.3 dex;
    // fluxes and λL to 4 digits: ≤ 1e-4 dex; μ to 1e-3: ≤ 2e-4 dex; decrement to 1e-3: ≤ 1e-4 dex), and
    // the test's k values are at air wavelengths while the generator's are vacuum (≤ 2e-4 dex):
    // together under 1.5e-3 dex.
    const TOL_DEX = 1.5e-3;

    it('derives back to the model’s virial mass with the RV15, VP06 and S11 calibrations', () => {
      const checked = { halpha: 0, hbeta: 0, mgii: 0 };
      for (const { row, truth } of objects) {
        const mu = row.mu ?? 1;
        let logM: number;
        if (row.fwhm_halpha !== null && row.flux_halpha_is_limit === false) {
          const lHalpha = (luminosityFromFlux(row.flux_halpha! * 1e-18, row.z) / mu) * dustCorrection(row.balmer_decrement);
          logM = rv15Halpha(lHalpha, row.fwhm_halpha);
          checked.halpha++;
        } else if (row.lam_l_5100 !== null) {
          logM = vp06Hbeta(row.lam_l_5100 / mu, row.fwhm_hbeta!);
          checked.hbeta++;
        } else if (row.lam_l_3000 !== null) {
          logM = s11Mgii(row.lam_l_3000 / mu, row.fwhm_mgii!);
          checked.mgii++;
        } else continue; // flux limits: the mass is an upper limit, checked below
        // The widths encode the virial mass (the true mass plus the calibration's scatter), which is what a derivation recovers.
        expectClose(logM, truth.logMbhVirial, { atol: TOL_DEX, source: `internal regression: model virial mass of ${row.id}` });
      }
      expect(checked.halpha).toBeGreaterThan(1000);
      expect(checked.hbeta).toBeGreaterThan(50);
      expect(checked.mgii).toBeGreaterThan(3);
    });

    it('writes flux limits above the true flux, so their RV15 masses are upper limits', () => {
      const limits = objects.filter((o) => o.row.flux_halpha_is_limit === true);
      expect(limits.length).toBeGreaterThan(100);
      for (const { row, truth } of limits) {
        const lLimit = luminosityFromFlux(row.flux_halpha! * 1e-18, row.z) / (row.mu ?? 1);
        expect(rv15Halpha(lLimit, row.fwhm_halpha!), row.id).toBeGreaterThan(truth.logMbhVirial);
      }
    });

    it('puts the detected black holes above the intrinsic relation, which lies 0.5 dex above the RV15 local one', () => {
      // The intrinsic relation (DEMO_MODEL.truth) is 6.9 + 1.05 (log M* − 10); RV15 at log M* = 10 is 6.40 (published-checks.md).
      const t = DEMO_MODEL.truth;
      expectClose(t.alpha - rv15Local(10), 0.5, { atol: 0.01, source: 'the demo truth against RV15 eq. (published-checks.md)' });
      // A flux-limited survey finds the black holes above the relation at a given host mass (selection bias): the mean
      // residual of the detected ones is positive, several standard errors (0.5/√1600 ≈ 0.013 dex) above zero.
      const residuals = objects.filter((o) => o.row.log_mstar !== null).map((o) => o.truth.logMbh - (t.alpha + t.beta * (o.truth.logMstar - t.pivotLogMstar)));
      const mean = residuals.reduce((a, b) => a + b, 0) / residuals.length;
      expect(mean).toBeGreaterThan(0.1);
      // Relative to the local relation they sit about a dex above, as the published samples do (common practice, no source).
      const offsets = objects.filter((o) => o.row.log_mstar !== null).map((o) => o.truth.deltaLogMbhLocal);
      const meanOffset = offsets.reduce((a, b) => a + b, 0) / offsets.length;
      expect(meanOffset).toBeGreaterThan(0.6);
      expect(meanOffset).toBeLessThan(1.6);
    });

    it('has the same objects as the noisy catalog, only without noise', () => {
      const noisy = [...iterateDemoObjects({ n: 50, seed: 77 })];
      for (let i = 0; i < noisy.length; i++) {
        expect(noisy[i]!.truth).toEqual(objects[i]!.truth);
        expect(noisy[i]!.row.id).toBe(objects[i]!.row.id);
      }
    });
  });
});

describe('toCsv', () => {
  it('quotes fields with commas or quotes, leaves nulls empty and writes comments on top', () => {
    const [row] = generateDemoCatalog({ n: 1, seed: 1 });
    const csv = toCsv([{ ...row!, notes: 'pair, "a" and "b"', log_mstar: null }], { comments: ['invented'] });
    const lines = csv.split('\n');
    expect(lines[0]).toBe('# invented');
    expect(lines[1]!.startsWith('id,z,fwhm_halpha,')).toBe(true);
    expect(lines[2]!.endsWith(',"pair, ""a"" and ""b"""')).toBe(true);
    const header = lines[1]!.split(',');
    const cells = lines[2]!.split(',');
    expect(cells[header.indexOf('log_mstar')]).toBe('');
  });
});

describe('committed demo files', () => {
  it('data-demo/catalog.csv is what the generator writes with the default n and seed', () => {
    // Internal regression: fails when the model changes and the data was not regenerated
    // (run `npx tsx scripts/generate-demo.ts`).
    const { n, seed } = DEMO_DEFAULTS;
    const expected = toCsv(generateDemoCatalog({ n, seed }), { comments: headerComments(n, seed, false) });
    expect(readFileSync(dataDemo('catalog.csv'), 'utf8')).toBe(expected);
  });

  it('data-demo/new-objects.csv holds an ordinary, an extreme and a z ≈ 9 Hβ-only object', () => {
    const text = readFileSync(dataDemo('new-objects.csv'), 'utf8');
    const rows = newObjectRows();
    for (const r of rows) expect(text).toContain(`\n${r.id},${r.z},`);
    const [ordinary, extreme, highZ] = newObjectTruths();
    expect(ordinary!.logEddRatio).toBeLessThan(0);
    expect(extreme!.logEddRatio).toBeGreaterThan(0); // super-Eddington
    expect(extreme!.deltaLogMbhLocal).toBeGreaterThan(2.5); // very over-massive
    expect(highZ!.z).toBeGreaterThan(8.5);
    expect(rows[2]!.fwhm_halpha).toBeNull();
    expect(rows[2]!.fwhm_hbeta).not.toBeNull();
    expect(rows[2]!.lam_l_5100).not.toBeNull();
  });
});
