import { describe, expect, it } from 'vitest';
import { spaceDensityFunction, type DensityBinRow } from '../../../src/site/charts/spaceDensityFunction.ts';
import { expectClose } from '../../helpers/expectClose.ts';
import { markElements, testDocument } from './fakeRows.ts';

type Scaled = Element & { scale(name: string): { apply(v: number): number; invert(v: number): number } };

// invented bins: two redshift ranges, one empty bin (an upper limit), one bin without Monte Carlo percentiles
const rows: DensityBinRow[] = [
  { zLo: 4, zHi: 5, lo: 6, hi: 6.5, count: 3, phi: 2e-6, phiLo: 1e-6, phiHi: 4e-6, phiP16: 1.5e-6, phiP84: 3e-6 },
  { zLo: 4, zHi: 5, lo: 6.5, hi: 7, count: 20, phi: 1e-5, phiLo: 8e-6, phiHi: 1.2e-5, phiP16: 9e-6, phiP84: 1.1e-5 },
  { zLo: 4, zHi: 5, lo: 7, hi: 7.5, count: 0, phi: 0, phiLo: 0, phiHi: 4e-6, phiP16: 0, phiP84: 0 },
  { zLo: 5, zHi: 6, lo: 6, hi: 6.5, count: 1, phi: 5e-7, phiLo: 8.65e-8, phiHi: 1.15e-6, phiP16: null, phiP84: null },
];

describe('spaceDensityFunction', () => {
  it('draws a point and a Poisson bar per counted bin, a Monte Carlo bar where percentiles are known, an arrow per empty bin', () => {
    const el = spaceDensityFunction(rows, { document: testDocument(), quantity: 'log_mbh' });
    expect(markElements(el, 'density bin')).toHaveLength(3);
    expect(markElements(el, 'poisson interval')).toHaveLength(3);
    expect(markElements(el, 'monte carlo spread')).toHaveLength(2);
    expect(markElements(el, 'empty bin upper limit')).toHaveLength(1);
  });

  it('places each point at its Φ on a log axis', () => {
    const el = spaceDensityFunction(rows, { document: testDocument(), quantity: 'log_mbh' });
    const y = (el as unknown as Scaled).scale('y');
    const cy = markElements(el, 'density bin').map((e) => {
      const t = /translate\(([-\d.]+),([-\d.]+)\)/.exec(e.getAttribute('transform') ?? '');
      return t ? Number(t[2]) : Number(e.getAttribute('cy'));
    });
    const phis = cy.map((v) => y.invert(v)).sort((a, b) => a - b);
    [5e-7, 2e-6, 1e-5].forEach((p, i) => expectClose(phis[i]!, p, { rtol: 1e-3, source: 'internal: the rows given' }));
  });

  it('names one legend entry per redshift range and says what the bars are', () => {
    const el = spaceDensityFunction(rows, { document: testDocument(), quantity: 'log_lbol' });
    const legend = markElements(el, 'legend label').map((t) => t.textContent);
    expect(legend).toEqual(['4 ≤ z < 5', '5 ≤ z < 6', 'Poisson 1σ', 'Monte Carlo 16–84 %']);
    expect(el.textContent).toContain('Gehrels 1986');
    expect(el.textContent).toContain('bolometric correction');
  });

  it('is the same SVG for the same rows', () => {
    const a = spaceDensityFunction(rows, { document: testDocument(), quantity: 'log_mbh' });
    const b = spaceDensityFunction(rows, { document: testDocument(), quantity: 'log_mbh' });
    // Plot numbers its clip paths per call; everything else must match
    const stable = (html: string) => html.replace(/plot-clip-\d+/g, 'plot-clip');
    expect(stable(a.outerHTML) === stable(b.outerHTML)).toBe(true);
    expect(a.outerHTML.length).toBeGreaterThan(1000);
  });
});
