// Worker entry of the relation-fit pool. Compiled (lib/, next to relationWorker.js) it imports the JavaScript
// directly; from the sources it loads the TypeScript through tsx's scoped import, since workers do not inherit the
// parent's TypeScript loader.
import { existsSync } from 'node:fs';
import { parentPort, workerData } from 'node:worker_threads';

const compiled = existsSync(new URL('./relationWorker.js', import.meta.url));
const mod = compiled
  ? await import(new URL('./relationWorker.js', import.meta.url).href)
  : await (await import('tsx/esm/api')).tsImport('./relationWorker.ts', import.meta.url);
mod.serveRelationWorker(parentPort, workerData);
