/**
 * What a derive worker runs when it derives with the real deriveObject: the worker's message loop
 * and deriveObject in one module graph. `scripts/build-cli.mjs` bundles this entry (with the
 * science core it reaches) into lib/catalog/derive/deriveWorker.bundle.js, which a worker loads as
 * one file: loading the core's few hundred small modules one by one took each worker about half a
 * second of its start.
 */
export { serveDeriveWorker } from './deriveWorker.ts';
export { deriveObject } from '../../core/derive/deriveObject.ts';
