// Worker entry of the derive pool. Compiled (lib/, next to deriveWorker.js) it imports the
// JavaScript directly; from the sources it loads the TypeScript through tsx's scoped import,
// since workers do not inherit the parent's TypeScript loader.
import { existsSync } from 'node:fs';
import { parentPort, workerData } from 'node:worker_threads';

const compiled = existsSync(new URL('./deriveWorker.js', import.meta.url));
const tsImport = compiled ? null : (await import('tsx/esm/api')).tsImport;
const load = (spec) => (tsImport ? tsImport(spec, import.meta.url) : import(new URL(spec, import.meta.url).href));

const worker = await load(compiled ? './deriveWorker.js' : './deriveWorker.ts');
const { loadDeriveObject } = await load(compiled ? './loadDeriveObject.js' : './loadDeriveObject.ts');
const deriveObject = await loadDeriveObject(workerData.deriveModule, (url) => load(url));
worker.serveDeriveWorker(parentPort, workerData, deriveObject);
