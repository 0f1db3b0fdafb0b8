/**
 * The standard normal distribution's tails to full double precision, also far out where
 * 1 − Φ(x) underflows in a naive form: the selection likelihood takes logs of them.
 */

const SQRT1_2 = Math.SQRT1_2;

// erfc by its Taylor series for |x| < 2 (through erf) and by the Laplace continued fraction
// (Abramowitz & Stegun 1964, eq. 7.1.14) beyond, evaluated with the modified Lentz method.
function erfcPositive(x: number): number {
  if (x < 2) {
    // erf x = 2/√π Σ (−1)^n x^(2n+1) / (n! (2n+1)); converges fast for x < 2.
    let term = x;
    let sum = x;
    const x2 = x * x;
    for (let n = 1; n < 200; n++) {
      term *= -x2 / n;
      const add = term / (2 * n + 1);
      sum += add;
      if (Math.abs(add) < 1e-17 * Math.abs(sum)) break;
    }
    return 1 - (2 / Math.sqrt(Math.PI)) * sum;
  }
  return Math.exp(-x * x + logErfcCfTail(x));
}

// log of the continued fraction part: erfc x = exp(−x²)/√π · 1/(x + (1/2)/(x + 1/(x + (3/2)/(x + …)))).
function logErfcCfTail(x: number): number {
  const tiny = 1e-300;
  let f = x;
  let c = x;
  let d = 0;
  for (let n = 1; n < 500; n++) {
    const a = n / 2;
    d = x + a * d;
    d = Math.abs(d) < tiny ? tiny : d;
    c = x + a / c;
    c = Math.abs(c) < tiny ? tiny : c;
    d = 1 / d;
    const delta = c * d;
    f *= delta;
    if (Math.abs(delta - 1) < 1e-16) break;
  }
  return -Math.log(f) - 0.5 * Math.log(Math.PI);
}

/**
 * Standard normal cumulative distribution Φ(x) = P(Z ≤ x), relative accuracy ~1e-15.
 * @param x - any real number.
 */
export function normalCdf(x: number): number {
  if (Number.isNaN(x)) return NaN;
  return x < 0 ? 0.5 * erfcPositive(-x * SQRT1_2) : 1 - 0.5 * erfcPositive(x * SQRT1_2);
}

/**
 * ln Φ(x), finite for every finite x (about −x²/2 for x → −∞, where Φ itself underflows).
 * @param x - any real number.
 */
export function logNormalCdf(x: number): number {
  if (Number.isNaN(x)) return NaN;
  if (x >= 0) return Math.log1p(-0.5 * erfcPositive(x * SQRT1_2));
  const t = -x * SQRT1_2;
  if (t < 2) return Math.log(0.5 * erfcPositive(t));
  return Math.log(0.5) - t * t + logErfcCfTail(t);
}
