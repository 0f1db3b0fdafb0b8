/**
 * The population's derivation inputs as the build publishes them (`data/readings-inputs.json`,
 * written by src/site/build/readingsInputs.ts) for the Readings page's live custom reading.
 */
import type { ObjectInputs } from '../../core/derive/types.ts';

/** Path of the file under the site's base. */
export const READINGS_INPUTS_PATH = 'data/readings-inputs.json';

/** What the file holds. */
export interface ReadingsInputsFile {
  /** Every derivable object's inputs, in catalog order. */
  inputs: ObjectInputs[];
  /** The catalog's log_mstar of each object (null where absent), for the charts. */
  logMstar: (number | null)[];
}
