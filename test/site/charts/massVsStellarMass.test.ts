import { describe, expect, it } from 'vitest';
import { getLocalRelation, localLogMbh } from '../../../src/core/local/index.ts';
import { authorYear } from '../../../src/site/charts/authorYear.ts';
import { massVsStellarMass } from '../../../src/site/charts/massVsStellarMass.ts';
import { relationCurves } from '../../../src/site/charts/relationLines.ts';
import { expectClose } from '../../helpers/expectClose.ts';
import { fakeRows, markElements, svgOf, testDocument } from './fakeRows.ts';

const settings = { localRelation: 'rv15_agn' as const };

describe('massVsStellarMass', () => {
  it('draws one point per row with both masses that is not a limit, and limits as limit symbols', () => {
    const rows = fakeRows({ n: 45, limitEvery: 5, missingEvery: 9 });
    // rows 0, 9, 18, 27, 36 lack M*; rows 4, 9, 14, …, 44 are limits (9 of them, one of which lacks M*)
    const el = massVsStellarMass(rows, { document: testDocument(), settings });
    expect(svgOf(el).tagName.toLowerCase()).toBe('svg');
    expect(markElements(el, 'catalog point')).toHaveLength(45 - 5 - 8);
    expect(markElements(el, 'upper limit')).toHaveLength(8);
    expect(markElements(el, 'catalog error bar y')).toHaveLength(32);
    expect(markElements(el, 'catalog error bar x')).toHaveLength(40);
  });

  it('labels the catalog relation and another with author and year', () => {
    const el = massVsStellarMass(fakeRows({ n: 30 }), { document: testDocument(), settings });
    const labels = markElements(el, 'relation label').map((t) => t.textContent);
    expect(labels).toEqual(['Reines & Volonteri 2015', 'Kormendy & Ho 2013']);
    const legend = markElements(el, 'legend label').map((t) => t.textContent ?? '');
    expect(legend.some((l) => l.includes('Reines & Volonteri 2015') && l.includes('(catalog)'))).toBe(true);
  });

  it('puts a relation label on the side of its line with fewer objects, off the data', () => {
    // invented rows: every object lies well above both relations
    const rows = Array.from({ length: 30 }, (_, i) => ({ id: `A-${i}`, log_mstar: 9 + i * 0.07, log_mbh: 9.5 + (i % 5) * 0.1 }));
    const el = massVsStellarMass(rows, { document: testDocument(), settings });
    const groups = [...el.querySelectorAll('g.census-relation-label')];
    expect(groups.length).toBeGreaterThan(0);
    for (const g of groups) {
      const m = /translate\(([-\d.]+),\s*([-\d.]+)\)/.exec(g.getAttribute('transform') ?? '');
      expect(Number(m?.[2])).toBeGreaterThan(0); // below the line: the data lie above it
    }
  });

  it('draws each relation from src/core/local with a band of ± its intrinsic scatter', () => {
    const curves = relationCurves('rv15_agn', ['kh13_mbulge'], [8, 11]);
    expect(curves.map((c) => c.relation.id)).toEqual(['rv15_agn', 'kh13_mbulge']);
    const rv = getLocalRelation('rv15_agn');
    for (const p of curves[0]!.line) expectClose(p.y, localLogMbh(rv, p.x), { atol: 1e-12, source: 'internal: same record' });
    // the RV15 AGN fit is calibrated over 9.5–12 (record's validity): below it the line is marked extrapolated
    expect(curves[0]!.line.filter((p) => !p.inRange).map((p) => p.x)).toEqual([8, 9.5]);
    const b = curves[0]!.band[0]!;
    expectClose(b.hi - b.lo, 2 * rv.scatterDex, { atol: 1e-12, source: 'internal: band is ± scatterDex' });
  });

  it('skips a σ-based catalog relation and says so in the caption', () => {
    const el = massVsStellarMass(fakeRows({ n: 10 }), { document: testDocument(), settings: { localRelation: 'kh13_sigma' } });
    expect(markElements(el, 'relation label').map((t) => t.textContent)).toEqual(['Reines & Volonteri 2015', 'Kormendy & Ho 2013']);
    expect(el.textContent).toContain('is not drawn here');
  });

  it('draws highlighted and new objects on top', () => {
    const rows = fakeRows({ n: 12 });
    const el = massVsStellarMass(rows, { document: testDocument(), settings, highlightIds: ['FAKE-00001'], extra: [{ id: 'N', log_mstar: 9, log_mbh: 8 }] });
    expect(markElements(el, 'highlighted object')).toHaveLength(1);
    expect(markElements(el, 'new object')).toHaveLength(1);
    const order = [...svgOf(el).querySelectorAll('g[class]')].map((g) => g.getAttribute('class'));
    expect(order.indexOf('census-new-object')).toBeGreaterThan(order.indexOf('census-catalog-point'));
    expect(order.indexOf('census-highlighted-object')).toBeGreaterThan(order.indexOf('census-catalog-point'));
  });
});

describe('authorYear', () => {
  it('keeps the authors and year of a reference', () => {
    expect(authorYear('Reines & Volonteri 2015, ApJ 813, 82, eq. 4')).toBe('Reines & Volonteri 2015');
    expect(authorYear('Someone et al. 2023b, MNRAS 1, 2')).toBe('Someone et al. 2023b');
    expect(authorYear('no year here')).toBe('no year here');
  });
});
