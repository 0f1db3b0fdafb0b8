import { describe, expect, it } from 'vitest';
import { PUBLISHED_DENSITIES } from '../../../src/core/population/publishedDensities.ts';
import { spaceDensityByRedshift, type DensityTotalRow } from '../../../src/site/charts/spaceDensityByRedshift.ts';
import { expectClose } from '../../helpers/expectClose.ts';
import { markElements, testDocument } from './fakeRows.ts';

type Scaled = Element & { scale(name: string): { apply(v: number): number; invert(v: number): number } };

// invented totals
const rows: DensityTotalRow[] = [
  { zLo: 4, zHi: 5, count: 90, n: 3e-5, nLo: 2.7e-5, nHi: 3.3e-5 },
  { zLo: 5, zHi: 7, count: 4, n: 5e-6, nLo: 2.6e-6, nHi: 9e-6 },
  { zLo: 7, zHi: 11, count: 0, n: 0, nLo: 0, nHi: null },
];

describe('spaceDensityByRedshift', () => {
  it('draws the published range as a band from 1e-5 to 1e-4 cMpc⁻³ over z > 4', () => {
    const el = spaceDensityByRedshift(rows, { document: testDocument(), published: PUBLISHED_DENSITIES });
    const [rect] = markElements(el, 'published density band');
    const s = el as unknown as Scaled;
    const y0 = Number(rect!.getAttribute('y'));
    const h = Number(rect!.getAttribute('height'));
    // Ma et al. 2025 (arXiv:2509.02662), abstract: ~1e-5–1e-4 cMpc^-3 at z > 4
    expectClose(s.scale('y').invert(y0), 1e-4, { rtol: 1e-2, source: 'Ma et al. 2025, arXiv:2509.02662, abstract' });
    expectClose(s.scale('y').invert(y0 + h), 1e-5, { rtol: 1e-2, source: 'Ma et al. 2025, arXiv:2509.02662, abstract' });
    expectClose(s.scale('x').invert(Number(rect!.getAttribute('x'))), 4, { atol: 1e-3, source: 'Ma et al. 2025: z > 4' });
    expect(el.textContent).toContain('arXiv:2509.02662');
  });

  it('draws one point with a Poisson bar per range with objects, and nothing for an empty range without a limit', () => {
    const el = spaceDensityByRedshift(rows, { document: testDocument(), published: PUBLISHED_DENSITIES });
    expect(markElements(el, 'total density')).toHaveLength(2);
    expect(markElements(el, 'poisson interval')).toHaveLength(2);
    expect(markElements(el, 'redshift range')).toHaveLength(2);
  });

  it('is the same SVG for the same rows', () => {
    const a = spaceDensityByRedshift(rows, { document: testDocument(), published: PUBLISHED_DENSITIES });
    const b = spaceDensityByRedshift(rows, { document: testDocument(), published: PUBLISHED_DENSITIES });
    // Plot numbers its clip paths per call; everything else must match
    const stable = (html: string) => html.replace(/plot-clip-\d+/g, 'plot-clip');
    expect(stable(a.outerHTML) === stable(b.outerHTML)).toBe(true);
    expect(a.outerHTML.length).toBeGreaterThan(1000);
  });
});
