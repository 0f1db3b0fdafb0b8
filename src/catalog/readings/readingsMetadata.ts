import type { Reading } from '../../core/readings/reading.ts';
import { READING_FLAG_DESCRIPTIONS } from '../../core/readings/readingFlags.ts';
import { SUMMARY_INTERVAL_METHOD, type ReadingSummary } from '../../core/readings/readingSummary.ts';
import type { ColumnDoc } from '../metadata/columnDoc.ts';

/** Key of the readings metadata in the readings Parquet file's key/value metadata. */
export const READINGS_METADATA_KEY = 'dawn_census_readings';

/** What a reader of the readings table needs: every reading's full record, the reading flags and the columns. */
export interface ReadingsMetadata {
  format: 'dawn-census-readings/1';
  /** The reading the main catalog is derived under. */
  primary: string;
  /** File name of the readings table (same folder as the catalog). */
  file: string;
  readings: Reading[];
  flags: Record<string, string>;
  columns: ColumnDoc[];
  /** How the summary's intervals are computed. */
  intervalMethod: string;
  /** Per-reading headline numbers (in the catalog's metadata only: computed after this table is written). */
  summary?: ReadingSummary[];
}

/** Assembles the readings metadata (without the summary). */
export function buildReadingsMetadata(primary: string, file: string, readings: readonly Reading[], columns: readonly ColumnDoc[]): ReadingsMetadata {
  return {
    format: 'dawn-census-readings/1',
    primary,
    file,
    readings: readings.map((r) => structuredClone(r) as Reading),
    flags: { ...READING_FLAG_DESCRIPTIONS },
    columns: columns.map((c) => ({
      name: c.name,
      kind: c.kind,
      group: c.group,
      ...(c.unit !== undefined ? { unit: c.unit } : {}),
      description: c.description,
      ...(c.ucd ? { ucd: c.ucd } : {}),
    })),
    intervalMethod: SUMMARY_INTERVAL_METHOD,
  };
}
