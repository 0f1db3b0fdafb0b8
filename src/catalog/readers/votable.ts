import { DEFAULT_GZIP_LIMITS, type GzipLimits } from './gzipLimits.ts';
import type { ColumnInfo, ColumnKind, TableChunk, TableSource } from './types.ts';
import { CatalogError } from './CatalogError.ts';
import { ChunkBuilder, checkChunkRows } from './ChunkBuilder.ts';
import { settleColumnNames } from './columnNames.ts';
import { readTextChunks } from './textChunks.ts';
import { XmlTokenizer, type XmlHandler } from './XmlTokenizer.ts';
import { votColumnInfo, votKind, votParser, votTextParser, type VotField, type VotParser } from './votableFields.ts';
import { VotBinaryDecoder } from './votableBinary.ts';
import { cellAsText } from './cellText.ts';
import { MAX_COLUMNS, MAX_FIELD_CHARS, MAX_RECORD_CHARS } from './limits.ts';
import type { Cell } from './types.ts';

/**
 * Opens the first TABLE of an IVOA VOTable (1.3/1.4) document serialized as TABLEDATA, BINARY
 * or BINARY2 (base64 `<STREAM>`; see {@link VotBinaryDecoder}), gzip-compressed or not.
 *
 * The file is streamed through {@link XmlTokenizer}; nothing but one read buffer and one chunk is
 * held. Opening makes one full pass (well-formedness, every cell against its FIELD's datatype,
 * row count, 64-bit range); `chunks()` re-parses and stops at the end of the table. The FITS
 * serialization and external streams (`href`) are refused. A TD longer than MAX_FIELD_CHARS or a
 * row of more than MAX_COLUMNS cells is a CatalogError. `meta` holds `description` (the VOTABLE's
 * DESCRIPTION), `tableName`, `tableDescription`, `params` (every PARAM: name → {value, datatype,
 * unit?, ucd?}) and `infos` (INFO name → value). A long column holding values beyond ±(2^53 − 1)
 * is read as `string` (exact digits). Cell rules: see {@link votParser}.
 *
 * @param path - file to read
 */
export async function openVotable(path: string, limits: Readonly<GzipLimits> = DEFAULT_GZIP_LIMITS): Promise<TableSource> {
  const scan = new VotHandler(path, null);
  await parseFile(path, scan, limits);
  if (scan.fields === null) {
    throw new CatalogError(scan.tables === 0 ? `${path}: VOTable has no TABLE element` : `${path}: the first VOTable TABLE has no FIELD elements`);
  }
  const fields = scan.fields;
  const columns = fields.map((f, i) => ({ ...f.info, kind: scan.unsafe[i] ? 'string' as const : f.info.kind }));
  const parsers = fields.map((f, i) => votParser(f.field, columns[i]!.kind, scan.unsafe[i]!));
  let closed = false;
  return {
    path, format: 'votable', columns, nRows: scan.nRows, meta: scan.meta,
    keepAsText(index: number) {
      columns[index]!.kind = 'string';
      parsers[index] = votTextParser(fields[index]!.field);
    },
    async *chunks(chunkRows?: number): AsyncGenerator<TableChunk> {
      if (closed) throw new Error(`${path}: chunks() called after close()`);
      const builder = new ChunkBuilder(columns.length, checkChunkRows(chunkRows));
      const rows = new VotHandler(path, { parsers, builder, kinds: columns.map((c) => c.kind) });
      const tok = new XmlTokenizer(path, rows);
      rows.tok = tok;
      for await (const text of readTextChunks(path, path, limits)) {
        tok.push(text);
        yield* builder.takeReady();
        if (rows.targetDone) break;
      }
      yield* builder.finish();
    },
    async close() { closed = true; },
  };
}

async function parseFile(path: string, handler: VotHandler, limits: Readonly<GzipLimits>): Promise<void> {
  const tok = new XmlTokenizer(path, handler);
  handler.tok = tok;
  for await (const text of readTextChunks(path, path, limits)) tok.push(text);
  tok.end();
}

interface ScannedField { field: VotField; info: ColumnInfo }
interface RowSink { parsers: VotParser[]; builder: ChunkBuilder; kinds: ColumnKind[] }
type TextTarget = 'td' | 'fieldDescription' | 'description' | 'tableDescription' | null;

/** Event handler for both passes: scan (`sink` null) collects the schema and checks cells; rows fills chunks. */
class VotHandler implements XmlHandler {
  tok!: XmlTokenizer;
  tables = 0;
  fields: ScannedField[] | null = null;
  unsafe: boolean[] = [];
  nRows = 0;
  targetDone = false;
  readonly meta: Record<string, unknown> = {};
  private readonly params: Record<string, unknown> = {};
  private readonly infos: Record<string, string> = {};
  private readonly path: string[] = [];
  private declared: VotField[] = [];
  private current: VotField | null = null;
  private currentIsParam = false;
  private inTarget = false;
  private inTableData = false;
  private collect: TextTarget = null;
  private buf = '';
  private cells: string[] = [];
  private rowChars = 0;
  private scanParsers: VotParser[] = [];
  private binary: 'BINARY' | 'BINARY2' | null = null;
  private decoder: VotBinaryDecoder | null = null;

  private readonly file: string;
  private readonly sink: RowSink | null;

  constructor(file: string, sink: RowSink | null) {
    this.file = file;
    this.sink = sink;
  }

  open(name: string, attrs: Record<string, string>): void {
    const parent = this.path[this.path.length - 1];
    this.path.push(name);
    if (this.inTableData) {
      if (name === 'TR') { this.cells = []; this.rowChars = 0; }
      else if (name === 'TD') {
        if (this.cells.length >= MAX_COLUMNS) throw this.tok.error(`a row with more than ${MAX_COLUMNS} TD cells`);
        this.collect = 'td';
        this.buf = '';
      }
      return;
    }
    if (parent === undefined && name !== 'VOTABLE') throw new CatalogError(`${this.file}: not a VOTable: the root element is <${name}>`);
    switch (name) {
      case 'TABLE':
        if (++this.tables === 1) {
          this.inTarget = true;
          if (attrs.name !== undefined) this.meta.tableName = attrs.name;
        }
        break;
      case 'FIELD':
      case 'PARAM':
        this.current = { attrs };
        this.currentIsParam = name === 'PARAM';
        if (name === 'FIELD' && this.inTarget && parent === 'TABLE') this.declared.push(this.current);
        break;
      case 'VALUES':
        if (this.current && attrs.null !== undefined) this.current.nullValue = attrs.null;
        break;
      case 'DESCRIPTION':
        if (parent === 'FIELD' || parent === 'PARAM') this.collect = 'fieldDescription';
        else if (parent === 'VOTABLE') this.collect = 'description';
        else if (parent === 'TABLE' && this.inTarget) this.collect = 'tableDescription';
        this.buf = '';
        break;
      case 'INFO':
        if (attrs.name !== undefined) this.infos[attrs.name] = attrs.value ?? '';
        break;
      case 'DATA':
        if (this.inTarget) this.settleFields();
        break;
      case 'TABLEDATA':
        if (this.inTarget && parent === 'DATA') this.inTableData = true;
        break;
      case 'BINARY':
      case 'BINARY2':
        if (this.inTarget && parent === 'DATA') this.binary = name;
        break;
      case 'STREAM':
        if (this.binary !== null && parent === this.binary) this.openStream(attrs);
        break;
      case 'FITS':
        if (this.inTarget && parent === 'DATA') {
          throw new CatalogError(`${this.file}: VOTable serialization FITS is not supported; re-save as TABLEDATA, BINARY or BINARY2`);
        }
        break;
    }
  }

  text(s: string): void {
    if (this.decoder !== null) { this.decoder.push(s); return; }
    if (this.collect === null) return;
    this.buf += s;
    if (this.buf.length > MAX_FIELD_CHARS) throw this.tok.error(`text longer than ${MAX_FIELD_CHARS} characters in one ${this.collect === 'td' ? 'TD cell' : 'DESCRIPTION'}`);
  }

  private openStream(attrs: Record<string, string>): void {
    if (attrs.href !== undefined) throw this.tok.error(`a ${this.binary} STREAM with href (data in another file) is not supported`);
    if (attrs.encoding !== 'base64') throw this.tok.error(`a ${this.binary} STREAM with encoding "${attrs.encoding ?? ''}" is not supported (only base64)`);
    const fields = this.fields ?? [];
    const kinds = this.sink ? this.sink.kinds : fields.map((f) => f.info.kind);
    const layout = fields.map((f, i) => ({ field: f.field, kind: kinds[i]! }));
    this.decoder = new VotBinaryDecoder(layout, this.binary === 'BINARY2', this.file, (cells) => this.binaryRow(cells));
  }

  private binaryRow(cells: Cell[]): void {
    if (this.sink) {
      const { builder, kinds } = this.sink;
      for (let i = 0; i < cells.length; i++) builder.cols[i]!.push(kinds[i] === 'string' ? cellAsText(cells[i]!) : cells[i]!);
      builder.rowDone();
      return;
    }
    const fields = this.fields ?? [];
    for (let i = 0; i < cells.length; i++) {
      if (typeof cells[i] === 'string' && fields[i]!.info.kind === 'int') this.unsafe[i] = true;
    }
    this.nRows++;
  }

  close(name: string): void {
    this.path.pop();
    if (name === 'STREAM' && this.decoder !== null) {
      this.decoder.end();
      this.decoder = null;
      return;
    }
    if (name === 'BINARY' || name === 'BINARY2') this.binary = null;
    if (this.inTableData) {
      if (name === 'TD' && this.collect === 'td') {
        this.rowChars += this.buf.length;
        if (this.rowChars > MAX_RECORD_CHARS) throw this.tok.error(`a row longer than ${MAX_RECORD_CHARS} characters (the limit for one row)`);
        this.cells.push(this.buf);
        this.collect = null;
      }
      else if (name === 'TR') this.row();
      else if (name === 'TABLEDATA') this.inTableData = false;
      return;
    }
    switch (name) {
      case 'DESCRIPTION':
        if (this.collect === 'fieldDescription' && this.current) this.current.description = this.buf.trim();
        else if (this.collect === 'description' && this.meta.description === undefined) this.meta.description = this.buf.trim();
        else if (this.collect === 'tableDescription') this.meta.tableDescription = this.buf.trim();
        this.collect = null;
        break;
      case 'PARAM':
        if (this.current && this.currentIsParam) this.addParam(this.current);
        this.current = null;
        break;
      case 'FIELD':
        this.current = null;
        break;
      case 'TABLE':
        if (this.inTarget) {
          this.settleFields();
          this.inTarget = false;
          this.targetDone = true;
        }
        break;
      case 'VOTABLE':
        if (Object.keys(this.params).length) this.meta.params = this.params;
        if (Object.keys(this.infos).length) this.meta.infos = this.infos;
        break;
    }
  }

  /** Fixes the columns once the FIELDs of the target table are all declared. */
  private settleFields(): void {
    if (this.fields !== null || this.declared.length === 0) return;
    const where = `${this.file}: line ${this.tok.line()}`;
    const names = settleColumnNames(this.declared.map((f) => f.attrs.name ?? f.attrs.ID ?? ''), where);
    this.fields = this.declared.map((field, i) => {
      const kind = votKind(field);
      if (!isKind(kind)) throw new CatalogError(`${this.file}: FIELD "${names[i]}" ${kind}`);
      return { field, info: votColumnInfo(field, names[i]!, kind) };
    });
    this.unsafe = this.fields.map(() => false);
    this.scanParsers = this.fields.map((f) => votParser(f.field, f.info.kind, false));
  }

  private row(): void {
    const cells = this.cells;
    if (this.sink) {
      const { parsers, builder } = this.sink;
      for (let i = 0; i < parsers.length; i++) builder.cols[i]!.push(parsers[i]!(cells[i] ?? '') ?? null);
      builder.rowDone();
      return;
    }
    const fields = this.fields ?? [];
    if (cells.length !== fields.length) {
      throw this.tok.error(`row ${this.nRows + 1} has ${cells.length} TD cells but the table has ${fields.length} FIELDs`);
    }
    for (let i = 0; i < cells.length; i++) {
      const v = this.scanParsers[i]!(cells[i]!);
      if (v === undefined) {
        const f = fields[i]!;
        throw this.tok.error(`column "${f.info.name}" (${f.field.attrs.datatype}): "${clip(cells[i]!.trim())}" is not a valid ${f.field.attrs.datatype} value`);
      }
      if (typeof v === 'number' && f64Unsafe(v, fields[i]!.info.kind)) this.unsafe[i] = true;
    }
    this.nRows++;
  }

  private addParam(p: VotField): void {
    const name = p.attrs.name ?? p.attrs.ID;
    if (name === undefined) return;
    const raw = p.attrs.value ?? '';
    const kind = votKind(p);
    const parsed = isKind(kind) ? votParser(p, kind, false)(raw) : undefined;
    const entry: Record<string, unknown> = { value: parsed === undefined ? raw : parsed, datatype: p.attrs.datatype };
    if (p.attrs.unit) entry.unit = p.attrs.unit;
    if (p.attrs.ucd) entry.ucd = p.attrs.ucd;
    if (p.description) entry.description = p.description;
    this.params[name] = entry;
  }
}

function isKind(k: string): k is ColumnKind {
  return k === 'float' || k === 'int' || k === 'bool' || k === 'string';
}

function f64Unsafe(v: number, kind: ColumnKind): boolean {
  return kind === 'int' && !Number.isSafeInteger(v);
}

function clip(s: string): string {
  return s.length > 40 ? `${s.slice(0, 40)}…` : s;
}
