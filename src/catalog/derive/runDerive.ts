import { mkdir, writeFile } from 'node:fs/promises';
import path from 'node:path';
import type { ObjectInputs } from '../../core/derive/types.ts';
import type { CensusConfig } from '../config/CensusConfig.ts';
import { displayPath } from '../config/loadConfig.ts';
import { catalogMetadataJson, buildCatalogMetadata } from '../metadata/buildCatalogMetadata.ts';
import { METADATA_KEY } from '../metadata/catalogMetadata.ts';
import { parquetStandardKeys } from '../publish/parquetStandardKeys.ts';
import { tableDocOf } from '../publish/tableDoc.ts';
import { exportCatalog, exportPath } from '../publish/exportCatalog.ts';
import { sha256File } from '../metadata/sha256.ts';
import { settingsProvenance } from '../metadata/settingsProvenance.ts';
import { normalizeChunk } from '../normalize/normalizeChunk.ts';
import { planColumns } from '../normalize/planColumns.ts';
import { openParquetWriter } from '../parquet/parquetWriter.ts';
import type { CellValue, ParquetWriter } from '../parquet/parquetWriter.ts';
import { StagedFiles } from '../parquet/stagedFiles.ts';
import { openTable } from '../readers/openTable.ts';
import type { TableFormat, TableSource } from '../readers/types.ts';
import type { BatchDeriver } from './batchDeriver.ts';
import { DuplicateIds } from './duplicateIds.ts';
import { createInProcessDeriver } from './inProcessDeriver.ts';
import { buildOutputColumns, DERIVE_FAILED_FLAG, INVALID_INPUT_FLAG } from './outputColumns.ts';
import type { OutputColumn, RowContext } from './outputColumns.ts';
import { outputPaths } from './outputPaths.ts';
import type { OutputPaths } from './outputPaths.ts';
import type { PackedDerived } from './packedDerived.ts';
import { RejectionReport } from './rejectionReport.ts';
import type { RejectionEntry } from './rejectionReport.ts';
import type { NormalizedRow } from '../normalize/normalizeChunk.ts';
import { createWorkerPool } from './workerPool.ts';

/**
 * Rows per chunk read, normalized and sent to a worker. Small on purpose: the rows of the
 * chunks in flight (up to 2 × threads + 1) outlive several young-generation collections, so
 * they reach V8's old generation, whose size V8 lets grow to a few times what is live; with
 * 4096 rows a chunk the main thread's heap peaked ~250 MB higher, and smaller chunks cost no
 * measurable time.
 */
export const DEFAULT_CHUNK_ROWS = 1024;

/** What a derive run is asked to do. */
export interface DeriveRunOptions {
  /** The input catalog. */
  catalogPath: string;
  /** Its format, when the extension does not say. */
  format?: TableFormat;
  /** Settings, column mapping and descriptive metadata (with --draws/--seed already applied). */
  config: CensusConfig;
  /** The Parquet file to write; its sidecars go beside it (see outputPaths). */
  outputPath: string;
  /** Worker threads deriving; 1 derives in this thread. */
  threads: number;
  /** Rows per chunk (default DEFAULT_CHUNK_ROWS). */
  chunkRows?: number;
  /** Module exporting deriveObject (default: src/core/derive/deriveObject.ts); tests substitute a stand-in. */
  deriveModule?: string;
  /** Aborts the run between chunks (e.g. on Ctrl-C): it then throws the signal's reason and writes nothing. */
  signal?: AbortSignal;
  /** Called after each chunk is written. */
  onProgress?: (p: DeriveProgress) => void;
  /** Called for each problem found in a row, in row order. */
  onRowProblem?: (p: RejectionEntry) => void;
}

/** Progress of a run. */
export interface DeriveProgress {
  /** Rows written so far. */
  rowsDone: number;
  /** Rows in the catalog, when the reader knows. */
  rowsTotal?: number;
  /** Milliseconds since the run started. */
  elapsedMs: number;
}

/** What a finished run did. */
export interface DeriveSummary {
  paths: OutputPaths;
  /** Rows read (= rows written). */
  rows: number;
  /** Rows whose derivation ran. */
  derived: number;
  /** Rows with at least one problem (flagged invalid_input or derive_failed). */
  flagged: number;
  /** Problems listed in the rejection report. */
  problems: number;
  columns: number;
  threads: number;
  elapsedMs: number;
}

interface PendingChunk {
  rows: NormalizedRow[];
  results: Promise<PackedDerived> | null;
}

/**
 * Derives a catalog: opens it, plans its columns, streams it in chunks (normalized here,
 * derived on `threads` workers), and writes the rows in input order to a Parquet file with
 * provenance metadata, a `.meta.json` sidecar and a `.rejections.csv` report. All three are
 * written under temporary names and renamed into place only when the whole run succeeded.
 *
 * Throws CatalogError for a problem with the catalog as a whole (unreadable, no id column,
 * duplicate ids, a passthrough column named like a derived one): then nothing is written and an
 * earlier output stays as it was. Problems of single rows do not stop the run: the row is
 * written with the flag `invalid_input` and null derived values, and listed in the report.
 */
export async function runDerive(opts: DeriveRunOptions): Promise<DeriveSummary> {
  const started = performance.now();
  const settings = opts.config.settings;
  const paths = outputPaths(opts.outputPath);
  const staged = new StagedFiles();
  let source: TableSource | null = null;
  let writer: ParquetWriter | null = null;
  let report: RejectionReport | null = null;
  let deriver: BatchDeriver | null = null;
  try {
    const src = await openTable(opts.catalogPath, opts.format ? { format: opts.format } : {});
    source = src;
    const plan = planColumns(src, opts.config);
    const provenance = settingsProvenance(settings);
    const columns = buildOutputColumns(plan, provenance, opts.config.passthrough);
    const inputHash = sha256File(opts.catalogPath);
    inputHash.catch(() => undefined);

    await mkdir(path.dirname(path.resolve(paths.catalog)), { recursive: true });
    const parquetTemp = staged.stage(paths.catalog);
    const metaTemp = staged.stage(paths.meta);
    const reportTemp = staged.stage(paths.rejections);
    writer = await openParquetWriter(parquetTemp, columns, { scratchDir: staged.scratchPath(paths.catalog, '.d') });
    report = new RejectionReport(reportTemp);
    deriver =
      opts.threads > 1
        ? createWorkerPool(opts.threads, settings, opts.deriveModule)
        : await createInProcessDeriver(settings, opts.deriveModule);

    const label = displayPath(src.path);
    const duplicates = new DuplicateIds(label, plan.seenIds);
    const counts = { rows: 0, derived: 0, flagged: 0, problems: 0 };
    const values: CellValue[] = new Array<CellValue>(columns.length);
    const queue: PendingChunk[] = [];
    const maxInFlight = 2 * deriver.threads + 1;
    const rowsTotal = src.nRows;

    // Rejects as soon as the run is aborted, so a long batch in a worker is not waited for.
    const aborted = opts.signal ? abortedPromise(opts.signal) : null;
    aborted?.catch(() => undefined);
    const writeChunk = async (chunk: PendingChunk): Promise<void> => {
      const packed = chunk.results ? await (aborted ? Promise.race([chunk.results, aborted]) : chunk.results) : null;
      let k = 0;
      for (const row of chunk.rows) {
        const index = derivable(row) ? k++ : -1;
        const own = index >= 0 ? packed : null;
        const failed = own ? own.errors[index]! : null;
        if (own && failed === null) counts.derived++;
        if (failed) {
          const entry: RejectionEntry = {
            row: row.row,
            id: row.id,
            column: '',
            value: null,
            reason: DERIVE_FAILED_FLAG,
            message: `row ${row.row} (id ${row.id}): the derivation failed: ${failed}`,
          };
          report!.add(entry);
          counts.problems++;
          opts.onRowProblem?.(entry);
        }
        if (row.problems.length > 0 || failed) counts.flagged++;
        const ctx = rowContext(row, own, index);
        fillRow(values, columns, ctx);
        writer!.appendRow(values);
      }
      counts.rows += chunk.rows.length;
      await report!.flushed();
      opts.onProgress?.({ rowsDone: counts.rows, ...(rowsTotal !== undefined ? { rowsTotal } : {}), elapsedMs: performance.now() - started });
    };

    for await (const chunk of src.chunks(opts.chunkRows ?? DEFAULT_CHUNK_ROWS)) {
      opts.signal?.throwIfAborted();
      const rows = normalizeChunk(chunk, plan);
      const inputs: ObjectInputs[] = [];
      for (const row of rows) {
        duplicates.check(row.id, row.row);
        for (const p of row.problems) {
          report.add(p);
          counts.problems++;
          opts.onRowProblem?.(p);
        }
        if (derivable(row)) inputs.push(row.inputs!);
      }
      const results = inputs.length > 0 ? deriver.derive(inputs) : null;
      // Settled later, in order; a rejection must not count as unhandled meanwhile.
      results?.catch(() => undefined);
      queue.push({ rows, results });
      while (queue.length >= maxInFlight) await writeChunk(queue.shift()!);
    }
    while (queue.length > 0) {
      opts.signal?.throwIfAborted();
      await writeChunk(queue.shift()!);
    }
    opts.signal?.throwIfAborted();

    await deriver.close();
    deriver = null;
    await report.close();
    report = null;
    const metadata = buildCatalogMetadata({
      config: opts.config,
      source: src,
      inputSha256: await inputHash,
      provenance,
      counts,
      paths,
      columns,
      inputColumns: plan.canonical,
    });
    const doc = tableDocOf(metadata);
    await writer.finish({ [METADATA_KEY]: catalogMetadataJson(metadata), ...parquetStandardKeys(doc) });
    writer = null;
    // ECSV, VOTable and FITS copies, staged with the rest so that all files are replaced together.
    const exports = (opts.config.outputFormats ?? []).map((format) => ({ format, path: staged.stage(exportPath(paths.catalog, format)) }));
    await exportCatalog(parquetTemp, doc, exports);
    await writeFile(metaTemp, `${JSON.stringify(metadata, null, 2)}\n`);
    await staged.commit();
    return {
      paths,
      ...counts,
      columns: columns.length,
      threads: opts.threads,
      elapsedMs: performance.now() - started,
    };
  } catch (error) {
    await deriver?.close().catch(() => undefined);
    await report?.abandon();
    await writer?.abort();
    await staged.discard();
    throw error;
  } finally {
    await source?.close().catch(() => undefined);
  }
}

function abortedPromise(signal: AbortSignal): Promise<never> {
  return new Promise((_, reject) => {
    if (signal.aborted) reject(signal.reason);
    else signal.addEventListener('abort', () => reject(signal.reason), { once: true });
  });
}

/** A row is derived only when its inputs parsed and it has no problem at all. */
function derivable(row: NormalizedRow): boolean {
  return row.inputs !== null && row.problems.length === 0;
}

function rowContext(row: NormalizedRow, packed: PackedDerived | null, k: number): RowContext {
  const flags: string[] = [];
  if (!derivable(row)) flags.push(INVALID_INPUT_FLAG);
  if (packed) {
    if (packed.errors[k] !== null) flags.push(DERIVE_FAILED_FLAG);
    else if (packed.flags[k]) flags.push(packed.flags[k]!);
  }
  return { row, packed: packed && packed.errors[k] === null ? packed : null, k, flags: flags.join(',') };
}

function fillRow(values: CellValue[], columns: readonly OutputColumn[], ctx: RowContext): void {
  for (let i = 0; i < columns.length; i++) values[i] = columns[i]!.value(ctx);
}
