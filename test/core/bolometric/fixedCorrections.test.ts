import { describe, it, expect } from 'vitest';
import { BC5100_RICHARDS06, BC_SHEN11, logLbolFixedBC } from '../../../src/core/bolometric/fixedCorrections.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('fixed bolometric corrections', () => {
  it('are 9.26, 5.15 and 3.81 at 5100, 3000 and 1350 Å (Shen et al. 2011 from Richards et al. 2006)', () => {
    // Shen et al. 2011, ApJS 194, 45 (bolometric luminosities, section not rechecked), from the Richards et al. 2006,
    // ApJS 166, 470 mean quasar SED: BC5100 = 9.26, BC3000 = 5.15, BC1350 = 3.81.
    expect(BC_SHEN11.l5100.bc).toBe(9.26);
    expect(BC_SHEN11.l3000.bc).toBe(5.15);
    expect(BC_SHEN11.l1350.bc).toBe(3.81);
  });

  it('include BC5100 = 10.33 of recent high-redshift papers', () => {
    // Richards et al. 2006, ApJS 166, 470 mean SED, BC5100 = 10.33, as Matthee et al. 2024, ApJ 963, 129 apply it to L5100 from broad Hα.
    expect(BC5100_RICHARDS06.bc).toBe(10.33);
  });

  it('add log10 BC to log λL_λ', () => {
    expectClose(logLbolFixedBC(45, 3.81), 45 + Math.log10(3.81), { atol: 1e-12, source: 'definition' });
  });

  it('refuse a non-positive correction', () => {
    expect(() => logLbolFixedBC(45, 0)).toThrow(/bolometric correction must be > 0/);
  });
});
