/**
 * Every derivable object of the catalog as the derivation's inputs, rebuilt in the browser from
 * the catalog's canonical input columns (already in canonical units) through the build's own row
 * checks. Rows the build flagged invalid_input are left out, as the build derived nothing for them.
 */
import type { ObjectInputs } from '../../core/derive/types.ts';
import { CANONICAL_COLUMNS } from '../../catalog/normalize/canonicalColumns.ts';
import { queryCensus, TABLE } from '../db/duckdb.ts';
import { sqlIdent } from '../db/sqlIdent.ts';
import { normalizeOne } from '../place/normalizeOne.ts';

/** One object's inputs with the catalog columns the charts draw besides the derived ones. */
export interface PopulationObject {
  inputs: ObjectInputs;
  z: number;
  logMstar: number | null;
}

/** Reads the population's inputs (`have`: the catalog's column names). */
export async function populationInputs(have: readonly string[]): Promise<PopulationObject[]> {
  const cols = CANONICAL_COLUMNS.map((c) => c.name).filter((n) => have.includes(n));
  const rs = await queryCensus(`SELECT ${cols.map(sqlIdent).join(', ')}, flags FROM ${TABLE} ORDER BY "row"`);
  const flagIdx = rs.names.indexOf('flags');
  const out: PopulationObject[] = [];
  for (let r = 0; r < rs.numRows; r++) {
    const flags = String(rs.columns[flagIdx]![r] ?? '');
    if (flags.split(',').includes('invalid_input')) continue;
    const cells = cols.map((_, c) => rs.columns[c]![r] as string | number | boolean | null);
    const n = normalizeOne(cols, cells);
    if (!n.inputs) continue;
    const ls = cells[cols.indexOf('log_mstar')];
    out.push({ inputs: n.inputs, z: n.inputs.z, logMstar: typeof ls === 'number' ? ls : null });
  }
  return out;
}
