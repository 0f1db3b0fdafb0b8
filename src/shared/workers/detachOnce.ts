/**
 * Detaches one throwaway ArrayBuffer, for a worker that answers by transferring buffers. V8
 * compiles typed-array code on the assumption that no buffer has ever been detached in the
 * isolate, and throws all of that code away the first time one is: the derive workers' first
 * transferred answer used to discard nearly every optimized function of the derivation, to be
 * compiled again (seen with --trace-deopt; 10–11 % of the CPU of a 20,000-object run). Called
 * before any of that code is compiled, it makes the first compilation the lasting one. The derive
 * workers now copy their answers instead, which is cheaper still (see deriveWorker.ts). The live
 * reading's web workers call it, as they answer by transfer after a warm-up; in Chromium 156
 * their submits measured the same with and without it (its V8 may no longer discard code on a
 * detach), so there it is a safeguard only.
 * @returns the detached buffer (zero bytes long).
 */
export function detachOnce(): ArrayBuffer {
  const buffer = new ArrayBuffer(8);
  structuredClone(buffer, { transfer: [buffer] });
  return buffer;
}

// structuredClone is a global of both Node and browsers; the pure modules' type check (no DOM, no
// Node types) does not know it.
declare function structuredClone<T>(value: T, options?: { transfer?: ArrayBuffer[] }): T;
