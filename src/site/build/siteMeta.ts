/**
 * The catalog's metadata as the site uses it, normalised from the sidecar `<name>.meta.json`
 * written by the catalog build. The sidecar's settings tree is kept as read (`settings`) so
 * the methods page can show every recorded choice; the fields the pages name are lifted out.
 */

import { isRecord, pick } from '../recordPath.ts';

/** What the site knows about one column. */
export interface ColumnMeta {
  name: string;
  unit: string;
  description: string;
  ucd?: string;
  reference?: string;
  /** Where the column comes from, when the sidecar says: 'key', 'input', 'passthrough' or 'derived'. */
  group?: string;
}

export interface SiteMeta {
  title: string;
  group?: string;
  description?: string;
  licence?: string;
  citation?: string;
  /** Version of the tool that derived the catalog. */
  toolVersion?: string;
  /** When the catalog was derived (ISO 8601), if recorded. */
  createdAt?: string;
  /** Content hashes recorded by the build (name → hash). */
  hashes: Record<string, string>;
  /** Counts recorded by the build (name → number). */
  counts: Record<string, number>;
  /** Column name → metadata. */
  columns: Record<string, ColumnMeta>;
  /** The derivation's settings, as recorded. */
  settings: Record<string, unknown>;
  /** The whole sidecar, for anything not lifted out above. */
  raw: Record<string, unknown>;
}

const str = (v: unknown): string | undefined => (typeof v === 'string' && v.trim() !== '' ? v : undefined);


function flatRecord<T>(v: unknown, keep: (x: unknown) => x is T): Record<string, T> {
  const out: Record<string, T> = {};
  if (isRecord(v)) for (const [k, x] of Object.entries(v)) if (keep(x)) out[k] = x;
  return out;
}

function columnsOf(v: unknown): Record<string, ColumnMeta> {
  const out: Record<string, ColumnMeta> = {};
  const add = (name: string, c: Record<string, unknown>) => {
    out[name] = {
      name,
      unit: str(c.unit) ?? '',
      description: str(c.description) ?? '',
      ucd: str(c.ucd),
      reference: str(c.reference),
      group: str(c.group),
    };
  };
  if (Array.isArray(v)) for (const c of v) if (isRecord(c) && str(c.name)) add(c.name as string, c);
  if (isRecord(v)) for (const [k, c] of Object.entries(v)) if (isRecord(c)) add(str(c.name) ?? k, c);
  return out;
}

/** Recorded content hashes: a `hashes` record, or the `sha256` of the input and config files. */
function hashesOf(r: Record<string, unknown>): Record<string, string> {
  const out = flatRecord(pick(r, 'hashes'), (x): x is string => typeof x === 'string');
  for (const k of ['input', 'config']) {
    const h = str(pick(r, `${k}.sha256`));
    if (h) out[k] = `sha256:${h}`;
  }
  return out;
}

/** The derivation's own settings (DeriveSettings), whether recorded alone or inside their provenance record. */
export function deriveSettingsOf(meta: SiteMeta): Record<string, unknown> {
  const inner = meta.settings.settings;
  return isRecord(inner) ? inner : meta.settings;
}

/** Normalises a parsed sidecar. Tolerates missing parts: a page shows what is recorded. */
export function normalizeMeta(raw: unknown): SiteMeta {
  const r = isRecord(raw) ? raw : {};
  const config = isRecord(r.config) ? r.config : {};
  const text = (...paths: string[]) => str(pick(r, ...paths)) ?? str(pick(config, ...paths));
  return {
    title: text('title', 'catalog.title') ?? 'Dawn Census',
    group: text('group', 'catalog.group'),
    description: text('description', 'catalog.description'),
    licence: text('licence', 'license', 'catalog.licence'),
    citation: text('citation', 'catalog.citation'),
    toolVersion: text('tool.version', 'toolVersion', 'tool_version', 'version'),
    createdAt: text('createdAt', 'created_at', 'created'),
    hashes: hashesOf(r),
    counts: flatRecord(pick(r, 'counts'), (x): x is number => typeof x === 'number'),
    columns: columnsOf(pick(r, 'columns')),
    settings: isRecord(pick(r, 'settings')) ? (pick(r, 'settings') as Record<string, unknown>) : {},
    raw: r,
  };
}
