/**
 * Writes the catalog's large downloads (CSV with units, ECSV, VOTable, FITS) straight into the
 * built site's `data/` folder after Astro has written the pages (`census-downloads` in
 * astro.config.mjs). Each file is streamed from the Parquet file chunk by chunk, so the build's
 * memory does not grow with the catalog: an Astro endpoint would hold each whole file in memory
 * (a 1,000,000-row catalog makes about 0.7–1.2 GB per format).
 */
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { exportCatalog } from '../../catalog/publish/exportCatalog.ts';
import { tableDocOf } from '../../catalog/publish/tableDoc.ts';
import { catalogFiles, type CatalogFiles } from './catalogFiles.ts';
import { csvUnitsComment, readSidecar } from './exportDownloads.ts';
import { writeCatalogCsv } from './loadCatalog.ts';

/** The files written, relative to the data folder, in the order the overview lists them. */
export const STREAMED_DOWNLOADS = ['catalog.ecsv', 'catalog.vot', 'catalog.fits', 'catalog.csv'] as const;

/** Writes every streamed download of `files` (default: the build's catalog) into `dataDir`. */
export async function writeDownloads(dataDir: string, files: CatalogFiles = catalogFiles()): Promise<void> {
  mkdirSync(dataDir, { recursive: true });
  const sidecar = readSidecar(files);
  await exportCatalog(files.parquet, tableDocOf(sidecar), [
    { format: 'ecsv', path: join(dataDir, 'catalog.ecsv') },
    { format: 'votable', path: join(dataDir, 'catalog.vot') },
    { format: 'fits', path: join(dataDir, 'catalog.fits') },
  ]);
  await writeCatalogCsv(files.parquet, join(dataDir, 'catalog.csv'), csvUnitsComment(sidecar));
}
