import type { DeriveSettings } from '../../core/derive/types.ts';
import type { TableFormat } from '../readers/types.ts';
import type { SurveyConfig } from './SurveyConfig.ts';

/** How one canonical column is read from the catalog file. */
export interface ColumnMapping {
  /** Name of the column in the file (default: the canonical name, matched exactly, then case-insensitively). */
  source?: string;
  /** Unit of the values in the file; overrides the file's own unit metadata. */
  unit?: string;
}

/** A validated census config: what `census.config.yaml` says, with defaults filled in. */
export interface CensusConfig {
  title?: string;
  group?: string;
  description?: string;
  licence?: string;
  citation?: string;
  /** The catalog file: absolute path, and its format when the extension does not say. */
  input?: { path: string; format?: TableFormat };
  /** Canonical column name → where and in which unit it is in the file. */
  columns: Record<string, ColumnMapping>;
  /** Every choice of the derivation. */
  settings: DeriveSettings;
  /** Where the Parquet catalog is written: absolute path. */
  output?: string;
  /** Site options; `base` starts and ends with '/'. */
  site: { base: string };
  /** The survey's fields, limits and selection, for space densities and the selection-aware relation fit. */
  survey?: SurveyConfig;
  /** Absolute path of the config file, when read from one. */
  configPath?: string;
  /** Text of the config file as read, for provenance. */
  configText?: string;
}
