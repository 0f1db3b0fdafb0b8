/**
 * Turns an invented object's truth into the catalog row a survey would publish: measured
 * values with recorded 1σ errors (step 11 of the model in demoPopulation.ts), rounded to the
 * digits a catalog would print.
 */
import type { DemoModel } from './demoPopulation.ts';
import type { DemoTruth } from './demoTruth.ts';
import { type DemoRow, emptyRow } from './demoRow.ts';
import { type Rng, standardNormal, uniform } from './demoRandom.ts';
import { fwhmForMass, fwhmHbetaFromHalpha, intrinsicLuminosities, observeLines } from './demoPhysics.ts';

const sig = (x: number, digits: number): number => Number(x.toPrecision(digits));
const dec = (x: number, decimals: number): number => Number(x.toFixed(decimals));

/**
 * Builds the row of one object.
 * @param rng the row's generator; the same number of deviates is drawn with or without
 *   noise, so a noise-free catalog has the same objects as the noisy one
 * @param noiseFree write the true values (errors are still recorded)
 */
export function rowFromTruth(model: DemoModel, truth: DemoTruth, rng: Rng, noiseFree: boolean): DemoRow {
  const nz = Array.from({ length: 7 }, () => standardNormal(rng));
  const uz = Array.from({ length: 4 }, () => rng());
  const dev = (i: number): number => (noiseFree ? 0 : nz[i] ?? 0);
  // Measured = truth + error × N(0,1); the floor keeps a rare 5σ low draw positive.
  const measure = (value: number, err: number, i: number): number => Math.max(0.1 * value, value + err * dev(i));

  const { noise, fluxUnitCgs: unit } = model;
  const row = emptyRow(truth.id, truth.z);
  row.ra = truth.raDeg;
  row.dec = truth.decDeg;
  row.field = truth.field;
  row.spec_program = truth.program;
  row.notes = truth.notes;

  const lum = intrinsicLuminosities(truth.logMbh, truth.logEddRatio);
  const obs = observeLines(lum, truth.z, truth.mu, truth.ebv);
  const fluxErr = (f: number): number => Math.hypot(truth.noiseFloor, noise.fluxRel * f);
  const fwhmErr = (w: number, snr: number): number => w * (noise.fwhmRelBase + noise.fwhmSnrCoeff / snr);
  const setFwhm = (w: number, snr: number, i: number): [number, number] => {
    const err = fwhmErr(w, snr);
    return [Math.round(measure(w, err, i)), Math.max(1, Math.round(err))];
  };

  if (truth.branch === 'halpha') {
    const w = fwhmForMass('halpha', truth.logMbhVirial, lum);
    const f = obs.fluxHalphaCgs / unit;
    if (truth.isLimit) {
      row.flux_halpha = sig(model.detection.limitSigma * truth.noiseFloor, 4);
      row.flux_halpha_is_limit = true;
      [row.fwhm_halpha, row.fwhm_halpha_err] = setFwhm(w, model.detection.limitSigma, 1);
    } else {
      const fErr = fluxErr(f);
      const fMeas = measure(f, fErr, 0);
      row.flux_halpha = sig(fMeas, 4);
      row.flux_halpha_err = sig(fErr, 3);
      row.flux_halpha_is_limit = false;
      [row.fwhm_halpha, row.fwhm_halpha_err] = setFwhm(w, f / fErr, 1);
      if (truth.hasBalmer) {
        const fb = obs.fluxHbetaCgs / unit;
        const fbErr = fluxErr(fb);
        const fbMeas = measure(fb, fbErr, 2);
        row.flux_hbeta = sig(fbMeas, 4);
        row.flux_hbeta_err = sig(fbErr, 3);
        const ratio = fMeas / fbMeas;
        row.balmer_decrement = dec(ratio, 3);
        row.balmer_decrement_err = sig(ratio * Math.hypot(fErr / f, fbErr / fb), 3);
        if (truth.hasHbetaFwhm) [row.fwhm_hbeta, row.fwhm_hbeta_err] = setFwhm(fwhmHbetaFromHalpha(w), fb / fbErr, 3);
      }
    }
  } else if (truth.branch === 'hbeta') {
    const w = fwhmForMass('hbeta', truth.logMbhVirial, lum);
    const fb = obs.fluxHbetaCgs / unit;
    const fbErr = fluxErr(fb);
    row.flux_hbeta = sig(measure(fb, fbErr, 2), 4);
    row.flux_hbeta_err = sig(fbErr, 3);
    [row.fwhm_hbeta, row.fwhm_hbeta_err] = setFwhm(w, fb / fbErr, 3);
    const lErr = obs.lamL5100ErgS * uniform(() => uz[0] ?? 0, noise.lamL5100RelMin, noise.lamL5100RelMax);
    row.lam_l_5100 = sig(measure(obs.lamL5100ErgS, lErr, 4), 4);
    row.lam_l_5100_err = sig(lErr, 3);
  } else {
    // Mg II: no line flux in the model; the width error is a plain 10–25 %.
    const w = fwhmForMass('mgii', truth.logMbhVirial, lum);
    const wErr = w * uniform(() => uz[3] ?? 0, noise.mgiiFwhmRelMin, noise.mgiiFwhmRelMax);
    row.fwhm_mgii = Math.round(measure(w, wErr, 3));
    row.fwhm_mgii_err = Math.max(1, Math.round(wErr));
    const lErr = obs.lamL3000ErgS * uniform(() => uz[0] ?? 0, noise.lamL5100RelMin, noise.lamL5100RelMax);
    row.lam_l_3000 = sig(measure(obs.lamL3000ErgS, lErr, 4), 4);
    row.lam_l_3000_err = sig(lErr, 3);
  }

  if (truth.lensed) {
    const muErr = truth.mu * uniform(() => uz[1] ?? 0, model.lensing.relErrMin, model.lensing.relErrMax);
    row.mu = dec(Math.max(1.05, truth.mu + muErr * dev(5)), 3);
    row.mu_err = sig(muErr, 3);
  }
  if (truth.hasHost) {
    const err = dec(uniform(() => uz[2] ?? 0, noise.logMstarErrMin, noise.logMstarErrMax), 2);
    row.log_mstar = dec(truth.logMstar + err * dev(6), 2);
    row.log_mstar_err = err;
  }
  return row;
}
