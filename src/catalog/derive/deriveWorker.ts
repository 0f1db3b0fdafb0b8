import type { MessagePort } from 'node:worker_threads';
import type { DeriveSettings, ObjectInputs } from '../../core/derive/types.ts';
import { deriveBatch } from './deriveBatch.ts';
import type { BatchReadings, DeriveObjectFn } from './deriveBatch.ts';
import type { PackedDerived } from './packedDerived.ts';
import { detachOnce } from '../../shared/workers/detachOnce.ts';

/** What the pool hands each worker at start-up (`workerData`). */
export interface DeriveWorkerData {
  settings: DeriveSettings;
  /** URL of the module exporting deriveObject. */
  deriveModule: string;
  /** The run's readings, when it derives any. */
  readings?: BatchReadings;
}

/** A batch sent to a worker. */
export interface DeriveTaskMessage {
  seq: number;
  inputs: ObjectInputs[];
}

/** A worker's answer: the packed results, or the message of a failure of the whole batch. */
export type DeriveResultMessage = { seq: number; packed: PackedDerived } | { seq: number; error: string };

/**
 * Answers every batch posted on `port` with its derived results; the Float64Array of each
 * answer is transferred, not copied. Called by deriveWorkerBootstrap.mjs inside the worker.
 */
export function serveDeriveWorker(port: MessagePort, data: DeriveWorkerData, deriveObject: DeriveObjectFn): void {
  detachOnce();
  port.on('message', (task: DeriveTaskMessage) => {
    let answer: DeriveResultMessage;
    try {
      answer = { seq: task.seq, packed: deriveBatch(task.inputs, data.settings, deriveObject, data.readings) };
    } catch (error) {
      answer = { seq: task.seq, error: error instanceof Error ? error.message : String(error) };
    }
    if ('packed' in answer) {
      const buffers = [answer.packed, ...(answer.packed.readings ?? [])].map((p) => p.numbers.buffer as ArrayBuffer);
      port.postMessage(answer, buffers);
    }
    else port.postMessage(answer);
  });
}
