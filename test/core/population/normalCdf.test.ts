import { describe, expect, it } from 'vitest';
import { logNormalCdf, normalCdf } from '../../../src/core/population/normalCdf.ts';
import { expectClose } from '../../helpers/expectClose.ts';

// Reference values computed with scipy 1.10.1 (Debian python3-scipy) scipy.stats.norm.cdf / logcdf,
// printed with 17 significant digits.
const SCIPY = [
  { x: 0, cdf: 0.5 },
  { x: 1, cdf: 0.8413447460685429 },
  { x: -1, cdf: 0.15865525393145707 },
  { x: 1.96, cdf: 0.9750021048517795 },
  { x: -3, cdf: 0.0013498980316300933 },
  { x: -8, cdf: 6.22096057427174e-16 },
];

// Computed with scipy 1.10.1 (Debian python3-scipy) scipy.stats.norm.cdf / norm.logcdf, printed by repr, at points
// where erfc's argument |x|/√2 is above 2, i.e. on the continued-fraction path.
const SCIPY_CONTINUED_FRACTION = [
  { x: -2.875, cdf: 0.0020201374899460017 },
  { x: -3.125, cdf: 0.0008890252991084321 },
  { x: -3.875, cdf: 5.331234975109624e-05 },
  { x: -5.625, cdf: 9.275398734560802e-09 },
  { x: -5.875, cdf: 2.1142167424408314e-09 },
  { x: -6.125, cdf: 4.534180326695269e-10 },
  { x: -6.625, cdf: 1.7362408953520502e-11 },
  { x: -6.875, cdf: 3.0994929517572154e-12 },
];
const SCIPY_LOG_UPPER = [
  { x: 2.875, logcdf: -0.00202218071988582 },
  { x: 3.125, logcdf: -0.0008894207164743915 },
  { x: 3.875, logcdf: -5.3313770904924494e-05 },
  { x: 5.625, logcdf: -9.275398777577317e-09 },
  { x: 5.875, logcdf: -2.1142167446757874e-09 },
  { x: 6.125, logcdf: -4.534180327723208e-10 },
  { x: 6.625, logcdf: -1.7362408953671233e-11 },
  { x: 6.875, logcdf: -3.099492951762019e-12 },
];

// Computed with mpmath 1.2.1 (Debian python3-mpmath) at mp.dps = 40: [x, float(ncdf(x)), float(log(ncdf(x)))], x = −56/32 … −91/32.
// The band where erfc's argument |x|/√2 runs from 1.24 to 2.01: 1 − erf loses most digits here, and with the
// series used up to 2 Φ was 1.5e-13 off.
const MPMATH_BAND: readonly (readonly [number, number, number])[] = [
  [-1.75, 0.04005915686381709, -3.217397995800274],
  [-1.78125, 0.03743580936252121, -3.2851275630571504],
  [-1.8125, 0.03495448696823474, -3.3537084360466585],
  [-1.84375, 0.032609791273917846, -3.423142689878553],
  [-1.875, 0.030396361765261375, -3.4934323565063337],
  [-1.90625, 0.028308888971924365, -3.564579425703521],
  [-1.9375, 0.02634212668914146, -3.6365858460196314],
  [-1.96875, 0.024490903264233276, -3.709453525716054],
  [-2.0, 0.02275013194817921, -3.783184333682032],
  [-2.03125, 0.021114820317715284, -3.85778010033098],
  [-2.0625, 0.019580078778377457, -3.9332426184773737],
  [-2.09375, 0.018141128163506277, -4.009573644194466],
  [-2.125, 0.016793306448448814, -4.086774897653098],
  [-2.15625, 0.015532074603028849, -4.1648480639418635],
  [-2.1875, 0.014353021608801655, -4.243794793868934],
  [-2.21875, 0.0132518686706629, -4.323616704745804],
  [-2.25, 0.012224472655044703, -4.404315381153271],
  [-2.28125, 0.011266828789210063, -4.485892375689945],
  [-2.3125, 0.010375072658058005, -4.568349209703584],
  [-2.34375, 0.009545481536386156, -4.651687374005575],
  [-2.375, 0.008774475095738362, -4.735908329568859],
  [-2.40625, 0.008058615525807035, -4.821013508209609],
  [-2.4375, 0.007394607110880697, -4.907004313252989],
  [-2.46875, 0.006779295302044561, -4.993882120183275],
  [-2.5, 0.006209665325776135, -5.08164827727869],
  [-2.53125, 0.00568284036924937, -5.1703041062312245],
  [-2.5625, 0.005196079382091164, -5.2598509027517695],
  [-2.59375, 0.004746774533545239, -5.350289937160876],
  [-2.625, 0.004332448363012558, -5.441622454965433],
  [-2.65625, 0.0039507506607768085, -5.533849677421564],
  [-2.6875, 0.0035994551144099673, -5.626972802084058],
  [-2.71875, 0.0032764557549083443, -5.720993003342619],
  [-2.75, 0.002979763235054557, -5.815911432945222],
  [-2.78125, 0.0027075009708561826, -5.911729220508885],
  [-2.8125, 0.0024579011751966876, -6.008447474018119],
  [-2.84375, 0.0022293008110671753, -6.10606728031135],
];

describe('normalCdf', () => {
  it('matches scipy 1.10.1 norm.cdf to 1e-14 relative', () => {
    for (const r of SCIPY) expectClose(normalCdf(r.x), r.cdf, { rtol: 1e-13, source: `computed with scipy 1.10.1 norm.cdf(${r.x})` });
  });

  it('stops the continued fraction once it has converged, keeping Φ and ln Φ to 3e-15 relative beyond |x| = 2√2', () => {
    // Tolerance: about twice the largest difference seen on this path (1.4e-15, the two codes' rounding together);
    // running the fraction on after convergence multiplies in factors that differ from 1 in the last bit and drifts
    // by about 1e-14 at these points.
    for (const r of SCIPY_CONTINUED_FRACTION) expectClose(normalCdf(r.x), r.cdf, { rtol: 3e-15, source: `computed with scipy 1.10.1 norm.cdf(${r.x})` });
    for (const r of SCIPY_LOG_UPPER) expectClose(logNormalCdf(r.x), r.logcdf, { rtol: 3e-15, source: `computed with scipy 1.10.1 norm.logcdf(${r.x})` });
  });

  it('keeps Φ and ln Φ to 5e-15 relative where 1 − erf cancels, on both sides of the switch to the continued fraction', () => {
    // Tolerance: the worst seen over these points is 3.7e-15 (Φ) and 1.1e-15 (ln Φ); with the series up to |x|/√2 = 2, 1.5e-13.
    for (const [x, cdf, logcdf] of MPMATH_BAND) {
      expectClose(normalCdf(x), cdf, { rtol: 5e-15, source: `mpmath 1.2.1 ncdf(${x}), 40 digits` });
      expectClose(logNormalCdf(x), logcdf, { rtol: 5e-15, source: `mpmath 1.2.1 log(ncdf(${x})), 40 digits` });
    }
  });

  it('keeps ln Φ finite far in the lower tail, where Φ underflows', () => {
    // scipy 1.10.1 norm.logcdf(-40) = -804.6084420137539
    expectClose(logNormalCdf(-40), -804.6084420137539, { rtol: 1e-13, source: 'computed with scipy 1.10.1 norm.logcdf(-40)' });
    expect(normalCdf(-40)).toBeLessThan(1e-300);
  });

  it('agrees with ln of normalCdf where both are representable', () => {
    for (const x of [-5, -2.5, -1.9, -0.3, 0.7, 3]) {
      expectClose(logNormalCdf(x), Math.log(normalCdf(x)), { rtol: 1e-13, source: 'identity ln Φ = ln(Φ), internal consistency' });
    }
  });
});
