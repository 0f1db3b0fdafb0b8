/**
 * Reading values out of the metadata sidecar, whose settings tree the pages walk by dotted
 * paths (`settings.cosmology`, `cosmology.id`, …) without trusting its shape.
 */

/** True for a plain object (not null, not an array). */
export const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

/** The value at the first of `paths` (dotted) that is present and not null in `raw`; undefined when none is. */
export function pick(raw: Record<string, unknown>, ...paths: string[]): unknown {
  for (const p of paths) {
    let v: unknown = raw;
    for (const k of p.split('.')) v = isRecord(v) ? v[k] : undefined;
    if (v !== undefined && v !== null) return v;
  }
  return undefined;
}
