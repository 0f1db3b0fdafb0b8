import type { CosmologyId } from '../derive/types.ts';
import type { Cosmology } from './cosmology.ts';
import { createCosmology } from './createCosmology.ts';
import { COSMOLOGY_PRESETS } from './presets.ts';

const cache = new Map<CosmologyId, Cosmology>();

/**
 * The preset cosmology `id` (see {@link COSMOLOGY_PRESETS}), created once and shared, so its
 * tables are built once per process. Throws a RangeError naming an unknown id.
 */
export function getCosmology(id: CosmologyId): Cosmology {
  let c = cache.get(id);
  if (!c) {
    const params = Object.hasOwn(COSMOLOGY_PRESETS, id) ? COSMOLOGY_PRESETS[id] : undefined;
    if (!params) {
      throw new RangeError(`unknown cosmology "${String(id)}", expected one of ${Object.keys(COSMOLOGY_PRESETS).join(', ')}`);
    }
    c = createCosmology(params);
    cache.set(id, c);
  }
  return c;
}
