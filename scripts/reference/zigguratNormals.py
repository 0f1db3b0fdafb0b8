"""Independent transcription of the 128-layer ziggurat normal sampler (src/core/random/standardNormal.ts)
from its published descriptions, to pin the draws that take the wedge and tail tests.

- Marsaglia & Tsang 2000, "The Ziggurat Method for Generating Random Variables", J. Stat. Softw. 5(8):
  the layers x_1 = r, x_{i+1} = f^-1(v/x_i + f(x_i)) with f(x) = exp(-x^2/2), r = 3.442619855899 and
  v = 9.91256303526217e-3 for 128 layers; the base strip of width v/f(r); a point of layer i with
  |x| < x_{i+1} is accepted at once; otherwise, in the wedge, a height y uniform between the curve's
  heights at the layer's two edges is drawn and x accepted when y < f(x), else a new point is drawn
  from scratch.
- Marsaglia 1964 (Technometrics 6, 101) for the tail beyond r: x = -ln(U1)/r, y = -ln(U2) until
  2y > x^2; return r + x.
- Doornik 2005 ("An improved ziggurat method to generate normal random samples", Nuffield College,
  ZIGNOR): the layers numbered from the base (x[0] = v/f(r), x[1] = r, ..., x[128] = 0), the height in
  the wedge measured from the narrower edge, y = f(x[i+1]) + U (f(x[i]) - f(x[i+1])) (his test
  f1 + U (f0 - f1) < 1 divided through by f(x)), and the tail loop `while -2 ln U2 < x^2`. The project's
  own arrangement of the bits: one 32-bit word gives the layer (its low 7 bits) and the abscissa (its
  upper 25 bits, a signed uniform in (-1, 1) at the centres of 2^25 cells).

Every uniform U is a 32-bit word / 2^32 (the project's Rng.next), and U in the tail enters as 1 - U
(no log 0). The script writes a stream of words built so that most first words fall in a wedge or the
base strip's edge (the draws a density test barely sees, ~1 % of a random stream), then the deviates the
sampler must give for that stream, with the path each one took. Uses only Python's math module
(libm exp, log, sqrt: within an ulp, so tests compare to 1e-12 relative).

Run with /usr/bin/python3 (3.11, Debian):
  /usr/bin/python3 scripts/reference/zigguratNormals.py > test/core/random/zigguratReference.json
"""
import json
import math
import random

N = 128
R = 3.442619855899
V = 9.91256303526217e-3


def f(x):
    return math.exp(-0.5 * x * x)


# x[1..N-1] the right edges of the layers, counted from the base; x[0] the base strip's equivalent width.
x = [0.0] * (N + 1)
x[0] = V / f(R)
x[1] = R
for i in range(2, N):
    x[i] = math.sqrt(-2 * math.log(V / x[i - 1] + f(x[i - 1])))
x[N] = 0.0


def abscissa(word):
    """Doornik 2005: the upper 25 bits as a signed uniform at cell centres in (-1, 1)."""
    return ((word >> 7) + 0.5) * (2 / 2**25) - 1


class Words:
    def __init__(self, words):
        self.words = words
        self.pos = 0

    def word(self):
        w = self.words[self.pos]
        self.pos += 1
        return w

    def uniform(self):
        return self.word() / 2**32


def normal(src, path):
    while True:
        j = src.word()
        i = j & (N - 1)
        u = abscissa(j)
        xx = u * x[i]
        if abs(xx) < x[i + 1] if i > 0 else abs(xx) < R:
            path.append('core')
            return xx
        if i == 0:
            # Marsaglia 1964 tail beyond R, on the side of u.
            tries = 0
            while True:
                tries += 1
                a = -math.log(1 - src.uniform()) / R
                b = -math.log(1 - src.uniform())
                if not 2 * b < a * a:
                    break
            path.append('tail' if tries == 1 else 'Tail after a rejected pair')
            return -(R + a) if u < 0 else R + a
        # Marsaglia & Tsang 2000, measured from the narrower edge as Doornik 2005 does.
        y = f(x[i + 1]) + src.uniform() * (f(x[i]) - f(x[i + 1]))
        if y < f(xx):
            path.append('wedge')
            return xx
        path.append('reject')


def wedge_word(rng, tail):
    """A first word whose point lies in a wedge (layer 1..127, x[i+1] <= |u x[i]|) or, with `tail`, the base strip's edge."""
    while True:
        j = rng.getrandbits(32)
        if tail:
            j &= ~(N - 1)
        i = j & (N - 1)
        bound = x[i + 1] / x[i] if i > 0 else R / x[0]
        if abs(abscissa(j)) >= bound:
            return j


rng = random.Random(20261202)
words = []
for k in range(6000):
    # Two in three first words in a wedge or (two in five of those) the base strip's edge, then
    # uniforms for the tests that follow.
    words.append(wedge_word(rng, k % 5 < 2) if k % 3 else rng.getrandbits(32))
    words.append(rng.getrandbits(32))
    words.append(rng.getrandbits(32))
count = 3000
src = Words(words)
path = []
normals = [normal(src, path) for _ in range(count)]
used = src.pos
json.dump(
    {
        'source': 'scripts/reference/zigguratNormals.py (Python 3.11 math; Marsaglia & Tsang 2000, Marsaglia 1964, Doornik 2005)',
        # The words the draws take, padded to whole 512-word chunks (the bulk fill reads ahead).
        'words': words[: -(-used // 512) * 512],
        'wordsUsed': used,
        'normals': normals,
        'paths': ''.join(p[0] for p in path),
    },
    __import__('sys').stdout,
)
