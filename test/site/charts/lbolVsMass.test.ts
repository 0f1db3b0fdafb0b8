import { describe, expect, it } from 'vitest';
import { L_EDD_PER_MSUN_CONVENTIONAL } from '../../../src/core/constants/eddington.ts';
import { EDDINGTON_RATIOS, eddingtonSegments, logLbolAtEddington } from '../../../src/site/charts/eddingtonLines.ts';
import { chartPoints } from '../../../src/site/charts/chartPoints.ts';
import { lbolVsMass } from '../../../src/site/charts/lbolVsMass.ts';
import { DENSITY_BINS } from '../../../src/site/charts/scatterLayers.ts';
import { hasFlag } from '../../../src/site/charts/rowValues.ts';
import { expectClose } from '../../helpers/expectClose.ts';
import { fakeRows, markElements, svgOf, testDocument } from './fakeRows.ts';

const settings = { eddingtonPerMsun: L_EDD_PER_MSUN_CONVENTIONAL };

describe('lbolVsMass', () => {
  it('returns a chart with an svg inside', () => {
    const el = lbolVsMass(fakeRows({ n: 10 }), { document: testDocument(), settings });
    expect(svgOf(el).tagName.toLowerCase()).toBe('svg');
  });

  it('draws one point per row that is not a limit and one limit symbol per limit row', () => {
    const rows = fakeRows({ n: 40, limitEvery: 5 });
    const limits = rows.filter((r) => hasFlag(r, 'mbh_upper_limit') || hasFlag(r, 'lbol_upper_limit')).length;
    expect(limits).toBe(8);
    const el = lbolVsMass(rows, { document: testDocument(), settings });
    expect(markElements(el, 'catalog point')).toHaveLength(40 - limits);
    expect(markElements(el, 'upper limit')).toHaveLength(limits);
  });

  it('draws error bars on both axes for the detections', () => {
    const rows = fakeRows({ n: 30, limitEvery: 6 });
    const el = lbolVsMass(rows, { document: testDocument(), settings });
    expect(markElements(el, 'catalog error bar x')).toHaveLength(25);
    expect(markElements(el, 'catalog error bar y')).toHaveLength(25);
  });

  it('draws highlighted and new objects in their own marks, with legend entries', () => {
    const rows = fakeRows({ n: 20 });
    const el = lbolVsMass(rows, {
      document: testDocument(),
      settings,
      highlightIds: ['FAKE-00002', 'FAKE-00004'],
      extra: [{ id: 'NEW-1', log_mbh: 7.2, log_lbol: 45.1, log_mbh_p16: 6.9, log_mbh_p84: 7.5 }],
    });
    expect(markElements(el, 'catalog point')).toHaveLength(18);
    expect(markElements(el, 'highlighted object')).toHaveLength(2);
    expect(markElements(el, 'new object')).toHaveLength(1);
    expect(markElements(el, 'new object error bar x')).toHaveLength(1);
    const legend = markElements(el, 'legend label').map((t) => t.textContent);
    expect(legend).toContain('Highlighted');
    expect(legend).toContain('New object');
  });

  it('draws a large selection as a density, not one mark per row', () => {
    const rows = fakeRows({ n: 12000, limitEvery: 10 });
    const el = lbolVsMass(rows, { document: testDocument(), settings });
    expect(markElements(el, 'catalog point')).toHaveLength(0);
    const cells = markElements(el, 'density');
    expect(cells.length).toBeGreaterThan(0);
    expect(cells.length).toBeLessThanOrEqual(DENSITY_BINS[0] * DENSITY_BINS[1]);
    expect(svgOf(el).querySelectorAll('circle').length).toBeLessThan(100);
  });

  it('puts the λ = 1 line at log L = log(1.26e38) + 8 at log M = 8', () => {
    // log10(1.26e38) + 8 = 46.100370545 (computed: L_Edd per Msun from Shen et al. 2011, ApJS 194, 45)
    expectClose(logLbolAtEddington(8, 1, 1.26e38), 46.100370545, { atol: 1e-9, source: 'computed: log10(1.26e38) + 8' });
    expectClose(logLbolAtEddington(8, 0.01, 1.26e38), 44.100370545, { atol: 1e-9, source: 'computed: log10(0.01 × 1.26e38) + 8' });
    const segs = eddingtonSegments(EDDINGTON_RATIOS, 1.26e38, [6, 10], [43, 48]);
    const one = segs.find((s) => s.lambda === 1)!;
    const yAt8 = one.y1 + ((8 - one.x1) * (one.y2 - one.y1)) / (one.x2 - one.x1);
    expectClose(yAt8, 46.100370545, { atol: 1e-9, source: 'computed: log10(1.26e38) + 8' });
  });

  it('keeps every λ label at least a tenth of the frame inside its top and right edges (the λ = 1 label was clipped)', () => {
    const x: [number, number] = [6, 9];
    const y: [number, number] = [43.5, 46.6];
    for (const seg of eddingtonSegments(EDDINGTON_RATIOS, 1.26e38, x, y)) {
      expect(seg.labelX).toBeLessThanOrEqual(x[1] - 0.1 * (x[1] - x[0]) + 1e-9);
      expect(seg.labelY).toBeLessThanOrEqual(y[1] - 0.1 * (y[1] - y[0]) + 1e-9);
      expect(seg.labelX).toBeGreaterThanOrEqual(seg.x1);
    }
  });

  it('draws the λ = 1 line through the pixel of (8, log 1.26e38 + 8)', () => {
    const rows = fakeRows({ n: 50 });
    const el = lbolVsMass(rows, { document: testDocument(), settings });
    const paths = markElements(el, 'constant Eddington ratio');
    expect(paths.length).toBeGreaterThanOrEqual(3);
    const x = (el as unknown as { scale(n: string): { apply(v: number): number } }).scale('x');
    const y = (el as unknown as { scale(n: string): { apply(v: number): number } }).scale('y');
    const px = x.apply(8);
    const py = y.apply(Math.log10(1.26e38) + 8);
    // some segment's straight path passes within half a pixel of the point
    const hits = paths.filter((p) => {
      const nums = (p.getAttribute('d') ?? '').match(/-?\d+(\.\d+)?(e-?\d+)?/g)!.map(Number);
      const [x1, y1, x2, y2] = nums as [number, number, number, number];
      if (px < Math.min(x1, x2) || px > Math.max(x1, x2)) return false;
      return Math.abs(y1 + ((px - x1) * (y2 - y1)) / (x2 - x1) - py) < 0.5;
    });
    expect(hits).toHaveLength(1);
  });

  it('has a hover layer and records every point with its id for mountChart', () => {
    const el = lbolVsMass(fakeRows({ n: 3 }), { document: testDocument(), settings, extra: [{ id: 'NEW-1', log_mbh: 7, log_lbol: 45 }] });
    expect(el.querySelector('g.census-hover')).not.toBeNull();
    const index = chartPoints(el)!;
    expect(index.points.map((p) => `${p.id}:${p.role}`)).toEqual(['FAKE-00000:population', 'FAKE-00001:population', 'FAKE-00002:population', 'NEW-1:extra']);
  });
});
