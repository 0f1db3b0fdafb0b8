import type { MessagePort } from 'node:worker_threads';
import type { DeriveSettings, ObjectInputs } from '../../core/derive/types.ts';
import { deriveBatch } from './deriveBatch.ts';
import type { BatchReadings, DeriveObjectFn } from './deriveBatch.ts';
import type { PackedDerived } from './packedDerived.ts';
import { getCosmology } from '../../core/cosmology/getCosmology.ts';

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
 * Answers every batch posted on `port` with its derived results. Called by
 * deriveWorkerBootstrap.mjs inside the worker.
 *
 * The answers are copied, not transferred. A transfer detaches the ArrayBuffer, and once any
 * buffer of an isolate has been detached V8 compiles every typed-array access with a check that
 * its buffer is still attached (and throws away the code compiled without it: see detachOnce).
 * Nothing in a derive worker ever detaches a buffer, so the core's loops run without those checks;
 * copying a batch's packed numbers (a few hundred kilobytes) costs far less. Measured at 20,000
 * objects × 1000 draws, alternating: 6.1–6.3 against 6.6–6.9 CPU s (transfer after detachOnce).
 */
export function serveDeriveWorker(port: MessagePort, data: DeriveWorkerData, deriveObject: DeriveObjectFn): void {
  prepareCosmology(data.settings);
  port.on('message', (task: DeriveTaskMessage) => {
    let answer: DeriveResultMessage;
    try {
      answer = { seq: task.seq, packed: deriveBatch(task.inputs, data.settings, deriveObject, data.readings) };
    } catch (error) {
      answer = { seq: task.seq, error: error instanceof Error ? error.message : String(error) };
    }
    port.postMessage(answer);
  });
}

/**
 * Builds the run's cosmology tables (see cosmologyTables.ts) before the first batch: a worker is
 * ready before the main thread has read and checked its first chunk, and the tables were tens of
 * milliseconds of every worker's first batch. Batches are answered only after this returns.
 * A cosmology that cannot be built is left for the first batch to report, as before.
 */
export function prepareCosmology(settings: DeriveSettings): void {
  try {
    getCosmology(settings.cosmology).ageGyr(settings.zSeed);
  } catch {
    // Reported by every object that needs it, as without this step.
  }
}
