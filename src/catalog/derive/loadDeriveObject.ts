import type { DeriveObjectFn } from './deriveBatch.ts';

/**
 * Imports the module at `moduleUrl` with `importer` and returns its `deriveObject` export;
 * throws a one-line error naming the module when it is missing or exports no function.
 */
export async function loadDeriveObject(
  moduleUrl: string,
  importer: (url: string) => Promise<unknown>,
): Promise<DeriveObjectFn> {
  let mod: unknown;
  try {
    mod = await importer(moduleUrl);
  } catch (error) {
    const why = error instanceof Error ? error.message.split('\n')[0] : String(error);
    throw new Error(`cannot load deriveObject from ${moduleUrl}: ${why}`);
  }
  const fn = (mod as { deriveObject?: unknown } | null)?.deriveObject;
  if (typeof fn !== 'function') throw new Error(`${moduleUrl} does not export a deriveObject function`);
  return fn as DeriveObjectFn;
}
