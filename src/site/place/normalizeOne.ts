/**
 * Reads one object given as canonical columns (from the compare form or a pasted CSV row)
 * through the catalog build's own row checks (src/catalog/normalize/normalizeChunk.ts), so a
 * value the build would reject is rejected here with the same reason, and the inputs handed to
 * deriveObject are built the same way. Browser-safe: no file or config access.
 */
import { CANONICAL_UNITS, unitConverter, UnitError, type QuantityKind } from '../../core/units/index.ts';
import type { ObjectInputs } from '../../core/derive/types.ts';
import { CANONICAL_COLUMNS } from '../../catalog/normalize/canonicalColumns.ts';
import type { ColumnPlan, PlannedColumn } from '../../catalog/normalize/ColumnPlan.ts';
import { errorScale } from '../../catalog/normalize/errorScale.ts';
import { normalizeChunk, type RowProblem } from '../../catalog/normalize/normalizeChunk.ts';
import type { Cell } from '../../catalog/readers/types.ts';

/** One problem with the object: the canonical column it concerns (or '' for the row as a whole) and a one-line message. */
export interface InputProblem {
  column: string;
  /** What is wrong, in words, e.g. '-1200 km s-1: must be positive'. */
  message: string;
}

/** What {@link normalizeOne} found. */
export interface NormalizedObject {
  /** The derivation's inputs, or null when there is any problem. */
  inputs: ObjectInputs | null;
  problems: InputProblem[];
  /** Header names that are not canonical inputs (kept out of the derivation). */
  ignored: string[];
}

const identity = (x: number): number => x;

/**
 * Checks one object given as `header` names and `cells` (same length) in the units of `units`
 * (canonical name → unit string; an error column without its own unit takes its value's;
 * none means the canonical unit). Names match canonical columns exactly, then ignoring case.
 */
export function normalizeOne(header: readonly string[], cells: readonly Cell[], units: Readonly<Record<string, string | undefined>> = {}): NormalizedObject {
  const res = normalizeRows(header, [cells], units);
  if (!res.rows) return { inputs: null, problems: res.problems, ignored: res.ignored };
  const [row] = res.rows;
  return { inputs: row!.inputs, problems: row!.problems, ignored: res.ignored };
}

/** What {@link normalizeRows} found: problems of the header (then no rows), or each row's inputs and problems. */
export interface NormalizedRows {
  /** Problems of the columns as a whole (a unit that cannot be read, no id or z column); then `rows` is null. */
  problems: InputProblem[];
  rows: { row: number; id: string; inputs: ObjectInputs | null; problems: InputProblem[] }[] | null;
  /** Header names that are not canonical inputs (kept out of the derivation). */
  ignored: string[];
}

/**
 * Checks several objects sharing one header, as {@link normalizeOne} does for one; rows are
 * numbered from 1 and a repeated id is a problem of the later row, as in the catalog build.
 */
export function normalizeRows(header: readonly string[], rows: readonly (readonly Cell[])[], units: Readonly<Record<string, string | undefined>> = {}): NormalizedRows {
  const problems: InputProblem[] = [];
  const lower = header.map((h) => h.trim().toLowerCase());
  const claimed = new Set<number>();
  const canonical: PlannedColumn[] = [];
  const unitOf = new Map<string, string | undefined>();
  for (const def of CANONICAL_COLUMNS) {
    let idx = header.findIndex((h, i) => !claimed.has(i) && h.trim() === def.name);
    if (idx < 0) idx = lower.findIndex((h, i) => !claimed.has(i) && h === def.name);
    if (idx < 0) continue;
    claimed.add(idx);
    let unitIn = units[def.name] ?? (def.role === 'error' && def.of ? unitOf.get(def.of) : undefined);
    if (def.kind === 'text' || def.kind === 'bool') unitIn = undefined;
    unitOf.set(def.name, unitIn);
    let convert = identity;
    if (def.kind !== 'text' && def.kind !== 'bool') {
      try {
        convert = unitConverter(unitIn, def.kind as QuantityKind);
      } catch (e) {
        if (!(e instanceof UnitError)) throw e;
        problems.push({ column: def.name, message: e.message });
        continue;
      }
      if (def.role === 'error') {
        const k = errorScale(convert);
        if (k === undefined) {
          problems.push({ column: def.name, message: `an error needs a unit that scales linearly, got "${unitIn}"` });
          continue;
        }
        convert = k === 1 ? identity : (x: number) => x * k;
      }
    }
    canonical.push({
      name: def.name,
      sourceIndex: idx,
      sourceName: header[idx]!,
      ...(unitIn !== undefined ? { unitIn } : {}),
      convert,
      kind: def.kind,
      fileKind: 'string',
      def,
      unitLabel: unitIn ?? (def.kind === 'text' || def.kind === 'bool' ? '' : CANONICAL_UNITS[def.kind]),
      label: def.name,
    });
  }
  const ignored = header.filter((h, i) => !claimed.has(i) && h.trim() !== '');
  for (const req of ['id', 'z']) {
    if (!canonical.some((c) => c.name === req)) problems.push({ column: req, message: `no ${req} column` });
  }
  if (problems.length) return { problems, rows: null, ignored };
  const plan: ColumnPlan = { label: 'new object', canonical, passthrough: [], seenIds: new Map() };
  const out = normalizeChunk({ rowOffset: 0, nRows: rows.length, columns: header.map((_, i) => rows.map((r) => r[i] ?? null)) }, plan);
  return { problems: [], rows: out.map((r) => ({ row: r.row, id: r.id, inputs: r.inputs, problems: r.problems.map(problemOf) })), ignored };
}

function problemOf(p: RowProblem): InputProblem {
  if (p.reason === 'is empty') return { column: p.column, message: 'required' };
  // the build's message reads 'row 1 (id …): <column> = <value> <unit>: <reason>'; the column is said elsewhere
  const at = p.message.indexOf(`${p.column} = `);
  return { column: p.column, message: at >= 0 ? p.message.slice(at + p.column.length + 3) : `${p.value}: ${p.reason}` };
}
