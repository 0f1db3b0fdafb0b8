/**
 * The population's derivation inputs for the Readings page's live custom reading, prepared at
 * build time (Node, @duckdb/node-api) and published as `data/readings-inputs.json`: the page's
 * web workers fetch it once and never go through DuckDB-WASM. The inputs are rebuilt from the
 * catalog's canonical input columns (already in canonical units) through the build's own row
 * checks, as the catalog build made them; rows the build flagged invalid_input are left out, as
 * the build derived nothing for them.
 */
import { DuckDBInstance } from '@duckdb/node-api';
import { CANONICAL_COLUMNS } from '../../catalog/normalize/canonicalColumns.ts';
import type { Cell } from '../../catalog/readers/types.ts';
import { normalizeRows } from '../place/normalizeOne.ts';
import { sqlIdent } from '../db/sqlIdent.ts';
import type { CatalogFiles } from './catalogFiles.ts';
import type { ReadingsInputsFile } from '../readings/readingsInputsFile.ts';

/** Above this many objects the page offers no live custom reading (the file would pass ~30 MB). */
export const LIVE_READING_MAX_OBJECTS = 100_000;


const CHUNK = 10_000;
const quote = (s: string) => `'${s.replace(/'/g, "''")}'`;

/** Reads the inputs of `files.parquet`; null when the catalog has more than LIVE_READING_MAX_OBJECTS rows. */
export async function readingsInputs(files: CatalogFiles): Promise<ReadingsInputsFile | null> {
  const instance = await DuckDBInstance.create(':memory:');
  const con = await instance.connect();
  try {
    const src = `read_parquet(${quote(files.parquet)})`;
    const have = (await con.runAndReadAll(`SELECT * FROM ${src} LIMIT 0`)).columnNames();
    const count = Number((await con.runAndReadAll(`SELECT count(*)::DOUBLE AS n FROM ${src}`)).getRowObjectsJS()[0]!.n);
    if (count > LIVE_READING_MAX_OBJECTS) return null;
    const cols = CANONICAL_COLUMNS.map((c) => c.name).filter((n) => have.includes(n));
    const flags = have.includes('flags') ? 'flags' : `''`;
    const order = have.includes('row') ? ' ORDER BY "row"' : '';
    const reader = await con.runAndReadAll(`SELECT ${cols.map(sqlIdent).join(', ')}, ${flags} AS "__flags" FROM ${src}${order}`);
    const raw = reader.getRowsJS();
    const out: ReadingsInputsFile = { inputs: [], logMstar: [] };
    const mstarAt = cols.indexOf('log_mstar');
    for (let from = 0; from < raw.length; from += CHUNK) {
      const part = raw.slice(from, from + CHUNK).filter((r) => !String(r[cols.length] ?? '').split(',').includes('invalid_input'));
      const cells = part.map((r) => r.slice(0, cols.length).map((v) => (typeof v === 'bigint' ? Number(v) : v) as Cell));
      // Ids are unique in a derived catalog (a repeated id stops the build), so chunks change nothing.
      const res = normalizeRows(cols, cells);
      res.rows?.forEach((r, i) => {
        if (!r.inputs) return;
        out.inputs.push(r.inputs);
        const m = mstarAt >= 0 ? part[i]![mstarAt] : null;
        out.logMstar.push(typeof m === 'number' ? m : null);
      });
    }
    return out;
  } finally {
    con.closeSync();
    instance.closeSync();
  }
}
