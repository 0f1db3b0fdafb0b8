import { describe, expect, it } from 'vitest';
import type { ChartPoint } from '../../../src/site/charts/chartPoint.ts';
import { hoverText } from '../../../src/site/charts/scatterLayers.ts';

const point = (over: Partial<ChartPoint>): ChartPoint => ({
  id: 'OBJ-1',
  x: 7.123,
  y: 45.678,
  xLo: null,
  xHi: null,
  yLo: null,
  yHi: null,
  xLimit: false,
  yLimit: false,
  role: 'population',
  ...over,
});

describe('hoverText', () => {
  it('starts with the object id and gives both coordinates', () => {
    expect(hoverText(point({}), { xLabel: 'log M', yLabel: 'log L' })).toBe('OBJ-1\nlog M: 7.12\nlog L: 45.68');
  });

  it('marks upper limits with "<" and new objects as new', () => {
    expect(hoverText(point({ role: 'extra', yLimit: true }), { xLabel: 'x', yLabel: 'y' })).toBe('OBJ-1 (new object)\nx: 7.12\ny: < 45.68');
  });
});
