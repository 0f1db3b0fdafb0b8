import { describe, it, expect } from 'vitest';
import { inCalibrationRange, virialLogMass, virialLogMassInto, type VirialCalibration } from '../../../src/core/virial/virialCalibration.ts';
import { CALIBRATIONS } from '../../../src/core/virial/calibrations.ts';
import { createRng } from '../../../src/core/random/index.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const toy: VirialCalibration = {
  id: 'toy', line: 'hbeta', label: 'toy', logEps: 0.1, a: 7, b: 0.5, c: 2, luminosity: 'line', logLpivot: 42,
  scatterDex: 0.3, scatterProvenance: 'common practice', reference: 'none (test fixture)', massScale: 'vp06_f5.5',
  validity: { logL: [41, 43], fwhmKms: [1000, 5000] },
};

describe('virialLogMass and inCalibrationRange', () => {
  it('evaluate logEps + a + b (log L − log Lpivot) + c (log FWHM − 3)', () => {
    expectClose(virialLogMass(toy, 43, Math.log10(2000)), 0.1 + 7 + 0.5 + 2 * Math.log10(2), { atol: 1e-12, source: 'definition' });
  });

  it('accept the range edges and reject points outside in L or FWHM', () => {
    expect(inCalibrationRange(toy, 41, 1000)).toBe(true);
    expect(inCalibrationRange(toy, 43, 5000)).toBe(true);
    expect(inCalibrationRange(toy, 43.01, 2000)).toBe(false);
    expect(inCalibrationRange(toy, 42, 900)).toBe(false);
    expect(inCalibrationRange(toy, NaN, 2000)).toBe(false);
    expect(inCalibrationRange(toy, 40.99, 2000)).toBe(false);
    expect(inCalibrationRange(toy, 42, 5001)).toBe(false);
  });
});

describe('virialLogMassInto', () => {
  it('gives virialLogMass plus the scatter, bit for bit, draw by draw, for every calibration and every length', () => {
    const rng = createRng(5);
    for (const cal of Object.values(CALIBRATIONS)) {
      for (const n of [0, 1, 2, 3, 4, 5, 7, 1000, 1001, 1003]) {
        const logL = Float64Array.from({ length: n }, () => 41 + 3 * rng.next());
        const logFwhm = Float64Array.from({ length: n }, () => 3 + 0.5 * rng.next());
        const scatter = Float64Array.from({ length: n }, () => 0.3 * (rng.next() - 0.5));
        const out = new Float64Array(n);
        virialLogMassInto(cal, logL, logFwhm, scatter, out);
        for (let k = 0; k < n; k++) {
          const want = virialLogMass(cal, logL[k] as number, logFwhm[k] as number) + (scatter[k] as number);
          expect(Object.is(out[k], want), `${cal.id}, n = ${n}, k = ${k}`).toBe(true);
        }
      }
    }
  });
});
