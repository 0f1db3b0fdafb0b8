import type { Rng } from './rng.ts';
import { standardNormal } from './standardNormal.ts';

/** Fills `out` with normal deviates of mean `mean` and standard deviation `sigma` (same units); returns `out`. */
export function fillNormal(rng: Rng, out: Float64Array, mean: number, sigma: number): Float64Array {
  for (let i = 0; i < out.length; i++) out[i] = mean + sigma * standardNormal(rng);
  return out;
}
