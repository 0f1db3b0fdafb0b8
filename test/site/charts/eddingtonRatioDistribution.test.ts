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

  it('never counts a lower-limit or unflagged bound as a detection: lower limits get their own stacked part, named in the caption', () => {
    // 10 measured ratios, 3 lower limits and 2 bounds without a direction flag, all in the bin [-0.5, -0.25)
    const rows = [
      ...Array.from({ length: 10 }, (_, i) => ({ id: `D${i}`, log_edd_ratio: -0.45, log_edd_ratio_p16: -0.6, log_edd_ratio_p84: -0.3, log_edd_ratio_is_limit: false, flags: '' })),
      ...Array.from({ length: 3 }, (_, i) => ({ id: `L${i}`, log_edd_ratio: -0.4, log_edd_ratio_p16: null, log_edd_ratio_p84: null, log_edd_ratio_is_limit: true, flags: 'mbh_upper_limit,edd_ratio_lower_limit' })),
      ...Array.from({ length: 2 }, (_, i) => ({ id: `U${i}`, log_edd_ratio: -0.3, log_edd_ratio_p16: null, log_edd_ratio_p84: null, log_edd_ratio_is_limit: true, flags: '' })),
    ];
    const el = eddingtonRatioDistribution(rows, { document: testDocument(), highlightIds: ['L0'] });
    const [det] = heights(el, 'detections bin');
    const [up] = heights(el, 'upper limits bin');
    const [low] = heights(el, 'lower limits bin');
    expect(heights(el, 'detections bin')).toHaveLength(1);
    // bar heights are proportional to counts: 10 detections, 2 upper limits, 3 lower limits
    expect(up! / det!).toBeCloseTo(2 / 10, 2);
    expect(low! / det!).toBeCloseTo(3 / 10, 2);
    expect(markElements(el, 'highlighted lower limit')).toHaveLength(1);
    expect(markElements(el, 'highlighted object')).toHaveLength(0);
    expect(el.textContent).toContain('bounds are not counted as detections');
    expect(el.textContent).toContain('lower limits on top of them (their true values lie further right)');
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
