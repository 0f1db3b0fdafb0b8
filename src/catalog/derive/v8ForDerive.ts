import { setFlagsFromString } from 'node:v8';

/**
 * Young generation (each of its two semi-spaces) a derive worker starts with, in MB: V8's
 * default starts at 1–2 MB and grows, and a worker scavenged about 57 times over 10,000 objects ×
 * 1000 draws (200 ms); starting at 16 MB (the size it grows to anyway) it is about 15 times
 * (100 ms). Each worker holds 32 MB more at most.
 */
export const WORKER_SEMI_SPACE_MB = 16;

/**
 * The V8 settings of a derive run, set once before its workers are made. They change how fast
 * the run is, never a number it writes (no V8 setting changes the arithmetic of JavaScript).
 *
 * - `--min-semi-space-size`: see {@link WORKER_SEMI_SPACE_MB}. V8 reads it when it makes an
 *   isolate, so it sizes the workers made from now on; this thread's heap keeps its size, and
 *   Node's `resourceLimits` sets only the largest size, not the first.
 * - `--max-inlined-bytecode-size=120` (V8's default 460): V8's optimizing compiler copies only
 *   small functions into their callers. The derivation's hot loops are functions of their own,
 *   compiled each on its own either way; inlined, they were compiled again inside every caller
 *   (deriveObject, evaluateChain, sampleInputs…), in each worker. Small helpers (a word of the
 *   generator, a gathered value) stay inlined, which the steady state needs. Alternating on a quiet
 *   host (2026-12-02 20:33–20:36, load average near 0): 20,000 objects × 1000 draws 3.02–3.13 s
 *   (4.65–4.71 CPU s) against 3.06–3.22 s (4.83–5.04) with the default; 100,000 objects 9.74–9.93 s
 *   against 9.81–9.89 s. No inlining at all was as fast at 20,000 (3.00–3.06 s) but slower at
 *   100,000 (10.10–10.27 s). It applies to every isolate of the process from now on.
 * - `--no-concurrent-recompilation`: each worker compiles its hot functions itself, when V8
 *   decides to, instead of handing them to V8's background threads and running on in slower
 *   code meanwhile. A worker's hot loops run a thousand draws a call, so the slower code cost
 *   more than the wait, and the background threads competed with the workers for the two cores.
 *   V8 reads it when it makes an isolate: the workers compile in line, this thread as before.
 *   Per-thread CPU from /proc (2026-12-03, 20,000 objects × 1000 draws, one reading, alternating):
 *   V8's background threads 0.3 s against 0.9–1.0 s, the whole run 4.7–4.8 CPU s against
 *   5.0–5.4 (two pairs), workers unchanged within noise.
 *
 * Process-wide, as V8 flags are; a program that embeds runDerive gets them too.
 */
export function setV8ForDerive(): void {
  setFlagsFromString(`--min-semi-space-size=${WORKER_SEMI_SPACE_MB}`);
  setFlagsFromString('--max-inlined-bytecode-size=120');
  setFlagsFromString('--no-concurrent-recompilation');
}
