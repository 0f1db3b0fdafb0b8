/**
 * Re-derives the whole population under a reading in web workers (one per core, at most 4),
 * each taking a contiguous slice; the rows come back in input order. Workers are started once
 * and reused.
 */
import type { DeriveSettings, ObjectInputs } from '../../core/derive/types.ts';
import type { Reading } from '../../core/readings/reading.ts';
import type { RederivedRow } from './rederiveBatch.ts';

let workers: Worker[] | null = null;
let seq = 0;

function pool(): Worker[] {
  if (!workers) {
    const n = Math.max(1, Math.min(4, navigator.hardwareConcurrency || 2));
    workers = Array.from({ length: n }, () => new Worker(new URL('./rederiveWorker.ts', import.meta.url), { type: 'module' }));
  }
  return workers;
}

function run(worker: Worker, inputs: ObjectInputs[], settings: DeriveSettings, reading: Reading): Promise<RederivedRow[]> {
  const id = seq++;
  return new Promise((resolve, reject) => {
    const onMessage = (e: MessageEvent<{ seq: number; rows?: RederivedRow[]; error?: string }>) => {
      if (e.data.seq !== id) return;
      worker.removeEventListener('message', onMessage);
      if (e.data.rows) resolve(e.data.rows);
      else reject(new Error(e.data.error ?? 'the worker failed'));
    };
    worker.addEventListener('message', onMessage);
    worker.postMessage({ seq: id, inputs, settings, reading });
  });
}

/** The population's rows under `reading`, and the milliseconds it took. */
export async function rederivePopulation(inputs: readonly ObjectInputs[], settings: DeriveSettings, reading: Reading): Promise<{ rows: RederivedRow[]; ms: number }> {
  const started = performance.now();
  const ws = pool();
  const size = Math.ceil(inputs.length / ws.length);
  const parts = await Promise.all(ws.map((w, i) => run(w, inputs.slice(i * size, (i + 1) * size), settings, reading)));
  return { rows: parts.flat(), ms: performance.now() - started };
}
