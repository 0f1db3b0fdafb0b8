import type { ColumnDoc } from './columnDoc.ts';
import type { SettingsProvenance } from './settingsProvenance.ts';
import type { ReadingsMetadata } from '../readings/readingsMetadata.ts';
import type { Publication } from '../config/publicationConfig.ts';

/** Key of the Parquet key/value metadata entry that holds the catalog metadata (JSON). */
export const METADATA_KEY = 'dawn_census';

/** Version of the layout of {@link CatalogMetadata}; raised when a field changes meaning. */
export const METADATA_FORMAT = 'dawn-census-catalog/1';

/**
 * Everything a reader of a derived catalog needs to trust and reproduce it. Stored as JSON in
 * the Parquet file (key `dawn_census`) and in the `<name>.meta.json` sidecar. Holds no
 * timestamps or absolute paths, so the same input, config and seed give the same bytes.
 */
export interface CatalogMetadata {
  format: typeof METADATA_FORMAT;
  tool: { name: 'dawn-census'; version: string };
  title?: string;
  group?: string;
  description?: string;
  licence?: string;
  citation?: string;
  /** Authors (with ORCID iDs), the catalog's own version and its DOI, when the config gives them. */
  publication?: Publication;
  /**
   * The input catalog: file name (no folder), format, SHA-256 of its bytes, and for each
   * canonical column the file column it was read from and the unit it was read in (from the
   * file's metadata or the config; '' = canonical), so a reader can trace every value back.
   */
  input: { file: string; format: string; sha256: string; columns: { name: string; source: string; unit: string }[] };
  /** The config file, or null values when the defaults were used. */
  config: { file: string | null; sha256: string | null };
  settings: SettingsProvenance;
  /** Rows read, rows derived, rows flagged with input problems (listed in the rejection report), and problems found. */
  counts: { rows: number; derived: number; flagged: number; problems: number };
  /** What each flag in the `flags` column means. */
  flags: Record<string, string>;
  /** File names (same folder) of the catalog, this sidecar and the rejection report. */
  files: { catalog: string; meta: string; rejections: string };
  columns: ColumnDoc[];
  /** The readings the catalog was also derived under, their provenance and per-reading summary (see readings.parquet). */
  readings?: ReadingsMetadata;
}
