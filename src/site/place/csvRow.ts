/**
 * Reads a pasted CSV snippet: optional '#' comment lines, a header line of column names and data
 * rows (RFC 4180 quoting: fields in double quotes may hold commas, newlines and doubled
 * quotes). Blank lines are skipped.
 */

/** The header and the rows of a pasted CSV snippet, or the reason it cannot be read. */
export type PastedCsv = { header: string[]; rows: string[][] } | { error: string };

/** Splits CSV text into records of fields (RFC 4180). Unterminated quotes are an error. */
export function csvRecords(text: string): string[][] | { error: string } {
  const records: string[][] = [];
  let field = '';
  let record: string[] = [];
  let quoted = false;
  let i = 0;
  const endField = () => {
    record.push(field);
    field = '';
  };
  const endRecord = () => {
    endField();
    records.push(record);
    record = [];
  };
  while (i < text.length) {
    const c = text[i]!;
    if (quoted) {
      if (c === '"') {
        if (text[i + 1] === '"') {
          field += '"';
          i += 2;
          continue;
        }
        quoted = false;
      } else field += c;
      i++;
      continue;
    }
    if (c === '"' && field.trim() === '') {
      field = '';
      quoted = true;
    } else if (c === ',') endField();
    else if (c === '\n' || c === '\r') {
      endRecord();
      if (c === '\r' && text[i + 1] === '\n') i++;
    } else field += c;
    i++;
  }
  if (quoted) return { error: 'a quoted field is not closed (a " is missing)' };
  if (field !== '' || record.length) endRecord();
  return records;
}

/**
 * Parses pasted text into its header and data rows, skipping comment lines (first non-blank
 * character '#') and blank lines.
 */
export function parsePastedCsv(text: string): PastedCsv {
  const kept = text
    .split(/\r\n|\n|\r/)
    .filter((line) => !/^\s*#/.test(line))
    .join('\n');
  const records = csvRecords(kept);
  if ('error' in records) return records;
  const nonBlank = records.filter((r) => r.some((f) => f.trim() !== ''));
  if (nonBlank.length === 0) return { error: 'nothing to read: paste a header line and one data row' };
  if (nonBlank.length === 1) return { error: 'only one line: paste the header line (column names) and then the data row' };
  const header = nonBlank[0]!.map((h) => h.trim());
  for (const [k, row] of nonBlank.slice(1).entries()) {
    if (row.length !== header.length) {
      return { error: `data row ${k + 1} has ${row.length} fields but the header has ${header.length}` };
    }
  }
  return { header, rows: nonBlank.slice(1) };
}
