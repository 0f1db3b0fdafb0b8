import { getEventListeners } from 'node:events';
import { setFlagsFromString } from 'node:v8';
import { runInNewContext } from 'node:vm';
import { describe, expect, it } from 'vitest';
import { untilAborted } from '../../../src/catalog/derive/untilAborted.ts';

setFlagsFromString('--expose-gc');
const gc = runInNewContext('gc') as () => void;

describe('untilAborted', () => {
  it('resolves with the work’s value and removes its abort listener', async () => {
    const controller = new AbortController();
    await expect(untilAborted(Promise.resolve(42), controller.signal)).resolves.toBe(42);
    expect(getEventListeners(controller.signal, 'abort')).toHaveLength(0);
  });

  it('rejects with the work’s error and removes its abort listener', async () => {
    const controller = new AbortController();
    await expect(untilAborted(Promise.reject(new Error('worker died')), controller.signal)).rejects.toThrow('worker died');
    expect(getEventListeners(controller.signal, 'abort')).toHaveLength(0);
  });

  it('rejects with the signal’s reason as soon as it aborts, without waiting for the work', async () => {
    const controller = new AbortController();
    const never = new Promise<number>(() => undefined);
    const raced = untilAborted(never, controller.signal);
    controller.abort(new Error('interrupted'));
    await expect(raced).rejects.toThrow('interrupted');
  });

  it('rejects at once when the signal has already aborted', async () => {
    const controller = new AbortController();
    controller.abort(new Error('too late'));
    await expect(untilAborted(Promise.resolve(1), controller.signal)).rejects.toThrow('too late');
  });

  it('keeps no settled result alive while the signal lives on (Promise.race against one pending promise did)', async () => {
    const controller = new AbortController();
    const refs: WeakRef<object>[] = [];
    for (let i = 0; i < 200; i++) {
      const result = { values: new Float64Array(1000) };
      refs.push(new WeakRef(result));
      await untilAborted(Promise.resolve(result), controller.signal);
    }
    // Let the settled promises' jobs run out, then collect.
    await new Promise((resolve) => setTimeout(resolve, 0));
    gc();
    await new Promise((resolve) => setTimeout(resolve, 0));
    gc();
    const alive = refs.filter((r) => r.deref() !== undefined).length;
    expect(alive).toBeLessThan(5);
    expect(controller.signal.aborted).toBe(false);
  });
});
