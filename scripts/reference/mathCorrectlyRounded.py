"""Correctly rounded references for src/core/math (fdlibm ports), from Python's decimal module.

decimal's exp, ln and log10 are correctly rounded at the working precision (Python docs, decimal
module); at 80 digits and then one rounding to a double (float(Decimal) rounds correctly) the
result is the correctly rounded double except in cases within 1e-60 relative of a tie. For each
argument the script also gives the residual (true value - rounded double) in units of the
double's last place, so a test can measure a function's error in ulps.

Run with /usr/bin/python3 (3.11, Debian); writes JSON to stdout:
  /usr/bin/python3 scripts/reference/mathCorrectlyRounded.py > test/core/math/correctlyRounded.json
"""
import json
import math
import random
import sys
from decimal import Decimal, getcontext

getcontext().prec = 80
D = Decimal


def ulp(x: float) -> float:
    return math.ulp(x)


def ref(true: Decimal):
    r = float(true)
    if r == 0 or math.isinf(r):
        return [r, 0.0]
    return [r, float((true - D(r)) / D(ulp(r)))]


def f_log(x):
    return D(x).ln()


def f_log10(x):
    return D(x).log10()


def f_log1p(x):
    return (D(x) + 1).ln()


def f_exp(x):
    return D(x).exp()


def f_expm1(x):
    return D(x).exp() - 1


rng = random.Random(20261202)
args = {}
# log, log10: the whole positive range, subnormals, near 1 (|f| < 2^-20), near powers of two and ten.
near = [1 + 2.0**-52, 1 + 2.0**-40, 1 - 2.0**-53, 1 + 2.0**-20, 1 + 3 * 2.0**-21, 1 + 2.0**-21, 1 - 2.0**-22, 1 + 1e-9, 1 - 1e-9, 2 + 2.0**-20, 0.5 - 2.0**-25, 1.5, 0.75, 1.4142135623730951, 0.7071067811865476]
wide = [math.exp(rng.uniform(-700, 700)) for _ in range(300)]
mid = [rng.uniform(0.5, 3.0) for _ in range(300)]
sub = [5e-324, 1e-320, 1e-310, 2.2250738585072e-308, 3.3e-315]
args['log'] = near + wide + mid + sub + [2.0**k for k in (-1000, -1, 1, 2, 3, 600)] + [2.0**k * (1 + 2.0**-30) for k in (-3, 4, 90)]
args['log10'] = near + wide + mid + sub + [2 - 2.0**-30, 8 - 2.0**-35, 1024 - 2.0**-30, 2 - 2.0**-50] + [10.0**k * (1 + 1e-15) for k in (1, 5, 15)] + [0.1, 0.001, 1e-5, 1e-300, 2.0, 1024.0]
# log1p: tiny (|x| < 2^-29), 1+x in [sqrt(2)/2, sqrt(2)) (k = 0), large (x >= 2^53), near -1, 1+x near a power of two.
args['log1p'] = (
    [1e-20, -1e-20, 1e-10, -1e-10, 2.0**-30, 1e-17, 2.0**-55, -(2.0**-55), 2.0**-54, 2.0**-40, -(2.0**-40), 2.0**-29, 2.0**-28]
    + [rng.uniform(-0.29, 0.41) for _ in range(200)]
    + [rng.uniform(-0.9999, -0.3) for _ in range(100)]
    + [math.exp(rng.uniform(-0.35, 120)) for _ in range(200)]
    + [1e17, 1e300, 2.0**53 + 2, 2.0**53, 2.0**53 - 1, 9.1e15, 0.4142135623730951, 0.41421356237309515, -0.2928932188134524, -0.29289321881345254, -0.9999999, 1 + 2.0**-25, 3 + 2.0**-19, 7 - 2.0**-18, 2.0**-20 + 1]
)
# exp: |x| < 2^-28, |x| <= ln2/2 (k = 0), ln2/2 < |x| < 1.5 ln2 (k = ±1), general k, k = 1024, subnormal results.
args['exp'] = (
    [1e-10, -1e-10, 2.0**-29, 1e-300]
    + [rng.uniform(-0.3465, 0.3465) for _ in range(150)]
    + [rng.uniform(0.35, 1.039) * rng.choice([-1, 1]) for _ in range(100)]
    + [rng.uniform(-700, 700) for _ in range(200)]
    + [709.7, 709.78, 709.782712893, 7.09782712893383973096e2, 709.78271289338397, -7.45133219101941108420e2, -745.1332191019411 + 1e-13, 0.3465735902799726, 0.34657359027997264, 1.0397207708399179, 1.039720770839918, -708.39641853226, -708.4, -708.5, -710, -720, -740, -745, -745.13]
)
# expm1: tiny, k = 0, k = ±1 (with x < -0.25 after reduction), 2 <= k < 20, 20 <= k <= 56, k > 56, k <= -2, k = 1024.
args['expm1'] = (
    [1e-20, -1e-20, 1e-17, 1e-10, -1e-10]
    + [rng.uniform(-0.3465, 0.3465) for _ in range(150)]
    + [rng.uniform(0.35, 1.039) * rng.choice([-1, 1]) for _ in range(100)]
    + [rng.uniform(1.04, 13.8) for _ in range(100)]
    + [rng.uniform(13.9, 38.9) for _ in range(60)]
    + [rng.uniform(39.1, 700) for _ in range(60)]
    + [rng.uniform(-38.8, -1.04) for _ in range(60)]
    + [709.7, 709.78, 7.09782712893383973096e2, 0.3465735902799726, 0.34657359027997264, 0.3465735912322998, 13.5, 13.86, 14.2, 38.8, 39.6, 40, -1.4, 0.6931471805599453 + 1e-9, 1.0397207708399179 - 1e-9, -0.6931471805599453]
)
# log10InPlace (src/core/math/log10.ts): both ends of each of its 128 intervals of the significand,
# at exponents from -1022 to 1023, and draws of the kind it takes (widths, fluxes, values near 1).
# Its own generator, so the cases above stay as they were.
rng_table = random.Random(20261203)
table = []
for i in range(128):
    for e in (-1022, -300, -60, -1, 0, 1, 9, 60, 1023):
        start = (1 + i / 128) * 2.0**e
        end = (1 + (i + 1) / 128) * 2.0**e
        table += [start, math.nextafter(end, 0), start * (1 + rng_table.random() / 128)]
table += [rng_table.uniform(300, 9000) for _ in range(400)]
table += [1e-18 * rng_table.uniform(0.1, 30) for _ in range(400)]
table += [1 + rng_table.uniform(-1, 1) * 2.0**-rng_table.randint(1, 52) for _ in range(400)]
table += [math.exp(rng_table.uniform(-700, 700)) for _ in range(400)]
args['log10_table'] = [x for x in table if math.isfinite(x) and x > 0]
fns = {'log': f_log, 'log10': f_log10, 'log1p': f_log1p, 'exp': f_exp, 'expm1': f_expm1, 'log10_table': f_log10}
out = {
    'source': 'Python 3.11 decimal module at 80 digits (exp, ln, log10 correctly rounded), rounded once to a double; residual = (true - double) / ulp(double)',
    'cases': {name: [[x, *ref(fns[name](x))] for x in xs] for name, xs in args.items()},
}
json.dump(out, sys.stdout, indent=None)
sys.stdout.write('\n')
