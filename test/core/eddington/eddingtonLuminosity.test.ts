import { describe, it, expect } from 'vitest';
import { logEddingtonLuminosity, logEddingtonRatio } from '../../../src/core/eddington/eddingtonLuminosity.ts';
import { L_EDD_PER_MSUN_COMPUTED } from '../../../src/core/constants/eddington.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('Eddington luminosity and ratio', () => {
  it('uses 1.26e38 erg/s per solar mass by default', () => {
    // Shen et al. 2011 (ApJS 194, 45) convention, published-checks.md.
    expectClose(logEddingtonLuminosity(8), 8 + Math.log10(1.26e38), { atol: 1e-12, source: 'Shen et al. 2011, 1.26e38' });
  });

  it('uses the per-solar-mass value it is given (computed 1.2571e38)', () => {
    // published-checks.md: 4πG m_p c/σ_T = 1.2571e38 erg/s (computed, CODATA 2018); 5 digits → rtol 5e-5.
    expectClose(10 ** (logEddingtonLuminosity(0, L_EDD_PER_MSUN_COMPUTED) - 38), 1.2571, { rtol: 5e-5, source: 'published-checks.md (computed)' });
  });

  it('gives λ_Edd = 1 when L_bol equals L_Edd and scales with L_bol', () => {
    const logM = 7.3;
    expectClose(logEddingtonRatio(logM + Math.log10(1.3e38), logM, 1.3e38), 0, { atol: 1e-12, source: 'definition' });
    expectClose(logEddingtonRatio(45, 8, 1.3e38) - logEddingtonRatio(44, 8, 1.3e38), 1, { atol: 1e-12, source: 'definition' });
  });

  it('refuses a non-positive Eddington luminosity per solar mass', () => {
    expect(() => logEddingtonLuminosity(8, 0)).toThrow(/must be > 0/);
  });
});
