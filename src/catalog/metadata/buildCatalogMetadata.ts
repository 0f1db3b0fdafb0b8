import path from 'node:path';
import { FLAG_DESCRIPTIONS } from '../../core/derive/flags.ts';
import type { CensusConfig } from '../config/CensusConfig.ts';
import type { TableSource } from '../readers/types.ts';
import type { OutputPaths } from '../derive/outputPaths.ts';
import type { ColumnDoc } from './columnDoc.ts';
import { METADATA_FORMAT } from './catalogMetadata.ts';
import type { CatalogMetadata } from './catalogMetadata.ts';
import { sha256Text } from './sha256.ts';
import type { SettingsProvenance } from './settingsProvenance.ts';
import { toolVersion } from './toolVersion.ts';
import type { ReadingsMetadata } from '../readings/readingsMetadata.ts';

/** What {@link buildCatalogMetadata} assembles the metadata from. */
export interface CatalogMetadataParts {
  config: CensusConfig;
  source: Pick<TableSource, 'path' | 'format'>;
  inputSha256: string;
  provenance: SettingsProvenance;
  counts: CatalogMetadata['counts'];
  paths: OutputPaths;
  /** The output columns (extra fields, such as value getters, are dropped). */
  columns: readonly ColumnDoc[];
  /** How each canonical column was read: its file column and the unit it was read in. */
  inputColumns: readonly { name: string; sourceName: string; unitIn?: string }[];
  /** The readings metadata with its summary, when the run derived readings. */
  readings?: ReadingsMetadata;
}

/** Flags the catalog build adds on top of deriveObject's. */
const BUILD_FLAGS: Readonly<Record<string, string>> = {
  derive_failed: 'The derivation stopped with an error for this object; no quantity was derived (see the rejection report).',
};

const docOnly = (c: ColumnDoc): ColumnDoc => ({
  name: c.name,
  kind: c.kind,
  group: c.group,
  ...(c.unit !== undefined ? { unit: c.unit } : {}),
  description: c.description,
  ...(c.ucd ? { ucd: c.ucd } : {}),
  ...(c.reference ? { reference: c.reference } : {}),
});

/** Assembles the metadata of a derived catalog (see {@link CatalogMetadata}). */
export function buildCatalogMetadata(p: CatalogMetadataParts): CatalogMetadata {
  const { config } = p;
  const described = Object.fromEntries(
    (['title', 'group', 'description', 'licence', 'citation'] as const).flatMap((k) => (config[k] ? [[k, config[k]]] : [])),
  );
  return {
    format: METADATA_FORMAT,
    tool: { name: 'dawn-census', version: toolVersion() },
    ...described,
    ...(config.publication ? { publication: config.publication } : {}),
    input: {
      file: path.basename(p.source.path),
      format: p.source.format,
      sha256: p.inputSha256,
      columns: p.inputColumns.map((c) => ({ name: c.name, source: c.sourceName, unit: c.unitIn ?? '' })),
    },
    config: {
      file: config.configPath ? path.basename(config.configPath) : null,
      sha256: config.configText !== undefined ? sha256Text(config.configText) : null,
    },
    settings: p.provenance,
    counts: p.counts,
    flags: { ...FLAG_DESCRIPTIONS, ...BUILD_FLAGS },
    files: {
      catalog: path.basename(p.paths.catalog),
      meta: path.basename(p.paths.meta),
      rejections: path.basename(p.paths.rejections),
    },
    columns: p.columns.map(docOnly),
    ...(p.readings ? { readings: p.readings } : {}),
  };
}

/** The metadata as compact JSON: the value of the Parquet `dawn_census` key. */
export function catalogMetadataJson(m: CatalogMetadata): string {
  return JSON.stringify(m);
}
