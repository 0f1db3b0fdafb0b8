"""Reference values of test/core/population/autocorrelationTime.test.ts: emcee 3.1.6's integrated_time (c = 5) on the
Park-Miller chain the test builds (the same numbers to the last bit: the generator is exact in doubles).
emcee is not packaged by Debian: run with a venv that has it, e.g.
  python3 -m venv --system-site-packages /tmp/emcee-venv && /tmp/emcee-venv/bin/pip install emcee==3.1.6
  /tmp/emcee-venv/bin/python scripts/reference/autocorrelationEmcee.py
"""
import numpy as np
import emcee


def chain(steps, walkers, phi=0.8, offset=5.0, seed=12345):
    st = seed
    x = np.zeros(walkers)
    out = np.zeros((steps, walkers, 1))
    for s in range(steps):
        for w in range(walkers):
            st = (st * 16807) % 2147483647
            x[w] = phi * x[w] + (st / 2147483647 - 0.5)
            out[s, w, 0] = x[w] + offset
    return out


c = chain(3000, 6)
tau = lambda x: repr(emcee.autocorr.integrated_time(x, c=5, tol=0, quiet=True)[0])
print('emcee', emcee.__version__, 'numpy', np.__version__)
print('whole chain:', tau(c))
print('from step 500:', tau(c[500:]))
print('first four walkers:', tau(c[:, :4]))
