/// <reference lib="webworker" />
/** Web worker of the live custom reading: derives the batch it is sent and posts the rows back. */
import type { DeriveSettings, ObjectInputs } from '../../core/derive/types.ts';
import type { Reading } from '../../core/readings/reading.ts';
import { rederiveBatch } from './rederiveBatch.ts';

export interface RederiveRequest {
  seq: number;
  inputs: ObjectInputs[];
  settings: DeriveSettings;
  reading: Reading;
}

self.onmessage = (e: MessageEvent<RederiveRequest>) => {
  const { seq, inputs, settings, reading } = e.data;
  try {
    (self as unknown as Worker).postMessage({ seq, rows: rederiveBatch(inputs, settings, reading) });
  } catch (err) {
    (self as unknown as Worker).postMessage({ seq, error: err instanceof Error ? err.message : String(err) });
  }
};
