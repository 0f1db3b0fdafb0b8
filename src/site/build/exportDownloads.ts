/** The sidecar and the commented-units head of the CSV download (the downloads themselves: writeDownloads.ts). */
import { readFileSync } from 'node:fs';
import type { CatalogMetadata } from '../../catalog/metadata/catalogMetadata.ts';
import { boundsNoteLines } from '../text/boundsNote.ts';
import type { CatalogFiles } from './catalogFiles.ts';

/** The sidecar as written by derive. */
export function readSidecar(files: CatalogFiles): CatalogMetadata {
  return JSON.parse(readFileSync(files.meta, 'utf8')) as CatalogMetadata;
}

/** `# name [unit]: description` lines (and the UCD) put before a CSV header, so the units travel with the file; with the note on bounds (boundsNoteLines). */
export function csvUnitsComment(m: CatalogMetadata): string {
  const lines = [`# ${m.title ?? 'Derived catalog'} — written by ${m.tool.name} ${m.tool.version}; input SHA-256 ${m.input.sha256}`];
  for (const l of boundsNoteLines(m.columns.map((c) => c.name))) lines.push(`# ${l}`);
  lines.push('# column [unit] (UCD): description');
  for (const c of m.columns) lines.push(`# ${c.name}${c.unit ? ` [${c.unit}]` : ''}${c.ucd ? ` (${c.ucd})` : ''}: ${c.description.replace(/\s+/g, ' ')}`);
  return lines.join('\n') + '\n';
}
