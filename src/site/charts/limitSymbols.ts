/**
 * Symbols for upper limits: a bar at the limit value with an arrow pointing toward smaller
 * values (down for a limit on y, left for a limit on x, both for both). They implement d3's
 * symbol-type interface, which Plot's dot mark accepts as `symbol`; `size` is the symbol's
 * area in px², as for Plot's built-in symbols.
 */

/** Minimal path context d3 symbols draw into. */
export interface PathContext {
  moveTo(x: number, y: number): void;
  lineTo(x: number, y: number): void;
  closePath(): void;
}

/** A d3-compatible symbol type (Plot's dot accepts one as `symbol`). */
export interface CustomSymbol {
  draw(context: PathContext, size: number): void;
}

/** A symbol drawn for an upper limit. */
export type LimitSymbol = CustomSymbol;

/** Draws a bar across (0,0) and an arrow from (0,0) along (dx, dy), the unit direction of the limit. */
function arrow(ctx: PathContext, r: number, dx: number, dy: number): void {
  const len = 2.6 * r;
  const head = 0.8 * r;
  // bar perpendicular to the arrow, at the limit value
  ctx.moveTo(-dy * r, -dx * r);
  ctx.lineTo(dy * r, dx * r);
  // stem
  ctx.moveTo(0, 0);
  ctx.lineTo(dx * len, dy * len);
  // head: two strokes back from the tip
  const tx = dx * len;
  const ty = dy * len;
  ctx.moveTo(tx - dx * head - dy * head * 0.7, ty - dy * head - dx * head * 0.7);
  ctx.lineTo(tx, ty);
  ctx.lineTo(tx - dx * head + dy * head * 0.7, ty - dy * head + dx * head * 0.7);
}

const radius = (size: number): number => Math.sqrt(size / Math.PI);

/** Upper limit on y: bar and downward arrow (SVG y grows downward). */
export const LIMIT_DOWN: LimitSymbol = { draw: (ctx, size) => arrow(ctx, radius(size), 0, 1) };
/** Upper limit on x: bar and leftward arrow. */
export const LIMIT_LEFT: LimitSymbol = { draw: (ctx, size) => arrow(ctx, radius(size), -1, 0) };
/** Upper limits on both x and y. */
export const LIMIT_DOWN_LEFT: LimitSymbol = {
  draw: (ctx, size) => {
    arrow(ctx, radius(size), 0, 1);
    arrow(ctx, radius(size), -1, 0);
  },
};

/** The limit symbol for a point limited on x, y or both. */
export function limitSymbol(xLimit: boolean, yLimit: boolean): LimitSymbol {
  if (xLimit && yLimit) return LIMIT_DOWN_LEFT;
  return xLimit ? LIMIT_LEFT : LIMIT_DOWN;
}

/** Lower limit on y: bar and upward arrow. */
export const LIMIT_UP: LimitSymbol = { draw: (ctx, size) => arrow(ctx, radius(size), 0, -1) };
/** Lower limit on x: bar and rightward arrow. */
export const LIMIT_RIGHT: LimitSymbol = { draw: (ctx, size) => arrow(ctx, radius(size), 1, 0) };

/**
 * The symbol for a point whose x and y are each a measurement (null), an upper limit (arrow
 * toward smaller values) or a lower limit (arrow toward larger values). Null when neither is a limit.
 */
export function directedLimitSymbol(x: 'upper' | 'lower' | null, y: 'upper' | 'lower' | null): LimitSymbol | null {
  if (!x && !y) return null;
  const dirs: [number, number][] = [];
  if (x) dirs.push([x === 'upper' ? -1 : 1, 0]);
  if (y) dirs.push([0, y === 'upper' ? 1 : -1]);
  return { draw: (ctx, size) => dirs.forEach(([dx, dy]) => arrow(ctx, radius(size), dx, dy)) };
}
