import { describe, expect, it } from 'vitest';
import { XmlTokenizer } from '../../../src/catalog/readers/XmlTokenizer.ts';

function events(pieces: string[]): string[] {
  const out: string[] = [];
  let text = '';
  const flush = () => { if (text.trim() !== '') out.push(`text:${text}`); text = ''; };
  const tok = new XmlTokenizer('mem', {
    open: (name, attrs) => { flush(); out.push(`open:${name}${JSON.stringify(attrs)}`); },
    close: (name) => { flush(); out.push(`close:${name}`); },
    text: (s) => { text += s; },
  });
  for (const p of pieces) tok.push(p);
  tok.end();
  return out;
}

const DOC = `<?xml version="1.0"?>\n<!-- c > -->\n<a x="1>2" y='q"'><b/>t &amp; u<![CDATA[<c>]]>&#x41;</a>\n`;

describe('XmlTokenizer', () => {
  it('gives the same events however the document is cut into pieces', () => {
    const expected = ['open:a{"x":"1>2","y":"q\\""}', 'open:b{}', 'close:b', 'text:t & u<c>A', 'close:a'];
    expect(events([DOC])).toEqual(expected);
    for (let i = 1; i < DOC.length; i++) expect(events([DOC.slice(0, i), DOC.slice(i)])).toEqual(expected);
    expect(events([...DOC])).toEqual(expected);
  });

  it('names the line of a mismatched closing tag', () => {
    expect(() => events(['<a>\n<b>\n</a>'])).toThrow('mem: line 3: closing tag </a> does not match <b>');
  });

  it('rejects a bare ampersand, an unknown entity and text after the root', () => {
    expect(() => events(['<a>x & y</a>'])).toThrow('mem: line 1: unescaped "&" in text (write &amp;)');
    expect(() => events(['<a>\n&nbsp;</a>'])).toThrow('mem: line 2: unknown entity "&nbsp;"');
    expect(() => events(['<a/>\nz'])).toThrow('mem: line 2: text outside the root element');
  });
});

describe('XmlTokenizer with long text', () => {
  it('passes long text on in pieces before its end tag arrives, holding back only a split entity', () => {
    const texts: string[] = [];
    const tok = new XmlTokenizer('mem', { open: () => {}, close: () => {}, text: (s) => texts.push(s) });
    tok.push('<A>');
    tok.push('x'.repeat(1000));
    expect(texts.join('')).toBe('x'.repeat(1000)); // a BINARY stream must not pile up until </STREAM>
    tok.push('y&am');
    expect(texts.join('')).toBe(`${'x'.repeat(1000)}y`);
    tok.push('p;z</A>');
    tok.end();
    expect(texts.join('')).toBe(`${'x'.repeat(1000)}y&z`);
  });
});
