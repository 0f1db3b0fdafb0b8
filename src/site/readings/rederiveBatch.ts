/**
 * Derives a batch of objects under one reading, each with its own random stream seeded from
 * (settings.seed, id), exactly as the catalog build does: the same inputs, reading and seed give
 * the CLI's numbers. Pure; runs in a web worker (rederiveWorker.ts) or in a test.
 */
import type { DeriveSettings, ObjectInputs } from '../../core/derive/types.ts';
import { deriveObject } from '../../core/derive/deriveObject.ts';
import { createRng, seedFor } from '../../core/random/index.ts';
import type { DrawBank } from '../../core/random/drawBank.ts';
import type { Rng } from '../../core/random/rng.ts';
import type { Reading } from '../../core/readings/reading.ts';
import { deriveUnderReading } from '../../core/readings/deriveUnderReading.ts';

/** One object's values under the reading (the readings table's columns, src/catalog/readings/readingsColumns.ts). */
export interface RederivedRow {
  id: string;
  log_mbh: number | null;
  log_mbh_p16: number | null;
  log_mbh_p50: number | null;
  log_mbh_p84: number | null;
  mbh_method: string | null;
  log_lbol: number | null;
  log_lbol_p16: number | null;
  log_lbol_p84: number | null;
  lbol_method: string | null;
  log_edd_ratio: number | null;
  log_edd_ratio_p16: number | null;
  log_edd_ratio_p84: number | null;
  p_super_eddington: number | null;
  delta_log_mbh_local: number | null;
  p_above_local: number | null;
  log_mseed: number | null;
  lambda_req_light: number | null;
  lambda_req_heavy: number | null;
  flags: string;
}

/**
 * Derives `inputs` under `reading`; an object whose derivation throws gets nulls and the flag
 * derive_failed. `randomFor` gives an object's random stream, freshly seeded from
 * (settings.seed, id), or its bank of deviates made from that stream (keptDrawBanks.ts); by
 * default the stream.
 */
export function rederiveBatch(
  inputs: readonly ObjectInputs[],
  settings: DeriveSettings,
  reading: Reading,
  randomFor: (input: ObjectInputs) => Rng | DrawBank = (input) => createRng(seedFor(settings.seed, input.id)),
): RederivedRow[] {
  return inputs.map((input) => {
    try {
      const d = deriveUnderReading(input, settings, reading, deriveObject, randomFor(input));
      return {
        id: input.id,
        log_mbh: d.logMbh,
        log_mbh_p16: d.pct.logMbh?.p16 ?? null,
        log_mbh_p50: d.pct.logMbh?.p50 ?? null,
        log_mbh_p84: d.pct.logMbh?.p84 ?? null,
        mbh_method: d.mbhMethod,
        log_lbol: d.logLbol,
        log_lbol_p16: d.pct.logLbol?.p16 ?? null,
        log_lbol_p84: d.pct.logLbol?.p84 ?? null,
        lbol_method: d.lbolMethod,
        log_edd_ratio: d.logEddRatio,
        log_edd_ratio_p16: d.pct.logEddRatio?.p16 ?? null,
        log_edd_ratio_p84: d.pct.logEddRatio?.p84 ?? null,
        p_super_eddington: d.pSuperEddington,
        delta_log_mbh_local: d.deltaLogMbhLocal,
        p_above_local: d.pAboveLocal,
        log_mseed: d.logMseed,
        lambda_req_light: d.lambdaReqLight,
        lambda_req_heavy: d.lambdaReqHeavy,
        flags: d.flags.join(','),
      };
    } catch {
      const nulls = { log_mbh: null, log_mbh_p16: null, log_mbh_p50: null, log_mbh_p84: null, mbh_method: null, log_lbol: null, log_lbol_p16: null, log_lbol_p84: null, lbol_method: null };
      const more = { log_edd_ratio: null, log_edd_ratio_p16: null, log_edd_ratio_p84: null, p_super_eddington: null, delta_log_mbh_local: null, p_above_local: null, log_mseed: null };
      return { id: input.id, ...nulls, ...more, lambda_req_light: null, lambda_req_heavy: null, flags: 'derive_failed' };
    }
  });
}
