/** The catalog's ECSV, VOTable and FITS downloads and the commented-units CSV, written at build time from the Parquet file. */
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { ExportFormat } from '../../catalog/config/publicationConfig.ts';
import type { CatalogMetadata } from '../../catalog/metadata/catalogMetadata.ts';
import { exportCatalog } from '../../catalog/publish/exportCatalog.ts';
import { tableDocOf } from '../../catalog/publish/tableDoc.ts';
import { boundsNoteLines } from '../text/boundsNote.ts';
import type { CatalogFiles } from './catalogFiles.ts';

/** The sidecar as written by derive. */
export function readSidecar(files: CatalogFiles): CatalogMetadata {
  return JSON.parse(readFileSync(files.meta, 'utf8')) as CatalogMetadata;
}

/** The catalog in `format`, as bytes. */
export async function catalogIn(files: CatalogFiles, format: ExportFormat): Promise<Uint8Array<ArrayBuffer>> {
  const dir = mkdtempSync(join(tmpdir(), 'census-export-'));
  try {
    const path = join(dir, `catalog.${format}`);
    await exportCatalog(files.parquet, tableDocOf(readSidecar(files)), [{ format, path }]);
    return new Uint8Array(readFileSync(path));
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/** `# name [unit]: description` lines (and the UCD) put before a CSV header, so the units travel with the file; with the note on bounds (boundsNoteLines). */
export function csvUnitsComment(m: CatalogMetadata): string {
  const lines = [`# ${m.title ?? 'Derived catalog'} — written by ${m.tool.name} ${m.tool.version}; input SHA-256 ${m.input.sha256}`];
  for (const l of boundsNoteLines(m.columns.map((c) => c.name))) lines.push(`# ${l}`);
  lines.push('# column [unit] (UCD): description');
  for (const c of m.columns) lines.push(`# ${c.name}${c.unit ? ` [${c.unit}]` : ''}${c.ucd ? ` (${c.ucd})` : ''}: ${c.description.replace(/\s+/g, ' ')}`);
  return lines.join('\n') + '\n';
}
