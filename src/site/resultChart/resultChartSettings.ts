/**
 * What a reader chose for the chart of a query result — the columns on x and y, optional
 * colour and size columns, log axes, reference overlays — and how it travels in the page URL
 * beside the query (?sql=…&cx=…&cy=…&cc=…&cs=…&clog=xy&cref=0), so a shared link redraws the
 * same chart.
 */

export interface ResultChartSettings {
  x: string;
  y: string;
  /** Column coloured by, or '' for none. */
  colour: string;
  /** Column the point area grows with, or '' for none. */
  size: string;
  xLog: boolean;
  yLog: boolean;
  /** Draw local relations / Eddington lines where the axes allow (default true). */
  overlays: boolean;
}

const KEYS = ['cx', 'cy', 'cc', 'cs', 'clog', 'cref'] as const;

/** The chart settings a URL's search string carries, or null when it carries none. */
export function chartSettingsFromSearch(search: string): ResultChartSettings | null {
  const p = new URLSearchParams(search);
  if (!KEYS.some((k) => p.has(k))) return null;
  const log = p.get('clog') ?? '';
  return {
    x: p.get('cx') ?? '',
    y: p.get('cy') ?? '',
    colour: p.get('cc') ?? '',
    size: p.get('cs') ?? '',
    xLog: log.includes('x'),
    yLog: log.includes('y'),
    overlays: p.get('cref') !== '0',
  };
}

/** `href` with the chart settings written into its search string (other parameters kept). */
export function hrefWithChartSettings(href: string, s: ResultChartSettings): string {
  const u = new URL(href);
  const set = (k: string, v: string) => (v ? u.searchParams.set(k, v) : u.searchParams.delete(k));
  set('cx', s.x);
  set('cy', s.y);
  set('cc', s.colour);
  set('cs', s.size);
  set('clog', `${s.xLog ? 'x' : ''}${s.yLog ? 'y' : ''}`);
  set('cref', s.overlays ? '' : '0');
  return u.href;
}

/**
 * Settings that fit a result's columns: the asked ones where the result has them, else the
 * first two numeric columns on x and y (an id-like or limit column is never a default axis).
 */
export function fitSettings(asked: Partial<ResultChartSettings> | null, numeric: readonly string[], all: readonly string[]): ResultChartSettings {
  const axisCandidates = numeric.filter((c) => !/(_p16|_p84|_err|_err_lo|_err_hi|_is_limit)$/.test(c) && c !== 'row');
  const pick = (v: string | undefined, fallback: string) => (v && numeric.includes(v) ? v : fallback);
  const x = pick(asked?.x, axisCandidates[0] ?? numeric[0] ?? '');
  const y = pick(asked?.y, axisCandidates.find((c) => c !== x) ?? numeric.find((c) => c !== x) ?? x);
  return {
    x,
    y,
    colour: asked?.colour && all.includes(asked.colour) ? asked.colour : '',
    size: asked?.size && numeric.includes(asked.size) ? asked.size : '',
    xLog: asked?.xLog ?? false,
    yLog: asked?.yLog ?? false,
    overlays: asked?.overlays ?? true,
  };
}
