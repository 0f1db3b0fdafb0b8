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
 * - `--no-turbo-inlining`: V8's optimizing compiler no longer copies the functions a function
 *   calls into its code. The derivation's hot loops are functions of their own, compiled each on
 *   its own either way; inlined, they were compiled again inside every caller (deriveObject,
 *   evaluateChain, sampleInputs…), in each worker. At 20,000 objects × 1000 draws, in one thread:
 *   0.73–0.77 s of compilation against 1.21–1.32 s, and the same run time; with two workers,
 *   alternating five times, 3.34–3.70 s against 3.50–3.94 s wall (medians 3.45 and 3.64 s).
 *   It applies to every isolate of the process from now on, this thread's included.
 *
 * Process-wide, as V8 flags are; a program that embeds runDerive gets them too.
 */
export function setV8ForDerive(): void {
  setFlagsFromString(`--min-semi-space-size=${WORKER_SEMI_SPACE_MB}`);
  setFlagsFromString('--no-turbo-inlining');
}
