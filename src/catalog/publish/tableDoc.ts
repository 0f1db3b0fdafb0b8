import type { CatalogMetadata } from '../metadata/catalogMetadata.ts';
import type { ColumnDoc } from '../metadata/columnDoc.ts';
import { READINGS_COLUMNS } from '../readings/readingsColumns.ts';

/** What every published format says about the table: its name, description, table-level facts and columns. */
export interface TableDoc {
  name: string;
  description?: string;
  /** Table-level key/values (title, group, licence, citation, DOI, version, tool), in order. */
  meta: [string, string][];
  columns: readonly ColumnDoc[];
}

/** The table description of a derived catalog, from its metadata. */
export function tableDocOf(m: CatalogMetadata, name = 'dawn_census'): TableDoc {
  const meta: [string, string][] = [];
  const put = (k: string, v: string | undefined): void => {
    if (v !== undefined && v !== '') meta.push([k, v]);
  };
  put('title', m.title);
  put('group', m.group);
  put('licence', m.licence);
  put('citation', m.citation);
  const pub = m.publication;
  put('authors', pub?.authors.map((a) => a.name + (a.orcid ? ` (ORCID ${a.orcid})` : '')).join('; '));
  put('catalog_version', pub?.version);
  put('doi', pub?.doi);
  put('tool', `${m.tool.name} ${m.tool.version}`);
  put('input_sha256', m.input.sha256);
  return { name, ...(m.description ? { description: m.description } : {}), meta, columns: m.columns };
}

/**
 * The table description of the readings table (`<name>.readings.parquet`): every object under
 * every reading of the broad lines, one row each.
 */
export function readingsTableDoc(toolVersion: string): TableDoc {
  return {
    name: 'dawn_census_readings',
    description: 'Every object under every reading of the broad lines, one row per object and reading; the readings are described in the dawn_census_readings key of this file',
    meta: [['tool', `dawn-census ${toolVersion}`]],
    columns: READINGS_COLUMNS,
  };
}
