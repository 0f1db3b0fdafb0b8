import { CatalogError } from './CatalogError.ts';
import { MAX_XML_PENDING_CHARS } from './limits.ts';

/** Receives the events of {@link XmlTokenizer}. Element names have any namespace prefix removed. */
export interface XmlHandler {
  open(name: string, attrs: Record<string, string>): void;
  close(name: string): void;
  /** Character data (entities decoded; CDATA verbatim); may arrive in several pieces. */
  text(s: string): void;
}

const NAME_RE = /^[A-Za-z_:][-A-Za-z0-9_.:]*$/;
const ATTR_RE = /\s+([^\s=/>]+)\s*=\s*(?:"([^"]*)"|'([^']*)')/y;
const NAMED_ENTITIES: Record<string, string> = { lt: '<', gt: '>', amp: '&', quot: '"', apos: "'" };

/**
 * A small incremental XML tokenizer, fed with string pieces of any size: enough XML 1.0 for
 * VOTable documents (elements, attributes, character and entity references, comments, CDATA,
 * processing instructions, a DOCTYPE). It checks well-formedness that matters for a table
 * (tag nesting, names, attribute syntax, entities, a single root) and raises a
 * {@link CatalogError} `<file>: line N: ...` otherwise. It does not validate against a schema,
 * and it does not expand entities declared in a DTD.
 */
export class XmlTokenizer {
  private buf = '';
  private pos = 0;
  private lineBase = 1;
  private readonly stack: { name: string; line: number }[] = [];
  private rootSeen = false;
  private rootClosed = false;

  private readonly label: string;
  private readonly handler: XmlHandler;

  constructor(label: string, handler: XmlHandler) {
    this.label = label;
    this.handler = handler;
  }

  /** 1-based line of the markup being handled (for messages raised by the handler). */
  line(): number {
    let n = this.lineBase;
    let i = this.buf.indexOf('\n');
    while (i !== -1 && i < this.pos) {
      n++;
      i = this.buf.indexOf('\n', i + 1);
    }
    return n;
  }

  /** A CatalogError at the current line, or `extraLines` lines further (for text spanning lines). */
  error(message: string, extraLines = 0): CatalogError {
    return new CatalogError(`${this.label}: line ${this.line() + extraLines}: ${message}`);
  }

  /** Feeds the next piece of the document. */
  push(chunk: string): void {
    if (this.pos > 0) {
      this.lineBase = this.line();
      this.buf = this.buf.slice(this.pos);
      this.pos = 0;
    }
    this.buf += chunk;
    this.run(false);
    if (this.buf.length - this.pos > MAX_XML_PENDING_CHARS) {
      throw this.error(`markup longer than ${MAX_XML_PENDING_CHARS} characters without its end (is a tag, comment or quote left open?)`);
    }
  }

  /** Signals the end of the document; throws if anything is left open. */
  end(): void {
    this.run(true);
    const open = this.stack[this.stack.length - 1];
    if (open) {
      this.pos = this.buf.length;
      throw this.error(`unexpected end of file: <${open.name}>${open.line ? ` opened on line ${open.line}` : ''} is not closed`);
    }
    if (!this.rootSeen) throw new CatalogError(`${this.label}: no XML element found`);
  }

  private run(atEnd: boolean): void {
    const buf = this.buf;
    const n = buf.length;
    while (this.pos < n) {
      const lt = buf.indexOf('<', this.pos);
      if (lt === -1) {
        // Hold back only a trailing entity reference that may be split: long text (a BINARY
        // stream) flows through in pieces instead of piling up until its end tag.
        const amp = atEnd ? -1 : buf.lastIndexOf('&');
        const cut = amp >= this.pos && buf.indexOf(';', amp) === -1 ? amp : n;
        if (cut > this.pos) { this.emitText(buf.slice(this.pos, cut)); this.pos = cut; }
        return;
      }
      if (lt > this.pos) {
        this.emitText(buf.slice(this.pos, lt));
        this.pos = lt;
      }
      const next = this.markup(lt);
      if (next === -1) {
        if (atEnd) throw this.error('unexpected end of file inside markup');
        return;
      }
      this.pos = next;
    }
  }

  /** Handles the markup at `lt`; returns the index after it, or -1 if it is not complete yet. */
  private markup(lt: number): number {
    const buf = this.buf;
    const c = buf[lt + 1];
    if (c === undefined) return -1;
    if (c === '/') {
      const gt = buf.indexOf('>', lt);
      if (gt === -1) return -1;
      this.closeTag(buf.slice(lt + 2, gt).trim());
      return gt + 1;
    }
    if (c === '?') {
      const e = buf.indexOf('?>', lt + 2);
      return e === -1 ? -1 : e + 2;
    }
    if (c === '!') {
      if (buf.startsWith('<!--', lt)) {
        const e = buf.indexOf('-->', lt + 4);
        return e === -1 ? -1 : e + 3;
      }
      if (buf.startsWith('<![CDATA[', lt)) {
        const e = buf.indexOf(']]>', lt + 9);
        if (e === -1) return -1;
        this.textInElement(buf.slice(lt + 9, e));
        return e + 3;
      }
      if (buf.startsWith('<!DOCTYPE', lt)) {
        const gt = buf.indexOf('>', lt);
        const br = buf.indexOf('[', lt);
        if (gt === -1) return -1;
        if (br === -1 || br > gt) return gt + 1;
        const e = buf.indexOf(']', br);
        if (e === -1) return -1;
        const gt2 = buf.indexOf('>', e);
        return gt2 === -1 ? -1 : gt2 + 1;
      }
      const head = buf.slice(lt, lt + 9);
      if (head.length < 9 && ['<!--', '<![CDATA[', '<!DOCTYPE'].some((p) => p.startsWith(head))) return -1;
      throw this.error(`malformed markup "${buf.slice(lt, lt + 12)}"`);
    }
    // Start tag: find the closing '>' outside quoted attribute values.
    let quote = '';
    let i = lt + 1;
    for (; i < buf.length; i++) {
      const ch = buf[i];
      if (quote) { if (ch === quote) quote = ''; }
      else if (ch === '"' || ch === "'") quote = ch;
      else if (ch === '>') break;
      else if (ch === '<') throw this.error(`malformed tag "${buf.slice(lt, i)}"`);
    }
    if (i >= buf.length) return -1;
    this.openTag(buf.slice(lt + 1, i));
    return i + 1;
  }

  private openTag(content: string): void {
    const selfClosing = content.endsWith('/');
    const body = selfClosing ? content.slice(0, -1) : content;
    const sp = body.search(/\s/);
    const name = sp === -1 ? body : body.slice(0, sp);
    if (!NAME_RE.test(name)) throw this.error(`malformed tag "<${clip(content)}>"`);
    const attrs: Record<string, string> = {};
    if (sp !== -1) {
      ATTR_RE.lastIndex = sp;
      let end = sp;
      let m: RegExpExecArray | null;
      while ((m = ATTR_RE.exec(body)) !== null) {
        attrs[m[1]!] = this.decode(m[2] ?? m[3] ?? '');
        end = ATTR_RE.lastIndex;
      }
      if (body.slice(end).trim() !== '') throw this.error(`malformed attributes in <${clip(content)}>`);
    }
    if (this.rootClosed) throw this.error(`element <${name}> after the end of the root element`);
    if (this.stack.length === 0) this.rootSeen = true;
    const local = localName(name);
    // Row and cell tags are the bulk of a document: skip the line count for them.
    this.stack.push({ name, line: local === 'TD' || local === 'TR' ? 0 : this.line() });
    this.handler.open(local, attrs);
    if (selfClosing) this.closeTag(name);
  }

  private closeTag(name: string): void {
    const top = this.stack.pop();
    if (top === undefined) throw this.error(`closing tag </${name}> without an opening tag`);
    if (top.name !== name) throw this.error(`closing tag </${name}> does not match <${top.name}>`);
    if (this.stack.length === 0) this.rootClosed = true;
    this.handler.close(localName(name));
  }

  private emitText(raw: string): void {
    if (this.stack.length === 0) {
      const at = raw.search(/\S/);
      if (at !== -1) throw this.error('text outside the root element', newlinesBefore(raw, at));
      return;
    }
    this.handler.text(raw.includes('&') ? this.decode(raw) : raw);
  }

  private textInElement(s: string): void {
    if (this.stack.length === 0) throw this.error('CDATA outside the root element');
    this.handler.text(s);
  }

  /** Decodes character and predefined entity references; anything else after '&' is an error. */
  private decode(s: string): string {
    if (!s.includes('&')) return s;
    return s.replace(/&([^;\s&<]*);?/g, (all: string, ref: string, at: number) => {
      const fail = (msg: string) => this.error(msg, newlinesBefore(s, at));
      if (!all.endsWith(';')) throw fail(`unescaped "&" in text (write &amp;)`);
      if (ref.startsWith('#x') || ref.startsWith('#X')) return codePoint(ref.slice(2), 16, () => fail(`bad character reference "${all}"`));
      if (ref.startsWith('#')) return codePoint(ref.slice(1), 10, () => fail(`bad character reference "${all}"`));
      const named = NAMED_ENTITIES[ref];
      if (named === undefined) throw fail(`unknown entity "${all}"`);
      return named;
    });
  }
}

function codePoint(digits: string, radix: number, fail: () => Error): string {
  const ok = radix === 16 ? /^[0-9a-fA-F]+$/.test(digits) : /^\d+$/.test(digits);
  const cp = ok ? parseInt(digits, radix) : NaN;
  if (!Number.isFinite(cp) || cp > 0x10ffff) throw fail();
  return String.fromCodePoint(cp);
}

function newlinesBefore(s: string, end: number): number {
  let n = 0;
  for (let i = s.indexOf('\n'); i !== -1 && i < end; i = s.indexOf('\n', i + 1)) n++;
  return n;
}

function localName(name: string): string {
  const c = name.indexOf(':');
  return c === -1 ? name : name.slice(c + 1);
}

function clip(s: string): string {
  return s.length > 40 ? `${s.slice(0, 40)}…` : s;
}
