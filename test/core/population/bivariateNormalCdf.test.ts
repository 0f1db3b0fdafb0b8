import { describe, it } from 'vitest';
import { bivariateNodes, bivariateNormalCdf, bivariateNormalCdfAlongLine, bivariateNormalCdfWith } from '../../../src/core/population/bivariateNormalCdf.ts';
import { normalCdf } from '../../../src/core/population/normalCdf.ts';
import { expectClose } from '../../helpers/expectClose.ts';

// Computed with scipy 1.10.1 multivariate_normal(cov=[[1, ρ], [ρ, 1]]).cdf([h, k]) (Genz's algorithm, absolute
// error target 1e-5 by default): the tolerance is 2e-5.
const SCIPY = [
  { h: 0.3, k: -0.5, rho: 0.4, p: 0.24357588920110462 },
  { h: 1.2, k: 0.7, rho: -0.8, p: 0.6430627539615452 },
  { h: -1, k: -2, rho: 0.97, p: 0.022749976531382554 },
  { h: 0.5, k: 0.5, rho: -0.97, p: 0.3829254088001089 },
  { h: -3, k: 2, rho: 0, p: 0.0013191876732939435 },
  { h: 2, k: -1.5, rho: -0.5, p: 0.05860369960786955 },
];

// The same function at high correlation, where the 20-point rule is used. scipy 1.10.1 computes a bivariate normal CDF
// with Genz's BVNU (the abseps default does not apply in two dimensions); it agrees with an adaptive quadrature of
// Sheppard's integral (scipy.integrate.quad, epsrel 1e-14) to 2e-16 at the first two points.
const SCIPY_HIGH_RHO = [
  { h: -1, k: -2, rho: 0.97, p: 0.022749976531382554 },
  { h: 0.5, k: 0.5, rho: -0.97, p: 0.3829254088001089 },
  { h: 0.2, k: 0.1, rho: 0.99, p: 0.5319414646931109 },
  { h: -0.4, k: 0.3, rho: 0.98, p: 0.3445735772700624 },
  { h: 1.1, k: -0.6, rho: -0.9, p: 0.1468544638460309 },
];

describe('bivariateNormalCdf', () => {
  it('matches scipy 1.10.1 multivariate_normal.cdf', () => {
    for (const c of SCIPY) expectClose(bivariateNormalCdf(c.h, c.k, c.rho), c.p, { atol: 2e-5, source: `computed with scipy 1.10.1, (h, k, ρ) = (${c.h}, ${c.k}, ${c.rho})` });
  });

  it('matches scipy 1.10.1 to 3e-10 at high correlation, with the 20-point rule', () => {
    // Tolerance: the tabulated Φ's ~1e-10 relative error (which alone gives the 6e-11 seen at these points); the
    // 12-point rule would miss by 1e-9 to 4e-9 here.
    for (const c of SCIPY_HIGH_RHO) expectClose(bivariateNormalCdf(c.h, c.k, c.rho), c.p, { atol: 3e-10, source: `computed with scipy 1.10.1 multivariate_normal.cdf, (h, k, ρ) = (${c.h}, ${c.k}, ${c.rho})` });
  });

  it('gives the closed forms at the origin and at the independence limit', () => {
    // Closed form (Sheppard 1900): Φ₂(0, 0; ρ) = 1/4 + asin(ρ)/(2π).
    for (const rho of [-0.9, -0.3, 0.5, 0.95]) {
      expectClose(bivariateNormalCdf(0, 0, rho), 0.25 + Math.asin(rho) / (2 * Math.PI), { atol: 1e-12, source: 'closed form 1/4 + asin ρ / 2π' });
    }
    expectClose(bivariateNormalCdf(0.7, -0.2, 0), normalCdf(0.7) * normalCdf(-0.2), { atol: 1e-9, source: 'closed form: independent normals (the tabulated Φ is good to ~1e-10)' });
  });
});

describe('bivariateNormalCdf with fewer nodes at small and moderate correlation', () => {
  it('agrees with a fine Simpson integration of the same angle integral to 3e-10', () => {
    // Reference: Sheppard's integral by composite Simpson with 4000 intervals (internal check of the quadrature,
    // not a published value); its error is far below 1e-13 for these smooth integrands.
    const reference = (h: number, k: number, rho: number): number => {
      const top = Math.asin(rho);
      const f = (t: number): number => Math.exp(-(h * h + k * k - 2 * h * k * Math.sin(t)) / (2 * Math.cos(t) ** 2));
      const n = 4000;
      let s = f(0) + f(top);
      for (let i = 1; i < n; i++) s += (i % 2 === 1 ? 4 : 2) * f((top * i) / n);
      return normalCdf(h) * normalCdf(k) + (s * top) / (3 * n) / (2 * Math.PI);
    };
    for (const rho of [-0.74, -0.5, -0.29, -0.1, 0.05, 0.2, 0.299, 0.31, 0.6, 0.749]) {
      for (const [h, k] of [[0, 0], [1.3, -0.4], [-2.1, 0.8], [3, 2.5], [-0.7, -1.9]] as const) {
        expectClose(bivariateNormalCdf(h, k, rho), reference(h, k, rho), { atol: 3e-10, source: `internal (the tabulated Φ is good to ~1e-10): Simpson reference at (h, k, ρ) = (${h}, ${k}, ${rho})` });
      }
    }
  });
});

describe('bivariateNormalCdfAlongLine', () => {
  it('gives the point-by-point probabilities along a line to 1e-12, at small, moderate and high correlation', () => {
    // Internal check: the same quadrature evaluated one point at a time.
    for (const rho of [-0.98, -0.9, -0.8, -0.5, 0.1, 0.6, 0.95]) {
      const nodes = bivariateNodes(rho);
      for (const [h0, dh, k0, dk, count] of [[-6, 0.4, 3, -0.2, 30], [2.5, -0.1, -1, 0.15, 25], [-9, 0.9, -9, 0.8, 22], [0.3, 0, -0.4, 0, 4]] as const) {
        const out = new Float64Array(count);
        bivariateNormalCdfAlongLine(nodes, h0, dh, k0, dk, count, out);
        for (let q = 0; q < count; q++) {
          const h = h0 + dh * q;
          const k = k0 + dk * q;
          expectClose(out[q] as number, bivariateNormalCdfWith(nodes, h, k), { atol: 1e-12, source: `internal: point by point at (h, k, ρ) = (${h.toFixed(2)}, ${k.toFixed(2)}, ${rho})` });
        }
      }
    }
  });

  it('writes only the first count entries of a longer output array', () => {
    // The function's contract (out is "at least count long"): entries from count on belong to the caller.
    for (const rho of [0, 0.5]) {
      const out = new Float64Array(8).fill(-7);
      bivariateNormalCdfAlongLine(bivariateNodes(rho), -1, 0.2, 0.5, -0.1, 5, out);
      for (let q = 5; q < 8; q++) if (out[q] !== -7) throw new Error(`entry ${q} changed to ${out[q]} (ρ = ${rho})`);
    }
  });
});
