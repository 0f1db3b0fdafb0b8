import type { DeriveSettings } from '../../core/derive/types.ts';

/** A cell as it comes back from the catalog query: a number, text, a boolean, or missing. */
export type CatalogCell = number | bigint | string | boolean | null | undefined;

/**
 * One catalog row as the charts read it (snake_case Parquet columns). Every column but `id`
 * may be absent, so a chart can be drawn from a query that selects only what it needs.
 * Logs are base 10; masses in solar masses, luminosities in erg s^-1, widths in km s^-1.
 */
export interface CatalogRow {
  id: string;
  z?: CatalogCell;
  log_mstar?: CatalogCell;
  log_mstar_err?: CatalogCell;
  log_mbh?: CatalogCell;
  log_mbh_p16?: CatalogCell;
  log_mbh_p50?: CatalogCell;
  log_mbh_p84?: CatalogCell;
  log_lbol?: CatalogCell;
  log_lbol_p16?: CatalogCell;
  log_lbol_p84?: CatalogCell;
  log_edd_ratio?: CatalogCell;
  log_edd_ratio_p16?: CatalogCell;
  log_edd_ratio_p84?: CatalogCell;
  fwhm_halpha?: CatalogCell;
  fwhm_halpha_err?: CatalogCell;
  log_lum_halpha?: CatalogCell;
  fwhm_hbeta?: CatalogCell;
  fwhm_hbeta_err?: CatalogCell;
  log_lum_hbeta?: CatalogCell;
  flux_halpha_is_limit?: CatalogCell;
  /** Comma-separated flags, e.g. 'mbh_upper_limit,no_host_mass'. */
  flags?: CatalogCell;
  [column: string]: CatalogCell;
}

/** The derivation settings the charts draw reference curves from (the catalog metadata's settings). */
export type ChartSettings = Pick<
  DeriveSettings,
  'cosmology' | 'localRelation' | 'zSeed' | 'efficiency' | 'lightSeedMsun' | 'heavySeedMsun' | 'eddingtonPerMsun'
>;

/** Options every chart takes. */
export interface ChartOptions {
  /** Document to create elements in (the browser's by default; a linkedom/jsdom one in tests). */
  document?: Document;
  /** Ids drawn on top of the population and emphasised. */
  highlightIds?: readonly string[];
  /** Objects that are not in the catalog (the compare page's new objects), drawn in their own style with a legend entry. */
  extra?: readonly CatalogRow[];
  /** Outer width and height in px (defaults 640 × 440). */
  width?: number;
  height?: number;
  /** Above this many population points the chart draws a binned density instead of one mark per point (default 5000). */
  densityThreshold?: number;
  /** Heading drawn above the chart (none by default: pages give their own). */
  title?: string;
  /** Omit the caption under the chart (default false). */
  noCaption?: boolean;
}

/** Options of the charts that draw reference curves from the catalog settings. */
export interface SettingsChartOptions extends ChartOptions {
  settings: ChartSettings;
}
