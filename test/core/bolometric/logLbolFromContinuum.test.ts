import { describe, it, expect } from 'vitest';
import { logLbolFromContinuum } from '../../../src/core/bolometric/logLbolFromContinuum.ts';
import { logLbolNetzer19 } from '../../../src/core/bolometric/netzer19.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('logLbolFromContinuum', () => {
  it('applies 9.26, 5.15 and 3.81 for bc5100, bc3000 and bc1350', () => {
    // Shen et al. 2011, ApJS 194, 45, from the Richards et al. 2006, ApJS 166, 470 mean SED: 9.26, 5.15, 3.81.
    expectClose(logLbolFromContinuum('bc5100', 44), 44 + Math.log10(9.26), { atol: 1e-12, source: 'Shen 2011 BC5100' });
    expectClose(logLbolFromContinuum('bc3000', 44), 44 + Math.log10(5.15), { atol: 1e-12, source: 'Shen 2011 BC3000' });
    expectClose(logLbolFromContinuum('bc1350', 44), 44 + Math.log10(3.81), { atol: 1e-12, source: 'Shen 2011 BC1350' });
  });

  it('uses a caller-given BC5100 for bc5100', () => {
    expectClose(logLbolFromContinuum('bc5100', 44, { bc5100: 10.33 }), 44 + Math.log10(10.33), { atol: 1e-12, source: 'definition' });
  });

  it('uses the band for netzer19 and requires it', () => {
    expect(logLbolFromContinuum('netzer19', 45.2, { band: 'l3000' })).toBe(logLbolNetzer19('l3000', 45.2));
    expect(() => logLbolFromContinuum('netzer19', 45)).toThrow(/needs the continuum band/);
  });

  it('rejects a band that does not match a fixed method', () => {
    expect(() => logLbolFromContinuum('bc3000', 45, { band: 'l5100' })).toThrow(/'bc3000' needs l3000, got l5100/);
  });

  it('accepts the matching band or none for a fixed method', () => {
    // BC3000 = 5.15 (Richards et al. 2006 mean SED as used by Shen et al. 2011, published-checks.md)
    expectClose(logLbolFromContinuum('bc3000', 45), 45 + Math.log10(5.15), { atol: 1e-12, source: 'Shen et al. 2011 BC3000 = 5.15' });
    expectClose(logLbolFromContinuum('bc3000', 45, { band: 'l3000' }), 45 + Math.log10(5.15), { atol: 1e-12, source: 'Shen et al. 2011 BC3000 = 5.15' });
  });

  it('names an unknown method and the known ones', () => {
    expect(() => logLbolFromContinuum('bc2000' as 'bc3000', 45)).toThrow("unknown continuum bolometric method 'bc2000' (known: bc5100, bc3000, bc1350, netzer19)");
  });
});
