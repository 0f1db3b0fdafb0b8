import { describe, expect, it } from 'vitest';
import { parseHTML } from 'linkedom';
import { chartSettings } from '../../../src/site/charts/chartSettings.ts';
import { CHART_FUNCTIONS, CHART_HEIGHT, CHART_WIDTH } from '../../../src/site/population/populationCharts.ts';
import { highlightedChartSvg, sharedChart, staticChartHtml } from '../../../src/site/build/staticCharts.ts';
import { fakeRows, markElements, testDocument } from '../charts/fakeRows.ts';

const settings = { cosmology: 'planck18', zSeed: 20, efficiency: 0.1, lightSeedMsun: 100, heavySeedMsun: 1e5 };

describe('population charts drawn at build time', () => {
  it('are the chart functions’ own SVG, with every point the browser would draw', () => {
    const rows = fakeRows({ n: 40 });
    const html = staticChartHtml('mbh-z', rows, { settings });
    const { document } = parseHTML(`<html><body>${html}</body></html>`);
    const browserLike = CHART_FUNCTIONS['mbh-z']!(rows, { document: testDocument(), settings: chartSettings(settings), width: CHART_WIDTH, height: CHART_HEIGHT });
    const count = (root: Element) => markElements(root, 'catalog point').length;
    expect(count(document.body)).toBeGreaterThan(0);
    expect(count(document.body)).toBe(count(browserLike));
  });

  it('mark an object where the chart code itself draws it highlighted', () => {
    const rows = fakeRows({ n: 40 });
    const id = String(rows[5]!.id);
    const shared = sharedChart('mbh-mstar', rows, settings);
    const overlay = highlightedChartSvg(shared, '/charts/mbh-mstar.svg', id);
    const { document } = parseHTML(`<html><body>${overlay}</body></html>`);
    const mark = document.querySelector('circle')!;
    // The same chart drawn in the browser's way with the object highlighted.
    const drawn = CHART_FUNCTIONS['mbh-mstar']!(rows, { document: testDocument(), settings: chartSettings(settings), width: CHART_WIDTH, height: CHART_HEIGHT, highlightIds: [id] });
    const dot = markElements(drawn, 'highlighted object')[0]!;
    const transform = dot.getAttribute('transform');
    const [cx, cy] = transform ? transform.match(/[-\d.]+/g)!.map(Number) : [Number(dot.getAttribute('cx')), Number(dot.getAttribute('cy'))];
    // The overlay rounds to 0.1 px.
    expect(Math.abs(Number(mark.getAttribute('cx')) - cx!)).toBeLessThanOrEqual(0.06);
    expect(Math.abs(Number(mark.getAttribute('cy')) - cy!)).toBeLessThanOrEqual(0.06);
    expect(document.querySelector('image')!.getAttribute('href')).toBe('/charts/mbh-mstar.svg');
  });

  it('write an id with markup in it as text', () => {
    const rows = fakeRows({ n: 10 });
    rows[0]!.id = '<script>alert(1)</script>&"';
    const shared = sharedChart('mbh-z', rows, settings);
    const svg = highlightedChartSvg(shared, '/charts/mbh-z.svg', String(rows[0]!.id));
    expect(svg).not.toContain('<script>');
    const { document } = parseHTML(`<html><body>${svg}</body></html>`);
    expect(document.querySelector('text')!.textContent).toBe('<script>alert(1)</script>&"');
  });

  it('say when the object cannot be placed on a chart', () => {
    const rows = fakeRows({ n: 10 });
    const shared = sharedChart('mbh-z', rows, settings);
    expect(highlightedChartSvg(shared, '/c.svg', 'not-in-catalog')).toMatch(/cannot be placed on this chart/);
  });
});
