import { describe, it, expect } from 'vitest';
import { eddingtonAccretionRateMsunYr } from '../../../src/core/eddington/eddingtonAccretionRate.ts';
import { L_EDD_PER_MSUN_COMPUTED, T_EDD_GYR } from '../../../src/core/constants/eddington.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('Eddington accretion rate', () => {
  it('equals M / (ε t_Edd) when L_Edd uses the same constants as t_Edd', () => {
    // L_Edd = M c² / t_Edd, so Ṁ = L_Edd/(ε c²) = M/(ε t_Edd): an identity, computed with T_EDD_GYR.
    expectClose(eddingtonAccretionRateMsunYr(1e8, 0.1, L_EDD_PER_MSUN_COMPUTED), 1e8 / (0.1 * T_EDD_GYR * 1e9), {
      rtol: 1e-12, source: 'identity Ṁ_Edd = M/(ε t_Edd)',
    });
  });

  it('is about 2.2 M_sun/yr for 1e8 M_sun at ε = 0.1', () => {
    // Common practice, no source: "about 2 M_sun/yr per 1e8 M_sun"; 1.26e38 gives 2.22 (computed); rtol 0.01.
    expectClose(eddingtonAccretionRateMsunYr(1e8, 0.1), 2.2249, { rtol: 0.01, source: 'computed from 1.26e38/(0.1 c²)' });
  });

  it('scales linearly with mass and inversely with efficiency', () => {
    const r = eddingtonAccretionRateMsunYr(1e6, 0.1);
    expectClose(eddingtonAccretionRateMsunYr(3e6, 0.1), 3 * r, { rtol: 1e-12, source: 'definition' });
    expectClose(eddingtonAccretionRateMsunYr(1e6, 0.2), r / 2, { rtol: 1e-12, source: 'definition' });
  });

  it('rejects an efficiency outside (0, 1)', () => {
    expect(() => eddingtonAccretionRateMsunYr(1e8, 0)).toThrow(/radiative efficiency must be in \(0, 1\), got 0/);
    expect(() => eddingtonAccretionRateMsunYr(1e8, 1)).toThrow(RangeError);
  });
});
