import { DEFAULT_GZIP_LIMITS, type GzipLimits } from './gzipLimits.ts';
import type { ColumnInfo, TableSource } from './types.ts';
import { CatalogError } from './CatalogError.ts';
import { DelimitedTokenizer } from './DelimitedTokenizer.ts';
import { delimitedSource } from './csv.ts';
import { isBoolText, isIntegerText, isNumberText } from './cellText.ts';
import { settleColumnNames } from './columnNames.ts';
import { parseEcsvHeader, type EcsvColumn } from './ecsvHeader.ts';
import { readTextChunks } from './textChunks.ts';

/**
 * Opens an Astropy ECSV 1.0 file (APE 6).
 *
 * Kinds, units, descriptions and UCDs (column `meta.ucd`) come from the YAML header; `meta` is the
 * header's `meta` mapping. Opening makes one full pass that checks the data header line against
 * the declared columns, every field count and every value against its datatype, and counts rows.
 * Empty fields (`""` with the space delimiter) are null. NaN/inf values of float columns stay
 * NaN/±Infinity. An int64/uint64 column holding a value beyond ±(2^53 − 1) is read as `string`
 * (exact decimal text) rather than rounded.
 *
 * @param path - file to read
 */
export async function openEcsv(path: string, limits: Readonly<GzipLimits> = DEFAULT_GZIP_LIMITS): Promise<TableSource> {
  const header = parseEcsvHeader(await readHeaderLines(path, limits), path);
  const names = settleColumnNames(header.columns.map((c) => c.name), `${path}: ECSV header`);
  const checks = header.columns.map(valueCheck);
  const unsafeInt = header.columns.map(() => false);
  let sawHeaderLine = false;
  let nRows = 0;
  const tok = new DelimitedTokenizer({ delimiter: header.delimiter, label: path }, (fields, line) => {
    if (!sawHeaderLine) {
      sawHeaderLine = true;
      if (fields.length !== names.length || fields.some((f, i) => f !== names[i])) {
        throw new CatalogError(
          `${path}: line ${line}: data header line lists columns (${fields.join(', ')}) but the YAML header declares (${names.join(', ')})`,
        );
      }
      return;
    }
    if (fields.length !== names.length) {
      throw new CatalogError(`${path}: line ${line}: ${fields.length} fields, header has ${names.length}`);
    }
    for (let i = 0; i < fields.length; i++) {
      const s = fields[i]!;
      if (s === '') continue;
      const col = header.columns[i]!;
      if (!checks[i]!(s)) {
        throw new CatalogError(`${path}: line ${line}: column "${col.name}" (${col.datatype}): "${clip(s)}" is not a valid ${col.datatype} value`);
      }
      if (col.kind === 'int' && s.length > 15 && !Number.isSafeInteger(Number(s))) unsafeInt[i] = true;
    }
    nRows++;
  });
  for await (const text of readTextChunks(path, path, limits)) tok.push(text);
  tok.end();
  if (!sawHeaderLine) throw new CatalogError(`${path}: ECSV file has no data header line after the YAML header`);
  const columns: ColumnInfo[] = header.columns.map((c, i) => {
    const info: ColumnInfo = { name: names[i]!, kind: unsafeInt[i] ? 'string' : c.kind, fileType: c.datatype };
    if (c.unit !== undefined) info.unit = c.unit;
    if (c.description !== undefined) info.description = c.description;
    if (c.ucd !== undefined) info.ucd = c.ucd;
    return info;
  });
  return delimitedSource(path, 'ecsv', columns, nRows, header.meta, { delimiter: header.delimiter, label: path }, 1, limits);
}

/** Reads the leading `#` lines (the ECSV header block) without reading the rest of the file. */
async function readHeaderLines(path: string, limits: Readonly<GzipLimits>): Promise<string[]> {
  const lines: string[] = [];
  let rest = '';
  for await (const text of readTextChunks(path, path, limits)) {
    rest += text;
    let nl: number;
    while ((nl = rest.indexOf('\n')) !== -1) {
      const line = rest.slice(0, nl).replace(/\r$/, '');
      rest = rest.slice(nl + 1);
      if (!line.startsWith('#')) return lines;
      lines.push(line);
    }
  }
  if (rest.startsWith('#')) lines.push(rest.replace(/\r$/, ''));
  if (lines.length === 0) throw new CatalogError(`${path}: line 1: not an ECSV file: the first line must be "# %ECSV <version>"`);
  return lines;
}

function valueCheck(c: EcsvColumn): (s: string) => boolean {
  switch (c.kind) {
    case 'int': return isIntegerText;
    case 'float': return isNumberText;
    case 'bool': return isBoolText;
    case 'string': return () => true;
  }
}

function clip(s: string): string {
  return s.length > 40 ? `${s.slice(0, 40)}…` : s;
}
