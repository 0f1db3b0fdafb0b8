import { DEFAULT_SETTINGS } from '../../core/derive/defaultSettings.ts';
import type { DeriveSettings } from '../../core/derive/types.ts';
import { isRecord } from '../recordPath.ts';


/**
 * The derivation settings of the catalog, from the `settings` record of its metadata sidecar
 * (the provenance record whose `settings` member is the DeriveSettings the build used; a bare
 * DeriveSettings record is accepted too). Keys the record lacks take DEFAULT_SETTINGS, which is
 * what the build used for them; `missing` names them so the page can say so.
 */
export function placeSettings(recorded: Record<string, unknown> | undefined): { settings: DeriveSettings; missing: string[] } {
  const r = recorded && isRecord(recorded.settings) ? recorded.settings : (recorded ?? {});
  const missing: string[] = [];
  const settings = { ...DEFAULT_SETTINGS, calibrations: { ...DEFAULT_SETTINGS.calibrations }, linePriority: [...DEFAULT_SETTINGS.linePriority] } as DeriveSettings;
  for (const key of Object.keys(DEFAULT_SETTINGS) as (keyof DeriveSettings)[]) {
    const v = r[key];
    if (v === undefined || v === null) {
      missing.push(key);
      continue;
    }
    if (key === 'calibrations' && isRecord(v)) settings.calibrations = { ...settings.calibrations, ...(v as Record<string, string>) };
    else (settings as unknown as Record<string, unknown>)[key] = v;
  }
  return { settings, missing };
}
