import { Worker } from 'node:worker_threads';
import type { DeriveSettings, ObjectInputs } from '../../core/derive/types.ts';
import { DEFAULT_DERIVE_MODULE } from './batchDeriver.ts';
import type { BatchDeriver } from './batchDeriver.ts';
import type { BatchReadings } from './deriveBatch.ts';
import type { DeriveResultMessage, DeriveTaskMessage, DeriveWorkerData } from './deriveWorker.ts';
import type { PackedDerived } from './packedDerived.ts';
import { setV8ForDerive } from './v8ForDerive.ts';

// '../derive/': the same file from lib/catalog/derive/ and from the bundled derive command in lib/catalog/cli/.
const BOOTSTRAP = new URL('../derive/deriveWorkerBootstrap.mjs', import.meta.url);

interface Task {
  message: DeriveTaskMessage;
  resolve: (p: PackedDerived) => void;
  reject: (e: Error) => void;
  /** The stall timer, while a worker holds the task. */
  timer?: ReturnType<typeof setTimeout>;
}

/**
 * Default time a worker may take over one batch before the run is stopped: ten minutes, far
 * beyond any batch we measured (1024 objects × 10,000 draws take a few seconds).
 */
export const DEFAULT_BATCH_TIMEOUT_MS = 600_000;

/** Options of {@link createWorkerPool}. */
export interface WorkerPoolOptions {
  /** A batch not answered within this many ms (from when a worker took it) fails the pool. */
  batchTimeoutMs?: number;
}

/**
 * A pool of `threads` worker threads running deriveObject. Each worker takes one batch at a
 * time; further batches wait in a queue. The first failure of a worker (a module that does
 * not load, a crash, an exit in the middle of a batch whatever its exit code, or no answer to a
 * batch within `batchTimeoutMs`) rejects every pending batch and every later one, with a
 * one-line message, so the run ends instead of waiting forever.
 */
export function createWorkerPool(
  threads: number,
  settings: DeriveSettings,
  deriveModule: string = DEFAULT_DERIVE_MODULE,
  readings?: BatchReadings,
  options: WorkerPoolOptions = {},
): BatchDeriver {
  const data: DeriveWorkerData = { settings, deriveModule, ...(readings ? { readings } : {}) };
  const timeoutMs = options.batchTimeoutMs ?? DEFAULT_BATCH_TIMEOUT_MS;
  const queue: Task[] = [];
  const idle: Worker[] = [];
  const running = new Map<Worker, Task>();
  let failure: Error | null = null;
  let closing = false;
  let seq = 0;

  const fail = (error: Error): void => {
    if (failure) return;
    failure = error;
    for (const task of running.values()) {
      clearTimeout(task.timer);
      task.reject(error);
    }
    running.clear();
    for (const task of queue.splice(0)) task.reject(error);
  };

  const dispatch = (): void => {
    while (!failure && idle.length > 0 && queue.length > 0) {
      const worker = idle.pop()!;
      const task = queue.shift()!;
      running.set(worker, task);
      task.timer = setTimeout(() => {
        const n = task.message.inputs.length.toLocaleString('en-US');
        fail(new Error(`a derive worker stopped answering: no result for a batch of ${n} objects after ${formatSeconds(timeoutMs)}; the run was stopped`));
      }, timeoutMs);
      worker.postMessage(task.message);
    }
  };

  setV8ForDerive();
  const workers = Array.from({ length: threads }, () => {
    const worker = new Worker(BOOTSTRAP, { workerData: data });
    worker.on('message', (answer: DeriveResultMessage) => {
      const task = running.get(worker);
      running.delete(worker);
      idle.push(worker);
      if (task) {
        clearTimeout(task.timer);
        if ('packed' in answer) task.resolve(answer.packed);
        else task.reject(new Error(`derive worker failed on a batch: ${answer.error}`));
      }
      dispatch();
    });
    worker.on('error', (error) => fail(new Error(`derive worker failed: ${error.message}`)));
    worker.on('exit', (code) => {
      if (closing) return;
      if (running.has(worker)) fail(new Error(`a derive worker exited (code ${code}) in the middle of a batch; the run was stopped`));
      else if (code !== 0) fail(new Error(`derive worker exited with code ${code}`));
      else fail(new Error('a derive worker exited before the run ended; the run was stopped'));
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
      closing = true;
      fail(new Error('derive pool closed'));
      await Promise.all(workers.map((w) => w.terminate()));
    },
  };
}

function formatSeconds(ms: number): string {
  return ms >= 1000 ? `${(ms / 1000).toLocaleString('en-US')} s` : `${ms} ms`;
}
