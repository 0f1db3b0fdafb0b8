import { describe, expect, it } from 'vitest';
import { expectClose } from '../../helpers/expectClose.ts';
import {
  EDDINGTON_CONSTANTS,
  L_EDD_PER_MSUN_COMPUTED,
  L_EDD_PER_MSUN_CONVENTIONAL,
  L_EDD_PER_MSUN_HARIKANE,
  T_EDD_GYR,
} from '../../../src/core/constants/index.ts';

describe('Eddington constants', () => {
  it('compute the Eddington luminosity per solar mass as 1.2571e38 erg/s', () => {
    // 1.2571e38: 4πG m_p c/σ_T from CODATA 2018 (published-checks.md, computed); 5 digits → rtol 5e-5.
    expectClose(L_EDD_PER_MSUN_COMPUTED, 1.2571e38, { rtol: 5e-5, source: 'published-checks.md: computed from CODATA 2018' });
  });

  it('compute the Eddington time as 0.45049 Gyr', () => {
    // 0.45049 Gyr: σ_T c/(4πG m_p) from CODATA 2018 (published-checks.md, computed); 5 digits → atol 5e-6.
    expectClose(T_EDD_GYR, 0.45049, { atol: 5e-6, source: 'published-checks.md: computed from CODATA 2018' });
  });

  it('give the Salpeter time for ε = 0.1 as 50.05 Myr', () => {
    // 50.05 Myr = ε/(1−ε) t_Edd (published-checks.md, computed); 4 digits → atol 0.005 Myr.
    expectClose((0.1 / 0.9) * T_EDD_GYR * 1e3, 50.05, { atol: 0.005, source: 'published-checks.md: computed' });
  });

  it('offer the conventional 1.26e38 and the rounded 1.3e38 as named options', () => {
    expect(L_EDD_PER_MSUN_CONVENTIONAL).toBe(1.26e38); // Shen et al. 2011, ApJS 194, 45
    expect(L_EDD_PER_MSUN_HARIKANE).toBe(1.3e38); // Harikane et al. 2023, ApJ 959, 39
    expect(EDDINGTON_CONSTANTS.conventional.lEddPerMsun).toBe(L_EDD_PER_MSUN_CONVENTIONAL);
    expect(EDDINGTON_CONSTANTS.rounded13.lEddPerMsun).toBe(L_EDD_PER_MSUN_HARIKANE);
    expect(EDDINGTON_CONSTANTS.computed.lEddPerMsun).toBe(L_EDD_PER_MSUN_COMPUTED);
    expect(EDDINGTON_CONSTANTS.conventional.reference).toMatch(/Shen et al\. 2011/);
    expect(EDDINGTON_CONSTANTS.rounded13.reference).toMatch(/Harikane et al\. 2023/);
  });
});
