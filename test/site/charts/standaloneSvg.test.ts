import { describe, expect, it } from 'vitest';
import { lbolVsMass } from '../../../src/site/charts/lbolVsMass.ts';
import { standaloneSvg, wrapText } from '../../../src/site/charts/standaloneSvg.ts';
import { objectHref } from '../../../src/site/charts/mountChart.ts';
import { fakeRows, testDocument } from './fakeRows.ts';

describe('standaloneSvg', () => {
  it('keeps the caption as svg text under the chart and declares the namespace', () => {
    const el = lbolVsMass(fakeRows({ n: 5 }), { document: testDocument(), settings: { eddingtonPerMsun: 1.26e38 }, title: 'Luminosity and mass' });
    const svg = standaloneSvg(el);
    expect(svg.getAttribute('xmlns')).toBe('http://www.w3.org/2000/svg');
    const texts = [...svg.querySelectorAll(':scope > text')].map((t) => t.textContent).join(' ');
    expect(texts).toContain('Luminosity and mass');
    expect(texts).toContain('single-epoch virial');
    expect(Number(svg.getAttribute('height'))).toBeGreaterThan(Number(el.querySelector('svg')!.getAttribute('height')));
  });
});

describe('wrapText', () => {
  it('breaks at spaces within the width', () => {
    expect(wrapText('aa bb cc dd', 5)).toEqual(['aa bb', 'cc dd']);
  });
});

describe('objectHref', () => {
  it('links to the object page under the base path', () => {
    expect(objectHref('/census/', 'CDW-00001')).toBe('/census/object/CDW-00001/');
    expect(objectHref('/', 'a b')).toMatch(/^\/object\/a_b-[0-9a-f]{8}\/$/);
    expect(objectHref('/census/', 'a b', 'viewer')).toBe('/census/object/?id=a%20b');
  });
});
