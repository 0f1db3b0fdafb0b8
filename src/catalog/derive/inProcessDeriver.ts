import type { DeriveSettings } from '../../core/derive/types.ts';
import { DEFAULT_DERIVE_MODULE } from './batchDeriver.ts';
import type { BatchDeriver } from './batchDeriver.ts';
import { deriveBatch } from './deriveBatch.ts';
import type { BatchReadings, DeriveObjectFn } from './deriveBatch.ts';
import { loadDeriveObject } from './loadDeriveObject.ts';

/**
 * A deriver that runs in the calling thread (`--threads 1`): no worker start-up, results
 * identical to the worker pool's since each object seeds its own random stream.
 */
export async function createInProcessDeriver(
  settings: DeriveSettings,
  deriveModule: string = DEFAULT_DERIVE_MODULE,
  readings?: BatchReadings,
): Promise<BatchDeriver> {
  const deriveObject: DeriveObjectFn = await loadDeriveObject(deriveModule, (url) => import(url));
  return {
    threads: 1,
    derive: async (inputs) => deriveBatch(inputs, settings, deriveObject, readings),
    close: async () => undefined,
  };
}
