import { EventEmitter } from 'node:events';
import type { MessagePort } from 'node:worker_threads';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import type { DeriveResultMessage } from '../../../src/catalog/derive/deriveWorker.ts';
import type { DeriveObjectFn } from '../../../src/catalog/derive/deriveBatch.ts';
import { DEFAULT_SETTINGS } from '../../../src/core/derive/defaultSettings.ts';

// The worker's first step, watched through a stand-in for the cosmology module.
const calls: string[] = [];
let failing = false;
vi.mock('../../../src/core/cosmology/getCosmology.ts', () => ({
  getCosmology: (id: string) => {
    calls.push(`getCosmology ${id}`);
    if (failing) throw new RangeError(`unknown cosmology "${id}"`);
    return { ageGyr: (z: number) => (calls.push(`ageGyr ${z}`), 1) };
  },
}));
const { serveDeriveWorker } = await import('../../../src/catalog/derive/deriveWorker.ts');

/** A port whose posted answers are collected, and a deriveObject that records its calls. */
function harness(): { port: MessagePort & EventEmitter; answers: DeriveResultMessage[]; derive: DeriveObjectFn } {
  const port = new EventEmitter() as MessagePort & EventEmitter;
  const answers: DeriveResultMessage[] = [];
  port.postMessage = (a: DeriveResultMessage) => void answers.push(a);
  const derive: DeriveObjectFn = () => {
    calls.push('deriveObject');
    throw new Error('stand-in');
  };
  return { port, answers, derive };
}

describe('serveDeriveWorker', () => {
  beforeEach(() => {
    calls.length = 0;
    failing = false;
  });

  it("builds the run's cosmology tables (an age at the seed redshift) before it answers any batch", () => {
    const { port, answers, derive } = harness();
    const settings = { ...DEFAULT_SETTINGS, cosmology: 'wmap9' as const, zSeed: 25 };
    serveDeriveWorker(port, { settings, deriveModule: 'stand-in' }, derive);
    expect(calls).toEqual(['getCosmology wmap9', 'ageGyr 25']);
    port.emit('message', { seq: 0, inputs: [{ id: 'a', z: 6, lines: {} }] });
    expect(calls.slice(2)).toEqual(['deriveObject']);
    expect(answers).toHaveLength(1);
  });

  it('leaves a cosmology that cannot be built for the batch to report, object by object', () => {
    failing = true;
    const { port, answers, derive } = harness();
    expect(() => serveDeriveWorker(port, { settings: { ...DEFAULT_SETTINGS }, deriveModule: 'stand-in' }, derive)).not.toThrow();
    port.emit('message', { seq: 3, inputs: [{ id: 'a', z: 6, lines: {} }] });
    expect(answers).toHaveLength(1);
    const answer = answers[0]!;
    expect(answer.seq).toBe(3);
    expect('packed' in answer && answer.packed.errors).toEqual(['stand-in']);
  });
});
