import { describe, expect, it } from 'vitest';
import { binGrid } from '../../../src/site/charts/binGrid.ts';
import { stackedBins } from '../../../src/site/charts/histogramBins.ts';

describe('binGrid', () => {
  it('counts points per cell, keeps points on the upper edge and drops points outside', () => {
    const cells = binGrid(
      [
        { x: 0.1, y: 0.1 },
        { x: 0.2, y: 0.3 },
        { x: 1, y: 1 },
        { x: 1.5, y: 0.5 },
      ],
      [0, 1],
      [0, 1],
      2,
      2,
    );
    expect(cells).toEqual([
      { x1: 0, x2: 0.5, y1: 0, y2: 0.5, count: 2 },
      { x1: 0.5, x2: 1, y1: 0.5, y2: 1, count: 1 },
    ]);
  });
});

describe('stackedBins', () => {
  it('counts detections and limits apart in bins aligned on multiples of the width', () => {
    const bins = stackedBins(
      [
        { v: -0.3, limit: false },
        { v: -0.2, limit: true },
        { v: 0.3, limit: false },
        { v: 0.5, limit: false },
      ],
      0.25,
    );
    expect(bins.map((b) => [b.x1, b.detections, b.limits])).toEqual([
      [-0.5, 1, 0],
      [-0.25, 0, 1],
      [0, 0, 0],
      [0.25, 1, 0],
      [0.5, 1, 0],
    ]);
  });

  it('counts lower limits apart from upper limits and detections', () => {
    const bins = stackedBins([{ v: 0.1, limit: false }, { v: 0.1, limit: 'upper' }, { v: 0.2, limit: 'lower' }, { v: 0.2, limit: 'lower' }], 0.25);
    expect(bins.map((b) => [b.x1, b.detections, b.limits, b.lowerLimits])).toEqual([[0, 1, 1, 2]]);
  });
});
