import { DEFAULT_SETTINGS } from '../../core/derive/defaultSettings.ts';
import type { CosmologyId, LocalRelationId } from '../../core/derive/types.ts';
import type { ChartSettings } from './types.ts';
import { isRecord, pick } from '../recordPath.ts';



const text = (v: unknown): string | undefined => (typeof v === 'string' && v.trim() !== '' ? v.trim() : undefined);

const finite = (v: unknown): number | undefined => (typeof v === 'number' && Number.isFinite(v) ? v : typeof v === 'string' && v.trim() !== '' && Number.isFinite(Number(v)) ? Number(v) : undefined);

/**
 * The chart settings from the settings recorded in a catalog's metadata sidecar: its
 * `settings` provenance record (whose `settings` member is the derivation's `DeriveSettings`),
 * or a `DeriveSettings`-like record itself (camelCase, or the config's snake_case spelling with
 * `seeds.light`). A key the record lacks takes the tool's default (DEFAULT_SETTINGS of
 * src/core/derive), which is what the derivation itself used for it.
 */
export function chartSettings(raw: Record<string, unknown> | undefined): ChartSettings {
  const d = DEFAULT_SETTINGS;
  const r = raw && isRecord(raw.settings) ? raw.settings : (raw ?? {});
  return {
    cosmology: ((text(pick(r, 'cosmology.id')) ?? text(pick(r, 'cosmology'))) as CosmologyId | undefined) ?? d.cosmology,
    localRelation: ((text(pick(r, 'localRelation.id', 'local_relation.id')) ?? text(pick(r, 'localRelation', 'local_relation'))) as LocalRelationId | undefined) ?? d.localRelation,
    zSeed: finite(pick(r, 'zSeed', 'z_seed')) ?? d.zSeed,
    efficiency: finite(pick(r, 'efficiency')) ?? d.efficiency,
    lightSeedMsun: finite(pick(r, 'lightSeedMsun', 'seeds.light', 'light_seed_msun')) ?? d.lightSeedMsun,
    heavySeedMsun: finite(pick(r, 'heavySeedMsun', 'seeds.heavy', 'heavy_seed_msun')) ?? d.heavySeedMsun,
    eddingtonPerMsun: finite(pick(r, 'eddingtonPerMsun', 'eddington_per_msun')) ?? d.eddingtonPerMsun,
  };
}
