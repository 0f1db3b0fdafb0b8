/**
 * `npm run bench:core`: object-draws per second of deriveObject on one core (Hα mass, L_bol,
 * λ_Edd, seed mass, local offset, 2000 draws per object), over a seeded set of invented
 * objects with errors on every input. A benchmark, not a test: the figure goes in the README.
 */
import { deriveObject } from '../src/core/derive/deriveObject.ts';
import { DEFAULT_SETTINGS } from '../src/core/derive/defaultSettings.ts';
import type { ObjectInputs } from '../src/core/derive/types.ts';
import { createRng } from '../src/core/random/createRng.ts';
import { seedFor } from '../src/core/random/seedFor.ts';

const nObjects = Number(process.argv[2] ?? 2000);
const settings = { ...DEFAULT_SETTINGS, draws: 2000 };
const gen = createRng(42);
const objects: ObjectInputs[] = Array.from({ length: nObjects }, (_, i) => {
  const flux = 10 ** (-17.5 + gen.next());
  const fwhm = 1000 + 3000 * gen.next();
  return {
    id: `bench-${i}`,
    z: 4 + 3 * gen.next(),
    lines: { halpha: { fluxCgs: { value: flux, errLo: 0.1 * flux, errHi: 0.1 * flux }, fwhmKms: { value: fwhm, errLo: 0.1 * fwhm, errHi: 0.12 * fwhm } } },
    logMstar: { value: 8.5 + gen.next(), errLo: 0.3, errHi: 0.3 },
    av: { value: gen.next(), errLo: 0.2, errHi: 0.2 },
  };
});

// Warm up the JIT and the cosmology tables.
for (let i = 0; i < Math.min(200, nObjects); i++) deriveObject(objects[i]!, settings, createRng(seedFor(1, objects[i]!.id)));

// Wall time, and this thread's CPU time: on a shared machine the CPU figure is the steadier one.
const t0 = performance.now();
const c0 = process.cpuUsage();
let sink = 0;
for (const o of objects) sink += deriveObject(o, settings, createRng(seedFor(1, o.id))).pct.logMbh!.p50;
const seconds = (performance.now() - t0) / 1000;
const cpu = process.cpuUsage(c0);
const cpuSeconds = (cpu.user + cpu.system) / 1e6;
const objectDraws = nObjects * settings.draws;
console.log(`deriveObject: ${nObjects} objects × ${settings.draws} draws in ${seconds.toFixed(2)} s wall, ${cpuSeconds.toFixed(2)} s CPU`);
console.log(
  `${(objectDraws / seconds / 1e6).toFixed(2)} million object-draws per second of wall time on one core ` +
    `(${(objectDraws / cpuSeconds / 1e6).toFixed(2)} million per CPU second; ${(nObjects / seconds).toFixed(0)} objects/s)`,
);
if (!Number.isFinite(sink)) process.exitCode = 1;
