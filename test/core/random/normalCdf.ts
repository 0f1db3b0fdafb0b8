/**
 * Test helper: standard normal CDF Φ(x) from erfc by the Numerical Recipes Chebyshev fit
 * (Press et al. 2007, §6.2.2, erfc fractional error < 1.2e-7): ample for the KS tests here,
 * whose critical distances are ~1e-3.
 */
export function normalCdf(x: number): number {
  const z = Math.abs(x) / Math.SQRT2;
  const t = 1 / (1 + 0.5 * z);
  const erfc =
    t *
    Math.exp(
      -z * z -
        1.26551223 +
        t * (1.00002368 + t * (0.37409196 + t * (0.09678418 + t * (-0.18628806 + t * (0.27886807 + t * (-1.13520398 + t * (1.48851587 + t * (-0.82215223 + t * 0.17087277)))))))),
    );
  return x >= 0 ? 1 - 0.5 * erfc : 0.5 * erfc;
}
