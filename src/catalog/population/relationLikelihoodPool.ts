import { Worker } from 'node:worker_threads';
import type { BatchLogProb } from '../../core/population/ensembleSampler.ts';
import type { RelationProblem } from '../../core/population/fitRelation.ts';
import type { RelationResultMessage, RelationTaskMessage } from './relationWorker.ts';

const BOOTSTRAP = new URL('./relationWorkerBootstrap.mjs', import.meta.url);

/** The relation's likelihood on worker threads. */
export interface RelationLikelihoodPool {
  readonly threads: number;
  /** Splits a batch of positions into one contiguous share per worker and returns the values in order. */
  readonly evaluate: BatchLogProb;
  close(): Promise<void>;
}

/**
 * Starts `threads` workers, each holding its own copy of the problem's likelihood. A batch is split into
 * contiguous shares, one per worker; each value depends only on its position, so the result is the same for any
 * number of threads. The first failure of a worker (a module that does not load, a crash, an error) rejects the
 * batch in flight and every later one with a one-line message.
 * @param threads - worker threads (≥ 1).
 * @param problem - the data, tables, grid and Eddington-ratio distribution of the fit.
 */
export function createRelationLikelihoodPool(threads: number, problem: RelationProblem): RelationLikelihoodPool {
  const pending = new Map<number, { resolve: (v: Float64Array) => void; reject: (e: Error) => void }>();
  let failure: Error | null = null;
  let seq = 0;
  const fail = (e: Error): void => {
    if (failure) return;
    failure = e;
    for (const p of pending.values()) p.reject(e);
    pending.clear();
  };
  const workers = Array.from({ length: threads }, () => {
    const w = new Worker(BOOTSTRAP, { workerData: problem });
    w.on('message', (m: RelationResultMessage) => {
      const p = pending.get(m.seq);
      if (!p) return;
      pending.delete(m.seq);
      if ('error' in m) fail(new Error(`a relation-fit worker failed: ${m.error}`));
      else p.resolve(m.values);
    });
    w.on('error', (e) => fail(new Error(`a relation-fit worker failed: ${e.message.split('\n')[0]}`)));
    w.on('exit', (code) => { if (pending.size > 0) fail(new Error(`a relation-fit worker exited (code ${code}) in the middle of a batch`)); });
    return w;
  });
  const ask = (w: Worker, thetas: Float64Array, count: number): Promise<Float64Array> => {
    if (failure) return Promise.reject(failure);
    const id = seq++;
    return new Promise((resolve, reject) => {
      pending.set(id, { resolve, reject });
      w.postMessage({ seq: id, thetas, count } satisfies RelationTaskMessage);
    });
  };
  const evaluate: BatchLogProb = async (thetas, count) => {
    const share = Math.ceil(count / threads);
    const parts: Promise<Float64Array>[] = [];
    for (let k = 0; k * share < count; k++) {
      const lo = k * share;
      const hi = Math.min(count, lo + share);
      parts.push(ask(workers[k] as Worker, thetas.slice(3 * lo, 3 * hi), hi - lo));
    }
    const out = new Float64Array(count);
    (await Promise.all(parts)).forEach((v, k) => out.set(v, k * share));
    return out;
  };
  return {
    threads,
    evaluate,
    async close() {
      await Promise.all(workers.map((w) => w.terminate()));
    },
  };
}
