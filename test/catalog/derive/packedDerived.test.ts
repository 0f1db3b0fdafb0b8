import { describe, expect, it } from 'vitest';
import { allocatePacked, PACKED_FIELDS, PACKED_WIDTH, packInto, packedField, packedValue } from '../../../src/catalog/derive/packedDerived.ts';
import type { DerivedObject } from '../../../src/core/derive/types.ts';

const derived: DerivedObject = {
  ageGyr: 1.1,
  dlMpc: 50000,
  logLum: { halpha: 42.5, civ: 43.25 },
  logL5100: 44,
  logMbh: 7.5,
  mbhMethod: 'halpha:rv15_halpha',
  logLbol: 45,
  lbolMethod: 'bc5100',
  logEddRatio: -0.6,
  pSuperEddington: 0.1,
  logMseed: 2.5,
  lambdaReqLight: 0.9,
  lambdaReqHeavy: 0.5,
  deltaLogMbhLocal: 1.2,
  localOffsetSigma: 2.1,
  pAboveLocal: 0.97,
  pct: {
    logMbh: { p16: 7.1, p50: 7.5, p84: 7.9 },
    logLbol: null,
    logEddRatio: { p16: -1, p50: -0.6, p84: -0.2 },
    logMseed: null,
    deltaLogMbhLocal: { p16: 0.8, p50: 1.2, p84: 1.6 },
  },
  isLimit: { logMbh: false, logLbol: true, logEddRatio: true, logMseed: false, lambdaReq: false, deltaLogMbhLocal: false },
  flags: ['no_host_mass', 'calibration_out_of_range'],
};

describe('packed derived results', () => {
  it('have one distinct slot per numeric field', () => {
    expect(new Set(PACKED_FIELDS).size).toBe(PACKED_WIDTH);
  });

  it('read back every value written, NaN for null and absent, and join the flags', () => {
    const p = allocatePacked(3);
    packInto(p, 1, derived);
    expect(packedValue(p, 1, 'ageGyr')).toBe(1.1);
    expect(packedValue(p, 1, 'logLum.civ')).toBe(43.25);
    expect(packedValue(p, 1, 'logLum.hbeta')).toBeNaN();
    expect(packedValue(p, 1, 'pAboveLocal')).toBe(0.97);
    expect(packedValue(p, 1, 'pct.logEddRatio.p84')).toBe(-0.2);
    expect(packedValue(p, 1, 'pct.logLbol.p50')).toBeNaN();
    expect(packedValue(p, 1, 'pct.deltaLogMbhLocal.p16')).toBe(0.8);
    expect(p.mbhMethod[1]).toBe('halpha:rv15_halpha');
    expect(p.flags[1]).toBe('no_host_mass,calibration_out_of_range');
    expect(packedValue(p, 0, 'logMbh')).toBeNaN();
    expect(packedValue(p, 2, 'ageGyr')).toBeNaN();
    expect(p.flags[0]).toBe('');
  });

  it('give, through a reader made for one field, what packedValue gives for every field and record', () => {
    const p = allocatePacked(3);
    packInto(p, 1, derived);
    packInto(p, 2, { ...derived, ageGyr: 0.5, logMbh: 6.5 });
    for (const f of PACKED_FIELDS) {
      const read = packedField(f);
      for (let i = 0; i < 3; i++) expect(Object.is(read(p, i), packedValue(p, i, f)), `${f}, record ${i}`).toBe(true);
    }
    expect(packedField('ageGyr')(p, 2)).toBe(0.5);
    expect(() => packedField('nope' as never)).toThrow('no packed field nope');
  });

  it('pack which quantities are bounds as 1 and the others as 0', () => {
    const p = allocatePacked(1);
    packInto(p, 0, derived);
    expect(packedValue(p, 0, 'isLimit.logLbol')).toBe(1);
    expect(packedValue(p, 0, 'isLimit.logEddRatio')).toBe(1);
    expect(packedValue(p, 0, 'isLimit.logMbh')).toBe(0);
  });
});
