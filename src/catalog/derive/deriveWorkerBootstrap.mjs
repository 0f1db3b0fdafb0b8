// Worker entry of the derive pool. Compiled (lib/, next to deriveWorker.js) it imports the
// JavaScript directly: with the real deriveObject, the one-file bundle of the worker and the core
// (deriveWorker.bundle.js, made by scripts/build-cli.mjs from deriveWorkerEntry.ts) when it is
// there; with another derive module (the tests' stand-ins), the modules one by one. From the
// sources it loads the TypeScript through tsx's scoped import, since workers do not inherit the
// parent's TypeScript loader.
import { existsSync } from 'node:fs';
import { parentPort, workerData } from 'node:worker_threads';

const compiled = existsSync(new URL('./deriveWorker.js', import.meta.url));
const bundle = new URL('./deriveWorker.bundle.js', import.meta.url);
const realDeriveObject = new URL('../../core/derive/deriveObject.js', import.meta.url).href;

if (compiled && workerData.deriveModule === realDeriveObject && existsSync(bundle)) {
  const { serveDeriveWorker, deriveObject } = await import(bundle.href);
  serveDeriveWorker(parentPort, workerData, deriveObject);
} else {
  const tsImport = compiled ? null : (await import('tsx/esm/api')).tsImport;
  const load = (spec) => (tsImport ? tsImport(spec, import.meta.url) : import(new URL(spec, import.meta.url).href));
  const worker = await load(compiled ? './deriveWorker.js' : './deriveWorker.ts');
  const { loadDeriveObject } = await load(compiled ? './loadDeriveObject.js' : './loadDeriveObject.ts');
  const deriveObject = await loadDeriveObject(workerData.deriveModule, (url) => load(url));
  worker.serveDeriveWorker(parentPort, workerData, deriveObject);
}
