import { assertInCurveRange, type DustCurveInfo } from './dustCurve.ts';
import { evalSpline, notAKnotSpline, type CubicSpline } from './notAKnotSpline.ts';

/**
 * The Gordon et al. 2003 SMC-bar average curve as data: Fitzpatrick & Massa (1990) form in
 * the UV, a cubic spline through optical/NIR anchor points below `uvCutMicronInv`
 * (the construction of Fitzpatrick 1999, PASP 111, 63).
 */
export interface SmcGordon03Curve extends DustCurveInfo {
  /**
   * FM90 parameters: E(λ−V)/E(B−V) = c1 + c2·x + c3·D(x; x0, γ) + c4·F(x), with
   * D = x²/((x² − x0²)² + x²γ²) and F = f2(x − fX0)² + f3(x − fX0)³ for x ≥ fX0, else 0.
   */
  readonly fm: {
    readonly c1: number; readonly c2: number; readonly c3: number; readonly c4: number;
    readonly x0: number; readonly gamma: number;
    readonly fX0: number; readonly f2: number; readonly f3: number;
  };
  /** Wavenumber above which the FM form is used, µm⁻¹ (1/0.27 µm). */
  readonly uvCutMicronInv: number;
  /** Extra spline anchors taken from the FM form, wavelengths in Å. */
  readonly uvAnchorAngstrom: readonly number[];
  /** Optical/NIR anchors: wavelength (µm) and A(λ)/A(V), long to short wavelength. */
  readonly optNirMicron: readonly number[];
  readonly optNirAOverAv: readonly number[];
}

/**
 * Gordon et al. 2003 (ApJ 594, 279) SMC bar average, R_V = 2.74 (Table 3 FM parameters,
 * Table 4 optical/NIR averages). All numbers below are transcribed from memory of the
 * paper and of the `dust_extinction` package's G03_SMCBar model (BSD-3); confirm against
 * the paper before quoting SMC-corrected values to better than a few per cent.
 */
export const SMC_GORDON03: SmcGordon03Curve = {
  id: 'smc',
  label: 'Gordon et al. 2003 SMC bar, R_V = 2.74',
  rv: 2.74,
  validityAngstrom: [1000, 1e4 / 0.3],
  reference: 'Gordon et al. 2003, ApJ 594, 279, Tables 3 and 4 (SMC bar average, R_V = 2.74)',
  notes:
    'From memory (confirm against the paper). FM90 UV form (Fitzpatrick & Massa 1990, ApJS 72, 163) with x0 = 4.6, γ = 1; ' +
    'optical/NIR by a not-a-knot cubic spline in x through A=0 at x=0, the anchors below and the FM values at 2700 and 2600 Å. ' +
    'The K and J anchors (0.11, 0.25) are the smoothed values of Gordon et al. 2016 (ApJ 826, 104), not the raw 0.016, 0.131.',
  fm: { c1: -4.959, c2: 2.264, c3: 0.389, c4: 0.461, x0: 4.6, gamma: 1.0, fX0: 5.9, f2: 0.5392, f3: 0.05644 },
  uvCutMicronInv: 1e4 / 2700,
  uvAnchorAngstrom: [2700, 2600],
  optNirMicron: [2.198, 1.65, 1.25, 0.81, 0.65, 0.55, 0.44, 0.37],
  optNirAOverAv: [0.11, 0.169, 0.25, 0.567, 0.801, 1.0, 1.374, 1.672],
};

/** FM90 E(λ−V)/E(B−V) at wavenumber x, µm⁻¹. */
function fm90(x: number): number {
  const p = SMC_GORDON03.fm;
  const x2 = x * x;
  const drude = x2 / ((x2 - p.x0 * p.x0) ** 2 + x2 * p.gamma * p.gamma);
  const d = x - p.fX0;
  const far = d > 0 ? p.f2 * d * d + p.f3 * d * d * d : 0;
  return p.c1 + p.c2 * x + p.c3 * drude + p.c4 * far;
}

function buildSpline(): CubicSpline {
  const c = SMC_GORDON03;
  const xs = [0, ...c.optNirMicron.map((l) => 1 / l)];
  const ys = [0, ...c.optNirAOverAv.map((r) => r * c.rv)];
  for (const lam of c.uvAnchorAngstrom) {
    const x = 1e4 / lam;
    xs.push(x);
    ys.push(fm90(x) + c.rv);
  }
  return notAKnotSpline(xs, ys);
}

// Built once at load: 11 nodes, negligible cost, and kLambda stays allocation-free.
const OPT_NIR_SPLINE = buildSpline();

/**
 * Gordon et al. 2003 SMC-bar k(λ) = A_λ / E(B−V) (dimensionless).
 * @param lambdaAngstrom - rest wavelength, Å, within 1000–33333 Å (throws RangeError outside).
 */
export function smcGordon03K(lambdaAngstrom: number): number {
  assertInCurveRange(SMC_GORDON03, lambdaAngstrom);
  const x = 1e4 / lambdaAngstrom;
  return x >= SMC_GORDON03.uvCutMicronInv ? fm90(x) + SMC_GORDON03.rv : evalSpline(OPT_NIR_SPLINE, x);
}
