import { describe, it } from 'vitest';
import { fwhmHalphaFromHbetaKms, fwhmHbetaFromHalphaKms } from '../../../src/core/virial/halphaHbetaWidth.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('Greene & Ho 2005 eq. 3 (Hβ width from Hα width)', () => {
  it('gives FWHM_Hβ = 2185.0 km/s for FWHM_Hα = 2000 km/s', () => {
    // Greene & Ho 2005, ApJ 630, 122, eq. 3: FWHM_Hβ = 1.07e3 (FWHM_Hα/1e3)^1.03 → 2185.0 at 2000 km/s (computed; 1 decimal → atol 0.05).
    expectClose(fwhmHbetaFromHalphaKms(2000), 2185.0, { atol: 0.05, source: 'Greene & Ho 2005, ApJ 630, 122, eq. 3 (computed)' });
  });

  it('inverts exactly', () => {
    expectClose(fwhmHalphaFromHbetaKms(fwhmHbetaFromHalphaKms(3456)), 3456, { rtol: 1e-12, source: 'round trip' });
  });
});
