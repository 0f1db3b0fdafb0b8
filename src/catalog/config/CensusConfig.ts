import type { DeriveSettings } from '../../core/derive/types.ts';
import type { TableFormat } from '../readers/types.ts';
import type { ReadingsConfig } from './readingsConfig.ts';
import type { ExportFormat, PassthroughDeclaration, Publication } from './publicationConfig.ts';
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
  /**
   * The catalog file: absolute path, its format when the extension does not say, and for CSV/TSV
   * a one-character comment prefix valid on every line (without it only `#` lines above the
   * header are comments).
   */
  input?: {
    path: string;
    format?: TableFormat;
    comment?: string;
    /** Most decompressed bytes per compressed byte of a gzip catalog (default 250; see gzipLimits.ts). */
    gzipMaxRatio?: number;
    /** Most decompressed gigabytes (1e9 bytes) of a gzip catalog (default 64). */
    gzipMaxGb?: number;
  };
  /** Canonical column name → where and in which unit it is in the file. */
  columns: Record<string, ColumnMapping>;
  /** Every choice of the derivation. */
  settings: DeriveSettings;
  /** Readings of the broad lines to derive under (default: the four built-ins, primary 'standard'). */
  readings?: ReadingsConfig;
  /**
   * `implausible_medians_intended: true`: the catalog's median line luminosity or FWHM lies
   * outside what broad lines have, on purpose; derive does not stop (default false).
   */
  implausibleMediansIntended?: boolean;
  /** Where the Parquet catalog is written: absolute path. */
  output?: string;
  /** Further formats written beside the Parquet catalog (`output.formats`, `--format`). */
  outputFormats?: ExportFormat[];
  /** Authors (with ORCID iDs), the catalog's version and DOI (`authors`, `version`, `doi`). */
  publication?: Publication;
  /** Unit, UCD and description declared for columns copied unchanged from the input, by file column name. */
  passthrough?: Record<string, PassthroughDeclaration>;
  /** Site options; `base` starts and ends with '/'. */
  site: { base: string };
  /** The survey's fields, limits and selection, for space densities and the selection-aware relation fit. */
  survey?: SurveyConfig;
  /** Absolute path of the config file, when read from one. */
  configPath?: string;
  /** Text of the config file as read, for provenance. */
  configText?: string;
}
