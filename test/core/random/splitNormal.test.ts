import { describe, expect, it } from 'vitest';
import { createRng, splitNormal } from '../../../src/core/random/index.ts';

describe('splitNormal', () => {
  const n = 400_000;
  const mode = 5;
  const lo = 0.5;
  const hi = 2;

  it('puts a fraction σlo/(σlo+σhi) below the mode (binomial 5σ, N = 4e5)', () => {
    const rng = createRng(11);
    let below = 0;
    for (let i = 0; i < n; i++) if (splitNormal(rng, mode, lo, hi) < mode) below++;
    const p = lo / (lo + hi);
    expect(Math.abs(below / n - p)).toBeLessThan(5 * Math.sqrt((p * (1 - p)) / n));
  });

  it('has half-normal widths σlo below and σhi above the mode, and mean mode + √(2/π)(σhi − σlo)', () => {
    const rng = createRng(12);
    let sLo = 0;
    let nLo = 0;
    let sHi = 0;
    let nHi = 0;
    let sum = 0;
    for (let i = 0; i < n; i++) {
      const x = splitNormal(rng, mode, lo, hi);
      sum += x;
      if (x < mode) (sLo += (x - mode) ** 2), nLo++;
      else (sHi += (x - mode) ** 2), nHi++;
    }
    // Each half: E[(x−mode)²] = σ²; the estimate of σ has relative error ≈ 1/√(2 n_half).
    expect(Math.abs(Math.sqrt(sLo / nLo) / lo - 1)).toBeLessThan(5 / Math.sqrt(2 * nLo));
    expect(Math.abs(Math.sqrt(sHi / nHi) / hi - 1)).toBeLessThan(5 / Math.sqrt(2 * nHi));
    // Mean of the two-piece normal (John 1982); its sd here is < σhi, so 5σhi/√N bounds the error.
    expect(Math.abs(sum / n - (mode + Math.sqrt(2 / Math.PI) * (hi - lo)))).toBeLessThan((5 * hi) / Math.sqrt(n));
  });

  it('returns the mode itself when both sigmas are 0', () => {
    expect(splitNormal(createRng(1), 3.25, 0, 0)).toBe(3.25);
  });
});
