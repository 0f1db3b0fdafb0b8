import { describe, it, expect } from 'vitest';
import { avFromBalmerDecrement, ebvFromBalmerDecrement, INTRINSIC_BALMER_CASE_B } from '../../../src/core/dust/balmerDecrement.ts';
import { kLambda } from '../../../src/core/dust/kLambda.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('E(B−V) and A_V from the Balmer decrement', () => {
  it('gives E(B−V) = 0.2864 for Hα/Hβ = 4.0 with Calzetti and the case-B 2.86', () => {
    // published-checks.md (computed, Calzetti 2000 + intrinsic 2.86); 4 decimals → atol 1e-4.
    expectClose(ebvFromBalmerDecrement(4.0, 'calzetti00'), 0.2864, { atol: 1e-4, source: 'published-checks.md (computed)' });
  });

  it('uses the case-B value 2.86 by default', () => {
    // Osterbrock & Ferland 2006, Table 4.4 (T = 1e4 K, n_e = 100 cm^-3).
    expect(INTRINSIC_BALMER_CASE_B.ratio).toBe(2.86);
    expect(ebvFromBalmerDecrement(4, 'ccm89')).toBe(ebvFromBalmerDecrement(4, 'ccm89', 2.86));
  });

  it('follows E(B−V) = 2.5/(k(Hβ) − k(Hα)) log10(obs/int) with a caller-given intrinsic ratio', () => {
    const dk = kLambda('smc', 4862.68) - kLambda('smc', 6564.61);
    expectClose(ebvFromBalmerDecrement(5.5, 'smc', 3.1), (2.5 / dk) * Math.log10(5.5 / 3.1), { rtol: 1e-12, source: 'definition' });
  });

  it('clips to 0 when the observed decrement is at or below the intrinsic one, including non-positive draws', () => {
    expect(ebvFromBalmerDecrement(2.5, 'calzetti00')).toBe(0);
    expect(ebvFromBalmerDecrement(2.86, 'calzetti00')).toBe(0);
    expect(ebvFromBalmerDecrement(-1, 'ccm89')).toBe(0);
    expect(avFromBalmerDecrement(1, 'smc')).toBe(0);
  });

  it('passes NaN through and rejects a non-positive intrinsic ratio', () => {
    expect(ebvFromBalmerDecrement(NaN, 'calzetti00')).toBeNaN();
    expect(() => ebvFromBalmerDecrement(4, 'calzetti00', 0)).toThrow(/intrinsic Balmer decrement/);
  });

  it('gives A_V = R_V E(B−V) with the curve\'s own R_V', () => {
    expectClose(avFromBalmerDecrement(4, 'calzetti00'), 4.05 * ebvFromBalmerDecrement(4, 'calzetti00'), { rtol: 1e-12, source: 'definition' });
    expectClose(avFromBalmerDecrement(4, 'ccm89'), 3.1 * ebvFromBalmerDecrement(4, 'ccm89'), { rtol: 1e-12, source: 'definition' });
  });
});
