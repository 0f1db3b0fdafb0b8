import { LINES, type ObjectInputs } from '../../core/derive/types.ts';
import type { Cell, TableChunk } from '../readers/types.ts';
import { buildInputs, MEASURED_TARGETS, type LimitSlots, type MeasuredSlot } from './buildInputs.ts';
import type { ColumnPlan, PlannedColumn } from './ColumnPlan.ts';
import {
  CELL_EMPTY,
  CELL_NOT_A_NUMBER,
  CELL_NOT_BOOLEAN,
  CELL_NOT_FINITE,
  CELL_OK,
  cellResult,
  readBool,
  readNumber,
  shorten,
  showCell,
} from './readCell.ts';

/** One invalid value of one row. */
export interface RowProblem {
  /** 1-based data-row number (the first data row is 1). */
  row: number;
  /** The row's id ('' when empty). */
  id: string;
  /** Canonical column name. */
  column: string;
  /** The value as given in the file (cut to 40 characters). */
  value: string;
  /** What is wrong, e.g. 'must be positive'. */
  reason: string;
  /** One line: `row 17 (id DF-0231): fwhm_halpha = -1200 km/s: must be positive`. */
  message: string;
}

/** One row, read and checked. */
export interface NormalizedRow {
  /** 1-based data-row number. */
  row: number;
  /** The id as text, trimmed ('' when empty). */
  id: string;
  /** The derivation's inputs; null when the row has any problem. */
  inputs: ObjectInputs | null;
  /** Every planned canonical column, in canonical units; null where empty or invalid. */
  canonical: Record<string, number | string | boolean | null>;
  /** The passthrough cells, aligned with `plan.passthrough`. */
  passthrough: Cell[];
  problems: RowProblem[];
}

interface Compiled {
  cols: PlannedColumn[];
  idPos: number;
  zPos: number;
  slots: MeasuredSlot[];
  limits: LimitSlots;
}

const compiledPlans = new WeakMap<ColumnPlan, Compiled>();

function compile(plan: ColumnPlan): Compiled {
  let c = compiledPlans.get(plan);
  if (c) return c;
  const cols = plan.canonical;
  const pos = new Map(cols.map((col, i) => [col.name, i]));
  const at = (name: string): number => pos.get(name) ?? -1;
  const slots: MeasuredSlot[] = [];
  for (const [name, set] of MEASURED_TARGETS) {
    if (!pos.has(name)) continue;
    slots.push({ set, value: at(name), err: at(`${name}_err`), errLo: at(`${name}_err_lo`), errHi: at(`${name}_err_hi`) });
  }
  const limits = Object.fromEntries(LINES.map((l) => [l, at(`flux_${l}_is_limit`)])) as LimitSlots;
  c = { cols, idPos: at('id'), zPos: at('z'), slots, limits };
  if (c.idPos < 0 || c.zPos < 0) throw new Error('normalizeChunk: the plan has no id or z column (use planColumns)');
  compiledPlans.set(plan, c);
  return c;
}

/** The id of a cell as text: trimmed text, numbers in shortest form, '' when empty. */
function idOf(cell: Cell): string {
  if (cell === null) return '';
  return typeof cell === 'string' ? cell.trim() : String(cell);
}

/**
 * Reads, converts and checks the rows of one chunk. Chunks must come in file order, each once:
 * duplicate ids are found through `plan.seenIds`. Each value is converted to canonical units
 * and checked (z in (0, 30]; widths, fluxes, luminosities, magnification and Balmer decrement
 * > 0; FWHM ≤ 30000 km/s; errors ≥ 0; A_V in [0, 10]; log M* in [5, 13]; all finite; flags
 * true/false/t/f/yes/no/1/0); each failure is a RowProblem with a one-line message such as
 * `row 17 (id DF-0231): fwhm_halpha = -1200 km/s: must be positive`, giving the value as in the
 * file with the file's unit. A row with any problem gets `inputs = null`.
 */
export function normalizeChunk(chunk: TableChunk, plan: ColumnPlan): NormalizedRow[] {
  const { cols, idPos, zPos, slots, limits } = compile(plan);
  const n = cols.length;
  const values = new Float64Array(n);
  const flags: (boolean | null)[] = new Array<boolean | null>(n).fill(null);
  const res = cellResult();
  const idCells = chunk.columns[cols[idPos]!.sourceIndex]!;
  const cells = cols.map((c) => chunk.columns[c.sourceIndex]!);
  const passIdx = plan.passthrough.map((p) => p.sourceIndex);
  const out: NormalizedRow[] = new Array<NormalizedRow>(chunk.nRows);

  for (let r = 0; r < chunk.nRows; r++) {
    const row = chunk.rowOffset + r + 1;
    const id = idOf(idCells[r] ?? null);
    const canonical: Record<string, number | string | boolean | null> = {};
    const problems: RowProblem[] = [];
    for (let j = 0; j < n; j++) {
      const col = cols[j]!;
      const cell = cells[j]![r] ?? null;
      if (j === idPos) {
        canonical[col.name] = id;
        if (id === '') problems.push(rowProblem(row, id, col, '', 'is empty', false));
        continue;
      }
      if (col.kind === 'bool') {
        readBool(cell, res);
        flags[j] = res.status === CELL_OK ? res.bool : null;
        canonical[col.name] = flags[j] ?? null;
        if (res.status === CELL_NOT_BOOLEAN) problems.push(rowProblem(row, id, col, showCell(cell), 'must be true or false', false));
        continue;
      }
      readNumber(cell, res);
      values[j] = NaN;
      canonical[col.name] = null;
      if (res.status === CELL_EMPTY) {
        if (j === zPos) problems.push(rowProblem(row, id, col, '', 'is empty', false));
        continue;
      }
      if (res.status === CELL_NOT_A_NUMBER) {
        problems.push(rowProblem(row, id, col, showCell(cell), 'not a number', false));
        continue;
      }
      if (res.status === CELL_NOT_FINITE) {
        problems.push(rowProblem(row, id, col, showCell(cell), 'must be a finite number', false));
        continue;
      }
      const v = col.convert(res.num);
      if (!Number.isFinite(v)) {
        problems.push(rowProblem(row, id, col, showCell(cell), 'must be a finite number', true));
        continue;
      }
      const reason = failedLimit(col, v);
      if (reason !== undefined) {
        problems.push(rowProblem(row, id, col, showCell(cell), reason, true));
        continue;
      }
      values[j] = v;
      canonical[col.name] = v;
    }

    if (id !== '') {
      const first = plan.seenIds.get(id);
      if (first === undefined) plan.seenIds.set(id, row);
      else problems.push(rowProblem(row, id, cols[idPos]!, shorten(id), `duplicate of row ${first}`, false));
    }

    const passthrough: Cell[] = new Array<Cell>(passIdx.length);
    for (let k = 0; k < passIdx.length; k++) passthrough[k] = chunk.columns[passIdx[k]!]![r] ?? null;

    const inputs = problems.length === 0 ? buildInputs(id, values[zPos] as number, values, flags, slots, limits) : null;
    out[r] = { row, id, inputs, canonical, passthrough, problems };
  }
  return out;
}

/** A row problem with its one-line message. */
function rowProblem(row: number, id: string, col: PlannedColumn, value: string, reason: string, withUnit: boolean): RowProblem {
  const prefix = id === '' ? `row ${row} (no id)` : `row ${row} (id ${shorten(id)})`;
  const unit = withUnit && col.unitLabel !== '' ? ` ${col.unitLabel}` : '';
  const message =
    value === '' && reason === 'is empty' ? `${prefix}: ${col.label} is empty` : `${prefix}: ${col.label} = ${value}${unit}: ${reason}`;
  return { row, id, column: col.name, value, reason, message };
}

function failedLimit(col: PlannedColumn, v: number): string | undefined {
  for (const l of col.def.limits) {
    const ok = l.op === '>' ? v > l.bound : l.op === '>=' ? v >= l.bound : v <= l.bound;
    if (!ok) return l.reason;
  }
  return undefined;
}
