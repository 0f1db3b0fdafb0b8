import { describe, expect, it } from 'vitest';
import { createRng } from '../../../src/core/random/index.ts';

function take(seed: number, n: number): number[] {
  const rng = createRng(seed);
  return Array.from({ length: n }, () => rng.next());
}

describe('createRng', () => {
  it('gives the same stream for the same seed and different streams for different seeds', () => {
    expect(take(7, 20)).toEqual(take(7, 20));
    expect(take(7, 20)).not.toEqual(take(8, 20));
    // Seeds that differ only above bit 32 (2^40 + 7 vs 7) still differ.
    expect(take(2 ** 40 + 7, 20)).not.toEqual(take(7, 20));
    expect(take(-7, 20)).not.toEqual(take(7, 20));
  });

  it('stays in [0, 1) with mean 1/2 and variance 1/12 (N = 1e6, 5σ tolerances)', () => {
    const rng = createRng(20240601);
    const n = 1_000_000;
    let sum = 0;
    let sum2 = 0;
    let min = 1;
    let max = 0;
    for (let i = 0; i < n; i++) {
      const u = rng.next();
      sum += u;
      sum2 += u * u;
      min = Math.min(min, u);
      max = Math.max(max, u);
    }
    const mean = sum / n;
    const variance = sum2 / n - mean * mean;
    expect(min).toBeGreaterThanOrEqual(0);
    expect(max).toBeLessThan(1);
    // σ(mean) = √(1/12/N) = 2.9e-4; σ(var) = √(1/180/N) = 7.5e-5 (uniform: μ4 − σ⁴ = 1/80 − 1/144).
    expect(Math.abs(mean - 0.5)).toBeLessThan(5 * Math.sqrt(1 / 12 / n));
    expect(Math.abs(variance - 1 / 12)).toBeLessThan(5 * Math.sqrt(1 / 180 / n));
  });

  it('fills 64 equal bins evenly (χ², 63 degrees of freedom, N = 640000)', () => {
    const rng = createRng(99);
    const bins = new Array<number>(64).fill(0);
    const n = 640_000;
    for (let i = 0; i < n; i++) {
      const j = Math.floor(rng.next() * 64);
      bins[j] = (bins[j] as number) + 1;
    }
    const e = n / 64;
    const chi2 = bins.reduce((s, o) => s + (o - e) ** 2 / e, 0);
    // χ²(63) has mean 63 and σ √126 = 11.2; 63 + 5σ ≈ 119.
    expect(chi2).toBeLessThan(119);
  });

  it('rejects a non-finite seed with a message naming it', () => {
    expect(() => createRng(Number.NaN)).toThrow(/random seed must be a finite number, got NaN/);
  });
});
