/**
 * The population charts drawn at build time (Node), by the same chart functions the browser
 * uses, into static SVG written into the page: the first view needs no JavaScript and no
 * database. Large catalogs come out as binned densities (the charts switch to counts per cell
 * above 5,000 points), so the page carries the bins, not the objects. The browser redraws a
 * chart from the same rows only when the reader reaches for it (hover, keyboard, download).
 */
import { parseHTML } from 'linkedom';
import type { ChartPoint } from '../charts/chartPoint.ts';
import { chartPoints } from '../charts/chartPoints.ts';
import { chartSettings } from '../charts/chartSettings.ts';
import { PALETTE } from '../charts/palette.ts';
import type { CatalogRow as ChartCatalogRow } from '../charts/types.ts';
import { CHART_FUNCTIONS, CHART_COLUMNS, CHART_HEIGHT, CHART_WIDTH, type ChartRow } from '../population/populationCharts.ts';
import type { CatalogRow } from './loadCatalog.ts';

/** Options of {@link staticChartHtml}. */
export interface StaticChartOptions {
  /** The catalog's derivation settings (metadata), for the reference curves. */
  settings?: Record<string, unknown>;
  /** Ids drawn on top and emphasised (an object page's own object). */
  highlightIds?: readonly string[];
}

let doc: Document | null = null;
function buildDocument(): Document {
  doc ??= parseHTML('<!doctype html><html><head></head><body></body></html>').document as unknown as Document;
  return doc;
}

/** The rows the population charts read, cut to their columns (ids as text, rows without an id dropped). */
export function chartRowsOf(rows: readonly CatalogRow[], columns: readonly string[] = CHART_COLUMNS): ChartRow[] {
  const out: ChartRow[] = [];
  for (const r of rows) {
    if (r.id === null || r.id === undefined) continue;
    const row: ChartRow = { id: String(r.id) };
    for (const c of columns) if (c !== 'id' && c in r) row[c] = r[c];
    out.push(row);
  }
  return out;
}

/** The markup of chart `key` drawn from `rows` (the `<svg>` or the `<figure>` Plot makes), or a note when it cannot be drawn. */
export function staticChartHtml(key: string, rows: readonly ChartRow[], options: StaticChartOptions = {}): string {
  const fn = CHART_FUNCTIONS[key];
  if (!fn) throw new Error(`unknown chart ${key}`);
  try {
    const el = fn(rows as readonly ChartCatalogRow[], {
      document: buildDocument(),
      settings: chartSettings(options.settings),
      highlightIds: options.highlightIds,
      width: CHART_WIDTH,
      height: CHART_HEIGHT,
    });
    return el.outerHTML;
  } catch (err) {
    const p = buildDocument().createElement('p');
    p.className = 'chart-note';
    p.textContent = `This chart could not be drawn: ${err instanceof Error ? err.message : String(err)}`;
    return p.outerHTML;
  }
}

/** A population chart drawn once at build time and shared by every object page as an SVG file. */
export interface SharedChart {
  key: string;
  /** The chart as a standalone SVG file. */
  file: string;
  width: number;
  height: number;
  /** The figure's caption (plain text), written beside the chart in the page. */
  caption: string;
  /** The chart's accessible description. */
  description: string;
  /** Position of a data value on the chart, px (undefined when the axis has no scale). */
  px: (v: number) => number;
  py: (v: number) => number;
  /** The points the chart placed, by id. */
  points: Map<string, ChartPoint>;
}

type ScaledElement = Element & { scale?: (name: string) => { apply(v: number): number } | undefined };

/** Draws chart `key` from the whole population (no highlight) for the object pages to share. */
export function sharedChart(key: string, rows: readonly ChartRow[], settings?: Record<string, unknown>): SharedChart {
  const fn = CHART_FUNCTIONS[key];
  if (!fn) throw new Error(`unknown chart ${key}`);
  const el = fn(rows as readonly ChartCatalogRow[], { document: buildDocument(), settings: chartSettings(settings), width: CHART_WIDTH, height: CHART_HEIGHT }) as ScaledElement;
  const svg = el.tagName.toLowerCase() === 'svg' ? el : el.querySelector('svg')!;
  svg.setAttribute('xmlns', 'http://www.w3.org/2000/svg');
  const x = el.scale?.('x');
  const y = el.scale?.('y');
  const points = new Map<string, ChartPoint>();
  for (const p of chartPoints(el)?.points ?? []) if (!points.has(p.id)) points.set(p.id, p);
  return {
    key,
    file: `<?xml version="1.0" encoding="UTF-8"?>\n${svg.outerHTML}`,
    width: Number(svg.getAttribute('width') ?? CHART_WIDTH),
    height: Number(svg.getAttribute('height') ?? CHART_HEIGHT),
    caption: el.querySelector('figcaption')?.textContent?.trim() ?? '',
    description: svg.getAttribute('aria-description') ?? '',
    px: (v) => x?.apply(v) ?? NaN,
    py: (v) => y?.apply(v) ?? NaN,
    points,
  };
}

const escapeXml = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
const f1 = (v: number) => (Math.round(v * 10) / 10).toString();

/**
 * The object `id` marked on a shared chart: the chart file as an image, and over it the
 * object's point, its 16–84 % bars (limit arrows for limits) and its id, in the highlight
 * style of the charts (src/site/charts/palette.ts). `value` is the x value of a histogram
 * chart (the Eddington-ratio distribution marks a value, not a point).
 */
export function highlightedChartSvg(shared: SharedChart, href: string, id: string, value?: number | null): string {
  const { width, height } = shared;
  const parts: string[] = [`<image href="${escapeXml(href)}" x="0" y="0" width="${width}" height="${height}"/>`];
  const p = shared.points.get(id);
  const ink = PALETTE.ink;
  let at: [number, number] | null = null;
  if (p && shared.key !== 'edd-hist') {
    const cx = shared.px(p.x);
    const cy = shared.py(p.y);
    if (Number.isFinite(cx) && Number.isFinite(cy)) {
      at = [cx, cy];
      const line = (x1: number, y1: number, x2: number, y2: number) =>
        `<line x1="${f1(x1)}" y1="${f1(y1)}" x2="${f1(x2)}" y2="${f1(y2)}" stroke="${ink}" stroke-width="1.6"/>`;
      if (p.xLo !== null && p.xHi !== null && !p.xLimit) parts.push(line(shared.px(p.xLo), cy, shared.px(p.xHi), cy));
      if (p.yLo !== null && p.yHi !== null && !p.yLimit) parts.push(line(cx, shared.py(p.yLo), cx, shared.py(p.yHi)));
      if (p.yLimit) parts.push(line(cx, cy, cx, cy + 16), `<path d="M${f1(cx - 5)},${f1(cy + 10)}L${f1(cx)},${f1(cy + 17)}L${f1(cx + 5)},${f1(cy + 10)}" fill="none" stroke="${ink}" stroke-width="2"/>`);
      if (p.xLimit) parts.push(line(cx, cy, cx - 16, cy), `<path d="M${f1(cx - 10)},${f1(cy - 5)}L${f1(cx - 17)},${f1(cy)}L${f1(cx - 10)},${f1(cy + 5)}" fill="none" stroke="${ink}" stroke-width="2"/>`);
      parts.push(`<circle cx="${f1(cx)}" cy="${f1(cy)}" r="5.5" fill="${PALETTE.highlight}" stroke="${ink}" stroke-width="1.4"/>`);
    }
  } else if (shared.key === 'edd-hist' && value !== null && value !== undefined && Number.isFinite(value)) {
    const cx = shared.px(value);
    if (Number.isFinite(cx)) {
      const bottom = shared.py(0);
      at = [cx, 28];
      parts.push(`<line x1="${f1(cx)}" y1="28" x2="${f1(cx)}" y2="${f1(Number.isFinite(bottom) ? bottom : height - 40)}" stroke="${PALETTE.highlight}" stroke-width="2"/>`);
      parts.push(`<circle cx="${f1(cx)}" cy="28" r="5.5" fill="${PALETTE.highlight}" stroke="${ink}" stroke-width="1.4"/>`);
    }
  }
  if (at) {
    const right = at[0] > width * 0.7;
    parts.push(
      `<text x="${f1(at[0] + (right ? -9 : 9))}" y="${f1(at[1] - 8)}" text-anchor="${right ? 'end' : 'start'}" font-family="system-ui, sans-serif" font-size="12" font-weight="600" fill="${ink}" stroke="white" stroke-width="3" paint-order="stroke">${escapeXml(id)}</text>`,
    );
  }
  const label = at ? `${shared.description} ${id} is marked.` : `${shared.description} ${id} cannot be placed on this chart (a value it needs is missing).`;
  return `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${width} ${height}" width="${width}" height="${height}" role="img" aria-label="${escapeXml(label)}">${parts.join('')}</svg>`;
}
