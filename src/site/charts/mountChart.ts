/**
 * Browser-only: puts a chart made by one of the chart functions into a container and makes it
 * usable: click a point (or press Enter on it) to open its object page, move between points
 * with the arrow keys, and download the figure as SVG or PNG (made locally: the SVG is
 * serialised, the PNG drawn from it on an offscreen canvas at twice the size).
 */
import { objectHref as linkHref, type ObjectPagesMode } from '../objectLink.ts';
import type { ChartPoint } from './chartPoint.ts';
import { chartPoints } from './chartPoints.ts';
import { hoverText } from './scatterLayers.ts';
import { standaloneSvg } from './standaloneSvg.ts';

/** Options of {@link mountChart}. */
export interface MountChartOptions {
  /** File name of the downloads, without extension (e.g. 'census-mbh-mstar'). */
  fileName: string;
  /** Accessible name of the chart (e.g. 'Black-hole mass against stellar mass'). */
  label: string;
  /** Site base path (default import.meta.env.BASE_URL). */
  base?: string;
  /** Called instead of navigating when an object is chosen (tests, embedding). */
  onOpen?: (id: string, href: string) => void;
}

type PlotElement = (SVGSVGElement | HTMLElement) & {
  value?: unknown;
  scale?: (name: string) => { apply(v: number): number } | undefined;
};

const SVG_NS = 'http://www.w3.org/2000/svg';

/**
 * The page of a catalog object under `base`: `object/<slug>/`, or the viewer `object/?id=` when
 * the build made one viewer page instead (see src/site/objectLink.ts; in the browser the mode
 * defaults to the one the build wrote on <body>).
 */
export function objectHref(base: string, id: string, mode: ObjectPagesMode = pagesModeHere()): string {
  return linkHref(base.endsWith('/') ? base : base + '/', id, mode);
}

function pagesModeHere(): ObjectPagesMode {
  return typeof document !== 'undefined' && document.body?.dataset.objectPages === 'viewer' ? 'viewer' : 'static';
}

function svgText(chart: Element): string {
  const copy = standaloneSvg(chart);
  const text = typeof XMLSerializer !== 'undefined' ? new XMLSerializer().serializeToString(copy) : copy.outerHTML;
  return `<?xml version="1.0" encoding="UTF-8"?>\n${text}`;
}

function download(blob: Blob, name: string): void {
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = name;
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

/** Draws the chart's standalone SVG on a canvas at `scale` and resolves to a PNG blob. */
export async function chartPng(chart: Element, scale = 2): Promise<Blob> {
  const text = svgText(chart);
  const copy = standaloneSvg(chart);
  const w = Number(copy.getAttribute('width'));
  const h = Number(copy.getAttribute('height'));
  const url = URL.createObjectURL(new Blob([text], { type: 'image/svg+xml' }));
  try {
    const img = new Image();
    img.decoding = 'async';
    await new Promise<void>((resolve, reject) => {
      img.onload = () => resolve();
      img.onerror = () => reject(new Error('The chart could not be drawn as an image.'));
      img.src = url;
    });
    const canvas = document.createElement('canvas');
    canvas.width = Math.round(w * scale);
    canvas.height = Math.round(h * scale);
    const ctx = canvas.getContext('2d');
    if (!ctx) throw new Error('This browser cannot draw on a canvas.');
    ctx.scale(scale, scale);
    ctx.drawImage(img, 0, 0, w, h);
    return await new Promise<Blob>((resolve, reject) => canvas.toBlob((b) => (b ? resolve(b) : reject(new Error('The PNG could not be made.'))), 'image/png'));
  } finally {
    URL.revokeObjectURL(url);
  }
}

/**
 * Mounts `chart` into `container` (replacing its content) with download buttons, click-through
 * to object pages and keyboard navigation. Returns a function that removes the listeners.
 */
export function mountChart(container: HTMLElement, chart: PlotElement, options: MountChartOptions): () => void {
  const base = options.base ?? import.meta.env.BASE_URL;
  const open = (id: string) => {
    const href = objectHref(base, id);
    if (options.onOpen) options.onOpen(id, href);
    else location.assign(href);
  };
  const index = chartPoints(chart);
  const svg = (chart.tagName.toLowerCase() === 'svg' ? chart : chart.querySelector('svg')) as SVGSVGElement | null;

  const toolbar = document.createElement('div');
  toolbar.className = 'chart-tools';
  const svgButton = document.createElement('button');
  svgButton.type = 'button';
  svgButton.textContent = 'Download SVG';
  const pngButton = document.createElement('button');
  pngButton.type = 'button';
  pngButton.textContent = 'Download PNG';
  const status = document.createElement('p');
  status.className = 'chart-focus-status';
  status.setAttribute('aria-live', 'polite');
  toolbar.append(svgButton, pngButton);
  container.replaceChildren(toolbar, chart, status);

  svgButton.addEventListener('click', () => download(new Blob([svgText(chart)], { type: 'image/svg+xml' }), `${options.fileName}.svg`));
  pngButton.addEventListener('click', () => {
    chartPng(chart).then(
      (b) => download(b, `${options.fileName}.png`),
      (err: unknown) => (status.textContent = err instanceof Error ? err.message : String(err)),
    );
  });

  const onClick = () => {
    const v = chart.value as Partial<ChartPoint> | null | undefined;
    if (v && typeof v.id === 'string' && v.role !== 'extra') open(v.id);
  };
  chart.addEventListener('click', onClick);

  // keyboard: the svg takes focus; arrows walk the points in x order, Enter opens. The order is
  // sorted at the first key press, not at every drawing (10,000 points on the Readings page).
  let sorted: ChartPoint[] | null = null;
  const ordered = (): ChartPoint[] => (sorted ??= index ? [...index.points].sort((a, b) => a.x - b.x || a.y - b.y) : []);
  const count = index?.points.length ?? 0;
  let at = -1;
  let ring: SVGCircleElement | null = null;
  const describe = (p: ChartPoint) => (index ? hoverText(p, index) : p.id).replace(/\n/g, '; ');
  const show = () => {
    const order = ordered();
    const p = order[at];
    if (!p || !svg) return;
    const x = chart.scale?.('x');
    const y = chart.scale?.('y');
    if (x && y) {
      ring ??= svg.appendChild(document.createElementNS(SVG_NS, 'circle'));
      ring.setAttribute('class', 'census-focus');
      ring.setAttribute('r', '9');
      ring.setAttribute('fill', 'none');
      ring.setAttribute('stroke', '#20262c');
      ring.setAttribute('stroke-width', '2');
      ring.setAttribute('stroke-dasharray', '3 2');
      ring.setAttribute('cx', String(x.apply(p.x)));
      ring.setAttribute('cy', String(y.apply(p.y)));
    }
    status.textContent = `${describe(p)}${p.role === 'extra' ? '' : ' — press Enter to open its page'} (${at + 1} of ${order.length})`;
  };
  const onKey = (e: KeyboardEvent) => {
    const order = ordered();
    if (!order.length) return;
    const step: Record<string, number> = { ArrowRight: 1, ArrowDown: 1, ArrowLeft: -1, ArrowUp: -1, PageDown: 10, PageUp: -10 };
    if (e.key in step) at = Math.min(order.length - 1, Math.max(0, (at < 0 ? 0 : at + step[e.key]!) ));
    else if (e.key === 'Home') at = 0;
    else if (e.key === 'End') at = order.length - 1;
    else if (e.key === 'Enter' && at >= 0 && order[at]!.role !== 'extra') {
      open(order[at]!.id);
      return;
    } else if (e.key === 'Escape') {
      ring?.remove();
      ring = null;
      at = -1;
      status.textContent = '';
      return;
    } else return;
    e.preventDefault();
    show();
  };
  if (svg) {
    svg.setAttribute('tabindex', '0');
    svg.setAttribute('role', 'group');
    svg.setAttribute('aria-label', `${options.label}. ${count ? 'Use the arrow keys to move between objects and Enter to open one.' : ''}`);
    svg.addEventListener('keydown', onKey);
  }
  return () => {
    chart.removeEventListener('click', onClick);
    svg?.removeEventListener('keydown', onKey);
  };
}
