import type { ObjectInputs } from '../../core/derive/types.ts';
import type { PackedDerived } from './packedDerived.ts';

/** Runs deriveObject over batches of inputs, on worker threads or in this thread. */
export interface BatchDeriver {
  /** Number of threads deriving (1 when in-process). */
  readonly threads: number;
  /** Derives one batch; batches may be in flight concurrently, each promise resolves to its own results. */
  derive(inputs: ObjectInputs[]): Promise<PackedDerived>;
  /** Stops the workers; pending batches are rejected. */
  close(): Promise<void>;
}

/** URL of the real deriveObject module, the default of every deriver. */
export const DEFAULT_DERIVE_MODULE: string = new URL(
  // Compiled into lib/ this file is .js and so is its neighbour.
  import.meta.url.endsWith('.js') ? '../../core/derive/deriveObject.js' : '../../core/derive/deriveObject.ts',
  import.meta.url,
).href;
