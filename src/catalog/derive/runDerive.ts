import { writeFile } from 'node:fs/promises';
import path from 'node:path';
import type { ObjectInputs } from '../../core/derive/types.ts';
import type { CensusConfig } from '../config/CensusConfig.ts';
import { displayPath } from '../config/loadConfig.ts';
import { catalogMetadataJson, buildCatalogMetadata } from '../metadata/buildCatalogMetadata.ts';
import { toolVersion } from '../metadata/toolVersion.ts';
import { METADATA_KEY } from '../metadata/catalogMetadata.ts';
import { parquetStandardKeys } from '../publish/parquetStandardKeys.ts';
import { readingsTableDoc, tableDocOf } from '../publish/tableDoc.ts';
import { exportCatalog, exportPath } from '../publish/exportCatalog.ts';
import { DEFAULT_GZIP_LIMITS } from '../readers/gzipLimits.ts';
import { sha256File } from '../metadata/sha256.ts';
import { settingsProvenance } from '../metadata/settingsProvenance.ts';
import { normalizeChunk } from '../normalize/normalizeChunk.ts';
import { planColumns } from '../normalize/planColumns.ts';
import { MAX_PARQUET_COLUMNS, openParquetWriter } from '../parquet/parquetWriter.ts';
import type { CellValue, ParquetWriter } from '../parquet/parquetWriter.ts';
import { checkOutputTargets } from '../outputs/checkOutputTargets.ts';
import { OutputSet } from '../outputs/OutputSet.ts';
import { recoverLeftovers } from '../outputs/recoverLeftovers.ts';
import { CatalogError } from '../readers/CatalogError.ts';
import { openTable } from '../readers/openTable.ts';
import type { TableFormat, TableSource } from '../readers/types.ts';
import type { BatchDeriver } from './batchDeriver.ts';
import { DuplicateIds } from './duplicateIds.ts';
import { checkInputUnchanged, inputIdentity } from './inputIdentity.ts';
import { InputMedians } from './inputMedians.ts';
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
import { defaultReadingsConfig } from '../config/readingsConfig.ts';
import { READINGS_COLUMNS } from '../readings/readingsColumns.ts';
import type { ReadingRowContext } from '../readings/readingsColumns.ts';
import { buildReadingsMetadata, READINGS_METADATA_KEY } from '../readings/readingsMetadata.ts';
import { summarizeReadingRows } from '../readings/summarizeReadings.ts';
import { untilAborted } from './untilAborted.ts';
import type { ReadingSummary } from '../../core/readings/readingSummary.ts';

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
  /** Replace existing outputs even when this tool did not write them (never the input or a special file). */
  force?: boolean;
  /** Called with a sentence about something done besides the run (e.g. leftovers of a killed run removed). */
  onNotice?: (text: string) => void;
  /** A worker batch not answered within this many milliseconds ends the run (default: see workerPool). */
  batchTimeoutMs?: number;
  /** Rows after which the input medians are looked at early (default {@link EARLY_MEDIAN_ROWS}). */
  earlyMedianRows?: number;
}

/**
 * Rows after which derive looks at the input medians (the check that stops a run whose fluxes or
 * widths are in the wrong unit) and, if they are already implausible, says so at once as a notice,
 * when at least as many rows are still to come: a wrong unit in a large catalog is then seen in
 * seconds, not at the end. The run still decides on the whole catalog's medians at the end.
 */
export const EARLY_MEDIAN_ROWS = 10_000;

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
  /** The headline numbers of each reading, in the config's order (also in the metadata). */
  readings: ReadingSummary[];
  /** ECSV, VOTable and FITS copies written beside the Parquet file. */
  exports: string[];
}

interface PendingChunk {
  rows: NormalizedRow[];
  results: Promise<PackedDerived> | null;
}

/**
 * Derives a catalog: opens it, plans its columns, streams it in chunks (normalized here,
 * derived on `threads` workers), and writes the rows in input order to a Parquet file with
 * provenance metadata, a `.meta.json` sidecar and a `.rejections.csv` report. All three are
 * written into a temporary folder beside them and committed as a set only when the whole run
 * succeeded (see OutputSet); leftovers of an earlier killed run for the same output are cleaned
 * up first (see recoverLeftovers).
 *
 * Throws OutputRefused before reading anything when an output may not be written (the input
 * itself, a special file, a file this tool did not write without `force`; see
 * checkOutputTargets). Throws CatalogError for a problem with the catalog as a whole
 * (unreadable, no id column, duplicate ids, a passthrough column named like a derived one, a
 * file that changed while it was read, an implausible median line luminosity or FWHM: see
 * inputMedians.ts): then nothing is written and an earlier output stays as it was. Problems of
 * single rows do not stop the run: the row is
 * written with the flag `invalid_input` and null derived values, and listed in the report.
 */
export async function runDerive(opts: DeriveRunOptions): Promise<DeriveSummary> {
  const started = performance.now();
  const settings = opts.config.settings;
  const paths = outputPaths(opts.outputPath);
  for (const note of await recoverLeftovers(paths)) opts.onNotice?.(note);
  const exportTargets = (opts.config.outputFormats ?? []).map((format) => ({ format, path: exportPath(paths.catalog, format) }));
  await checkOutputTargets(opts.catalogPath, paths, opts.force ?? false, exportTargets);
  const identity = await inputIdentity(opts.catalogPath);
  let staged: OutputSet | null = null;
  let source: TableSource | null = null;
  let writer: ParquetWriter | null = null;
  let readingsWriter: ParquetWriter | null = null;
  let report: RejectionReport | null = null;
  let deriver: BatchDeriver | null = null;
  let opening: Promise<void> | null = null;
  let stopping: Promise<void> | null = null;
  try {
    // The workers first: each loads and warms up its modules while this thread opens the catalog
    // and the Parquet writers (a few hundred milliseconds that were spent before they started).
    const readingsConfig = opts.config.readings ?? defaultReadingsConfig();
    const batchReadings = {
      primary: readingsConfig.readings.find((r) => r.id === readingsConfig.primary) ?? readingsConfig.readings[0]!,
      list: readingsConfig.readings,
    };
    deriver =
      opts.threads > 1
        ? createWorkerPool(opts.threads, settings, opts.deriveModule, batchReadings, opts.batchTimeoutMs !== undefined ? { batchTimeoutMs: opts.batchTimeoutMs } : {})
        : await createInProcessDeriver(settings, opts.deriveModule, batchReadings);
    const comment = opts.config.input?.comment;
    const gzipLimits = {
      maxRatio: opts.config.input?.gzipMaxRatio ?? DEFAULT_GZIP_LIMITS.maxRatio,
      maxBytes: (opts.config.input?.gzipMaxGb ?? DEFAULT_GZIP_LIMITS.maxBytes / 1e9) * 1e9,
    };
    const src = await openTable(opts.catalogPath, { ...(opts.format ? { format: opts.format } : {}), ...(comment ? { commentPrefix: comment } : {}), gzipLimits });
    source = src;
    const plan = planColumns(src, opts.config);
    const provenance = settingsProvenance(settings);
    const columns = buildOutputColumns(plan, provenance, opts.config.passthrough);
    if (columns.length > MAX_PARQUET_COLUMNS) {
      const n = (x: number): string => x.toLocaleString('en-US');
      throw new CatalogError(
        `${displayPath(src.path)}: ${n(plan.passthrough.length)} columns to pass through, ${n(columns.length)} to write in all, more than the ${n(MAX_PARQUET_COLUMNS)} the output can hold; keep fewer columns in the catalog`,
      );
    }
    const inputHash = sha256File(opts.catalogPath);
    inputHash.catch(() => undefined);

    const set = await OutputSet.create(paths);
    staged = set;
    const readingsTemp = set.staged('readings');
    // The Parquet writers open once the first batch is with the workers: opening the first loads
    // DuckDB's native module, about 0.2 s of this thread that the workers would otherwise wait for.
    const openWriters = (): Promise<void> =>
      (opening ??= (async () => {
        writer = await openParquetWriter(set.staged('catalog'), columns, { scratchDir: set.scratch('rows') });
        readingsWriter = await openParquetWriter(readingsTemp, READINGS_COLUMNS, { scratchDir: set.scratch('readings') });
      })());
    report = new RejectionReport(set.staged('rejections'));
    const readingValues: CellValue[] = new Array<CellValue>(READINGS_COLUMNS.length);

    const label = displayPath(src.path);
    const duplicates = new DuplicateIds(label, plan.seenIds);
    const medians = new InputMedians(plan, label);
    const intended = opts.config.implausibleMediansIntended === true;
    const earlyRows = opts.earlyMedianRows ?? EARLY_MEDIAN_ROWS;
    let earlyLooked = false;
    const counts = { rows: 0, derived: 0, flagged: 0, problems: 0 };
    const values: CellValue[] = new Array<CellValue>(columns.length);
    const queue: PendingChunk[] = [];
    const maxInFlight = 2 * deriver.threads + 1;
    const rowsTotal = src.nRows;

    const writeChunk = async (chunk: PendingChunk): Promise<void> => {
      await openWriters();
      // Rejects as soon as the run is aborted, so a long batch in a worker is not waited for.
      const packed = chunk.results ? await (opts.signal ? untilAborted(chunk.results, opts.signal) : chunk.results) : null;
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
        medians.add(row, own && failed === null ? own : null, index);
        const ctx = rowContext(row, own, index);
        fillRow(values, columns, ctx);
        writer!.appendRow(values);
        batchReadings.list.forEach((r, j) => {
          const under = ctx.packed?.readings?.[j] ?? null;
          const rc: ReadingRowContext = {
            id: row.id,
            reading: r.id,
            packed: under,
            k: index,
            flags: under ? under.flags[index]! : ctx.flags,
          };
          for (let i = 0; i < READINGS_COLUMNS.length; i++) readingValues[i] = READINGS_COLUMNS[i]!.value(rc);
          readingsWriter!.appendRow(readingValues);
        });
      }
      counts.rows += chunk.rows.length;
      if (!earlyLooked && counts.rows >= earlyRows) {
        earlyLooked = true;
        const problem = intended ? null : medians.problem();
        const rowsLeft = rowsTotal === undefined ? Infinity : rowsTotal - counts.rows;
        if (problem && rowsLeft >= earlyRows) {
          const n = (x: number): string => x.toLocaleString('en-US');
          opts.onNotice?.(
            `${problem} (from the first ${n(counts.rows)}${rowsTotal === undefined ? '' : ` of ${n(rowsTotal)}`} rows). ` +
              'The run goes on, and stops at the end with this message if the whole catalog gives it too; Ctrl-C stops it now.',
          );
        }
      }
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
      // Settled (or its failure reported) by writeChunk.
      openWriters().catch(() => undefined);
      while (queue.length >= maxInFlight) await writeChunk(queue.shift()!);
    }
    await openWriters();
    while (queue.length > 0) {
      opts.signal?.throwIfAborted();
      await writeChunk(queue.shift()!);
    }
    opts.signal?.throwIfAborted();
    medians.check(intended);

    // Every answer is in: the workers stop while the files are finished (awaited before the commit).
    stopping = deriver.close();
    stopping.catch(() => undefined);
    deriver = null;
    await report.close();
    report = null;
    // The rows derived and the hash recorded must come from the same bytes: the file must be the
    // one opened (same inode, size, modification and status-change times), and hold as many rows
    // as were counted when it was opened.
    const sha256 = await inputHash;
    // Open since the loop's end (the assignments happen inside openWriters, out of the compiler's sight).
    const catalogWriter = writer as unknown as ParquetWriter;
    const rw = readingsWriter as unknown as ParquetWriter;
    if (identity) await checkInputUnchanged(opts.catalogPath, label, identity);
    if (rowsTotal !== undefined && counts.rows !== rowsTotal) {
      throw new CatalogError(`${label}: the catalog changed while it was being read (${rowsTotal} rows counted when it was opened, ${counts.rows} read); nothing was written — derive again once it is complete`);
    }
    if (catalogWriter.rowCount !== counts.rows) throw new Error(`wrote ${catalogWriter.rowCount} rows for ${counts.rows} read; nothing was written`);
    const readingsMeta = buildReadingsMetadata(batchReadings.primary.id, path.basename(paths.readings), batchReadings.list, READINGS_COLUMNS);
    // The readings file's own metadata is written without the summary (the catalog's carries it).
    const readingsKv = {
      [READINGS_METADATA_KEY]: JSON.stringify(readingsMeta),
      ...parquetStandardKeys(readingsTableDoc(toolVersion()), rw.textLengths()),
    };
    // Both scratch tables take their last rows at once (one DuckDB each); the catalog's is written after the summary.
    for (const c of await Promise.allSettled([rw.commit(), catalogWriter.commit()])) if (c.status === 'rejected') throw c.reason;
    readingsMeta.summary = await summarizeReadingRows((sql) => rw.queryRows(sql), batchReadings.list.map((r) => r.id));
    const metadata = buildCatalogMetadata({
      config: opts.config,
      source: src,
      inputSha256: sha256,
      provenance,
      counts,
      paths,
      columns,
      inputColumns: plan.canonical,
      readings: readingsMeta,
    });
    const doc = tableDocOf(metadata);
    // The two Parquet files are written at the same time, one DuckDB thread each (the workers
    // have stopped, so both cores are free); each file's bytes do not depend on the other.
    const written = await Promise.allSettled([
      rw.finish(readingsKv),
      catalogWriter.finish({ [METADATA_KEY]: catalogMetadataJson(metadata), ...parquetStandardKeys(doc, catalogWriter.textLengths()) }),
    ]);
    readingsWriter = null;
    writer = null;
    for (const w of written) if (w.status === 'rejected') throw w.reason;
    // ECSV, VOTable and FITS copies, staged with the rest so that all files are replaced together.
    const exports = exportTargets.map((t) => ({ format: t.format, path: set.stagedExtra(t.path) }));
    await exportCatalog(set.staged('catalog'), doc, exports);
    await writeFile(set.staged('meta'), `${JSON.stringify(metadata, null, 2)}\n`);
    await stopping;
    // Files may have appeared at the output paths during the run: the same rules apply to them.
    await checkOutputTargets(opts.catalogPath, paths, opts.force ?? false, exportTargets);
    await set.commit();
    staged = null;
    return {
      paths,
      ...counts,
      columns: columns.length,
      threads: opts.threads,
      elapsedMs: performance.now() - started,
      readings: readingsMeta.summary ?? [],
      exports: exportTargets.map((t) => t.path),
    };
  } catch (error) {
    await deriver?.close().catch(() => undefined);
    await stopping?.catch(() => undefined);
    await report?.abandon();
    // A writer still opening is closed once it is open.
    await (opening as Promise<void> | null)?.catch(() => undefined);
    await (writer as ParquetWriter | null)?.abort();
    await (readingsWriter as ParquetWriter | null)?.abort();
    await staged?.discard();
    throw error;
  } finally {
    await source?.close().catch(() => undefined);
  }
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
