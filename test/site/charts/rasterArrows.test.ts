import { describe, expect, it } from 'vitest';
import { canDrawRaster, RASTER_CLASS } from '../../../src/site/charts/rasterArrows.ts';
import { standaloneSvg } from '../../../src/site/charts/standaloneSvg.ts';
import { readingShiftChart, SHIFT_RASTER_ABOVE, type ShiftRow } from '../../../src/site/readings/shiftChart.ts';
import { testDocument } from './fakeRows.ts';

/** A 2-D context that records the arrows drawn: each stroke() closes one arrow of moveTo/lineTo points. */
interface Recorder {
  strokes: [number, number][][];
  transform: number[];
  strokeStyle: unknown;
  globalAlpha: number;
}

/** linkedom's document, with canvases whose 2-D context records what is drawn (linkedom's own has none). */
function canvasDocument(): { doc: Document; recorders: Recorder[] } {
  const doc = testDocument();
  const recorders: Recorder[] = [];
  const make = doc.createElementNS.bind(doc);
  doc.createElementNS = ((ns: string, name: string) => {
    const el = make(ns, name) as HTMLCanvasElement;
    if (name !== 'canvas') return el;
    const rec: Recorder = { strokes: [], transform: [], strokeStyle: null, globalAlpha: 1 };
    let path: [number, number][] = [];
    const ctx = {
      set strokeStyle(v: unknown) { rec.strokeStyle = v; },
      set globalAlpha(v: number) { rec.globalAlpha = v; },
      lineWidth: 1, lineCap: '', lineJoin: '',
      setTransform: (...m: number[]) => (rec.transform = m),
      beginPath: () => (path = []),
      moveTo: (x: number, y: number) => path.push([x, y]),
      lineTo: (x: number, y: number) => path.push([x, y]),
      stroke: () => rec.strokes.push(path),
    };
    el.getContext = (() => {
      recorders.push(rec);
      return ctx;
    }) as unknown as HTMLCanvasElement['getContext'];
    el.toDataURL = () => 'data:image/png;base64,AAAA';
    return el;
  }) as typeof doc.createElementNS;
  return { doc, recorders };
}

function rows(n: number): ShiftRow[] {
  return Array.from({ length: n }, (_, i) => ({ id: `o${i}`, mbhA: 6 + (i % 50) / 20, eddA: -1 + (i % 30) / 20, mbhB: 5.5 + (i % 50) / 20, eddB: -0.5 + (i % 30) / 20 }));
}

describe('arrows drawn on a canvas inside the SVG', () => {
  it('are used only where the document can draw on a canvas', () => {
    expect(canDrawRaster(testDocument())).toBe(false);
    expect(canDrawRaster(canvasDocument().doc)).toBe(true);
  });

  it('draw one arrow per object above SHIFT_RASTER_ABOVE objects, in the plot frame, with Plot.arrow\'s head', () => {
    const { doc, recorders } = canvasDocument();
    const n = SHIFT_RASTER_ABOVE + 1;
    const el = readingShiftChart(rows(n), { labelA: 'A', labelB: 'B', document: doc, width: 640, height: 440 });
    expect(el.querySelectorAll('[aria-label="arrow"] path')).toHaveLength(0);
    const fo = el.querySelector(`foreignObject.${RASTER_CLASS}`)!;
    expect(fo.querySelector('canvas')).not.toBeNull();
    expect(fo.getAttribute('aria-label')).toBe(`${n} arrows, one per object, drawn as an image`);
    // The canvas covers the frame at twice the resolution: its origin is the frame's corner.
    const [x, y] = [Number(fo.getAttribute('x')), Number(fo.getAttribute('y'))];
    const canvas = fo.querySelector('canvas')!;
    expect(canvas.width).toBe(Math.round(Number(fo.getAttribute('width')) * 2));
    const rec = recorders.at(-1)!;
    expect(rec.transform).toEqual([2, 0, 0, 2, -2 * x, -2 * y]);
    expect(rec.globalAlpha).toBe(0.55);
    expect(rec.strokes).toHaveLength(n);
    // Each arrow: shaft, then the two wings through its (inset) end; Plot.arrow's head is 5 px here (headLength 5 × strokeWidth 1.5 / 1.5) at ±30°.
    const [a, b, w1, end, w2] = rec.strokes[0]!;
    expect(end).toEqual(b);
    const shaft = Math.atan2(b![1] - a![1], b![0] - a![0]);
    for (const w of [w1!, w2!]) {
      expect(Math.hypot(w[0] - end![0], w[1] - end![1])).toBeCloseTo(5, 9);
      const angle = Math.atan2(end![1] - w[1], end![0] - w[0]);
      expect(Math.abs(Math.abs(angle - shaft) - Math.PI / 6)).toBeLessThan(1e-9);
    }
    expect(el.textContent).toContain('(the arrows drawn as one image)');
  });

  it('keep SVG arrows where no canvas can be drawn (the build), and below the threshold', () => {
    expect(readingShiftChart(rows(SHIFT_RASTER_ABOVE + 1), { labelA: 'A', labelB: 'B', document: testDocument() }).querySelectorAll('[aria-label="arrow"] path')).toHaveLength(SHIFT_RASTER_ABOVE + 1);
    const { doc } = canvasDocument();
    expect(readingShiftChart(rows(50), { labelA: 'A', labelB: 'B', document: doc }).querySelectorAll('[aria-label="arrow"] path')).toHaveLength(50);
  });

  it('become an image of the canvas in the downloaded SVG', () => {
    const { doc } = canvasDocument();
    const el = readingShiftChart(rows(SHIFT_RASTER_ABOVE + 1), { labelA: 'A', labelB: 'B', document: doc });
    const copy = standaloneSvg(el);
    expect(copy.querySelector('foreignObject')).toBeNull();
    const image = copy.querySelector('image')!;
    expect(image.getAttribute('href')).toBe('data:image/png;base64,AAAA');
    expect(image.getAttribute('width')).toBe(el.querySelector('foreignObject')!.getAttribute('width'));
  });
});
