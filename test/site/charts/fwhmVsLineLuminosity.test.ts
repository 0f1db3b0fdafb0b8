import { describe, expect, it } from 'vitest';
import { fwhmVsLineLuminosity } from '../../../src/site/charts/fwhmVsLineLuminosity.ts';
import { fakeRows, markElements, svgOf, testDocument } from './fakeRows.ts';

describe('fwhmVsLineLuminosity', () => {
  it('draws Hα as circles and Hβ as triangles, one point per measured line', () => {
    const rows = fakeRows({ n: 30 });
    // every third row (10) has Hβ as well as Hα
    const el = fwhmVsLineLuminosity(rows, { document: testDocument() });
    expect(svgOf(el).tagName.toLowerCase()).toBe('svg');
    const pts = markElements(el, 'catalog point');
    expect(pts).toHaveLength(40);
    expect(pts.filter((p) => p.tagName.toLowerCase() === 'circle')).toHaveLength(30);
    expect(pts.filter((p) => p.tagName.toLowerCase() === 'path')).toHaveLength(10);
    expect(markElements(el, 'catalog error bar y')).toHaveLength(40);
  });

  it('draws an Hα flux upper limit as a leftward limit, not a point', () => {
    const rows = fakeRows({ n: 20, limitEvery: 4 });
    const el = fwhmVsLineLuminosity(rows, { document: testDocument() });
    expect(markElements(el, 'upper limit')).toHaveLength(5);
    // 20 Hα (5 of them limits) + 7 Hβ
    expect(markElements(el, 'catalog point')).toHaveLength(15 + 7);
  });

  it('draws new and highlighted objects', () => {
    const el = fwhmVsLineLuminosity(fakeRows({ n: 5 }), { document: testDocument(), highlightIds: ['FAKE-00001'], extra: [{ id: 'N', fwhm_halpha: 2000, log_lum_halpha: 42 }] });
    expect(markElements(el, 'highlighted object')).toHaveLength(1);
    expect(markElements(el, 'new object')).toHaveLength(1);
  });
});
