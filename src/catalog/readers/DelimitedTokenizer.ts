import { CatalogError } from './CatalogError.ts';
import { MAX_COLUMNS, MAX_COMMENT_CHARS, MAX_FIELD_CHARS, MAX_RECORD_CHARS } from './limits.ts';

/** Options of {@link DelimitedTokenizer}. */
export interface DelimitedOptions {
  /** Single-character field separator (`,` or tab); `' '` means "runs of blanks" (ECSV). */
  delimiter: string;
  /** File name for error messages. */
  label: string;
  /**
   * One character that starts a comment line anywhere in the file (the config's
   * `input.comment`). Without it only the `#` lines before the first record are comments.
   */
  commentPrefix?: string;
}

/** Receives each record: its fields and the 1-based line on which it starts. */
export type RecordSink = (fields: string[], line: number) => void;

/** Receives the text of each comment line after its `#`. */
export type CommentSink = (text: string, line: number) => void;

const LF = 10, CR = 13, QUOTE = 34, HASH = 35, SPACE = 32, TAB = 9;

/** Tokenizer states (plain constants rather than an enum: erasable TypeScript syntax). */
const S = { RecordStart: 0, FieldStart: 1, Unquoted: 2, Quoted: 3, QuoteInQuoted: 4, AfterQuoted: 5, Comment: 6 } as const;

/**
 * Incremental RFC 4180 tokenizer for delimited text, fed with string pieces of any size.
 *
 * - Quoted fields may hold delimiters, `""` (a literal quote) and line breaks; a quote in the
 *   middle of an unquoted field is kept literally; text right after a closing quote is appended
 *   (`"ab"c` reads as `abc`, as Python's csv module does).
 * - Lines beginning with `#` before the first record are comments; after it, a line beginning
 *   with `#` is data (an id such as `#9`), unless `commentPrefix` is `#`. Lines beginning with
 *   `commentPrefix` are comments everywhere. Blank lines are skipped.
 * - Bounds: a field longer than MAX_FIELD_CHARS characters, a record of more than MAX_COLUMNS
 *   fields or of more than MAX_RECORD_CHARS characters is a CatalogError naming the line; comment text is kept up to MAX_COMMENT_CHARS.
 * - CRLF, LF and lone CR all end a record. Unquoted fields are trimmed of surrounding blanks.
 * - With delimiter `' '`, runs of spaces/tabs separate fields and leading/trailing blanks are ignored.
 *
 * Records go to the sink synchronously from {@link push}/{@link end}; the state survives between
 * pushes, so a field may straddle any number of pieces.
 */
export class DelimitedTokenizer {
  private readonly delim: number;
  private readonly blankDelimited: boolean;
  private state: number = S.RecordStart;
  private fields: string[] = [];
  private field = '';
  private fieldQuoted = false;
  private recordQuoted = false;
  private line = 1;
  private recordLine = 1;
  private quoteLine = 1;
  private pendingCR = false;
  private quotedCR = false;

  private commentText = '';
  private records = 0;
  private recordChars = 0;
  private readonly commentCode: number;

  private readonly opts: DelimitedOptions;
  private readonly sink: RecordSink;
  private readonly commentSink: CommentSink | undefined;

  constructor(opts: DelimitedOptions, sink: RecordSink, commentSink?: CommentSink) {
    this.opts = opts;
    this.sink = sink;
    this.commentSink = commentSink;
    if (opts.delimiter.length !== 1) throw new Error(`delimiter must be one character, got "${opts.delimiter}"`);
    this.delim = opts.delimiter.charCodeAt(0);
    this.blankDelimited = opts.delimiter === ' ';
    const prefix = opts.commentPrefix;
    if (prefix !== undefined && prefix.length !== 1) throw new Error(`commentPrefix must be one character, got "${prefix}"`);
    this.commentCode = prefix === undefined ? -1 : prefix.charCodeAt(0);
  }

  /** Feeds the next piece of text. */
  push(text: string): void {
    const n = text.length;
    const delim = this.delim;
    const blank = this.blankDelimited;
    let i = 0;
    if (this.pendingCR) {
      this.pendingCR = false;
      if (n > 0 && text.charCodeAt(0) === LF) i = 1; // second half of a CRLF split across pieces
    }
    while (i < n) {
      const c = text.charCodeAt(i);
      switch (this.state) {
        case S.RecordStart:
          if (c === this.commentCode || (c === HASH && this.records === 0)) { this.state = S.Comment; i++; continue; }
          this.recordLine = this.line;
          this.state = S.FieldStart;
          continue;
        case S.FieldStart:
          if (blank) {
            if (c === SPACE || c === TAB) { i++; continue; }
            if (c === LF || c === CR) { this.finishRecord(); i = this.lineBreak(text, i); continue; }
          } else {
            if (c === delim) { this.finishField(); i++; continue; }
            if (c === LF || c === CR) { this.finishField(); this.finishRecord(); i = this.lineBreak(text, i); continue; }
            if (c === SPACE || c === TAB) { i++; continue; }
          }
          if (c === QUOTE) {
            this.fieldQuoted = this.recordQuoted = true;
            this.quoteLine = this.line;
            this.state = S.Quoted;
            i++; continue;
          }
          this.state = S.Unquoted;
          continue;
        case S.Unquoted: {
          // Fast path: scan to the next terminator and slice once.
          let j = i;
          while (j < n) {
            const d = text.charCodeAt(j);
            if (d === delim || d === LF || d === CR || (blank && d === TAB)) break;
            j++;
          }
          if (j > i) {
            this.field += text.slice(i, j);
            if (this.field.length > MAX_FIELD_CHARS) this.tooLong(this.recordLine);
          }
          i = j < n ? this.terminate(text, j) : j;
          continue;
        }
        case S.Quoted: {
          const q = text.indexOf('"', i);
          const end = q === -1 ? n : q;
          if (end > i) {
            const piece = text.slice(i, end);
            this.field += piece;
            this.countQuotedLines(piece);
            if (this.field.length > MAX_FIELD_CHARS) this.tooLong(this.quoteLine);
          }
          i = end;
          if (q !== -1) { this.state = S.QuoteInQuoted; this.quotedCR = false; i++; }
          continue;
        }
        case S.QuoteInQuoted:
          if (c === QUOTE) { this.field += '"'; this.state = S.Quoted; i++; continue; }
          this.state = S.AfterQuoted;
          continue;
        case S.AfterQuoted:
          if (c === delim || c === LF || c === CR || (blank && c === TAB)) { i = this.terminate(text, i); continue; }
          if (c !== SPACE && c !== TAB) this.field += text[i];
          i++;
          continue;
        case S.Comment: {
          let j = i;
          while (j < n) {
            const d = text.charCodeAt(j);
            if (d === LF || d === CR) break;
            j++;
          }
          if (this.commentSink && this.commentText.length < MAX_COMMENT_CHARS) {
            this.commentText += text.slice(i, Math.min(j, i + MAX_COMMENT_CHARS - this.commentText.length));
          }
          i = j;
          if (i < n) { this.emitComment(); i = this.lineBreak(text, i); }
          continue;
        }
      }
    }
  }

  /** Flushes the last record; throws if a quoted field was never closed. */
  end(): void {
    this.pendingCR = false;
    if (this.state === S.Quoted) {
      throw new CatalogError(`${this.opts.label}: line ${this.quoteLine}: unterminated quoted field (the opening quote is never closed)`);
    }
    if (this.state === S.Comment) this.emitComment();
    if (this.state === S.RecordStart || this.state === S.Comment) return;
    if (this.state !== S.FieldStart || !this.blankDelimited) this.finishField();
    this.finishRecord();
    this.state = S.RecordStart;
  }

  /** Ends the current field at the terminator `text[i]`; returns the index after it. */
  private terminate(text: string, i: number): number {
    this.finishField();
    const c = text.charCodeAt(i);
    if (c === LF || c === CR) {
      this.finishRecord();
      return this.lineBreak(text, i);
    }
    this.state = S.FieldStart;
    return i + 1;
  }

  /** Consumes the line break at `i` (CRLF counts once, even split across pieces). */
  private lineBreak(text: string, i: number): number {
    this.line++;
    this.state = S.RecordStart;
    if (text.charCodeAt(i) === CR) {
      if (i + 1 < text.length) return text.charCodeAt(i + 1) === LF ? i + 2 : i + 1;
      this.pendingCR = true;
    }
    return i + 1;
  }

  private emitComment(): void {
    if (this.commentSink) this.commentSink(this.commentText, this.line);
    this.commentText = '';
  }

  private tooLong(line: number): never {
    throw new CatalogError(`${this.opts.label}: line ${line}: a field longer than ${MAX_FIELD_CHARS} characters (the limit for one cell; is a quote left open?)`);
  }

  private finishField(): void {
    if (this.fields.length >= MAX_COLUMNS) {
      throw new CatalogError(`${this.opts.label}: line ${this.recordLine}: more than ${MAX_COLUMNS} fields in one record (the limit for columns)`);
    }
    this.recordChars += this.field.length;
    if (this.recordChars > MAX_RECORD_CHARS) {
      throw new CatalogError(`${this.opts.label}: line ${this.recordLine}: a record longer than ${MAX_RECORD_CHARS} characters (the limit for one row)`);
    }
    this.fields.push(this.fieldQuoted ? this.field : this.field.trim());
    this.field = '';
    this.fieldQuoted = false;
    this.state = S.FieldStart;
  }

  private finishRecord(): void {
    const f = this.fields;
    const quoted = this.recordQuoted;
    this.fields = [];
    this.recordChars = 0;
    this.recordQuoted = false;
    this.state = S.RecordStart;
    if (f.length === 0 || (f.length === 1 && f[0] === '' && !quoted)) return; // blank line
    this.records++;
    this.sink(f, this.recordLine);
  }

  private countQuotedLines(s: string): void {
    let k = 0;
    if (this.quotedCR && s.charCodeAt(0) === LF) k = 1; // CRLF split across pieces
    for (; k < s.length; k++) {
      const c = s.charCodeAt(k);
      if (c === LF) this.line++;
      else if (c === CR && s.charCodeAt(k + 1) !== LF) this.line++;
    }
    this.quotedCR = s.charCodeAt(s.length - 1) === CR;
  }
}
