import { describe, expect, it } from 'vitest';
import { eddingtonRatioDistribution } from '../../../src/site/charts/eddingtonRatioDistribution.ts';
import { fakeRows, markElements, svgOf, testDocument } from './fakeRows.ts';

const heights = (el: Element, name: string) => markElements(el, name).map((r) => Number(r.getAttribute('height')));

describe('eddingtonRatioDistribution', () => {
  it('stacks the upper limits apart from the detections', () => {
    const rows = fakeRows({ n: 50, limitEvery: 5 });
    const el = eddingtonRatioDistribution(rows, { document: testDocument() });
    expect(svgOf(el).tagName.toLowerCase()).toBe('svg');
    const det = markElements(el, 'detections bin');
    const lim = markElements(el, 'upper limits bin');
    expect(det.length).toBeGreaterThan(3);
    expect(lim.length).toBeGreaterThan(0);
    expect(lim.every((r) => r.getAttribute('stroke-dasharray') !== null || r.parentElement?.getAttribute('stroke-dasharray') !== null)).toBe(true);
    expect(heights(el, 'detections bin').every((h) => h >= 0)).toBe(true);
  });

  it('marks highlighted and new objects with their percentile bars', () => {
    const rows = fakeRows({ n: 30 });
    const el = eddingtonRatioDistribution(rows, {
      document: testDocument(),
      highlightIds: ['FAKE-00003'],
      extra: [{ id: 'NEW', log_edd_ratio: 0.4, log_edd_ratio_p16: 0.1, log_edd_ratio_p84: 0.7 }],
    });
    expect(markElements(el, 'highlighted object')).toHaveLength(1);
    expect(markElements(el, 'new object')).toHaveLength(1);
    expect(markElements(el, 'marked error bar x')).toHaveLength(2);
  });

  it('has a bounded number of marks for a large selection', () => {
    const el = eddingtonRatioDistribution(fakeRows({ n: 20000, limitEvery: 4 }), { document: testDocument() });
    expect(markElements(el, 'detections bin').length).toBeLessThanOrEqual(12);
    expect(svgOf(el).querySelectorAll('circle').length).toBeLessThan(20);
  });
});
