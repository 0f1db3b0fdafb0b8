import type { MessagePort } from 'node:worker_threads';
import { relationLikelihoodBatch, type RelationProblem } from '../../core/population/fitRelation.ts';

/** A batch of (alpha, beta, sigma) positions sent to a worker. */
export interface RelationTaskMessage {
  readonly seq: number;
  readonly thetas: Float64Array;
  readonly count: number;
}

/** A worker's answer: the log likelihoods in order, or the message of a failure. */
export type RelationResultMessage = { seq: number; values: Float64Array } | { seq: number; error: string };

/**
 * Builds the relation's likelihood once from `problem` (the worker's start-up data) and answers every batch posted
 * on `port`. Called by relationWorkerBootstrap.mjs inside the worker.
 */
export function serveRelationWorker(port: MessagePort, problem: RelationProblem): void {
  const evaluate = relationLikelihoodBatch(problem);
  port.on('message', (task: RelationTaskMessage) => {
    try {
      const values = evaluate(task.thetas, task.count) as Float64Array;
      port.postMessage({ seq: task.seq, values } satisfies RelationResultMessage, [values.buffer as ArrayBuffer]);
    } catch (error) {
      port.postMessage({ seq: task.seq, error: error instanceof Error ? error.message : String(error) } satisfies RelationResultMessage);
    }
  });
}
