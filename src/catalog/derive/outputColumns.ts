import type { LineId } from '../../core/derive/types.ts';
import { LINES } from '../../core/derive/types.ts';
import type { ColumnPlan } from '../normalize/ColumnPlan.ts';
import type { PassthroughDeclaration } from '../config/publicationConfig.ts';
import { CatalogError } from '../readers/CatalogError.ts';
import type { ColumnDoc } from '../metadata/columnDoc.ts';
import { derivedColumnSpecs } from '../metadata/derivedColumns.ts';
import type { DerivedColumnSpec } from '../metadata/derivedColumns.ts';
import { derivedReference } from '../metadata/derivedReference.ts';
import type { SettingsProvenance } from '../metadata/settingsProvenance.ts';
import type { CellValue } from '../parquet/parquetWriter.ts';
import { packedField } from './packedDerived.ts';
import type { PackedDerived } from './packedDerived.ts';
import type { NormalizedRow } from '../normalize/normalizeChunk.ts';

/** Everything one output row is assembled from. */
export interface RowContext {
  row: NormalizedRow;
  /** The batch results holding this row, or null when it was not derived. */
  packed: PackedDerived | null;
  /** Index of this row in `packed`. */
  k: number;
  /** The row's flags, comma-separated. */
  flags: string;
}

/** One column of the output file: its documentation and how its value is read from a row. */
export interface OutputColumn extends ColumnDoc {
  value: (ctx: RowContext) => CellValue;
}

/** Flag set on every row that has a problem in its inputs. */
export const INVALID_INPUT_FLAG = 'invalid_input';
/** Flag set on a row whose derivation threw. */
export const DERIVE_FAILED_FLAG = 'derive_failed';

/** The broad lines the plan reads any column of (their `log_lum_<line>` columns are written). */
export function linesInPlan(plan: ColumnPlan): LineId[] {
  return LINES.filter((line) => plan.canonical.some((c) => c.name.split('_').includes(line)));
}

function derivedColumn(spec: DerivedColumnSpec, provenance: SettingsProvenance | undefined, lines: readonly LineId[]): OutputColumn {
  const { source, topic, ...doc } = spec;
  const reference = topic && provenance ? derivedReference(topic, provenance, lines) : undefined;
  let value: OutputColumn['value'];
  if (source === 'flags') value = (c) => c.flags;
  else if (source === 'mbhMethod' || source === 'lbolMethod') value = (c) => (c.packed ? c.packed[source][c.k] : null);
  else {
    const read = packedField(source);
    if (spec.kind === 'bool') value = (c) => (c.packed && !c.packed.errors[c.k] ? read(c.packed, c.k) === 1 : null);
    else value = (c) => (c.packed ? read(c.packed, c.k) : null);
  }
  return { ...doc, group: 'derived', ...(reference ? { reference } : {}), value };
}

/**
 * The output columns for `plan`, in order: `id`, `row`, the canonical inputs present (canonical
 * units), the passthrough columns (their own kinds), then the derived columns. Throws
 * CatalogError when a passthrough column would take the name of another output column
 * (compared without case, as DuckDB and most readers do). With `provenance`, each derived
 * column carries the reference it rests on under those settings.
 */
export function buildOutputColumns(
  plan: ColumnPlan,
  provenance?: SettingsProvenance,
  declared: Readonly<Record<string, PassthroughDeclaration>> = {},
): OutputColumn[] {
  const key: OutputColumn[] = [
    { name: 'id', kind: 'string', group: 'key', description: 'Object identifier, unique in the catalog', ucd: 'meta.id;meta.main', value: (c) => c.row.id },
    { name: 'row', kind: 'int', group: 'key', description: 'Data row number in the input file (1-based)', ucd: 'meta.record', value: (c) => c.row.row },
  ];
  const inputs: OutputColumn[] = plan.canonical
    .filter((p) => p.name !== 'id')
    .map((p) => {
      const name = p.name;
      const def = p.def;
      return {
        name,
        kind: def.kind === 'text' ? 'string' : def.kind === 'bool' ? 'bool' : 'float',
        group: 'input',
        ...(def.kind === 'text' || def.kind === 'bool' ? {} : { unit: def.unit }),
        description: p.sourceName === name ? def.description : `${def.description} (file column "${p.sourceName}")`,
        ...(def.ucd ? { ucd: def.ucd } : {}),
        value: (c: RowContext) => c.row.canonical[name] ?? null,
      } satisfies OutputColumn;
    });
  // The config's declarations (passthrough: in census.config.yaml) win over the file's own metadata.
  for (const name of Object.keys(declared)) {
    if (!plan.passthrough.some((p) => p.name === name)) {
      const canonical = plan.canonical.find((c) => c.sourceName === name);
      if (canonical) throw new CatalogError(`${plan.label}: the config declares passthrough.${name}, but column "${name}" is read as the canonical column ${canonical.name}, which has its own unit, UCD and description`);
      throw new CatalogError(`${plan.label}: the config declares passthrough.${name}, but the file has no such pass-through column`);
    }
  }
  const passthrough: OutputColumn[] = plan.passthrough.map((p, i) => {
    const d = declared[p.name] ?? {};
    const unit = d.unit ?? p.info.unit;
    const ucd = d.ucd ?? p.info.ucd;
    return {
      name: p.name,
      kind: p.info.kind,
      group: 'passthrough',
      ...(unit ? { unit } : {}),
      description: d.description ?? p.info.description ?? 'Copied unchanged from the input catalog',
      ...(ucd ? { ucd } : {}),
      value: (c: RowContext) => c.row.passthrough[i] ?? null,
    };
  });
  const lines = linesInPlan(plan);
  const derived = derivedColumnSpecs(lines).map((spec) => derivedColumn(spec, provenance, lines));

  const taken = new Map<string, OutputColumn>();
  for (const col of [...key, ...inputs, ...derived]) taken.set(col.name.toLowerCase(), col);
  for (const col of passthrough) {
    const other = taken.get(col.name.toLowerCase());
    if (other) {
      const what = other.group === 'derived' ? 'a derived output column' : other.group === 'key' ? 'an output key column' : 'a canonical input column';
      throw new CatalogError(
        `${plan.label}: column "${col.name}" has the name of ${what} ("${other.name}"); rename it in the file, or map it to a canonical column in the config`,
      );
    }
    taken.set(col.name.toLowerCase(), col);
  }
  return [...key, ...inputs, ...passthrough, ...derived];
}
