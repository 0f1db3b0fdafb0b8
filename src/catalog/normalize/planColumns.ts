import type { CensusConfig } from '../config/CensusConfig.ts';
import { converterFor } from '../config/checkUnit.ts';
import { closestNames } from '../config/closestNames.ts';
import { displayPath } from '../config/loadConfig.ts';
import { CatalogError } from '../readers/CatalogError.ts';
import type { TableSource } from '../readers/types.ts';
import { CANONICAL_COLUMNS, type CanonicalColumn } from './canonicalColumns.ts';
import type { ColumnPlan, PassthroughColumn, PlannedColumn } from './ColumnPlan.ts';
import { errorScale } from './errorScale.ts';
import { fileUnitSpelling } from './fileUnitSpelling.ts';

/**
 * Decides how every column of `source` is read: which file column holds each canonical input
 * (the config's `columns.<name>.source`, else the canonical name matched exactly, then
 * case-insensitively), its unit (the config's `columns.<name>.unit`, else the file's metadata;
 * an error column without either takes its value's unit; none means the canonical unit) and
 * the converter to canonical units. Every other file column is passed through. The id column
 * is read as text exactly as written (`source.keepAsText`): `007`, `1e3` and `3.0` stay so.
 * A file unit's power-of-ten factor is read in the CDS and FITS spellings astropy writes
 * (`10-20erg.s-1.cm-2`, `10**-20 cm-2 erg s-1`; see {@link fileUnitSpelling}).
 *
 * Throws CatalogError (one line) when there is no id or no z column, a column named in the
 * config is not in the file (listing close matches), two file columns match one canonical name
 * case-insensitively, a unit is unknown or of the wrong dimension (naming the column and the
 * unit), or a file column's kind cannot hold its canonical column (true/false values where
 * numbers are needed).
 */
export function planColumns(source: TableSource, config: CensusConfig): ColumnPlan {
  const label = displayPath(source.path);
  const cfgLabel = config.configPath ? displayPath(config.configPath) : 'config';
  const fail = (msg: string): never => {
    throw new CatalogError(`${label}: ${msg}`);
  };
  const names = source.columns.map((c) => c.name);
  const claimed = new Set<number>();
  const found = new Map<string, number>();

  // Explicit mappings first, so that a file column mapped by the config is not also matched by name.
  for (const [canon, m] of Object.entries(config.columns)) {
    if (m.source === undefined) continue;
    const idx = findColumn(names, m.source, claimed, (a, b) =>
      fail(`columns "${a}" and "${b}" both match "${m.source}" (mapped to ${canon} in ${cfgLabel}) when case is ignored`),
    );
    if (idx < 0) {
      const near = closestNames(m.source, names);
      fail(
        `column "${m.source}" (mapped to ${canon} in ${cfgLabel}) is not in the file; ` +
          (near.length ? `close matches: ${near.join(', ')}` : `columns in the file: ${listNames(names)}`),
      );
    }
    found.set(canon, idx);
    claimed.add(idx);
  }
  for (const col of CANONICAL_COLUMNS) {
    if (found.has(col.name) || config.columns[col.name]?.source !== undefined) continue;
    const idx = findColumn(names, col.name, claimed, (a, b) =>
      fail(`columns "${a}" and "${b}" both match ${col.name} when case is ignored; choose one with columns.${col.name}.source in the config`),
    );
    if (idx >= 0) {
      found.set(col.name, idx);
      claimed.add(idx);
    }
  }
  for (const req of ['id', 'z']) {
    if (found.has(req)) continue;
    const near = closestNames(req, names);
    fail(
      `no ${req} column (looked for "${req}" in any case; map another column with columns.${req}.source in ` +
        (config.configPath ? 'the config)' : `a config: dawn-census init ${label} writes one, with the columns it recognises mapped)`) +
        (near.length ? `; close matches: ${near.join(', ')}` : ''),
    );
  }

  const canonical: PlannedColumn[] = [];
  const unitOf = new Map<string, string | undefined>();
  for (const def of CANONICAL_COLUMNS) {
    const idx = found.get(def.name);
    if (idx === undefined) continue;
    const info = source.columns[idx]!;
    const cfgUnit = config.columns[def.name]?.unit;
    let unitIn = cfgUnit ?? blankToUndefined(info.unit);
    if (unitIn === undefined && def.role === 'error' && def.of) unitIn = unitOf.get(def.of);
    if (def.kind === 'text' || def.kind === 'bool') unitIn = undefined;
    unitOf.set(def.name, unitIn);
    checkKind(def, info.kind, info.name, fail);
    const conv = converterFor(unitIn !== undefined && cfgUnit === undefined ? fileUnitSpelling(unitIn) : unitIn, def.kind, def.name);
    if ('problem' in conv) {
      if (cfgUnit !== undefined) throw new CatalogError(`${cfgLabel}: columns.${def.name}.unit: ${conv.problem}`);
      return fail(`column "${info.name}" (${def.name}): ${conv.problem}`);
    }
    let convert = conv.convert;
    if (def.role === 'error') {
      const scale = errorScale(convert);
      if (scale === undefined) fail(`column "${info.name}" (${def.name}): an error needs a unit that scales linearly, got "${unitIn}"`);
      const k = scale as number;
      convert = k === 1 ? identity : (x: number) => x * k;
    }
    const sameName = info.name.toLowerCase() === def.name;
    canonical.push({
      name: def.name,
      sourceIndex: idx,
      sourceName: info.name,
      ...(unitIn !== undefined ? { unitIn } : {}),
      convert,
      kind: def.kind,
      fileKind: info.kind,
      def,
      unitLabel: unitIn ?? def.unitText,
      label: sameName ? def.name : `${def.name} (column ${info.name})`,
    });
  }

  source.keepAsText(found.get('id')!);

  const passthrough: PassthroughColumn[] = [];
  source.columns.forEach((info, i) => {
    if (!claimed.has(i)) passthrough.push({ name: info.name, sourceIndex: i, info });
  });
  return { label, canonical, passthrough, seenIds: new Map() };
}

const identity = (x: number): number => x;

function blankToUndefined(u: string | undefined): string | undefined {
  return u === undefined || u.trim() === '' ? undefined : u;
}

/** Index of the unclaimed column named `want`: exact match first, then the single case-insensitive match; -1 if none. */
function findColumn(names: string[], want: string, claimed: Set<number>, ambiguous: (a: string, b: string) => never): number {
  const exact = names.indexOf(want);
  if (exact >= 0 && !claimed.has(exact)) return exact;
  const lower = want.toLowerCase();
  let hit = -1;
  for (let i = 0; i < names.length; i++) {
    if (claimed.has(i) || names[i]!.toLowerCase() !== lower) continue;
    if (hit >= 0) ambiguous(names[hit]!, names[i]!);
    hit = i;
  }
  return hit;
}

function checkKind(def: CanonicalColumn, fileKind: string, fileName: string, fail: (m: string) => never): void {
  if (def.kind === 'text' || def.kind === 'bool') return;
  if (fileKind === 'bool') fail(`column "${fileName}" (${def.name}) holds true/false values; ${def.name} needs numbers`);
}

function listNames(names: string[]): string {
  return names.length > 12 ? `${names.slice(0, 12).join(', ')}, ...` : names.join(', ') || '(none)';
}
