import { describe, it, expect } from 'vitest';
import {
  GH05_LHBETA_L5100,
  logL5100FromLogLHalpha,
  logL5100FromLogLHbeta,
  logLHalphaFromLogL5100,
  logLHbetaFromLogL5100,
} from '../../../src/core/virial/lineContinuumRelations.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('Greene & Ho 2005 line–continuum relations', () => {
  it('give L_Hα = 5.25e42 at λL5100 = 1e44 and slope 1.157 (eq. 1)', () => {
    // Greene & Ho 2005, ApJ 630, 122, eq. 1: L_Hα = 5.25e42 (λL5100/1e44)^1.157 erg/s.
    expectClose(logLHalphaFromLogL5100(44), Math.log10(5.25e42), { atol: 1e-12, source: 'Greene & Ho 2005 eq. 1' });
    expectClose(logLHalphaFromLogL5100(45) - logLHalphaFromLogL5100(44), 1.157, { atol: 1e-12, source: 'Greene & Ho 2005 eq. 1' });
  });

  it('invert eq. 1 exactly', () => {
    for (const l of [41.3, 42.5, 44.1]) expectClose(logLHalphaFromLogL5100(logL5100FromLogLHalpha(l)), l, { atol: 1e-12, source: 'round trip' });
  });

  it('give L_Hβ = 1.425e42 at λL5100 = 1e44 (eq. 2, from memory) and invert it', () => {
    // Greene & Ho 2005 eq. 2, from memory: confirm against the paper.
    expect(GH05_LHBETA_L5100.provenance).toBe('from memory');
    expectClose(logLHbetaFromLogL5100(44), Math.log10(1.425e42), { atol: 1e-12, source: 'Greene & Ho 2005 eq. 2 (from memory)' });
    expectClose(logL5100FromLogLHbeta(logLHbetaFromLogL5100(43.2)), 43.2, { atol: 1e-12, source: 'round trip' });
  });
});
