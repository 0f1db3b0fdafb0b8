/**
 * The unit the catalog's own line fluxes were read in (from the sidecar's `input.columns`,
 * where the build records each canonical column's source and unit), so that a row pasted
 * from the same kind of file is read the same way by default. `undefined` when the catalog
 * has no flux column, or read it in canonical units.
 * @param rawMeta - the whole metadata sidecar.
 */
export function catalogFluxUnit(rawMeta: Record<string, unknown>): string | undefined {
  const input = rawMeta.input as { columns?: unknown } | undefined;
  if (!input || !Array.isArray(input.columns)) return undefined;
  for (const c of input.columns as { name?: unknown; unit?: unknown }[]) {
    if (typeof c.name === 'string' && /^flux_[a-z]+$/.test(c.name) && typeof c.unit === 'string' && c.unit !== '') return c.unit;
  }
  return undefined;
}
