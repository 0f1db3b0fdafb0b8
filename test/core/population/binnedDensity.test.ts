import { describe, expect, it } from 'vitest';
import { binnedDensity, type DensityMember } from '../../../src/core/population/binnedDensity.ts';
import { expectClose } from '../../helpers/expectClose.ts';

// Gehrels 1986, ApJ 303, 336, Tables 1–2, S = 1 (CL 0.8413), as computed with astropy 5.2.1
// poisson_conf_interval(n, 'frequentist-confidence') to 9 digits (see poissonInterval.test.ts).
const UPPER = [1.84102165, 3.29952656, 4.63785962];
const LOWER = [0, 0.17275378, 0.70818544];
const GEHRELS = { rtol: 1e-7, source: 'Gehrels 1986 Tables 1–2 (S = 1), astropy 5.2.1 to 9 digits' };

const member = (x: number, vmaxCmpc3: number, xDraws: number[] = []): DensityMember => ({ x, vmaxCmpc3, xDraws });

// Computed inside each test (not once per file) so that a mutation run sees every test use the code.
const sample = () =>
  binnedDensity([member(6.2, 1e5), member(6.5, 2e5), member(6.999, 1e6), member(7.2, 4e5), member(8, 1e3), member(5.99, 1e3)], [6, 6.5, 7, 8], 1e7);

describe('binnedDensity', () => {

  it('sums 1/V_max over the members in each bin and divides by the bin width (Schmidt 1968)', () => {
    const bins = sample();
    expect(bins.map((b) => [b.lo, b.hi, b.count])).toEqual([[6, 6.5, 1], [6.5, 7, 2], [7, 8, 1]]);
    // Closed form: Σ 1/V_max / Δx. A value on a bin's lower edge belongs to that bin; the last edge (8) and
    // anything below the first are outside.
    expectClose(bins[0]!.phi, 1e-5 / 0.5, { rtol: 1e-14, source: 'Schmidt 1968 1/V_max, closed form' });
    expectClose(bins[1]!.phi, (1 / 2e5 + 1 / 1e6) / 0.5, { rtol: 1e-14, source: 'Schmidt 1968 1/V_max, closed form' });
    expectClose(bins[2]!.phi, 1 / 4e5 / 1, { rtol: 1e-14, source: 'Schmidt 1968 1/V_max, closed form' });
  });

  it('scales the Poisson 1σ limits of the count by phi per object', () => {
    const bins = sample();
    const b = bins[1]!;
    expectClose(b.phiHi, (UPPER[2]! * b.phi) / 2, GEHRELS);
    expectClose(b.phiLo, (LOWER[2]! * b.phi) / 2, GEHRELS);
    expectClose(bins[0]!.phiHi, UPPER[1]! * bins[0]!.phi, GEHRELS);
    expectClose(bins[0]!.phiLo, LOWER[1]! * bins[0]!.phi, GEHRELS);
  });

  it('gives an empty bin zero density and an upper limit of 1.841 objects in the whole volume', () => {
    const [b] = binnedDensity([member(7.5, 1e5)], [6, 6.5, 8], 2e7);
    expect(b!.count).toBe(0);
    expect(b!.phi).toBe(0);
    expect(b!.phiLo).toBe(0);
    expectClose(b!.phiHi, UPPER[0]! / (2e7 * 0.5), GEHRELS);
    // No members at all: every bin empty, no draws.
    const empty = binnedDensity([], [6, 7], 1e7);
    expect(empty.map((e) => [e.count, e.phi, e.phiP16])).toEqual([[0, 0, null]]);
  });

  it('has no draw percentiles without draws', () => {
    const bins = sample();
    expect(bins[0]!.phiP16).toBeNull();
    expect(bins[0]!.phiP84).toBeNull();
  });

  it('bins each draw of each member, so the draw percentiles follow members moving between bins', () => {
    // Two members, five draws each (numpy 'linear' percentiles of five values: p16 at rank 0.64, p84 at rank 3.36).
    // Bin [6.5, 7), Δx = 0.5: draw k holds member A (1/1e5) when its draw is inside, member B (1/2e5) likewise.
    const a = member(6.55, 1e5, [6.6, 6.7, 7.1, 6.8, 6.9]);
    const b = member(6.6, 2e5, [6.6, 5.5, 6.7, 6.8, 7.5]);
    const [bin] = binnedDensity([a, b], [6.5, 7], 1e7);
    const perDraw = [1e-5 + 5e-6, 1e-5, 5e-6, 1e-5 + 5e-6, 1e-5].map((v) => v / 0.5).sort((x, y) => x - y);
    const lerp = (h: number) => perDraw[Math.floor(h)]! + (h - Math.floor(h)) * (perDraw[Math.floor(h) + 1]! - perDraw[Math.floor(h)]!);
    expectClose(bin!.phiP16!, lerp(0.64), { rtol: 1e-12, source: "numpy 'linear' percentile of the per-draw sums, closed form" });
    expectClose(bin!.phiP84!, lerp(3.36), { rtol: 1e-12, source: "numpy 'linear' percentile of the per-draw sums, closed form" });
    expectClose(bin!.phi, (1e-5 + 5e-6) / 0.5, { rtol: 1e-14, source: 'Schmidt 1968 1/V_max, closed form' });
  });
});
