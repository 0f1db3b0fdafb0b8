"""Reference values of test/core/population/fitRelation.test.ts: the selection bias E[M | detected] - mu and the
detectable fraction of a relation log M = alpha + beta (log M* - 10) with intrinsic scatter sigma, for detection
criteria linear in (true mass M, virial mass u, log Eddington ratio l):
  A = a0 + aM M + aL l >= 0                      (flux)
  B = b0 + bM M + bU u + bL l >= 0               (width; absent when noWidthCut)
with u = M + N(0, sc^2) (the calibration's scatter) and l ~ N(meanLog, sigmaLog^2).
Written from the model, not from the TypeScript: the means and covariance of (A, B) come from the coefficient matrix
(C Sigma C^T), the bivariate normal probability from Sheppard's one-dimensional integral
  Phi2(h, k; rho) = int_{-inf}^{h} phi(x) Phi((k - rho x) / sqrt(1 - rho^2)) dx,
and the expectations over M from scipy.integrate.quad over the whole real line (no grid, no truncation).
The flux-only cases are also printed in closed form (a probit selection of a normal variable:
P = Phi(t), E[M | detected] = mu + aM sigma^2 / s phi(t) / Phi(t), t = (a0 + aM mu + aL meanLog) / s,
s = sqrt(aM^2 sigma^2 + aL^2 sigmaLog^2)); the two agree to ~1e-13.
Run: /usr/bin/python3 scripts/reference/relationSelection.py   (numpy, scipy: Debian python3-numpy, python3-scipy)
"""
import numpy as np
import scipy
from scipy import integrate
from scipy.stats import norm

TIGHT = dict(epsabs=1e-14, epsrel=1e-13, limit=200)
ERDF = (-0.6, 0.4)  # meanLog, sigmaLog
SC = 0.3  # calibration scatter, dex
FLUX = dict(a0=-5.5, aM=1.0, aL=1.0)
WIDTH = dict(a0=-5.3, aM=1.0, aL=1.0, b0=-1.4, bM=-0.25, bU=0.5, bL=-0.25)
ALPHA, BETA, SIGMA = 6.4, 1.05, 0.5
M_STAR = [9.0, 9.5, 10.5, 11.0]
PRIOR = [1.0, 3.0, 2.0, 0.5]


def phi2(h, k, rho):
    """P(X <= h, Y <= k) for standard normals of correlation rho (Sheppard's integral)."""
    r = np.sqrt(1 - rho * rho)
    return integrate.quad(lambda x: norm.pdf(x) * norm.cdf((k - rho * x) / r), -np.inf, h, **TIGHT)[0]


def p_detect(c, mean, cov):
    """P(A >= 0 [, B >= 0]) for (M, u, l) ~ N(mean, cov)."""
    ca = np.array([c['aM'], 0.0, c['aL']])
    ma, va = c['a0'] + ca @ mean, ca @ cov @ ca
    if 'b0' not in c:
        return norm.cdf(ma / np.sqrt(va))
    cb = np.array([c['bM'], c['bU'], c['bL']])
    mb, vb, cab = c['b0'] + cb @ mean, cb @ cov @ cb, ca @ cov @ cb
    # P(A >= 0, B >= 0) = P(-A <= 0, -B <= 0) = Phi2(E A / sd A, E B / sd B; corr(A, B)).
    return phi2(ma / np.sqrt(va), mb / np.sqrt(vb), cab / np.sqrt(va * vb))


def bias(c, m):
    """E[M | detected] - mu at log M* = m: M ~ N(mu, sigma^2); given M, u ~ N(M, sc^2) and l independent."""
    mu = ALPHA + BETA * (m - 10)
    ml, sl = ERDF
    cov = np.diag([0.0, SC * SC, sl * sl])
    p = lambda M: p_detect(c, np.array([M, M, ml]), cov)
    w = lambda M: norm.pdf(M, mu, SIGMA) * p(M)
    num = integrate.quad(lambda M: w(M) * (M - mu), -np.inf, np.inf, **TIGHT)[0]
    den = integrate.quad(w, -np.inf, np.inf, **TIGHT)[0]
    return num / den


def bias_closed(c, m):
    mu = ALPHA + BETA * (m - 10)
    ml, sl = ERDF
    s = np.sqrt(c['aM'] ** 2 * SIGMA ** 2 + c['aL'] ** 2 * sl ** 2)
    t = (c['a0'] + c['aM'] * mu + c['aL'] * ml) / s
    return c['aM'] * SIGMA ** 2 / s * norm.pdf(t) / norm.cdf(t)


def fraction(c):
    """Sum_j prior_j P(detected | M* = m_j) / Sum_j prior_j, with (M, u, l) jointly normal at each node."""
    ml, sl = ERDF
    cov = np.array([[SIGMA ** 2, SIGMA ** 2, 0.0], [SIGMA ** 2, SIGMA ** 2 + SC * SC, 0.0], [0.0, 0.0, sl * sl]])
    ps = [p_detect(c, np.array([ALPHA + BETA * (m - 10)] * 2 + [ml]), cov) for m in M_STAR]
    return float(np.dot(PRIOR, ps) / np.sum(PRIOR))


def fraction_quad_flux(c):
    """The flux-only fraction again, by integrating the probit over M (no moment algebra)."""
    ml, sl = ERDF
    tot = 0.0
    for m, pr in zip(M_STAR, PRIOR):
        mu = ALPHA + BETA * (m - 10)
        f = lambda M: norm.pdf(M, mu, SIGMA) * norm.cdf((c['a0'] + c['aM'] * M + c['aL'] * ml) / (abs(c['aL']) * sl))
        tot += pr * integrate.quad(f, -np.inf, np.inf, **TIGHT)[0]
    return tot / sum(PRIOR)


print('numpy', np.__version__, 'scipy', scipy.__version__)
print('selection bias at log M* = 9.5, flux only:', repr(bias(FLUX, 9.5)), ' closed form:', repr(bias_closed(FLUX, 9.5)))
print('selection bias at log M* = 9.5, flux and width:', repr(bias(WIDTH, 9.5)))
print('detectable fraction, flux only:', repr(fraction(FLUX)), ' by quadrature:', repr(fraction_quad_flux(FLUX)))
print('detectable fraction, flux and width:', repr(fraction(WIDTH)))
