import { describe, it, expect } from 'vitest';
import { evalSpline, notAKnotSpline } from '../../../src/core/dust/notAKnotSpline.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('not-a-knot cubic spline', () => {
  it('reproduces any cubic exactly, as the not-a-knot condition must', () => {
    const f = (t: number) => 2 - t + 0.5 * t * t - 0.3 * t ** 3;
    const xs = [0, 0.7, 1.1, 2, 3.5, 4];
    const s = notAKnotSpline(xs, xs.map(f));
    for (const t of [0.2, 1.5, 2.7, 3.9]) expectClose(evalSpline(s, t), f(t), { rtol: 1e-10, atol: 1e-12, source: 'exact for cubics' });
  });

  it('interpolates its nodes', () => {
    const xs = [0, 1, 2, 3, 5];
    const ys = [1, -1, 4, 0, 2];
    const s = notAKnotSpline(xs, ys);
    xs.forEach((x, i) => expectClose(evalSpline(s, x), ys[i]!, { atol: 1e-12, source: 'interpolation' }));
  });

  it('refuses fewer than four nodes or unordered nodes', () => {
    expect(() => notAKnotSpline([0, 1, 2], [0, 1, 2])).toThrow(/≥ 4 nodes/);
    expect(() => notAKnotSpline([0, 2, 1, 3], [0, 1, 2, 3])).toThrow(/increasing/);
  });
});

describe('notAKnotSpline between the nodes and its input checks', () => {
  it('matches scipy CubicSpline(bc_type="not-a-knot") inside every interval of uneven nodes', () => {
    // Computed with scipy 1.10.1 (Debian python3): CubicSpline([0, 1, 2.5, 3, 4.5, 6], [1, 3, 2, 5, 4, 0], bc_type='not-a-knot').
    const s = notAKnotSpline([0, 1, 2.5, 3, 4.5, 6], [1, 3, 2, 5, 4, 0]);
    const scipy: [number, number][] = [[0.5, 3.205833333333333], [1.7, 1.342493333333333], [2.8, 3.797279999999999], [3.9, 5.992070000000001], [5.2, 1.1681214814814804]];
    for (const [t, v] of scipy) expectClose(evalSpline(s, t), v, { atol: 1e-12, source: `scipy 1.10.1 CubicSpline not-a-knot at ${t}` });
  });

  it('needs at least four strictly increasing nodes and one value per node', () => {
    expect(() => notAKnotSpline([0, 1, 2], [0, 1, 2])).toThrow(/need ≥ 4 nodes/);
    expect(() => notAKnotSpline([0, 1, 2, 3], [0, 1, 2])).toThrow('need ≥ 4 nodes and as many values, got 4 and 3');
    expect(() => notAKnotSpline([0, 1, 1, 2], [0, 1, 2, 3])).toThrow(/strictly increasing/);
  });
});
