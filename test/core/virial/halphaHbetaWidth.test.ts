import { describe, it } from 'vitest';
import { fwhmHalphaFromHbetaKms, fwhmHbetaFromHalphaKms } from '../../../src/core/virial/halphaHbetaWidth.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('Greene & Ho 2005 eq. 3 (Hβ width from Hα width)', () => {
  it('gives FWHM_Hβ = 2185.0 km/s for FWHM_Hα = 2000 km/s', () => {
    // published-checks.md (computed from Greene & Ho 2005 eq. 3); 1 decimal → atol 0.05.
    expectClose(fwhmHbetaFromHalphaKms(2000), 2185.0, { atol: 0.05, source: 'published-checks.md (computed, GH05 eq. 3)' });
  });

  it('inverts exactly', () => {
    expectClose(fwhmHalphaFromHbetaKms(fwhmHbetaFromHalphaKms(3456)), 3456, { rtol: 1e-12, source: 'round trip' });
  });
});
