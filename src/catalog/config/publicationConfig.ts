import { checkUcd } from '../../core/metadata/index.ts';
import { parseUnit } from '../../core/units/index.ts';

/** One author of a catalog, with an ORCID iD when given. */
export interface CatalogAuthor {
  name: string;
  orcid?: string;
  affiliation?: string;
}

/** How a published catalog is cited: authors, its own version, a DOI. */
export interface Publication {
  authors: CatalogAuthor[];
  version?: string;
  doi?: string;
}

/** What the config declares about a column copied unchanged from the input. */
export interface PassthroughDeclaration {
  unit?: string;
  ucd?: string;
  description?: string;
}

/** Extra file formats `derive` can write beside the Parquet catalog. */
export const EXPORT_FORMATS = ['ecsv', 'votable', 'fits'] as const;
export type ExportFormat = (typeof EXPORT_FORMATS)[number];

/** An ORCID iD: four groups of four digits, the last character a digit or X. */
const ORCID_SHAPE = /^\d{4}-\d{4}-\d{4}-\d{3}[\dX]$/;
/** A DOI: `10.<registrant>/<suffix>` (DOI Handbook §2.2; a `https://doi.org/` prefix is accepted and removed). */
const DOI_SHAPE = /^10\.\d{4,9}\/\S+$/;

/** The ORCID check character (ISO 7064 MOD 11-2, as ORCID documents for its identifiers). */
function orcidCheck(digits: string): string {
  let total = 0;
  for (const d of digits) total = (total + Number(d)) * 2;
  const r = (12 - (total % 11)) % 11;
  return r === 10 ? 'X' : String(r);
}

/** Normalises an ORCID iD (a `https://orcid.org/` prefix removed); null when it has the wrong shape or check character. */
export function normalizeOrcid(text: string): string | null {
  const id = text.trim().replace(/^https?:\/\/orcid\.org\//i, '');
  if (!ORCID_SHAPE.test(id)) return null;
  const digits = id.replaceAll('-', '');
  return orcidCheck(digits.slice(0, 15)) === digits[15] ? id : null;
}

/** Normalises a DOI (a `doi:` or `https://doi.org/` prefix removed); null when it has the wrong shape. */
export function normalizeDoi(text: string): string | null {
  const doi = text.trim().replace(/^(?:doi:|https?:\/\/(?:dx\.)?doi\.org\/)/i, '');
  return DOI_SHAPE.test(doi) ? doi : null;
}

/** Checks a unit declared in the config: the project's parser must read it. Returns what is wrong, or null. */
export function unitProblem(unit: string): string | null {
  try {
    parseUnit(unit);
    return null;
  } catch (e) {
    return (e as Error).message;
  }
}

/** Checks a UCD declared in the config against UCD1+ 1.5. Returns what is wrong, or null. */
export function ucdProblem(ucd: string): string | null {
  const why = checkUcd(ucd);
  return why ? `"${ucd}" is not a valid UCD1+ (${why})` : null;
}
