/** One cell of a 2-D histogram: its edges in data units and how many points fell in it. */
export interface GridCell {
  x1: number;
  x2: number;
  y1: number;
  y2: number;
  count: number;
}

/**
 * Counts points on an `nx` × `ny` grid spanning `xDomain` × `yDomain` and returns the non-empty
 * cells (points outside the domains are dropped). Used to draw large selections as a density
 * instead of one mark per point, so the number of marks is bounded by nx·ny.
 */
export function binGrid(
  points: readonly { x: number; y: number }[],
  xDomain: readonly [number, number],
  yDomain: readonly [number, number],
  nx: number,
  ny: number,
): GridCell[] {
  const [x0, x1] = xDomain;
  const [y0, y1] = yDomain;
  const dx = (x1 - x0) / nx;
  const dy = (y1 - y0) / ny;
  const counts = new Uint32Array(nx * ny);
  for (const p of points) {
    const i = Math.floor((p.x - x0) / dx);
    const j = Math.floor((p.y - y0) / dy);
    // a point exactly on the upper edge belongs to the last cell
    const ii = i === nx && p.x === x1 ? nx - 1 : i;
    const jj = j === ny && p.y === y1 ? ny - 1 : j;
    if (ii < 0 || ii >= nx || jj < 0 || jj >= ny) continue;
    counts[jj * nx + ii]! += 1;
  }
  const cells: GridCell[] = [];
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      const count = counts[j * nx + i]!;
      if (count > 0) cells.push({ x1: x0 + i * dx, x2: x0 + (i + 1) * dx, y1: y0 + j * dy, y2: y0 + (j + 1) * dy, count });
    }
  }
  return cells;
}
