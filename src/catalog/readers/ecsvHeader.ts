import { parseDocument } from 'yaml';
import type { ColumnKind } from './types.ts';
import { CatalogError } from './CatalogError.ts';

/** One column declared in an ECSV header. */
export interface EcsvColumn {
  name: string;
  /** ECSV datatype as written (`float64`, `int32`, `bool`, `string`, ...). */
  datatype: string;
  kind: ColumnKind;
  unit?: string;
  description?: string;
  ucd?: string;
}

/** The parsed `# ---` YAML header of an ECSV file. */
export interface EcsvHeader {
  version: string;
  columns: EcsvColumn[];
  delimiter: ' ' | ',';
  meta: Record<string, unknown>;
  /** Number of `#` lines at the top of the file (the header block). */
  headerLines: number;
}

/** ECSV 1.0 datatypes (APE 6) and the kind their values are read as. */
const DATATYPE_KIND: Record<string, ColumnKind> = {
  bool: 'bool', string: 'string',
  int8: 'int', int16: 'int', int32: 'int', int64: 'int',
  uint8: 'int', uint16: 'int', uint32: 'int', uint64: 'int',
  float16: 'float', float32: 'float', float64: 'float', float128: 'float',
};

/**
 * Parses the header lines of an ECSV file (Astropy ECSV 1.0, APE 6): line 1 `# %ECSV <version>`,
 * then `# ---` and a YAML document (one `# ` prefix per line) with the `datatype` list and the
 * optional `delimiter`, `meta` and `schema`. YAML 1.1 is used so that Astropy's `!!omap` maps
 * parse; unknown application tags (e.g. `!astropy.units.Unit`) are read as plain values.
 *
 * @param lines - the leading `#` lines of the file, without line terminators
 * @param file - file name for error messages
 */
export function parseEcsvHeader(lines: readonly string[], file: string): EcsvHeader {
  const m = /^# %ECSV (\d+(?:\.\d+)*)\s*$/.exec(lines[0] ?? '');
  if (!m) throw new CatalogError(`${file}: line 1: not an ECSV file: the first line must be "# %ECSV <version>"`);
  const body = lines.slice(1).map((l) => (l.startsWith('# ') ? l.slice(2) : l.slice(1)));
  const start = body.findIndex((l) => l.trim() !== '');
  if (start === -1) throw new CatalogError(`${file}: ECSV header has no YAML block (expected "# ---" on line 2)`);
  if (body[start]!.trimEnd() !== '---') {
    throw new CatalogError(`${file}: line ${start + 2}: ECSV header must start its YAML with "# ---"`);
  }
  const doc = parseDocument(body.join('\n'), { schema: 'yaml-1.1', logLevel: 'silent', uniqueKeys: false });
  const err = doc.errors[0];
  if (err) {
    const yamlLine = err.linePos?.[0].line;
    const where = yamlLine !== undefined ? `line ${yamlLine + 1}: ` : '';
    // The parser's own "at line N, column M" counts YAML lines, not file lines: drop it.
    const what = err.message.split('\n')[0]!.replace(/ at line \d+, column \d+:?$/, '');
    throw new CatalogError(`${file}: ${where}malformed ECSV YAML header: ${what}`);
  }
  const header = toPlain(doc.toJS());
  if (!isRecord(header)) throw new CatalogError(`${file}: ECSV YAML header is not a mapping`);
  const datatype = header.datatype;
  if (!Array.isArray(datatype) || datatype.length === 0) {
    throw new CatalogError(`${file}: ECSV header has no "datatype" list of columns`);
  }
  const columns = datatype.map((d, i) => ecsvColumn(d, i, file));
  const delimiter = header.delimiter ?? ' ';
  if (delimiter !== ' ' && delimiter !== ',') {
    throw new CatalogError(`${file}: ECSV delimiter must be " " or ",", got ${JSON.stringify(delimiter)}`);
  }
  const meta = isRecord(header.meta) ? header.meta : {};
  return { version: m[1]!, columns, delimiter, meta, headerLines: lines.length };
}

function ecsvColumn(d: unknown, i: number, file: string): EcsvColumn {
  if (!isRecord(d) || typeof d.name !== 'string' || d.name === '') {
    throw new CatalogError(`${file}: ECSV header: datatype entry ${i + 1} has no name`);
  }
  const name = d.name;
  if (typeof d.datatype !== 'string') throw new CatalogError(`${file}: ECSV header: column "${name}" has no datatype`);
  const kind = DATATYPE_KIND[d.datatype];
  if (kind === undefined) throw new CatalogError(`${file}: ECSV header: column "${name}" has unsupported datatype "${d.datatype}"`);
  if (d.subtype !== undefined) {
    throw new CatalogError(`${file}: ECSV header: column "${name}" has subtype "${String(d.subtype)}" (array or JSON cells are not supported)`);
  }
  const col: EcsvColumn = { name, datatype: d.datatype, kind };
  if (d.unit !== undefined && d.unit !== null) col.unit = String(d.unit);
  if (typeof d.description === 'string') col.description = d.description;
  if (isRecord(d.meta) && typeof d.meta.ucd === 'string') col.ucd = d.meta.ucd;
  return col;
}

function isRecord(x: unknown): x is Record<string, unknown> {
  return typeof x === 'object' && x !== null && !Array.isArray(x);
}

/** Turns the Maps that YAML 1.1 `!!omap` produces into plain objects, recursively. */
export function toPlain(x: unknown): unknown {
  if (x instanceof Map) {
    const o: Record<string, unknown> = {};
    for (const [k, v] of x) o[String(k)] = toPlain(v);
    return o;
  }
  if (x instanceof Set) return [...x].map(toPlain);
  if (Array.isArray(x)) return x.map(toPlain);
  if (isRecord(x)) return Object.fromEntries(Object.entries(x).map(([k, v]) => [k, toPlain(v)]));
  return x;
}
