// Worker entry of the derive pool. Workers do not inherit the parent's TypeScript loader, so
// this plain-JS entry loads the TypeScript sources through tsx's scoped import.
import { parentPort, workerData } from 'node:worker_threads';
import { tsImport } from 'tsx/esm/api';

const worker = await tsImport('./deriveWorker.ts', import.meta.url);
const { loadDeriveObject } = await tsImport('./loadDeriveObject.ts', import.meta.url);
const deriveObject = await loadDeriveObject(workerData.deriveModule, (url) => tsImport(url, import.meta.url));
worker.serveDeriveWorker(parentPort, workerData, deriveObject);
