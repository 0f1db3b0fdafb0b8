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
