import { describe, expect, it } from 'vitest';
import { DelimitedTokenizer } from '../../../src/catalog/readers/DelimitedTokenizer.ts';

function tokenize(pieces: string[], delimiter = ','): [string[], number][] {
  const out: [string[], number][] = [];
  const tok = new DelimitedTokenizer({ delimiter, label: 'mem' }, (f, line) => out.push([f, line]));
  for (const p of pieces) tok.push(p);
  tok.end();
  return out;
}

/** All ways to cut `s` into two pieces, plus one-character pieces. */
function splits(s: string): string[][] {
  const ways: string[][] = [[s], [...s]];
  for (let i = 1; i < s.length; i++) ways.push([s.slice(0, i), s.slice(i)]);
  return ways;
}

const DOC = '# c1\r\nh1,"h,2"\r\n"a""b",  x  \r\n\r\n"multi\r\nline",# not comment\n#c2\nlast,"q"z\r';

describe('DelimitedTokenizer', () => {
  it('returns the same records and start lines however the text is cut into pieces', () => {
    const expected: [string[], number][] = [
      [['h1', 'h,2'], 2],
      [['a"b', 'x'], 3],
      [['multi\r\nline', '# not comment'], 5],
      [['#c2'], 7], // a # line after the first record is data
      [['last', 'qz'], 8],
    ];
    for (const pieces of splits(DOC)) expect(tokenize(pieces)).toEqual(expected);
  });

  it('splits on runs of blanks when the delimiter is a space, with quoted fields', () => {
    const doc = '  a   b "c d"  \n1 "" 3\n\n  \n"x y"  2\t3\n';
    const expected: [string[], number][] = [[['a', 'b', 'c d'], 1], [['1', '', '3'], 2], [['x y', '2', '3'], 5]];
    for (const pieces of splits(doc)) expect(tokenize(pieces, ' ')).toEqual(expected);
  });

  it('keeps empty trailing fields of comma-delimited text', () => {
    expect(tokenize(['a,,\n,b,\n'])).toEqual([[['a', '', ''], 1], [['', 'b', ''], 2]]);
  });

  it('reports an unterminated quote at the line where it opened', () => {
    expect(() => tokenize(['a\n"x\n\ny\n'])).toThrow('mem: line 2: unterminated quoted field (the opening quote is never closed)');
  });
});
