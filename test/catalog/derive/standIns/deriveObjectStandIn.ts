// TEST STAND-IN for src/core/derive/deriveObject.ts (written last by another engineer): a
// deterministic function of the inputs and the random stream, so the tests can check that the
// run reaches every output column, keeps row order and gives the same bytes on any thread count.
// Not physics: the numbers only need to depend on the inputs and on the object's deviates
// (a random stream, or the DrawBank the batch passes).
import type { DeriveSettings, DerivedObject, ObjectInputs } from '../../../../src/core/derive/types.ts';
import type { Rng } from '../../../../src/core/random/index.ts';
import { isDrawBank, type DrawBank } from '../../../../src/core/random/drawBank.ts';
import { percentiles16_50_84 } from '../../../../src/core/random/index.ts';

export function deriveObject(inputs: ObjectInputs, settings: DeriveSettings, random: Rng | DrawBank): DerivedObject {
  if (inputs.id === 'THROW') throw new Error('stand-in refuses this object');
  const rng = isDrawBank(random) ? random.redraws('stand-in') : random;
  const fwhm = inputs.lines.halpha?.fwhmKms?.value ?? null;
  const logMbh = fwhm === null ? null : 6 + 2 * Math.log10(fwhm / 1000);
  const draws = new Float64Array(settings.draws);
  for (let i = 0; i < draws.length; i++) draws[i] = (logMbh ?? 0) + (rng.next() - 0.5);
  const pct = logMbh === null ? null : percentiles16_50_84(draws);
  return {
    ageGyr: 13.8 / (1 + inputs.z),
    dlMpc: 1000 * inputs.z,
    logLum: fwhm === null ? {} : { halpha: 42 + rng.next() },
    logL5100: null,
    logMbh,
    mbhMethod: logMbh === null ? null : `halpha:${settings.calibrations.halpha}`,
    logLbol: 45,
    lbolMethod: settings.bolometric,
    logEddRatio: logMbh === null ? null : 45 - logMbh - 38.1,
    pSuperEddington: 0.25,
    logMseed: null,
    lambdaReqLight: null,
    lambdaReqHeavy: null,
    deltaLogMbhLocal: null,
    localOffsetSigma: null,
    pAboveLocal: null,
    pct: { logMbh: pct, logLbol: null, logEddRatio: null, logMseed: null, deltaLogMbhLocal: null },
    isLimit: { logMbh: false, logLbol: false, logEddRatio: false, logMseed: false, lambdaReq: false, deltaLogMbhLocal: false },
    flags: logMbh === null ? ['no_mass_line'] : [],
  };
}
