/**
 * Turns DuckDB's error texts into one-line messages a reader understands. DuckDB prefixes
 * its errors with a class ("Parser Error: …", "Binder Error: …"); we replace the class with
 * plain words and keep DuckDB's own detail, which names the column or token at fault.
 */
import { OUTSIDE_MESSAGE } from './statementGate.ts';

const LEADS: [RegExp, string][] = [
  [/^Parser Error:\s*/i, 'The SQL could not be read: '],
  [/^Binder Error:\s*/i, 'The query refers to something that does not exist or does not fit: '],
  [/^Catalog Error:\s*/i, 'Unknown name: '],
  [/^Conversion Error:\s*/i, 'A value could not be converted: '],
  [/^Invalid Input Error:\s*/i, 'Invalid input: '],
  [/^Out of Range Error:\s*/i, 'A number is out of range: '],
  [/^Not implemented Error:\s*/i, 'Not supported in the browser: '],
  [/^Permission Error:\s*/i, 'Not allowed here: '],
  [/^Interrupt Error:\s*/i, 'The query was stopped: '],
];

/** A plain-words message for an error thrown by a DuckDB-WASM query (`sql` is the text that failed). */
export function friendlyQueryError(error: unknown): string {
  let text = error instanceof Error ? error.message : String(error);
  // The worker's network gate (networkGuard.worker.js) or DuckDB's own lock refused a file or address.
  if (/census-blocked|disabled through configuration|disabled by configuration/i.test(text)) return OUTSIDE_MESSAGE;
  if (/configuration has been locked/i.test(text)) return 'The database’s settings are fixed on this site: SET and PRAGMA that change them are not available.';
  text = text.replace(/\s+/g, ' ').trim();
  // DuckDB appends a caret diagram on a second line; the first line says what is wrong.
  text = text.replace(/\s*LINE \d+:.*$/s, '');
  if (/Table with name (\w+) does not exist/i.test(text)) {
    const name = /Table with name (\w+) does not exist/i.exec(text)![1];
    return `There is no table called “${name}”: the catalog is the table named census (e.g. SELECT * FROM census).`;
  }
  for (const [re, lead] of LEADS) if (re.test(text)) return lead + text.replace(re, '').replace(/!$/, '.');
  return text || 'The query failed for an unknown reason.';
}

/** The reason DuckDB-WASM could not open the catalog, in words: `status` is the HTTP status of the file, if known. */
export function catalogLoadError(fileUrl: string, status: number | null, detail?: string): string {
  if (status === 404) {
    return `The catalog file (${fileUrl}) was not found on this site: it was published without its data, so nothing can be queried.`;
  }
  if (status !== null && (status < 200 || status >= 400)) {
    return `The catalog file (${fileUrl}) could not be fetched (HTTP ${status}), so nothing can be queried.`;
  }
  if (detail && /magic|parquet|invalid|corrupt|footer|metadata/i.test(detail)) {
    return `The catalog file (${fileUrl}) is not a readable Parquet file (it may be damaged or incomplete): ${detail.replace(/\s+/g, ' ').slice(0, 200)}`;
  }
  return `The catalog could not be opened in the browser${detail ? `: ${detail.replace(/\s+/g, ' ').slice(0, 200)}` : '.'}`;
}
