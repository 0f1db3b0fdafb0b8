import { Worker } from 'node:worker_threads';
import type { DeriveSettings, ObjectInputs } from '../../core/derive/types.ts';
import { DEFAULT_DERIVE_MODULE } from './batchDeriver.ts';
import type { BatchDeriver } from './batchDeriver.ts';
import type { BatchReadings } from './deriveBatch.ts';
import type { DeriveResultMessage, DeriveTaskMessage, DeriveWorkerData } from './deriveWorker.ts';
import type { PackedDerived } from './packedDerived.ts';

const BOOTSTRAP = new URL('./deriveWorkerBootstrap.mjs', import.meta.url);

interface Task {
  message: DeriveTaskMessage;
  resolve: (p: PackedDerived) => void;
  reject: (e: Error) => void;
}

/**
 * A pool of `threads` worker threads running deriveObject. Each worker takes one batch at a
 * time; further batches wait in a queue. The first failure of a worker (a module that does
 * not load, a crash) rejects every pending batch and every later one.
 */
export function createWorkerPool(
  threads: number,
  settings: DeriveSettings,
  deriveModule: string = DEFAULT_DERIVE_MODULE,
  readings?: BatchReadings,
): BatchDeriver {
  const data: DeriveWorkerData = { settings, deriveModule, ...(readings ? { readings } : {}) };
  const queue: Task[] = [];
  const idle: Worker[] = [];
  const running = new Map<Worker, Task>();
  let failure: Error | null = null;
  let seq = 0;

  const fail = (error: Error): void => {
    if (failure) return;
    failure = error;
    for (const task of running.values()) task.reject(error);
    running.clear();
    for (const task of queue.splice(0)) task.reject(error);
  };

  const dispatch = (): void => {
    while (!failure && idle.length > 0 && queue.length > 0) {
      const worker = idle.pop()!;
      const task = queue.shift()!;
      running.set(worker, task);
      worker.postMessage(task.message);
    }
  };

  const workers = Array.from({ length: threads }, () => {
    const worker = new Worker(BOOTSTRAP, { workerData: data });
    worker.on('message', (answer: DeriveResultMessage) => {
      const task = running.get(worker);
      running.delete(worker);
      idle.push(worker);
      if (task) {
        if ('packed' in answer) task.resolve(answer.packed);
        else task.reject(new Error(`derive worker failed on a batch: ${answer.error}`));
      }
      dispatch();
    });
    worker.on('error', (error) => fail(new Error(`derive worker failed: ${error.message}`)));
    worker.on('exit', (code) => {
      if (code !== 0) fail(new Error(`derive worker exited with code ${code}`));
    });
    idle.push(worker);
    return worker;
  });

  return {
    threads,
    derive(inputs: ObjectInputs[]): Promise<PackedDerived> {
      if (failure) return Promise.reject(failure);
      return new Promise((resolve, reject) => {
        queue.push({ message: { seq: seq++, inputs }, resolve, reject });
        dispatch();
      });
    },
    async close(): Promise<void> {
      fail(new Error('derive pool closed'));
      await Promise.all(workers.map((w) => w.terminate()));
    },
  };
}
