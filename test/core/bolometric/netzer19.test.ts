import { describe, it, expect } from 'vitest';
import { logLbolNetzer19, NETZER19 } from '../../../src/core/bolometric/netzer19.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('Netzer 2019 luminosity-dependent corrections', () => {
  it('carry (c, d) = (40, −0.2), (19, −0.2), (7, −0.1) at 5100, 3000, 1400 Å', () => {
    // Netzer 2019, MNRAS 488, 5185, Table 1, k = c (λL/1e42)^d; from a code transcription (not from the paper): confirm.
    expect([NETZER19.l5100.c, NETZER19.l5100.d]).toEqual([40, -0.2]);
    expect([NETZER19.l3000.c, NETZER19.l3000.d]).toEqual([19, -0.2]);
    expect([NETZER19.l1350.c, NETZER19.l1350.d]).toEqual([7, -0.1]);
  });

  it('give k = c at λL_λ = 1e42 erg/s', () => {
    // Form k = c (λL/1e42)^d (Netzer 2019; transcription, confirm against the paper).
    expectClose(logLbolNetzer19('l5100', 42), 42 + Math.log10(40), { atol: 1e-12, source: 'Netzer 2019 form' });
    expectClose(logLbolNetzer19('l1350', 42), 42 + Math.log10(7), { atol: 1e-12, source: 'Netzer 2019 form' });
  });

  it('give k = 40 × 1000^−0.2 ≈ 10.05 at λL5100 = 1e45 erg/s', () => {
    // Computed from the transcribed form (confirm the coefficients against Netzer 2019 Table 1).
    expectClose(10 ** (logLbolNetzer19('l5100', 45) - 45), 40 * 1000 ** -0.2, { rtol: 1e-12, source: 'computed from Netzer 2019 form' });
    expectClose(10 ** (logLbolNetzer19('l3000', 45) - 45), 19 * 1000 ** -0.2, { rtol: 1e-12, source: 'computed from Netzer 2019 form' });
  });
});
