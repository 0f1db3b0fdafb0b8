/**
 * Thousands of arrows in one chart, drawn on a canvas inside the chart's SVG (a
 * `<foreignObject>`), with Plot.arrow's geometry for straight arrows. One SVG path per arrow
 * cost the Readings page's comparison about 0.6 s at 10,000 objects in Chromium (building,
 * laying out and painting the paths); the canvas takes a few milliseconds. The downloads turn
 * the canvas into an `<image>` (see {@link rasterAsImages}), so a saved figure keeps its arrows.
 */
import type * as Plot from '@observablehq/plot';

const SVG_NS = 'http://www.w3.org/2000/svg';
const XHTML_NS = 'http://www.w3.org/1999/xhtml';

/** Class of the `<foreignObject>` that holds a raster layer. */
export const RASTER_CLASS = 'census-raster';

/** How the arrows are drawn (Plot.arrow's options of the same names, in px). */
export interface RasterArrowStyle {
  stroke: string;
  strokeOpacity: number;
  strokeWidth: number;
  /** Plot.arrow's headLength: the wings are headLength × strokeWidth / 1.5 long, at most a third of the arrow. */
  headLength: number;
  /** Pixels cut from the end of each arrow. */
  insetEnd: number;
  /** Canvas pixels per CSS pixel (2: sharp on high-density screens and in the PNG download, drawn at twice the size). */
  pixelRatio?: number;
  /** Accessible name of the layer. */
  ariaLabel: string;
}

/** The arrows' ends in data units, one entry per arrow (x1, y1) → (x2, y2). */
export interface ArrowColumns {
  x1: ArrayLike<number>;
  y1: ArrayLike<number>;
  x2: ArrayLike<number>;
  y2: ArrayLike<number>;
}

type Context2D = Pick<CanvasRenderingContext2D, 'beginPath' | 'moveTo' | 'lineTo' | 'stroke' | 'setTransform'> & {
  strokeStyle: unknown;
  globalAlpha: number;
  lineWidth: number;
  lineCap: string;
  lineJoin: string;
};

function context2d(doc: Document): { canvas: HTMLCanvasElement; ctx: Context2D } | null {
  const canvas = doc.createElementNS(XHTML_NS, 'canvas') as HTMLCanvasElement;
  const ctx = typeof canvas.getContext === 'function' ? (canvas.getContext('2d') as Context2D | null) : null;
  return ctx ? { canvas, ctx } : null;
}

/** Whether `doc` can draw on a canvas (a browser can; the build's linkedom document cannot). */
export function canDrawRaster(doc: Document): boolean {
  try {
    return context2d(doc) !== null;
  } catch {
    return false;
  }
}

/** Wing angle of Plot.arrow's default 60° head, in radians. */
const WING = Math.PI / 6;

/**
 * A Plot render function (pass it in `marks`) that draws every arrow of `cols` on one canvas
 * covering the plot's frame, clipped to it. Use only where {@link canDrawRaster} holds.
 */
export function rasterArrows(cols: ArrowColumns, style: RasterArrowStyle): Plot.RenderFunction {
  return (_index, scales, _values, dimensions, context) => {
    const doc = context.document;
    const { width, height, marginLeft, marginTop, marginRight, marginBottom } = dimensions;
    const w = width - marginLeft - marginRight;
    const h = height - marginTop - marginBottom;
    const ratio = style.pixelRatio ?? 2;
    const made = context2d(doc);
    const fo = doc.createElementNS(SVG_NS, 'foreignObject');
    fo.setAttribute('class', RASTER_CLASS);
    fo.setAttribute('x', String(marginLeft));
    fo.setAttribute('y', String(marginTop));
    fo.setAttribute('width', String(w));
    fo.setAttribute('height', String(h));
    fo.setAttribute('role', 'img');
    fo.setAttribute('aria-label', style.ariaLabel);
    if (!made) return fo;
    const { canvas, ctx } = made;
    canvas.width = Math.round(w * ratio);
    canvas.height = Math.round(h * ratio);
    canvas.setAttribute('style', `display:block;width:${w}px;height:${h}px`);
    ctx.setTransform(ratio, 0, 0, ratio, -marginLeft * ratio, -marginTop * ratio);
    ctx.strokeStyle = style.stroke;
    ctx.globalAlpha = style.strokeOpacity;
    ctx.lineWidth = style.strokeWidth;
    ctx.lineCap = 'round';
    ctx.lineJoin = 'bevel';
    const sx = scales.x!;
    const sy = scales.y!;
    const wing = (style.headLength / 1.5) * style.strokeWidth;
    const n = cols.x1.length;
    for (let i = 0; i < n; i++) {
      const x1 = sx(cols.x1[i]!) as number;
      const y1 = sy(cols.y1[i]!) as number;
      let x2 = sx(cols.x2[i]!) as number;
      let y2 = sy(cols.y2[i]!) as number;
      const dx = x2 - x1;
      const dy = y2 - y1;
      const length = Math.hypot(dx, dy);
      // as Plot.arrow: an arrow no longer than its inset is not drawn
      if (!(length > style.insetEnd)) continue;
      x2 -= (dx / length) * style.insetEnd;
      y2 -= (dy / length) * style.insetEnd;
      const angle = Math.atan2(dy, dx);
      const head = Math.min(wing, length / 3);
      ctx.beginPath();
      ctx.moveTo(x1, y1);
      ctx.lineTo(x2, y2);
      ctx.moveTo(x2 - head * Math.cos(angle + WING), y2 - head * Math.sin(angle + WING));
      ctx.lineTo(x2, y2);
      ctx.lineTo(x2 - head * Math.cos(angle - WING), y2 - head * Math.sin(angle - WING));
      // one stroke per arrow: overlapping arrows darken as overlapping SVG paths do
      ctx.stroke();
    }
    fo.appendChild(canvas);
    return fo;
  };
}

/**
 * In `copy` (a clone of `original`'s SVG), replaces each raster layer with an `<image>` of the
 * original's canvas (a PNG data URL; cloning a canvas does not copy its pixels), so the
 * downloaded SVG and PNG show the arrows.
 */
export function rasterAsImages(original: Element, copy: Element): void {
  const from = [...original.querySelectorAll(`foreignObject.${RASTER_CLASS}`)];
  const to = [...copy.querySelectorAll(`foreignObject.${RASTER_CLASS}`)];
  to.forEach((fo, i) => {
    const canvas = from[i]?.querySelector('canvas');
    const image = copy.ownerDocument.createElementNS(SVG_NS, 'image');
    for (const a of ['x', 'y', 'width', 'height', 'aria-label']) {
      const v = fo.getAttribute(a);
      if (v !== null) image.setAttribute(a, v);
    }
    if (canvas && typeof canvas.toDataURL === 'function') image.setAttribute('href', canvas.toDataURL('image/png'));
    fo.replaceWith(image);
  });
}
