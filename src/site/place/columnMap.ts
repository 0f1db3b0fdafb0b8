/**
 * The catalog's column map: which source column of the group's own file held each canonical
 * input, and the unit it was read in. The catalog build records it in the metadata sidecar's
 * `input.columns` (src/catalog/metadata/buildCatalogMetadata.ts); the place page embeds it so
 * that a row pasted from the same kind of file is read the way the catalog was.
 */
import { isRecord } from '../recordPath.ts';
import { fileUnitSpelling } from '../../catalog/normalize/fileUnitSpelling.ts';

/** One canonical input column: its name, the source column that held it, and that column's unit ('' = canonical unit). */
export interface MappedColumn {
  name: string;
  source: string;
  unit: string;
}

/**
 * The column map recorded in a metadata sidecar (`input.columns`); entries without a name are
 * skipped, a missing source means the canonical name, a missing unit the canonical unit.
 * @param rawMeta - the whole metadata sidecar.
 */
export function catalogColumnMap(rawMeta: Record<string, unknown>): MappedColumn[] {
  const input = rawMeta.input;
  if (!isRecord(input) || !Array.isArray(input.columns)) return [];
  const out: MappedColumn[] = [];
  for (const c of input.columns) {
    if (!isRecord(c) || typeof c.name !== 'string' || c.name.trim() === '') continue;
    const source = typeof c.source === 'string' && c.source.trim() !== '' ? c.source : c.name;
    out.push({ name: c.name, source, unit: typeof c.unit === 'string' ? c.unit.trim() : '' });
  }
  return out;
}

/** A pasted header read through the column map. */
export interface MappedHeader {
  /** The canonical name each header cell stands for (the cell itself when the map does not name it). */
  names: string[];
  /** Canonical name → unit its values are in, for columns the map gives a unit. */
  units: Record<string, string>;
  /** Canonical name → the pasted header name, where they differ (for messages). */
  pastedAs: Record<string, string>;
  /** Header cells that would give one canonical column twice. */
  problems: string[];
}

/**
 * Reads a pasted header through the catalog's column map: a header cell equal to a source column
 * (exactly, else ignoring case) stands for that canonical column, in the unit the catalog read it
 * in; any other cell keeps its name (normalizeOne then matches canonical names). The map wins
 * over a canonical name, as in the catalog build; a cell that would give a mapped column a second
 * time is a problem.
 */
export function mapHeader(header: readonly string[], map: readonly MappedColumn[]): MappedHeader {
  const names = header.map((h) => h.trim());
  const units: Record<string, string> = {};
  const pastedAs: Record<string, string> = {};
  const taken = new Set<number>();
  const find = (source: string): number => {
    const exact = names.findIndex((h, i) => !taken.has(i) && h === source);
    if (exact >= 0) return exact;
    const lower = source.toLowerCase();
    return names.findIndex((h, i) => !taken.has(i) && h.toLowerCase() === lower);
  };
  const out = [...names];
  for (const m of map) {
    const i = find(m.source);
    if (i < 0) continue;
    taken.add(i);
    out[i] = m.name;
    // a unit taken from the file's own metadata may be in astropy's CDS or FITS spelling
    if (m.unit !== '') units[m.name] = fileUnitSpelling(m.unit);
    if (names[i] !== m.name) pastedAs[m.name] = names[i]!;
  }
  const problems: string[] = [];
  for (let i = 0; i < out.length; i++) {
    if (taken.has(i)) continue;
    const j = out.findIndex((n, k) => taken.has(k) && n.toLowerCase() === out[i]!.toLowerCase());
    if (j >= 0) problems.push(`columns "${names[j]}" and "${names[i]}" both give ${out[j]}: keep one`);
  }
  return { names: out, units, pastedAs, problems };
}
