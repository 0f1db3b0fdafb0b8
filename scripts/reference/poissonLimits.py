"""Reference values of test/core/population/poissonInterval.test.ts: the exact Poisson limits of Gehrels 1986 eqs. 1-2
as roots of the regularized incomplete gamma functions, computed with mpmath 1.2.1 (Debian python3-mpmath) at 50 digits:
  upper limit: Q(n + 1, lam) = Phi(-S)   (P(N <= n | lam) = Q(n + 1, lam))
  lower limit: P(n, lam)     = Phi(-S)   (P(N >= n | lam) = P(n, lam)), 0 for n = 0
each by 400 bisections of [0, 4n + 60]; printed by repr(float(root)).
  /usr/bin/python3 scripts/reference/poissonLimits.py
"""
import mpmath as mp

mp.mp.dps = 50


def root(f, target, increasing):
    lo, hi = mp.mpf(0), mp.mpf(1)
    while (f(hi) < target) == increasing:
        hi *= 2
    for _ in range(400):
        mid = (lo + hi) / 2
        if (f(mid) < target) == increasing:
            lo = mid
        else:
            hi = mid
    return (lo + hi) / 2


def limits(n, s):
    alpha = mp.ncdf(-mp.mpf(s))
    upper = root(lambda lam: mp.gammainc(n + 1, lam, mp.inf, regularized=True), alpha, False)
    lower = mp.mpf(0) if n == 0 else root(lambda lam: mp.gammainc(n, 0, lam, regularized=True), alpha, True)
    return float(lower), float(upper)


print('mpmath', mp.__version__)
# The table MPMATH: counts up to 400 and S from 0.5 to 6.
for n, s in [(1, 1), (3, 1), (5, 2), (20, 1), (50, 3), (100, 1), (400, 2), (0, 0.5), (7, 0.5), (0, 3), (0, 6), (1, 3),
             (2, 4), (1, 5), (10, 5)]:
    lo, up = limits(n, s)
    print(f'  {{ n: {n}, sigmas: {s}, lower: {lo!r}, upper: {up!r} }},')
# The table MPMATH_NARROW:
# Widths S far below 1 (Phi(-S) near 1/2): the bisection then meets means below n for the upper limit and above n
# for the lower one, where a wrong tail sum can change its direction.
for n, s in [(1, 0.01), (2, 0.01), (5, 0.01), (21, 0.01), (30, 0.05), (13, 0.02), (40, 0.01)]:
    lo, up = limits(n, s)
    print(f'  {{ n: {n}, sigmas: {s}, lower: {lo!r}, upper: {up!r} }},')
