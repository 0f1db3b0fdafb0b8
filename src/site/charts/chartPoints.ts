import type { ChartPoint } from './chartPoint.ts';

/** What {@link mountChart} needs to know about a drawn chart: its points and its axis labels. */
export interface ChartPointIndex {
  points: readonly ChartPoint[];
  xLabel: string;
  yLabel: string;
}

const registry = new WeakMap<Element, ChartPointIndex>();

/** Records the points a chart element shows, for keyboard navigation and click-through. */
export function attachPoints(el: Element, index: ChartPointIndex): void {
  registry.set(el, index);
}

/** The points recorded for a chart element, or undefined for an element no chart function made. */
export function chartPoints(el: Element): ChartPointIndex | undefined {
  return registry.get(el);
}
