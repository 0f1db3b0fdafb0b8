/** How a point is drawn: a catalog object, a highlighted catalog object, or a new object from the compare page. */
export type PointRole = 'population' | 'highlight' | 'extra';

/**
 * One object's position on a scatter chart, in the chart's data units, with its 16th–84th
 * percentile (or ±1σ) interval on each axis where known and whether each coordinate is an
 * upper limit. Charts turn rows into these; the layers draw them.
 */
export interface ChartPoint {
  id: string;
  x: number;
  y: number;
  xLo: number | null;
  xHi: number | null;
  yLo: number | null;
  yHi: number | null;
  xLimit: boolean;
  yLimit: boolean;
  role: PointRole;
  /** Sub-population drawn with its own symbol (e.g. 'halpha' / 'hbeta'); undefined for one series. */
  series?: string;
}

/** True when the point is drawn as a limit rather than a detection. */
export const isLimit = (p: ChartPoint): boolean => p.xLimit || p.yLimit;
