import { describe, expect, it } from 'vitest';
import { getLocalRelation, localLogMbh } from '../../../src/core/local/index.ts';
import { relationBand } from '../../../src/core/population/relationBand.ts';
import { relationBehindSelection } from '../../../src/site/charts/relationBehindSelection.ts';
import { expectClose } from '../../helpers/expectClose.ts';
import { fakeRows, markElements, svgOf, testDocument } from './fakeRows.ts';

type Scaled = Element & { scale(name: string): { apply(v: number): number; invert(v: number): number } };

/** The data-space points of the first path of mark `name` ("M x,y L x,y …" in px), through the chart's scales. */
function lineData(el: Element, name: string): { x: number; y: number }[] {
  const d = markElements(el, name)[0]!.getAttribute('d')!;
  const s = el as unknown as Scaled;
  return [...d.matchAll(/[ML]\s*(-?[\d.]+)[ ,](-?[\d.]+)/g)].map((m) => ({ x: s.scale('x').invert(Number(m[1])), y: s.scale('y').invert(Number(m[2])) }));
}

const samples = {
  alpha: Float64Array.from({ length: 200 }, (_, k) => 6.8 + 0.2 * Math.sin(k)),
  beta: Float64Array.from({ length: 200 }, (_, k) => 1 + 0.1 * Math.cos(k)),
};
const band = relationBand(samples.alpha, samples.beta, [8, 9, 10, 11]);
const options = { band, naive: { alpha: 7.4, beta: 0.4 }, pivotLogMstar: 10, localRelation: 'rv15_agn' as const };

describe('relationBehindSelection', () => {
  it('draws one point per row with both masses, with bars', () => {
    const rows = fakeRows({ n: 30, missingEvery: 10 });
    const el = relationBehindSelection(rows, { document: testDocument(), ...options });
    expect(markElements(el, 'catalog point')).toHaveLength(27);
    expect(markElements(el, 'catalog error bar y')).toHaveLength(27);
    expect(el.textContent).toContain('27 objects shown; 3 without a stellar or black-hole mass not shown.');
  });

  it('draws the naive fit through α + β (log M* − pivot)', () => {
    const el = relationBehindSelection(fakeRows({ n: 20 }), { document: testDocument(), ...options });
    const line = lineData(el, 'naive fit');
    expect(line.length).toBeGreaterThanOrEqual(2);
    // Plot rounds path coordinates to 0.01 px: over a 400 px axis spanning a few dex that is < 1e-3 dex
    for (const p of line) expectClose(p.y, 7.4 + 0.4 * (p.x - 10), { atol: 2e-3, source: 'internal: the line the options name' });
  });

  it('draws the intrinsic relation at the band’s median and the local relation from its record', () => {
    const el = relationBehindSelection(fakeRows({ n: 20 }), { document: testDocument(), ...options });
    const mid = lineData(el, 'intrinsic relation');
    expect(mid.map((p) => Math.round(p.x * 1e3) / 1e3)).toEqual([8, 9, 10, 11]);
    mid.forEach((p, i) => expectClose(p.y, band[i]!.mid, { atol: 2e-3, source: 'internal: relationBand median' }));
    expect(markElements(el, 'intrinsic relation band')).toHaveLength(1);
    const rv = getLocalRelation('rv15_agn');
    for (const p of lineData(el, 'local relation')) expectClose(p.y, localLogMbh(rv, p.x), { atol: 2e-3, source: 'internal: src/core/local record' });
    const legend = markElements(el, 'legend label').map((t) => t.textContent ?? '');
    expect(legend).toEqual(expect.arrayContaining(['Intrinsic relation, selection-aware (68 % band)', 'Naive fit to the points']));
    expect(legend.some((l) => l.startsWith('Local: Reines & Volonteri 2015'))).toBe(true);
  });

  it('leaves out what it is not given: no band, no naive line', () => {
    const el = relationBehindSelection(fakeRows({ n: 10 }), { document: testDocument(), ...options, band: [], naive: null });
    expect(markElements(el, 'intrinsic relation')).toHaveLength(0);
    expect(markElements(el, 'naive fit')).toHaveLength(0);
    expect(svgOf(el).tagName.toLowerCase()).toBe('svg');
  });

  it('is the same SVG for the same rows and options', () => {
    const a = relationBehindSelection(fakeRows({ n: 25 }), { document: testDocument(), ...options });
    const b = relationBehindSelection(fakeRows({ n: 25 }), { document: testDocument(), ...options });
    // Plot numbers its clip paths per call; everything else must match
    const stable = (html: string) => html.replace(/plot-clip-\d+/g, 'plot-clip');
    expect(stable(a.outerHTML) === stable(b.outerHTML)).toBe(true);
    expect(a.outerHTML.length).toBeGreaterThan(1000);
  });
});
