import { describe, it } from 'vitest';
import { logL5100FromLogLHalpha, logLbolFromHalpha } from '../../../src/core/bolometric/logLbolFromHalpha.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('L_bol from broad Hα', () => {
  it('maps L_Hα = 5.25e42 to λL5100 = 1e44 (Greene & Ho 2005 eq. 1 inverted)', () => {
    // Greene & Ho 2005, ApJ 630, 122, eq. 1: L_Hα = 5.25e42 (λL5100/1e44)^1.157 erg/s.
    expectClose(logL5100FromLogLHalpha(Math.log10(5.25e42)), 44, { atol: 1e-12, source: 'Greene & Ho 2005 eq. 1' });
  });

  it('multiplies λL5100 by 10.33 by default and by a given BC otherwise', () => {
    const lHa = Math.log10(5.25e42);
    expectClose(logLbolFromHalpha(lHa), 44 + Math.log10(10.33), { atol: 1e-12, source: 'BC5100 = 10.33 (Richards et al. 2006)' });
    expectClose(logLbolFromHalpha(lHa, 9.26), 44 + Math.log10(9.26), { atol: 1e-12, source: 'definition' });
  });

  it('scales as L_Hα^(1/1.157)', () => {
    expectClose(logLbolFromHalpha(43) - logLbolFromHalpha(42), 1 / 1.157, { atol: 1e-12, source: 'Greene & Ho 2005 eq. 1 slope' });
  });
});
