import { describe, expect, it } from 'vitest';
import { createInProcessDeriver } from '../../../src/catalog/derive/inProcessDeriver.ts';
import { Worker } from 'node:worker_threads';
import { createWorkerPool } from '../../../src/catalog/derive/workerPool.ts';
import { WORKER_SEMI_SPACE_MB } from '../../../src/catalog/derive/v8ForDerive.ts';
import { BROKEN, MISBEHAVING, STAND_IN, someInputs, testSettings } from './fixtures.ts';

describe('the derive worker pool', () => {
  it('loads the TypeScript worker through tsx and returns, batch by batch, exactly what the in-process deriver returns', async () => {
    const settings = testSettings();
    const batches = [someInputs(40, 'a'), someInputs(7, 'b'), someInputs(33, 'c'), someInputs(1, 'd')];
    const local = await createInProcessDeriver(settings, STAND_IN);
    const expected = await Promise.all(batches.map((b) => local.derive(b)));
    const pool = createWorkerPool(2, settings, STAND_IN);
    try {
      const got = await Promise.all(batches.map((b) => pool.derive(b)));
      for (let i = 0; i < batches.length; i++) {
        expect(got[i]!.count).toBe(batches[i]!.length);
        expect(Array.from(got[i]!.numbers)).toEqual(Array.from(expected[i]!.numbers));
        expect(got[i]!.flags).toEqual(expected[i]!.flags);
        expect(got[i]!.mbhMethod).toEqual(expected[i]!.mbhMethod);
      }
    } finally {
      await pool.close();
    }
  });

  it('gives an object the same results whatever batch it is in (its stream is seeded by its id)', async () => {
    const settings = testSettings();
    const local = await createInProcessDeriver(settings, STAND_IN);
    const all = someInputs(10);
    const whole = await local.derive(all);
    const alone = await local.derive([all[6]!]);
    const width = whole.numbers.length / whole.count;
    expect(Array.from(alone.numbers)).toEqual(Array.from(whole.numbers.subarray(6 * width, 7 * width)));
  });

  it('records an object whose derivation throws, without failing its batch', async () => {
    const local = await createInProcessDeriver(testSettings(), STAND_IN);
    const inputs = someInputs(3);
    inputs[1] = { ...inputs[1]!, id: 'THROW' };
    const got = await local.derive(inputs);
    expect(got.errors).toEqual([null, 'stand-in refuses this object', null]);
  });

  it('starts its workers with a young generation of WORKER_SEMI_SPACE_MB, not V8\'s 1 MB that grows by scavenging', async () => {
    const pool = createWorkerPool(1, testSettings(), STAND_IN);
    try {
      // Any isolate made after the pool: V8 reads the size when it makes one.
      const probe = new Worker(
        "const { parentPort } = require('node:worker_threads'); const v8 = require('node:v8'); parentPort.postMessage(v8.getHeapSpaceStatistics().find((s) => s.space_name === 'new_space').space_size);",
        { eval: true },
      );
      const bytes = await new Promise<number>((resolve, reject) => {
        probe.once('message', resolve);
        probe.once('error', reject);
      });
      await probe.terminate();
      expect(bytes).toBeGreaterThanOrEqual(WORKER_SEMI_SPACE_MB * 1024 * 1024);
    } finally {
      await pool.close();
    }
  });

  it('rejects every batch with a message naming the module when deriveObject cannot be loaded', async () => {
    const pool = createWorkerPool(2, testSettings(), BROKEN);
    try {
      await expect(pool.derive(someInputs(3))).rejects.toThrow(/brokenDeriveModule\.ts does not export a deriveObject function/);
      await expect(pool.derive(someInputs(3))).rejects.toThrow(/deriveObject/);
    } finally {
      await pool.close();
    }
    await expect(createInProcessDeriver(testSettings(), BROKEN)).rejects.toThrow(/does not export a deriveObject function/);
  });
});

describe('the derive worker pool when a worker misbehaves', () => {
  it('fails the batch with a message, instead of waiting forever, when a worker stops answering', async () => {
    const pool = createWorkerPool(2, testSettings(), MISBEHAVING, undefined, { batchTimeoutMs: 1500 });
    try {
      const inputs = someInputs(3);
      inputs[1] = { ...inputs[1]!, id: 'STALL' };
      await expect(pool.derive(inputs)).rejects.toThrow('a derive worker stopped answering: no result for a batch of 3 objects after 1.5 s; the run was stopped');
      await expect(pool.derive(someInputs(2))).rejects.toThrow('stopped answering');
    } finally {
      await pool.close();
    }
  });

  it('fails the batch with a message when a worker exits in the middle of it, even with exit status 0', async () => {
    const pool = createWorkerPool(2, testSettings(), MISBEHAVING);
    try {
      const inputs = someInputs(3);
      inputs[2] = { ...inputs[2]!, id: 'EXIT' };
      await expect(pool.derive(inputs)).rejects.toThrow('a derive worker exited (code 0) in the middle of a batch; the run was stopped');
    } finally {
      await pool.close();
    }
  });
});
